import { endOfMonthAfter, formatIsoDate, formatMonth, isIsoDate, shiftMonth, type IsoDate } from "@/lib/dates";

/** "2026-04" → its first and last day. */
export function monthRange(month: string): { start: IsoDate; end: IsoDate } {
  const start = `${month}-01`;
  if (!/^\d{4}-\d{2}$/.test(month) || !isIsoDate(start)) throw new RangeError(`Not a month: "${month}" (use YYYY-MM)`);
  return { start, end: endOfMonthAfter(start, 0) };
}

export function monthOf(date: IsoDate): string {
  return date.slice(0, 7);
}

/** The month `n` months after `month` (n may be negative). */
export function shiftMonthKey(month: string, n: number): string {
  const { start } = monthRange(month);
  const t = shiftMonth(Number(start.slice(0, 4)), Number(start.slice(5, 7)), n);
  return formatIsoDate(t.year, t.month, 1).slice(0, 7);
}

/** "2026-04" → "April 2026" in the club's locale (lib/dates formatMonth; en-US when none is given). */
export function monthLabel(month: string, locale = "en-US"): string {
  monthRange(month);
  return formatMonth(month, locale);
}
