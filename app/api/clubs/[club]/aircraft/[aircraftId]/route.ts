import { NextResponse } from "next/server";
import { getAircraft } from "@/db/queries/fleet";
import { listFlights } from "@/db/queries/fleet-flights";
import { listNotices } from "@/db/queries/fleet-notices";
import { getAircraftStatusEntry } from "@/db/queries/fleet-status";
import { listSquawks } from "@/db/queries/fleet-squawks";
import { apiError, withClub } from "@/lib/server/api";
import { can } from "@/permissions";
import { isRecordId } from "@/lib/validation/primitives";

export const dynamic = "force-dynamic";

/** One aircraft: its status and due list, squawks, notices and recent flights. */
export async function GET(_req: Request, { params }: { params: Promise<{ club: string; aircraftId: string }> }) {
  const { club, aircraftId } = await params;
  return withClub(club, ["read", "Aircraft"], (ctx) => {
    if (!isRecordId(aircraftId)) return apiError("not_found", "Not found.");
    const plane = getAircraft(ctx.db, ctx.club.id, aircraftId);
    const entry = plane ? getAircraftStatusEntry(ctx.db, ctx.club, plane.id) : undefined;
    if (!plane || !entry) return apiError("not_found", "Not found.");
    return NextResponse.json({
      ...entry,
      record: { category: plane.category, classRating: plane.classRating, serialNumber: plane.serialNumber, year: plane.year, hourlyRateMinor: plane.hourlyRateMinor, currency: ctx.club.currency, engineTboHours: plane.engineTboHours, engineTimeSinceOverhaul: plane.engineTimeSinceOverhaul },
      squawks: listSquawks(ctx.db, ctx.club.id, { aircraftId: plane.id, limit: 50 }).map(({ reportedById: _r, closedById: _c, ...s }) => s),
      notices: listNotices(ctx.db, ctx.club.id, { aircraftId: plane.id, limit: 20 }),
      flights: can(ctx.ability, "read", "Flight") ? listFlights(ctx.db, ctx.club.id, { aircraftId: plane.id, limit: 20 }) : [],
    });
  });
}
