import "server-only";
import { and, eq, isNull, ne, sql } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { aircraft, bookings, flights, journalEntries, users, type Aircraft, type FlightRow } from "@/db/schema";
import { findNeighbourFlights } from "@/db/queries/fleet-flights";
import { createSquawk } from "@/db/queries/fleet-squawks";
import { roundHours } from "@/lib/airworthiness";
import { advanceMeters, checkBetween, checkMeterContinuity } from "@/lib/fleet/continuity";
import type { DbLike } from "@/db/queries/money-accounts";
import { postFlightCharge, type FlightChargePosting, type PostingContext } from "@/db/queries/money-flight-charges";
import { lockedThrough } from "@/db/queries/money-post-entry";
import { firstOpenDay } from "@/lib/money/open-period";

// The one write path of a flight. The flight log ("Log a flight") and a booking's flight sheet both
// call recordFlight, in the caller's transaction: the flight row with its continuity flag, the
// aircraft's meters and engine time, the squawk, and the flight's charge to the pilot's member
// account — all or nothing. No flight is written without its charge being posted (or, on an
// aircraft whose rate is zero, without the flight appearing in listUnchargedFlights).
//
// Meter mismatch: the flight's "out" readings are compared with where the aircraft's previous
// flight came "in" (and a late entry's "in" with the next flight's "out"). A mismatch is
// flagged on THIS flight and must be explained by whoever enters it before the flight is
// recorded; the explanation is the pilot's word, so the treasurer still settles it
// (listMeterGaps / settleMeterGap): the time may never have been charged to anyone.

export type FlightReadings = {
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
  /** Why the meters do not continue from the previous flight; required when they do not. */
  meterExplanation?: string | null;
  /** The flight sheet's Out | In extras (optional): fuel on board at each end, clock times "HH:MM". */
  fuelOut?: number | null;
  fuelIn?: number | null;
  timeOut?: string | null;
  timeIn?: string | null;
};

export type RecordFlightRequest = {
  plane: Aircraft;
  pilotId: string;
  recordedById: string;
  /** The calendar day flown, in the club's time zone. */
  flownOn: string;
  readings: FlightReadings;
  /** The booking flown on, when the flight comes from its flight sheet. */
  bookingId?: string | null;
  /** Where the flight was entered, for the squawk's history. */
  via: "flight sheet" | "flight log";
};

export type RecordedFlight = {
  flightId: string;
  continuity: "ok" | "gap" | "overlap";
  continuityText: string | null;
  squawkId: string | null;
  charge: FlightChargePosting;
  /** The journal date of the charge (the first open day when the flight's day is locked). */
  chargedOn: string;
};

/** An expected refusal; the action turns it into its answer. Nothing has been written. */
export class FlightRefused extends Error {
  constructor(
    message: string,
    readonly fieldErrors: Record<string, string[]> = {},
    readonly code: "invalid" | "conflict" = "invalid",
  ) {
    super(message);
    this.name = "FlightRefused";
  }
}

export type FlightContext = PostingContext & { club: { id: string; currency: string; unitSystem: "imperial" | "metric" } };

