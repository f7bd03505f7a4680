import {
  compareIsoDates,
  endOfMonthAfter,
  formatIsoDate,
  parseIsoDate,
  shiftMonth,
  type IsoDate,
} from "@/lib/dates";
import { assertMinorUnits } from "./checks";
import { prorate } from "./proration";

export type DuesPlanPeriod = "monthly" | "quarterly" | "annual";

export type DuesPeriodRange = { start: IsoDate; end: IsoDate };

const PERIOD_MONTHS: Record<DuesPlanPeriod, number> = { monthly: 1, quarterly: 3, annual: 12 };

/**
 * The dues period that contains `date`: its calendar month, calendar quarter or year.
 * `startMonth` (1–12) moves quarters and years to a club's fiscal year, e.g. 7 for a year
 * that runs July through June.
 */
export function duesPeriod(plan: DuesPlanPeriod, date: IsoDate, startMonth = 1): DuesPeriodRange {
  const months = PERIOD_MONTHS[plan];
  if (months === undefined) throw new RangeError(`Unknown dues plan "${String(plan)}"`);
  if (!Number.isInteger(startMonth) || startMonth < 1 || startMonth > 12) {
    throw new RangeError(`startMonth must be 1–12, got ${startMonth}`);
  }
  const { year, month } = parseIsoDate(date);
  const offset = (((month - startMonth) % 12) + 12) % 12;
  const first = shiftMonth(year, month, -(offset % months));
  const start = formatIsoDate(first.year, first.month, 1);
  return { start, end: endOfMonthAfter(start, months - 1) };
}

export type DuesForMemberInput = {
  plan: DuesPlanPeriod;
  /** The plan's full amount for one period (the member category's price). */
  amountMinor: number;
  /** Any date inside the period being billed. */
  date: IsoDate;
  /** When membership began; absent for a member who was already a member. */
  joinedOn?: IsoDate | null;
  startMonth?: number;
};

/**
 * Dues owed for the period containing `date`: the full amount, or for a member who joined
 * during that period the share from the joining day through the period's end (prorate, by
 * days, both ends counted). Nothing is owed for a period that ended before they joined.
 */
export function duesForMember(input: DuesForMemberInput): number {
  assertMinorUnits(input.amountMinor, "amountMinor");
  const { start, end } = duesPeriod(input.plan, input.date, input.startMonth ?? 1);
  if (!input.joinedOn) return input.amountMinor;
  if (compareIsoDates(input.joinedOn, end) > 0) return 0;
  return prorate(input.amountMinor, start, end, input.joinedOn);
}

/** How often a dues plan bills, and the member categories a plan can be for (the schema's enums). */
export const DUES_PERIODS = ["monthly", "quarterly", "annual"] as const;
export const MEMBER_CATEGORIES = ["full", "student", "family", "inactive"] as const;
