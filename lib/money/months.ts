import { endOfMonthAfter, formatIsoDate, isIsoDate, shiftMonth, type IsoDate } from "@/lib/dates";

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

const labels = new Map<string, string>();
const labelFormat = new Intl.DateTimeFormat("en-US", { month: "long", year: "numeric", timeZone: "UTC" });

/** "2026-04" → "April 2026" (English month names, as the rest of the interface). */
export function monthLabel(month: string): string {
  let label = labels.get(month);
  if (label === undefined) {
    label = labelFormat.format(new Date(`${monthRange(month).start}T00:00:00Z`));
    labels.set(month, label);
  }
  return label;
}
