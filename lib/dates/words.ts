// Dates and instants in the words people use ("Wed 2 Dec 2026, 20:25"), never a raw ISO
// instant. Instants are shown in the club's time zone; a calendar date is already the club's day
// and is written as it stands (no time zone moves it).

import { parseIsoDate, type IsoDate } from "./index";

const WEEKDAYS = ["Sun", "Mon", "Tue", "Wed", "Thu", "Fri", "Sat"];
const MONTHS = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

// Making an Intl.DateTimeFormat costs far more than using one: one per time zone, kept.
const formats = new Map<string, Intl.DateTimeFormat>();

function partsIn(instant: Date, timeZone: string): { year: number; month: number; day: number; hour: string; minute: string } {
  let format = formats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat("en-US", { timeZone, hourCycle: "h23", year: "numeric", month: "numeric", day: "numeric", hour: "2-digit", minute: "2-digit" });
    formats.set(timeZone, format);
  }
  const parts = format.formatToParts(instant);
  const get = (t: string) => parts.find((p) => p.type === t)?.value ?? "";
  return { year: Number(get("year")), month: Number(get("month")), day: Number(get("day")), hour: get("hour").padStart(2, "0"), minute: get("minute").padStart(2, "0") };
}

function dayWords(year: number, month: number, day: number): string {
  const weekday = new Date(Date.UTC(year, month - 1, day)).getUTCDay();
  return `${WEEKDAYS[weekday]} ${day} ${MONTHS[month - 1]} ${year}`;
}

/** "2026-12-02" → "Wed 2 Dec 2026". */
export function formatDateWords(date: IsoDate): string {
  const { year, month, day } = parseIsoDate(date);
  return dayWords(year, month, day);
}

/**
 * An instant as "Wed 2 Dec 2026, 20:25" on the club's clock (24-hour). An instant that cannot be
 * read is returned as it was given, so nothing is lost from a reason.
 */
export function formatInstantWords(instant: Date | string, timeZone: string): string {
  const at = typeof instant === "string" ? new Date(instant) : instant;
  if (Number.isNaN(at.getTime())) return String(instant);
  const p = partsIn(at, timeZone);
  return `${dayWords(p.year, p.month, p.day)}, ${p.hour}:${p.minute}`;
}
