import { addDays, compareIsoDates, isoDateInTimeZone, parseIsoDate, type IsoDate } from "@/lib/dates";

// Officers hear of new safety reports in one daily digest, never at the instant of filing: an
// anonymous report's only time is the club day it was received, and the digest covers whole
// club days, so nothing it creates narrows that day down.

/** The digest for the days before is composed at this hour of the club's morning. */
export const DIGEST_HOUR = 6;

/** Offset of the zone from UTC at an instant, in ms (positive east of Greenwich). */
function zoneOffsetMs(instant: Date, timeZone: string): number {
  const parts = new Intl.DateTimeFormat("en-US", {
    timeZone, hourCycle: "h23", year: "numeric", month: "2-digit", day: "2-digit", hour: "2-digit", minute: "2-digit", second: "2-digit",
  }).formatToParts(instant);
  const n = (t: string) => Number(parts.find((p) => p.type === t)?.value ?? 0);
  const wall = Date.UTC(n("year"), n("month") - 1, n("day"), n("hour"), n("minute"), n("second"));
  return wall - Math.floor(instant.getTime() / 1000) * 1000;
}

/** The instant at which the wall clock of `timeZone` shows `hour`:00 on `day` (the first such, or the first instant after a skipped hour). */
export function zonedInstant(day: IsoDate, hour: number, timeZone: string): Date {
  const { year, month, day: d } = parseIsoDate(day);
  const wall = Date.UTC(year, month - 1, d, hour);
  let guess = wall - zoneOffsetMs(new Date(wall), timeZone);
  guess = wall - zoneOffsetMs(new Date(guess), timeZone);
  return new Date(guess);
}

/** The first instant of a club day. */
export function startOfClubDay(day: IsoDate, timeZone: string): Date {
  let t = zonedInstant(day, 0, timeZone).getTime();
  // Where the clocks jump over or repeat midnight, step back to the first instant of the day.
  while (compareIsoDates(isoDateInTimeZone(new Date(t), timeZone), day) < 0) t += 3_600_000;
  while (isoDateInTimeZone(new Date(t - 3_600_000), timeZone) === day) t -= 3_600_000;
  return new Date(t);
}

/** What an anonymous report stores as its filing time: the start of the club day it arrived on. */
export function anonymousReportStamp(now: Date, timeZone: string): Date {
  return startOfClubDay(isoDateInTimeZone(now, timeZone), timeZone);
}

export type DigestBatch = { fromDay: IsoDate; toDay: IsoDate; batchAt: Date; from: Date; until: Date };

/**
 * The batch due at `now`: the latest digest time that has passed (DIGEST_HOUR of a club day)
 * covers every whole club day before it that no earlier digest covered. With no earlier digest
 * it covers the one day before. Null when that batch was already composed.
 */
export function dueDigestBatch(now: Date, timeZone: string, lastCoveredDay: IsoDate | null, hour = DIGEST_HOUR): DigestBatch | null {
  const today = isoDateInTimeZone(now, timeZone);
  const todayBatch = zonedInstant(today, hour, timeZone);
  const batchDay = now.getTime() >= todayBatch.getTime() ? today : addDays(today, -1);
  const toDay = addDays(batchDay, -1);
  const fromDay = lastCoveredDay ? addDays(lastCoveredDay, 1) : toDay;
  if (compareIsoDates(fromDay, toDay) > 0) return null;
  return { fromDay, toDay, batchAt: zonedInstant(batchDay, hour, timeZone), from: startOfClubDay(fromDay, timeZone), until: startOfClubDay(addDays(toDay, 1), timeZone) };
}
