import { formatDate, isIsoDate } from "@/lib/dates";
import { DEFAULT_LOCALE } from "@/lib/money/format";

/**
 * A calendar day (already the club's day, "YYYY-MM-DD") as the club's locale writes it, in a
 * <time> element carrying the ISO day. Anything else is shown as it stands (nothing is lost).
 */
export function Day({ date, locale }: { date: string | null | undefined; locale?: string }) {
  if (!date) return <>—</>;
  if (!isIsoDate(date)) return <>{date}</>;
  return <time dateTime={date} className="whitespace-nowrap">{formatDate(date, locale ?? DEFAULT_LOCALE)}</time>;
}

/** The same as text, for labels, titles and captions. */
export function dayText(date: string, locale?: string): string {
  return isIsoDate(date) ? formatDate(date, locale ?? DEFAULT_LOCALE) : date;
}
