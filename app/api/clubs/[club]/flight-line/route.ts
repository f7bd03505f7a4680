import { NextResponse } from "next/server";
import { getFlightLine } from "@/db/queries/fleet-status";
import { withClub } from "@/lib/server/api";

export const dynamic = "force-dynamic";

/** The flight line as JSON, polled by the flight-line page to stay live. */
export async function GET(_req: Request, { params }: { params: Promise<{ club: string }> }) {
  const { club } = await params;
  return withClub(club, ["read", "Aircraft"], (ctx) =>
    NextResponse.json(getFlightLine(ctx.db, ctx.club), { headers: { "Cache-Control": "no-store" } }),
  );
}
