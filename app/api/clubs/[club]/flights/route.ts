import { NextResponse } from "next/server";
import { z } from "zod";
import { getAircraft } from "@/db/queries/fleet";
import { listFlights } from "@/db/queries/fleet-flights";
import { apiError, withClub, zodToFields } from "@/lib/server/api";
import { recordId } from "@/lib/validation/primitives";

export const dynamic = "force-dynamic";

const query = z.object({
  aircraftId: recordId("aircraftId must be an aircraft's id").optional(),
  flagged: z.enum(["1"], { error: "flagged must be 1 when given" }).optional(),
});

export async function GET(req: Request, { params }: { params: Promise<{ club: string }> }) {
  const { club } = await params;
  return withClub(club, ["read", "Flight"], (ctx) => {
    const parsed = query.safeParse(Object.fromEntries(new URL(req.url).searchParams));
    if (!parsed.success) return apiError("invalid", "Check the query.", zodToFields(parsed.error));
    const { aircraftId, flagged } = parsed.data;
    if (aircraftId && !getAircraft(ctx.db, ctx.club.id, aircraftId)) return apiError("not_found", "Not found.");
    return NextResponse.json({ flights: listFlights(ctx.db, ctx.club.id, { aircraftId, flaggedOnly: flagged === "1", limit: 200 }) });
  });
}