export function recordFlight(tx: Tx, ctx: FlightContext, req: RecordFlightRequest): RecordedFlight {
  const { plane, readings } = req;
  const clubId = ctx.club.id;
  const explanation = readings.meterExplanation?.trim() || null;

  // The same start reading twice is the same flight entered twice: it would be charged twice.
  const twin = tx
    .select({ id: flights.id, flownOn: flights.flownOn })
    .from(flights)
    .where(and(eq(flights.clubId, clubId), eq(flights.aircraftId, plane.id), eq(flights.hobbsOut, readings.hobbsOut)))
    .get();
  if (twin) {
    throw new FlightRefused(
      `A flight from Hobbs ${readings.hobbsOut.toFixed(1)} on this aircraft is already in the log (flown ${twin.flownOn}); entering it again would charge it twice. Nothing was saved.`,
      { hobbsOut: [`A flight starting at Hobbs ${readings.hobbsOut.toFixed(1)} is already logged.`] },
      "conflict",
    );
  }

  const { previous, following } = findNeighbourFlights(tx, clubId, plane.id, readings.hobbsOut);
  // The aircraft's first logged flight continues from the meters on its record.
  const before = previous ?? (plane.currentHobbs !== null && plane.currentTach !== null && !following ? { hobbsIn: plane.currentHobbs, tachIn: plane.currentTach } : null);
  const continuity = checkBetween(before, readings, following ?? null);
  const continuityText = continuity.issues.length ? continuity.issues.map((i) => i.text).join("; ") : null;
  if (continuity.status !== "ok" && !explanation) {
    const outSide = checkMeterContinuity(before, readings).issues;
    const fieldErrors: Record<string, string[]> = {
      meterExplanation: ["The meters do not continue from the aircraft's previous flight: correct the readings, or say why (for example a ground run or a maintenance run-up)."],
    };
    for (const issue of outSide) (fieldErrors[issue.meter === "hobbs" ? "hobbsOut" : "tachOut"] ??= []).push(issue.text);
    for (const issue of continuity.issues.filter((i) => !outSide.some((o) => `${o.text}` === i.text))) {
      (fieldErrors[issue.meter === "hobbs" ? "hobbsIn" : "tachIn"] ??= []).push(issue.text);
    }
    throw new FlightRefused(`The meters do not continue: ${continuityText}. Correct the readings or explain the difference; nothing was saved.`, fieldErrors);
  }

  const metric = ctx.club.unitSystem === "metric";
  const [row] = tx
    .insert(flights)
    .values({
      clubId, aircraftId: plane.id, pilotId: req.pilotId, flownOn: req.flownOn,
      hobbsOut: readings.hobbsOut, hobbsIn: readings.hobbsIn, tachOut: readings.tachOut, tachIn: readings.tachIn,
      dayLandings: readings.dayLandings, dayFullStopLandings: readings.dayFullStopLandings ?? null, nightFullStopLandings: readings.nightFullStopLandings,
      fuelAdded: readings.fuelAdded, oilAdded: readings.oilAdded, fuelUnit: metric ? "l" : "gal", oilUnit: metric ? "l" : "qt",
      fuelOut: readings.fuelOut ?? null, fuelIn: readings.fuelIn ?? null, timeOut: readings.timeOut ?? null, timeIn: readings.timeIn ?? null,
      notes: readings.notes, continuity: continuity.status, continuityText,
      meterExplanation: continuity.status === "ok" ? null : explanation,
      bookingId: req.bookingId ?? null,
      recordedById: req.recordedById,
    })
    .returning({ id: flights.id })
    .all();
  const flightId = row!.id;

  const meters = advanceMeters({ hobbs: plane.currentHobbs, tach: plane.currentTach }, readings);
  const tachAdded = roundHours(meters.tach - (plane.currentTach ?? meters.tach));
  tx.update(aircraft)
    .set({
      currentHobbs: meters.hobbs,
      currentTach: meters.tach,
      ...(plane.engineTimeSinceOverhaul !== null && tachAdded > 0 ? { engineTimeSinceOverhaul: roundHours(plane.engineTimeSinceOverhaul + tachAdded) } : {}),
    })
    .where(and(eq(aircraft.clubId, clubId), eq(aircraft.id, plane.id)))
    .run();

  let squawkId: string | null = null;
  if (readings.squawk) {
    squawkId = createSquawk(tx, {
      clubId, aircraftId: plane.id, flightId, reportedById: req.recordedById, description: readings.squawk, foundDuring: "flight",
      note: req.via === "flight sheet" ? "Reported on the flight sheet." : "Reported with the flight log.",
    });
  }

  // The charge, by the aircraft's billing meter and rate. A flight flown in a locked period is
  // still charged: on the first open day, its memo naming the day flown.
  const [meterOut, meterIn] = plane.rateMeter === "tach" ? [readings.tachOut, readings.tachIn] : [readings.hobbsOut, readings.hobbsIn];
  const open = firstOpenDay(req.flownOn, lockedThrough(tx, clubId));
  const charge = postFlightCharge(tx, ctx, {
    clubId, memberUserId: req.pilotId, flightId, meterOut, meterIn, ratePerHourMinor: plane.hourlyRateMinor,
    date: req.flownOn, postOn: open.postOn, aircraftLabel: plane.registration,
  });
  return { flightId, continuity: continuity.status, continuityText, squawkId, charge, chargedOn: open.postOn };
}

