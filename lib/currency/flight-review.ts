import { daysBetween, endOfMonthAfter, parseIsoDate, type IsoDate } from "@/lib/dates";

/**
 * 14 CFR 61.56(c): a flight review "since the beginning of the 24th calendar month before the
 * month in which that pilot acts as pilot in command". A review in month M therefore covers
 * acting as PIC through the last day of month M + 24.
 */
export function flightReviewDue(lastReview: IsoDate): IsoDate {
  return endOfMonthAfter(lastReview, 24);
}

export type DocumentStatus = "valid" | "expiring" | "expired";

/**
 * Status of anything with a last valid day (medical, flight review, insurance): expired the
 * day after `expiresOn`; expiring when `expiresOn` is at most `warnDays` days after `asOf`
 * (the club's reminder setting, e.g. 30).
 */
export function documentExpiryStatus(expiresOn: IsoDate, asOf: IsoDate, warnDays: number): DocumentStatus {
  parseIsoDate(expiresOn);
  parseIsoDate(asOf);
  if (!Number.isFinite(warnDays) || warnDays < 0) throw new RangeError(`warnDays must be ≥ 0, got ${warnDays}`);
  const left = daysBetween(asOf, expiresOn);
  if (left < 0) return "expired";
  return left <= warnDays ? "expiring" : "valid";
}
