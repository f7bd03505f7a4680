import "server-only";
import { and, asc, desc, eq, gt, isNull, lt, ne } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { aircraft, flights, users, type FlightRow } from "@/db/schema";

type Handle = Db | Tx;

export type FlightListRow = FlightRow & { registration: string; pilotName: string | null };

export function listFlights(db: Handle, clubId: string, opts: { aircraftId?: string; flaggedOnly?: boolean; unreviewedOnly?: boolean; limit?: number } = {}): FlightListRow[] {
  const rows = db
    .select({ flight: flights, registration: aircraft.registration, pilotName: users.name })
    .from(flights)
    .innerJoin(aircraft, and(eq(aircraft.id, flights.aircraftId), eq(aircraft.clubId, flights.clubId)))
    .leftJoin(users, eq(users.id, flights.pilotId))
    .where(
      and(
        eq(flights.clubId, clubId),
        opts.aircraftId ? eq(flights.aircraftId, opts.aircraftId) : undefined,
        opts.flaggedOnly ? ne(flights.continuity, "ok") : undefined,
        opts.unreviewedOnly ? isNull(flights.continuityReviewedAt) : undefined,
      ),
    )
    .orderBy(desc(flights.hobbsOut))
    .limit(opts.limit ?? 100)
    .all();
  return rows.map((r) => ({ ...r.flight, registration: r.registration, pilotName: r.pilotName }));
}

export function getFlight(db: Handle, clubId: string, flightId: string): FlightRow | undefined {
  return db.select().from(flights).where(and(eq(flights.clubId, clubId), eq(flights.id, flightId))).get();
}

/** The flights either side of a Hobbs reading, by the (club_id, aircraft_id, hobbs_out) index. */
export function findNeighbourFlights(tx: Handle, clubId: string, aircraftId: string, hobbsOut: number): { previous: FlightRow | undefined; following: FlightRow | undefined } {
  const scope = and(eq(flights.clubId, clubId), eq(flights.aircraftId, aircraftId));
  const previous = tx.select().from(flights).where(and(scope, lt(flights.hobbsOut, hobbsOut))).orderBy(desc(flights.hobbsOut)).limit(1).get();
  const same = tx.select().from(flights).where(and(scope, eq(flights.hobbsOut, hobbsOut))).limit(1).get();
  const following = tx.select().from(flights).where(and(scope, gt(flights.hobbsOut, hobbsOut))).orderBy(asc(flights.hobbsOut)).limit(1).get();
  // A flight already starting at the same reading is itself the clearest overlap.
  return { previous: same ?? previous, following };
}

/** Flagged flights nobody has looked at yet, for the maintenance page. */
export function listUnreviewedFlags(db: Handle, clubId: string): FlightListRow[] {
  return listFlights(db, clubId, { flaggedOnly: true, unreviewedOnly: true, limit: 200 });
}
