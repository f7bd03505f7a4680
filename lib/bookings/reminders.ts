// The day-before reminder: a booking is reminded on the club's calendar day before the one it
// starts on, from a civil hour of the morning (no message in the middle of the night), once per
// booking and start time (a moved booking is reminded of its new time). Pure.

import { addDays, isoDateInTimeZone } from "@/lib/dates";

/** Reminders go out from this club-local hour on the day before (common practice: not at night). */
export const REMINDER_FROM_HOUR = 8;

function localHour(instant: Date, timeZone: string): number {
  const hour = new Intl.DateTimeFormat("en-GB", { timeZone, hour: "2-digit", hourCycle: "h23" }).format(instant);
  return Number(hour);
}

/** Whether a booking starting at `startsAt` is due its reminder at `now` (club time zone). */
export function reminderDue(startsAt: Date, now: Date, timeZone: string): boolean {
  if (startsAt.getTime() <= now.getTime()) return false;
  const today = isoDateInTimeZone(now, timeZone);
  const startDay = isoDateInTimeZone(startsAt, timeZone);
  return addDays(startDay, -1) === today && localHour(now, timeZone) >= REMINDER_FROM_HOUR;
}

/** The club-local window [from, to) whose bookings may be due at `now`: tomorrow, as instants. */
export function reminderDay(now: Date, timeZone: string): string {
  return addDays(isoDateInTimeZone(now, timeZone), 1);
}
