import { compareIsoDates, daysBetween, parseIsoDate, type IsoDate } from "@/lib/dates";
import { assertMinorUnits } from "./checks";
import { roundQuotient } from "./decimal";

/** Days from `start` through `end`, both counted. */
export function countDaysInclusive(start: IsoDate, end: IsoDate): number {
  return daysBetween(start, end) + 1;
}

/**
 * The share of `amountMinor` for the days from `from` through `periodEnd`, by days and
 * counting both ends: amount × days(from..periodEnd) ÷ days(periodStart..periodEnd), rounded
 * half away from zero to the minor unit. A member who joins on or before the first day owes
 * the full amount; one who joins after the last day owes nothing. Calendar days come from the
 * shared date helpers, so February has 29 days in a Gregorian leap year.
 */
export function prorate(amountMinor: number, periodStart: IsoDate, periodEnd: IsoDate, from: IsoDate): number {
  assertMinorUnits(amountMinor, "amountMinor");
  parseIsoDate(from);
  const total = countDaysInclusive(periodStart, periodEnd);
  if (total < 1) throw new RangeError(`Period ends (${periodEnd}) before it starts (${periodStart})`);
  if (compareIsoDates(from, periodStart) <= 0) return amountMinor;
  if (compareIsoDates(from, periodEnd) > 0) return 0;
  return roundQuotient([amountMinor, countDaysInclusive(from, periodEnd)], [total]);
}
