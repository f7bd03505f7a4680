// A booking repeated weekly: the same club-local clock times on the same weekday, N weeks in a
// row. Local times are shifted by whole calendar days, so a daylight-saving change keeps
// "Tuesday 09:00" at 09:00 club time (the instant moves by an hour instead). Pure.

import { addDays } from "@/lib/dates";

/** The most weeks one recurring booking may span (a season of lessons). */
export const MAX_REPEAT_WEEKS = 26;

export type LocalWindow = { startsAt: string; endsAt: string };

const LOCAL = /^(\d{4}-\d{2}-\d{2})T(\d{2}:\d{2})$/;

function shift(local: string, days: number): string {
  const m = LOCAL.exec(local);
  if (!m) throw new RangeError(`Not a local date and time: "${local}"`);
  return `${addDays(m[1]!, days)}T${m[2]}`;
}

/** The first window and each one 7 days after the last, `weeks` windows in all. */
export function expandWeekly(first: LocalWindow, weeks: number): LocalWindow[] {
  if (!Number.isInteger(weeks) || weeks < 1 || weeks > MAX_REPEAT_WEEKS) throw new RangeError(`Weeks must be 1 to ${MAX_REPEAT_WEEKS}.`);
  return Array.from({ length: weeks }, (_, i) => ({ startsAt: shift(first.startsAt, 7 * i), endsAt: shift(first.endsAt, 7 * i) }));
}

const WEEKDAY = new Intl.DateTimeFormat("en-US", { weekday: "short", month: "short", day: "numeric", timeZone: "UTC" });

/** "Tue, Dec 8, 09:00–11:00" for a club-local window (the end's date is named when it differs). */
export function describeLocalWindow(w: LocalWindow): string {
  const [startDate, startTime] = w.startsAt.split("T") as [string, string];
  const [endDate, endTime] = w.endsAt.split("T") as [string, string];
  const day = (d: string) => WEEKDAY.format(new Date(`${d}T12:00:00Z`));
  return endDate === startDate ? `${day(startDate)}, ${startTime}–${endTime}` : `${day(startDate)}, ${startTime} – ${day(endDate)}, ${endTime}`;
}
