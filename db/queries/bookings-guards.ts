import "server-only";
import { and, desc, eq } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { flights, type Aircraft, type Club } from "@/db/schema";
import { averageFlightHours, DEFAULT_FLIGHT_HOURS, projectedMeterHours } from "@/lib/bookings/average-flight";
import type { GuardInput } from "@/lib/bookings/guards";
import { bookingTouchesNight } from "@/lib/bookings/night";
import { aircraftClassKey } from "@/lib/currency";
import { isoDateInTimeZone } from "@/lib/dates";
import { aircraftStatus, type AircraftStatusResult } from "@/lib/airworthiness";
import type { FleetRecords } from "@/lib/fleet/flight-line";
import { buildStatusInput, maintenanceHours } from "@/lib/fleet/status-input";
import type { FleetAircraftRecord } from "@/lib/fleet/types";
import { memberArrears } from "@/db/queries/money-arrears";
import { formatMoney } from "@/lib/money";
import { normalizeTypeGroup } from "@/lib/safety/audience";
import { getMemberCurrency } from "./currency";
import { loadAircraftRecords } from "./fleet-status";
import { countActiveBookingsBetween } from "./bookings";
import { findStandingCheckout } from "./safety-checkouts";

// Everything the booking guards weigh, gathered from the other areas' own queries: the flight
// line's status computation (lib/fleet), the currency board's (db/queries/currency) and the
// ledger's arrears rule (db/queries/money-arrears). Nothing here decides; lib/bookings/guards does.

type Handle = Db | Tx;

const RECENT_FLIGHTS = 50;

/** The club's average flight length on this aircraft's maintenance meter, from its last flights. */
export function aircraftAverageFlightHours(db: Handle, clubId: string, plane: Pick<Aircraft, "id" | "maintenanceMeter">): number {
  const rows = db
    .select({ hobbsOut: flights.hobbsOut, hobbsIn: flights.hobbsIn, tachOut: flights.tachOut, tachIn: flights.tachIn })
    .from(flights)
    .where(and(eq(flights.clubId, clubId), eq(flights.aircraftId, plane.id)))
    .orderBy(desc(flights.hobbsOut))
    .limit(RECENT_FLIGHTS)
    .all();
  const tach = plane.maintenanceMeter === "tach";
  return averageFlightHours(rows.map((r) => (tach ? { out: r.tachOut, in: r.tachIn } : { out: r.hobbsOut, in: r.hobbsIn }))) ?? DEFAULT_FLIGHT_HOURS;
}

/** The flight line's own status rules on one aircraft's records; never "flyable" by default. */
function statusOf(records: FleetRecords, record: FleetAircraftRecord, today: string, now: string, soon: { days: number; hours: number }, timeZone: string): AircraftStatusResult {
  try {
    return aircraftStatus(buildStatusInput({ ...records, aircraft: record, dueSoon: soon, now, timeZone }), today, maintenanceHours(record));
  } catch (error) {
    return { status: "unknown", reasons: [{ code: "status-error", text: `Status unknown: ${error instanceof Error ? error.message : String(error)}`, grounding: false }] };
  }
}

export function aircraftStatusNowAndAtEnd(db: Handle, club: Club, plane: Aircraft, window: { startsAt: Date; endsAt: Date }, now: Date, excludeBookingId?: string) {
  const records = loadAircraftRecords(db as Db, club.id, plane.id, now);
  const record = records.aircraft[0];
  const soon = { days: club.settings.dueSoonDays, hours: club.settings.dueSoonHours };
  const average = aircraftAverageFlightHours(db, club.id, plane);
  if (!record) return { statusNow: { status: "unknown" as const, reasons: [] }, statusAtEnd: null, average };
  const statusNow = statusOf(records, record, isoDateInTimeZone(now, club.timeZone), now.toISOString(), soon, club.timeZone);

  // Every active booking that ends after now and starts before this one ends flies about one
  // average flight first (this booking included, counted once even while it is being changed).
  const ahead = countActiveBookingsBetween(db, club.id, plane.id, now, window.endsAt) - (excludeBookingId ? 1 : 0) + 1;
  const meter = record.maintenanceMeter === "hobbs" ? record.currentHobbs : record.currentTach;
  const projected = projectedMeterHours(meter, average, Math.max(ahead, 1));
  const endRecord = record.maintenanceMeter === "hobbs" ? { ...record, currentHobbs: projected } : { ...record, currentTach: projected };
  const end = window.endsAt.getTime() > now.getTime() ? window.endsAt : now;
  const statusAtEnd = projected === null ? null : statusOf(records, endRecord, isoDateInTimeZone(end, club.timeZone), end.toISOString(), soon, club.timeZone);
  return { statusNow, statusAtEnd, average };
}

export function loadGuardInput(
  db: Handle,
  club: Club,
  args: { plane: Aircraft; memberId: string; memberName: string; startsAt: Date; endsAt: Date; withInstructor: boolean; carryingPassengers: boolean; excludeBookingId?: string },
  now: Date = new Date(),
): GuardInput {
  const today = isoDateInTimeZone(now, club.timeZone);
  const status = aircraftStatusNowAndAtEnd(db, club, args.plane, args, now, args.excludeBookingId);
  // Passenger currency in the booked aircraft's category and class (14 CFR 61.57(a)(1)(i)),
  // from verified records only: a member's own claim never clears a guard.
  const planeClass = { category: args.plane.category, classRating: args.plane.classRating, tailwheel: args.plane.tailwheel };
  const currency = getMemberCurrency(db, club, args.memberId, today, [planeClass]);
  const item = (key: string) => currency.items.find((i) => i.key === key);
  const classKey = aircraftClassKey(planeClass);
  // Night (61.57(b)) at the home field. When the position is not recorded, night cannot be
  // computed; with passengers the booking is treated as touching night and the reason says
  // why (a careful chief instructor assumes the worse case rather than the convenient one).
  const night = bookingTouchesNight(args, { latitude: club.settings.homeLatitude, longitude: club.settings.homeLongitude });
  const nightFlight = night.computed ? night.night : args.carryingPassengers;
  const checkedOut = Boolean(findStandingCheckout(db, club.id, args.memberId, args.plane.typeGroup));
  const arrears = memberArrears(db, club.id, args.memberId, today);
  return {
    window: { startDate: isoDateInTimeZone(args.startsAt, club.timeZone), endDate: isoDateInTimeZone(args.endsAt, club.timeZone) },
    aircraft: { registration: args.plane.registration, typeGroup: args.plane.typeGroup, statusNow: status.statusNow, statusAtEnd: status.statusAtEnd, averageFlightHours: status.average },
    member: {
      name: args.memberName,
      checkedOut,
      recencyLastDay: item(`recency:${normalizeTypeGroup(args.plane.typeGroup)}`)?.lastDay ?? null,
      flightReviewLastDay: item("flight_review")?.lastDay ?? null,
      medicalLastDay: item("medical")?.lastDay ?? null,
      passengerDayLastDay: item(`passenger_day:${classKey}`)?.lastDay ?? null,
      passengerNightLastDay: item(`passenger_night:${classKey}`)?.lastDay ?? null,
      arrears: { inArrears: arrears.inArrears, owedText: formatMoney(arrears.balanceMinor, club.currency, club.locale), oldestDueDate: arrears.oldestDueDate },
    },
    withInstructor: args.withInstructor,
    carryingPassengers: args.carryingPassengers,
    nightFlight,
    nightUnknown: !night.computed,
  };
}
