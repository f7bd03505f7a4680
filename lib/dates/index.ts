// Calendar-date helpers shared by every rule in lib/. Dates are ISO "YYYY-MM-DD" strings
// with no time zone: a calendar date as the club sees it. Arithmetic runs on UTC midnights so
// that daylight-saving changes can never shift a day.

export type IsoDate = string;

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

export function isIsoDate(value: string): boolean {
  const m = ISO_DATE.exec(value);
  if (!m) return false;
  const y = Number(m[1]);
  const mo = Number(m[2]);
  const d = Number(m[3]);
  return mo >= 1 && mo <= 12 && d >= 1 && d <= lastDayOfMonth(y, mo);
}

/**
 * The calendar years any date typed into the product may fall in. Wider than any club's real
 * records (a 1903 aircraft, a member born in 1930, a policy ending in 2150) and narrow enough
 * that date arithmetic and instants never leave the range JavaScript dates represent.
 */
export const MIN_CALENDAR_YEAR = 1900;
export const MAX_CALENDAR_YEAR = 2200;

/** An ISO calendar date whose year lies within MIN_CALENDAR_YEAR..MAX_CALENDAR_YEAR. */
export function isIsoDateInRange(value: string): boolean {
  if (!isIsoDate(value)) return false;
  const year = Number(value.slice(0, 4));
  return year >= MIN_CALENDAR_YEAR && year <= MAX_CALENDAR_YEAR;
}

export function parseIsoDate(value: string): { year: number; month: number; day: number } {
  if (!isIsoDate(value)) throw new RangeError(`Not an ISO calendar date: "${value}"`);
  const [y, m, d] = value.split("-").map(Number) as [number, number, number];
  return { year: y, month: m, day: d };
}

export function formatIsoDate(year: number, month: number, day: number): IsoDate {
  return `${String(year).padStart(4, "0")}-${String(month).padStart(2, "0")}-${String(day).padStart(2, "0")}`;
}

export function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

/** month is 1–12 */
export function lastDayOfMonth(year: number, month: number): number {
  return new Date(Date.UTC(year, month, 0)).getUTCDate();
}

/** The month `n` months after (year, month); n may be negative. */
export function shiftMonth(year: number, month: number, n: number): { year: number; month: number } {
  const index = year * 12 + (month - 1) + n;
  return { year: Math.floor(index / 12), month: (index % 12 + 12) % 12 + 1 };
}

/** Last day of the month that is `months` calendar months after the month of `date`. */
export function endOfMonthAfter(date: IsoDate, months: number): IsoDate {
  const { year, month } = parseIsoDate(date);
  const t = shiftMonth(year, month, months);
  return formatIsoDate(t.year, t.month, lastDayOfMonth(t.year, t.month));
}

/** First day of the month that is `months` calendar months after the month of `date`. */
export function startOfMonthAfter(date: IsoDate, months: number): IsoDate {
  const { year, month } = parseIsoDate(date);
  const t = shiftMonth(year, month, months);
  return formatIsoDate(t.year, t.month, 1);
}

function toUtcMs(date: IsoDate): number {
  const { year, month, day } = parseIsoDate(date);
  return Date.UTC(year, month - 1, day);
}

export function addDays(date: IsoDate, days: number): IsoDate {
  const d = new Date(toUtcMs(date) + days * 86_400_000);
  return formatIsoDate(d.getUTCFullYear(), d.getUTCMonth() + 1, d.getUTCDate());
}

/** Whole days from `from` to `to` (positive when `to` is later). */
export function daysBetween(from: IsoDate, to: IsoDate): number {
  return Math.round((toUtcMs(to) - toUtcMs(from)) / 86_400_000);
}

export function compareIsoDates(a: IsoDate, b: IsoDate): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/** Calendar date of an instant in a time zone (IANA name), e.g. the club's "today". */
// Making an Intl.DateTimeFormat costs far more than using one: one per time zone, kept.
const dateFormats = new Map<string, Intl.DateTimeFormat>();

export function isoDateInTimeZone(instant: Date, timeZone: string): IsoDate {
  let format = dateFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" });
    dateFormats.set(timeZone, format);
  }
  const parts = format.formatToParts(instant);
  const get = (t: string) => parts.find((p) => p.type === t)?.value ?? "";
  return `${get("year")}-${get("month")}-${get("day")}`;
}

export function isValidTimeZone(timeZone: string): boolean {
  try {
    new Intl.DateTimeFormat("en-US", { timeZone });
    return true;
  } catch {
    return false;
  }
}

// Dates people read, in the club's locale (ECMA-402 Intl.DateTimeFormat). A calendar date is a
// day, not an instant: it is formatted at noon UTC in UTC, so no time zone can move it a day.
export type DateStyle = "short" | "medium" | "long";
const displayFormats = new Map<string, Intl.DateTimeFormat>();

function displayFormat(key: string, locale: string, options: Intl.DateTimeFormatOptions): Intl.DateTimeFormat {
  let f = displayFormats.get(key);
  if (!f) {
    f = new Intl.DateTimeFormat(locale, options);
    displayFormats.set(key, f);
  }
  return f;
}

/** "2026-12-01" → "Dec 1, 2026" (en-US), "01.12.2026" (de-DE), "1 déc. 2026" (fr-FR). */
export function formatDate(date: IsoDate, locale: string, style: DateStyle = "medium"): string {
  const { year, month, day } = parseIsoDate(date);
  const f = displayFormat(`d|${locale}|${style}`, locale, { dateStyle: style, timeZone: "UTC" });
  return f.format(new Date(Date.UTC(year, month - 1, day, 12)));
}

/** "2026-04" → "April 2026" (en-US), "April 2026" (de-DE), "avril 2026" (fr-FR). */
export function formatMonth(month: string, locale: string): string {
  const m = /^(\d{4})-(\d{2})$/.exec(month);
  if (!m) throw new RangeError(`Not a month: "${month}" (use YYYY-MM)`);
  const f = displayFormat(`m|${locale}`, locale, { month: "long", year: "numeric", timeZone: "UTC" });
  return f.format(new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, 15, 12)));
}

/** An instant as the club's date and time, in its time zone and locale: "Dec 1, 2026, 6:05 PM". */
export function formatDateTime(instant: Date, timeZone: string, locale: string): string {
  const f = displayFormat(`dt|${locale}|${timeZone}`, locale, { dateStyle: "medium", timeStyle: "short", timeZone });
  return f.format(instant);
}
