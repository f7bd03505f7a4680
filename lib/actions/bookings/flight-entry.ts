import "server-only";
import { and, eq } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { aircraft, flights, squawks, type Aircraft } from "@/db/schema";
import { findNeighbourFlights } from "@/db/queries/fleet-flights";
import { recordSquawkEvent } from "@/db/queries/fleet-squawks";
import { roundHours } from "@/lib/airworthiness";
import { advanceMeters, checkBetween } from "@/lib/fleet/continuity";

// The flight-log entry written at check-in, by the flight log's own rules (lib/fleet/continuity
// and the fleet queries): the flight row with its continuity flag, the aircraft's current
// meters and engine time, and the squawk when one was found. It mirrors the flight log's
// logFlight action, whose body is not exported as a function of its own.

export type FlightEntry = {
  hobbsOut: number;
  hobbsIn: number;
  tachOut: number;
  tachIn: number;
  dayLandings: number;
  /** How many day landings were to a full stop; null or absent when not recorded. */
  dayFullStopLandings?: number | null;
  nightFullStopLandings: number;
  fuelAdded: number;
  oilAdded: number;
  notes: string | null;
  squawk: string | null;
};

export function writeFlightEntry(
  tx: Tx,
  club: { id: string; unitSystem: "imperial" | "metric" },
  plane: Aircraft,
  who: { pilotId: string; recordedById: string },
  flownOn: string,
  entry: FlightEntry,
): { flightId: string; continuity: "ok" | "gap" | "overlap"; continuityText: string | null; squawkId: string | null } {
  const { previous, following } = findNeighbourFlights(tx, club.id, plane.id, entry.hobbsOut);
  const before = previous ?? (plane.currentHobbs !== null && plane.currentTach !== null && !following ? { hobbsIn: plane.currentHobbs, tachIn: plane.currentTach } : null);
  const continuity = checkBetween(before, entry, following ?? null);
  const continuityText = continuity.issues.length ? continuity.issues.map((i) => i.text).join("; ") : null;
  const metric = club.unitSystem === "metric";
  const [row] = tx
    .insert(flights)
    .values({
      clubId: club.id, aircraftId: plane.id, pilotId: who.pilotId, flownOn,
      hobbsOut: entry.hobbsOut, hobbsIn: entry.hobbsIn, tachOut: entry.tachOut, tachIn: entry.tachIn,
      dayLandings: entry.dayLandings, dayFullStopLandings: entry.dayFullStopLandings ?? null, nightFullStopLandings: entry.nightFullStopLandings,
      fuelAdded: entry.fuelAdded, oilAdded: entry.oilAdded, fuelUnit: metric ? "l" : "gal", oilUnit: metric ? "l" : "qt",
      notes: entry.notes, continuity: continuity.status, continuityText, recordedById: who.recordedById,
    })
    .returning({ id: flights.id })
    .all();

  const meters = advanceMeters({ hobbs: plane.currentHobbs, tach: plane.currentTach }, entry);
  const tachAdded = roundHours(meters.tach - (plane.currentTach ?? meters.tach));
  tx.update(aircraft)
    .set({
      currentHobbs: meters.hobbs,
      currentTach: meters.tach,
      ...(plane.engineTimeSinceOverhaul !== null && tachAdded > 0 ? { engineTimeSinceOverhaul: roundHours(plane.engineTimeSinceOverhaul + tachAdded) } : {}),
    })
    .where(and(eq(aircraft.clubId, club.id), eq(aircraft.id, plane.id)))
    .run();

  let squawkId: string | null = null;
  if (entry.squawk) {
    const [sq] = tx
      .insert(squawks)
      .values({ clubId: club.id, aircraftId: plane.id, flightId: row!.id, reportedById: who.recordedById, description: entry.squawk, foundDuring: "flight" })
      .returning({ id: squawks.id })
      .all();
    squawkId = sq!.id;
    recordSquawkEvent(tx, { clubId: club.id, squawkId, kind: "reported", actorId: who.recordedById, toTriage: "untriaged", note: "Reported at check-in." });
  }
  return { flightId: row!.id, continuity: continuity.status, continuityText, squawkId };
}
