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

/** Last day still within `days` days of lastDone: the day it was done is day 0, so a check
 *  done on 1 May is good through 31 May for a 30-day period. */
export function daysDue(lastDone: IsoDate, days: number): IsoDate {
  if (!Number.isInteger(days) || days < 0) {
    throw new RangeError(`days must be a whole number of days, got ${days}`);
  }
  return addDays(lastDone, days);
}
