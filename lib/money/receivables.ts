import { daysBetween, parseIsoDate, type IsoDate } from "@/lib/dates";
import { assertFiniteNonNegative, assertMinorUnits, assertNonNegativeMinor } from "./checks";
import { roundQuotient } from "./decimal";

export type ReceivableItem = { id: string | number; dueDate: IsoDate; openMinor: number };

export type AgeingBucketKey = "current" | "days1To30" | "days31To60" | "days61To90" | "over90";

export const AGEING_BUCKETS: readonly { key: AgeingBucketKey; label: string }[] = [
  { key: "current", label: "Current" },
  { key: "days1To30", label: "1–30 days" },
  { key: "days31To60", label: "31–60 days" },
  { key: "days61To90", label: "61–90 days" },
  { key: "over90", label: "Over 90 days" },
];

export type AgedItem = ReceivableItem & { daysPastDue: number };
export type AgeingBucket = { totalMinor: number; items: AgedItem[] };
export type AgeingReport = { asOf: IsoDate; totalMinor: number; buckets: Record<AgeingBucketKey, AgeingBucket> };

/** Whole days after the due date; 0 on the due date itself and for anything not yet due. */
export function daysPastDue(dueDate: IsoDate, asOf: IsoDate): number {
  return Math.max(0, daysBetween(dueDate, asOf));
}

/** Bucket for a number of days past due: 0 is current, 30 is the last day of "1–30". */
export function ageingBucketOf(days: number): AgeingBucketKey {
  if (days <= 0) return "current";
  if (days <= 30) return "days1To30";
  if (days <= 60) return "days31To60";
  if (days <= 90) return "days61To90";
  return "over90";
}

/**
 * Ages open items by how many days past their due date they are on `asOf`. Items with nothing
 * open are left out; a negative open amount (an unapplied credit) is aged like any item so the
 * report's total equals the members' balances.
 */
export function ageReceivables(items: readonly ReceivableItem[], asOf: IsoDate): AgeingReport {
  parseIsoDate(asOf);
  const buckets = Object.fromEntries(
    AGEING_BUCKETS.map((b) => [b.key, { totalMinor: 0, items: [] as AgedItem[] }]),
  ) as Record<AgeingBucketKey, AgeingBucket>;
  let totalMinor = 0;
  for (const item of items) {
    assertMinorUnits(item.openMinor, "openMinor");
    if (item.openMinor === 0) continue;
    const days = daysPastDue(item.dueDate, asOf);
    const bucket = buckets[ageingBucketOf(days)];
    bucket.items.push({ ...item, daysPastDue: days });
    bucket.totalMinor += item.openMinor;
    totalMinor += item.openMinor;
  }
  return { asOf, totalMinor, buckets };
}

/**
 * A member is in arrears when they owe money (balance > 0) and their oldest unpaid item is
 * more than `graceDays` past due: on the last day of grace they are not yet in arrears.
 */
export function isInArrears(
  balanceMinor: number,
  oldestDueDate: IsoDate | null | undefined,
  asOf: IsoDate,
  graceDays = 0,
): boolean {
  assertMinorUnits(balanceMinor, "balanceMinor");
  assertFiniteNonNegative(graceDays, "graceDays");
  if (balanceMinor <= 0 || !oldestDueDate) return false;
  return daysBetween(oldestDueDate, asOf) > graceDays;
}

export type LateFeePolicy = {
  /** A fixed fee. */
  flatMinor?: number;
  /** A percentage of the overdue balance, e.g. 1.5 for 1.5 %. */
  percent?: number;
  minimumMinor?: number;
  maximumMinor?: number;
};

/**
 * The late fee owed now: 0 unless the member is in arrears (see isInArrears), otherwise the
 * flat fee plus the percentage of the balance (half away from zero), kept within the policy's
 * minimum and maximum. Charging it once per period is the billing run's job.
 */
export function lateFee(
  balanceMinor: number,
  oldestDueDate: IsoDate | null | undefined,
  asOf: IsoDate,
  graceDays: number,
  policy: LateFeePolicy,
): number {
  if (!isInArrears(balanceMinor, oldestDueDate, asOf, graceDays)) return 0;
  const flat = policy.flatMinor ?? 0;
  assertNonNegativeMinor(flat, "flatMinor");
  assertFiniteNonNegative(policy.percent ?? 0, "percent");
  let fee = flat + roundQuotient([balanceMinor, policy.percent ?? 0], [100]);
  if (policy.minimumMinor !== undefined) fee = Math.max(fee, policy.minimumMinor);
  if (policy.maximumMinor !== undefined) fee = Math.min(fee, policy.maximumMinor);
  return fee;
}

/** Same as lateFee (alternative spelling). */
export const latefee = lateFee;
