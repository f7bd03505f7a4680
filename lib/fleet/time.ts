// Club-local wall-clock times ↔ UTC instants. The database keeps instants; people type and read
// times in the club's own time zone.

import { formatInstantWords } from "@/lib/dates/words";

// Making an Intl.DateTimeFormat costs far more than using one: one per time zone, kept.
const offsetFormats = new Map<string, Intl.DateTimeFormat>();

function offsetMs(instant: number, timeZone: string): number {
  let format = offsetFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat("en-US", { timeZone, hourCycle: "h23", year: "numeric", month: "2-digit", day: "2-digit", hour: "2-digit", minute: "2-digit", second: "2-digit" });
    offsetFormats.set(timeZone, format);
  }
  const parts = format.formatToParts(new Date(instant));
  const get = (t: string) => Number(parts.find((p) => p.type === t)?.value ?? "0");
  const asUtc = Date.UTC(get("year"), get("month") - 1, get("day"), get("hour"), get("minute"), get("second"));
  return asUtc - Math.floor(instant / 1000) * 1000;
}

/**
 * "2026-05-01T14:00" in `timeZone` → the UTC instant. Around a daylight-saving change the earlier
 * of the candidate instants wins, so a grounding notice never takes effect later than meant.
 */
export function localTimeToInstant(local: string, timeZone: string): Date {
  const m = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})$/.exec(local);
  if (!m) throw new RangeError(`Not a local date and time: "${local}"`);
  const guess = Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3]), Number(m[4]), Number(m[5]));
  const first = guess - offsetMs(guess, timeZone);
  const second = guess - offsetMs(first, timeZone);
  return new Date(Math.min(first, second));
}

/** An instant in words on the club's clock, "Fri 1 May 2026, 14:00", for screens, reasons and e-mails. */
export function formatLocalTime(instant: Date, timeZone: string): string {
  return formatInstantWords(instant, timeZone);
}
