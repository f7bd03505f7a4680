import { addDays, compareIsoDates, parseIsoDate, type IsoDate } from "@/lib/dates";
import { normalizeClassWord } from "./aircraft-class";

// Counting convention for "within the preceding N days" (14 CFR 61.57(a),(b) say 90 days and
// do not settle whether the day of the landings is day 1). Our choice, used everywhere in
// Hangarline (currency board and booking guards alike): the day of the landings is day 1, so
// landings on date D keep the pilot current through D + (N − 1) days — for 90 days, D + 89.
export const PASSENGER_CURRENCY_DAYS = 90;
export const PASSENGER_CURRENCY_LANDINGS = 3;

export type LandingEntry = {
  date: IsoDate;
  dayLandings: number;
  nightFullStopLandings: number;
  /** Category of the aircraft flown ("Airplane", …, 14 CFR 61.5(b)); absent when not recorded. */
  category?: string | null;
  /** Class of the aircraft flown ("Single-engine land", …); absent when not recorded. */
  classRating?: string | null;
  /** A tailwheel airplane; absent or null when not recorded. */
  tailwheel?: boolean | null;
  /** How many of `dayLandings` were to a full stop; absent when not recorded. */
  dayFullStopLandings?: number | null;
};

/** The aircraft the pilot means to carry passengers in. */
export type CurrencyAircraft = { category: string; classRating: string; tailwheel?: boolean };
export type CurrencyStatus = { current: boolean; lastDay: IsoDate | null };

/** Last day on which something done on `date` still counts, for a window of `days` days. */
export function lastDayOfWindow(date: IsoDate, days: number): IsoDate {
  if (!Number.isInteger(days) || days < 1) throw new RangeError(`Window must be a whole number of days ≥ 1, got ${days}`);
  return addDays(date, days - 1);
}

function checkCount(value: number, field: string, date: IsoDate): number {
  if (!Number.isInteger(value) || value < 0) {
    throw new RangeError(`${field} must be a whole number ≥ 0 (flight of ${date}), got ${value}`);
  }
  return value;
}

type Tally = { date: IsoDate; count: number };

// The latest expiry as of `asOf` comes from the `needed`-th most recent landing on or before
// it: any older set of three would expire no later than that one.
function statusFromTallies(tallies: Tally[], asOf: IsoDate, needed: number, days: number): CurrencyStatus {
  const newestFirst = tallies
    .filter((t) => t.count > 0 && compareIsoDates(t.date, asOf) <= 0)
    .sort((a, b) => compareIsoDates(b.date, a.date));
  let seen = 0;
  for (const tally of newestFirst) {
    seen += tally.count;
    if (seen >= needed) {
      const lastDay = lastDayOfWindow(tally.date, days);
      return { current: compareIsoDates(asOf, lastDay) <= 0, lastDay };
    }
  }
  return { current: false, lastDay: null };
}

function sameClass(f: LandingEntry, aircraft: CurrencyAircraft): boolean {
  // An entry with no category or class recorded is NOT counted toward currency in a specific
  // class: a careful chief instructor would not accept "three landings in something" as three
  // landings in a single-engine land airplane (it might have been a helicopter or a twin).
  if (!f.category?.trim() || !f.classRating?.trim()) return false;
  return normalizeClassWord(f.category) === normalizeClassWord(aircraft.category) && normalizeClassWord(f.classRating) === normalizeClassWord(aircraft.classRating);
}

/**
 * Passenger-carrying currency, 14 CFR 61.57(a) (day) and 61.57(b) (night): three takeoffs
 * and landings within the preceding 90 days (day 1 = the day of the landings, see above).
 * Night currency counts only full-stop landings at night; day currency counts those too,
 * because night landings also satisfy 61.57(a). Flights after `asOf` are ignored.
 * `lastDay` is the last date on which the pilot is still current on the landings flown up to
 * `asOf`; null when fewer than three landings have ever been logged by then.
 *
 * With `aircraft`, only flights in the same category and class count (61.57(a)(1)(i), (b)(1)(ii));
 * entries without a recorded category or class do not count (see sameClass). With
 * `aircraft.tailwheel`, only full-stop landings in a tailwheel airplane count (61.57(a)(1)(ii)):
 * day full stops as recorded in `dayFullStopLandings` (none when not recorded: a touch-and-go
 * is not a full stop, and an unrecorded kind is not assumed to be one) plus night full stops.
 * Night currency in a tailwheel airplane likewise counts only full stops flown in a tailwheel
 * airplane: our reading, stricter than 61.57(b) alone, so that "current at night" in a
 * tailwheel airplane also means the tailwheel landings of (a)(1)(ii) were made.
 * A tailwheel flight of the same class counts toward a tricycle-gear airplane of that class.
 * Without `aircraft`, every flight counts (the old, class-blind reading).
 */
export function passengerCurrency(flights: LandingEntry[], asOf: IsoDate, aircraft?: CurrencyAircraft): { day: CurrencyStatus; night: CurrencyStatus } {
  parseIsoDate(asOf);
  const day: Tally[] = [];
  const night: Tally[] = [];
  for (const f of flights) {
    parseIsoDate(f.date);
    const d = checkCount(f.dayLandings, "dayLandings", f.date);
    const n = checkCount(f.nightFullStopLandings, "nightFullStopLandings", f.date);
    const dFull = f.dayFullStopLandings === undefined || f.dayFullStopLandings === null ? null : checkCount(f.dayFullStopLandings, "dayFullStopLandings", f.date);
    if (dFull !== null && dFull > d) throw new RangeError(`dayFullStopLandings (${dFull}) cannot exceed dayLandings (${d}) (flight of ${f.date})`);
    if (aircraft) {
      if (!sameClass(f, aircraft)) continue;
      if (aircraft.tailwheel) {
        if (f.tailwheel !== true) continue;
        day.push({ date: f.date, count: (dFull ?? 0) + n });
        night.push({ date: f.date, count: n });
        continue;
      }
    }
    day.push({ date: f.date, count: d + n });
    night.push({ date: f.date, count: n });
  }
  return {
    day: statusFromTallies(day, asOf, PASSENGER_CURRENCY_LANDINGS, PASSENGER_CURRENCY_DAYS),
    night: statusFromTallies(night, asOf, PASSENGER_CURRENCY_LANDINGS, PASSENGER_CURRENCY_DAYS),
  };
}

/**
 * A club's own recency rule for a type group, e.g. "flown the type within 60 days, else a
 * check flight" (club setting, stricter than the regulations). Same counting convention as
 * passenger currency: a flight on D counts through D + (days − 1). Flights after `asOf` are
 * ignored.
 */
export function recencyInType(
  flights: { date: IsoDate }[],
  asOf: IsoDate,
  days: number,
): { current: boolean; lastFlown: IsoDate | null; lastDay: IsoDate | null } {
  parseIsoDate(asOf);
  let lastFlown: IsoDate | null = null;
  for (const f of flights) {
    parseIsoDate(f.date);
    if (compareIsoDates(f.date, asOf) > 0) continue;
    if (lastFlown === null || compareIsoDates(f.date, lastFlown) > 0) lastFlown = f.date;
  }
  if (lastFlown === null) {
    lastDayOfWindow(asOf, days); // still reject a bad window length
    return { current: false, lastFlown: null, lastDay: null };
  }
  const lastDay = lastDayOfWindow(lastFlown, days);
  return { current: compareIsoDates(asOf, lastDay) <= 0, lastFlown, lastDay };
}
