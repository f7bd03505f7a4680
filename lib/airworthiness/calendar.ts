// Date-based due points. Calendar months and plain days are different periods: "12 calendar
// months" runs to the end of the month (FAA-H-8083-25, Aircraft Inspections), "30 days" is
// counted to the day.

import { addDays, endOfMonthAfter, type IsoDate } from "@/lib/dates";

/** Last day of the month that is `months` calendar months after lastDone's month. */
export function calendarDue(lastDone: string, months: number): string {
  if (!Number.isInteger(months) || months < 0) {
    throw new RangeError(`months must be a whole number of calendar months, got ${months}`);
  }
  return endOfMonthAfter(lastDone, months);
}

/**
 * Last day on which something done on `lastDone` is still "within the preceding `days` days"
 * (the VOR check, 14 CFR 91.171(a)(2); any club item counted in days). One convention for every
 * such window in Hangarline: the day it was done is day 1, so a check done on 1 May is good
 * through 30 May for a 30-day window. The same as passenger currency's `lastDayOfWindow`
 * (lib/currency/passenger-currency.ts); a unit test holds the two equal. The regulation does
 * not settle whether the day itself counts; counting it as day 1 is the reading that never
 * gives a day more than the words allow.
 */
export function daysDue(lastDone: IsoDate, days: number): IsoDate {
  if (!Number.isInteger(days) || days < 1) {
    throw new RangeError(`days must be a whole number of days ≥ 1, got ${days}`);
  }
  return addDays(lastDone, days - 1);
}
