import type { BookingStatus } from "@/db/schema";

// Our own words for a booking's state, with a mark so that it is never told by colour alone.
export const BOOKING_STATUS_WORDS: Record<BookingStatus, string> = {
  reserved: "Reserved",
  dispatched: "Out flying",
  checked_in: "Flown, sheet closed",
  cancelled: "Cancelled",
};

export const BOOKING_STATUS_MARK: Record<BookingStatus, string> = {
  reserved: "○",
  dispatched: "▶",
  checked_in: "✓",
  cancelled: "✕",
};

const DAY_NAME = new Intl.DateTimeFormat("en-US", { weekday: "long", month: "short", day: "numeric", timeZone: "UTC" });

/** "Tuesday, Jun 2" for an ISO calendar date. */
export function dayHeading(date: string): string {
  return DAY_NAME.format(new Date(`${date}T12:00:00Z`));
}

// Building an Intl formatter costs far more than using one: the sheet formats thousands of
// times per render, so one formatter per time zone is kept.
const CLOCKS = new Map<string, Intl.DateTimeFormat>();

/** "HH:MM" of an instant in the club's time zone. */
export function clockTime(instant: Date | number, timeZone: string): string {
  let f = CLOCKS.get(timeZone);
  if (!f) CLOCKS.set(timeZone, (f = new Intl.DateTimeFormat("en-GB", { timeZone, hour: "2-digit", minute: "2-digit", hourCycle: "h23" })));
  return f.format(new Date(instant));
}

/** "YYYY-MM-DDTHH:MM" of an instant in the club's time zone, for a datetime-local field. */
export function localInputValue(instant: Date | number, timeZone: string): string {
  const parts = new Intl.DateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit", hour: "2-digit", minute: "2-digit", hourCycle: "h23" }).formatToParts(new Date(instant));
  const get = (t: string) => parts.find((p) => p.type === t)?.value ?? "00";
  return `${get("year")}-${get("month")}-${get("day")}T${get("hour")}:${get("minute")}`;
}