/** The pilot's booking on this aircraft whose flight has begun and whose flight sheet is not closed. */
export function openFlightBooking(tx: DbLike, clubId: string, aircraftId: string, pilotId: string): { id: string } | undefined {
  return tx
    .select({ id: bookings.id })
    .from(bookings)
    .where(and(eq(bookings.clubId, clubId), eq(bookings.aircraftId, aircraftId), eq(bookings.userId, pilotId), eq(bookings.status, "dispatched")))
    .get();
}

export type MeterGapRow = {
  flightId: string;
  flownOn: string;
  registration: string;
  pilotName: string;
  continuity: "gap" | "overlap";
  continuityText: string | null;
  meterExplanation: string | null;
  maintenanceNote: string | null;
};

/** Flights whose meters did not continue and that the treasurer has not settled yet, oldest first. */
export function listMeterGaps(db: DbLike, clubId: string): MeterGapRow[] {
  const rows = db
    .select({
      flightId: flights.id, flownOn: flights.flownOn, registration: aircraft.registration, pilotName: sql<string>`coalesce(${users.name}, ${users.email})`,
      continuity: flights.continuity, continuityText: flights.continuityText, meterExplanation: flights.meterExplanation, maintenanceNote: flights.continuityReviewNote,
    })
    .from(flights)
    .innerJoin(aircraft, and(eq(aircraft.id, flights.aircraftId), eq(aircraft.clubId, flights.clubId)))
    .innerJoin(users, eq(users.id, flights.pilotId))
    .where(and(eq(flights.clubId, clubId), ne(flights.continuity, "ok"), isNull(flights.gapSettledAt)))
    .orderBy(flights.flownOn, flights.hobbsOut)
    .limit(500)
    .all();
  return rows.map((r) => ({ ...r, continuity: r.continuity as "gap" | "overlap" }));
}

export type UnchargedFlightRow = { flightId: string; flownOn: string; registration: string; pilotName: string; hobbsOut: number; hobbsIn: number };

/**
 * Flights with no live charge in the journal (an aircraft without a rate, or a charge reversed
 * and not re-posted), flown since the club's books began (its first journal entry): flights
 * logged before the club kept its books here were charged elsewhere.
 */
export function listUnchargedFlights(db: DbLike, clubId: string): UnchargedFlightRow[] {
  return db
    .select({ flightId: flights.id, flownOn: flights.flownOn, registration: aircraft.registration, pilotName: sql<string>`coalesce(${users.name}, ${users.email})`, hobbsOut: flights.hobbsOut, hobbsIn: flights.hobbsIn })
    .from(flights)
    .innerJoin(aircraft, and(eq(aircraft.id, flights.aircraftId), eq(aircraft.clubId, flights.clubId)))
    .innerJoin(users, eq(users.id, flights.pilotId))
    .where(
      and(
        eq(flights.clubId, clubId),
        sql`${flights.flownOn} >= (select min(b.entry_date) from ${journalEntries} b where b.club_id = ${flights.clubId})`,
        sql`not exists (select 1 from ${journalEntries} e where e.club_id = ${flights.clubId} and e.source_type = 'flight' and e.source_id = ${flights.id} and e.reverses_entry_id is null
              and not exists (select 1 from ${journalEntries} r where r.club_id = e.club_id and r.reverses_entry_id = e.id))`,
      ),
    )
    .orderBy(flights.flownOn)
    .limit(500)
    .all();
}

/** The treasurer settles a flagged flight: once, with a note (time charged, or explanation accepted). */
export function settleMeterGap(tx: Tx, clubId: string, flightId: string, byUserId: string, note: string): FlightRow | "not-found" | "not-flagged" | "already" {
  const flight = tx.select().from(flights).where(and(eq(flights.clubId, clubId), eq(flights.id, flightId))).get();
  if (!flight) return "not-found";
  if (flight.continuity === "ok") return "not-flagged";
  const done = tx
    .update(flights)
    .set({ gapSettledAt: new Date(), gapSettledById: byUserId, gapSettledNote: note })
    .where(and(eq(flights.clubId, clubId), eq(flights.id, flightId), isNull(flights.gapSettledAt)))
    .run();
  return done.changes === 0 ? "already" : flight;
}
