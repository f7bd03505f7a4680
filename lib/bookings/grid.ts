// The club's calendar days as instants (the booking page and the JSON list of a day or a week).
// Days are the club's calendar days, so a day with a daylight-saving change is 23 or 25 hours.

import { addDays, parseIsoDate, type IsoDate } from "@/lib/dates";
import { localTimeToInstant } from "@/lib/fleet/time";

export type DayBounds = { date: IsoDate; start: number; end: number };

export function dayBounds(date: IsoDate, timeZone: string): DayBounds {
  const start = localTimeToInstant(`${date}T00:00`, timeZone).getTime();
  const end = localTimeToInstant(`${addDays(date, 1)}T00:00`, timeZone).getTime();
  return { date, start, end };
}

/** Monday of the week holding `date` (ISO 8601 weeks start on Monday). */
export function weekStart(date: IsoDate): IsoDate {
  const { year, month, day } = parseIsoDate(date);
  const weekday = new Date(Date.UTC(year, month - 1, day)).getUTCDay(); // 0 = Sunday
  return addDays(date, -((weekday + 6) % 7));
}

export function weekDates(date: IsoDate): IsoDate[] {
  const monday = weekStart(date);
  return Array.from({ length: 7 }, (_, i) => addDays(monday, i));
}
