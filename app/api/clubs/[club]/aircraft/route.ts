import { NextResponse } from "next/server";
import { listAircraft } from "@/db/queries/fleet";
import { withClub } from "@/lib/server/api";

export const dynamic = "force-dynamic";

export async function GET(_req: Request, { params }: { params: Promise<{ club: string }> }) {
  const { club } = await params;
  return withClub(club, ["read", "Aircraft"], (ctx) => {
    const fleet = listAircraft(ctx.db, ctx.club.id).map((a) => ({
      id: a.id,
      registration: a.registration,
      make: a.make,
      model: a.model,
      typeGroup: a.typeGroup,
      category: a.category,
      classRating: a.classRating,
      homeField: a.homeField,
      currentHobbs: a.currentHobbs,
      currentTach: a.currentTach,
      hourlyRateMinor: a.hourlyRateMinor,
      currency: ctx.club.currency,
    }));
    return NextResponse.json({ aircraft: fleet });
  });
}
