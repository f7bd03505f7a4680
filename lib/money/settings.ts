import { addDays, isoDateInTimeZone, type IsoDate } from "@/lib/dates";
import type { LateFeePolicy } from "./receivables";

// A club's money terms as the rules use them; db/queries/money-settings.ts reads them.
export type MoneySettings = {
  paymentTermsDays: number;
  lateFeeFlatMinor: number;
  lateFeeBasisPoints: number;
  fuelCreditCapPerUnitMinor: number;
  /** From the club's settings: days past due before a member is in arrears and a late fee applies. */
  lateFeeAfterDays: number;
};

export const DEFAULT_MONEY_SETTINGS = { paymentTermsDays: 14, lateFeeFlatMinor: 0, lateFeeBasisPoints: 0, fuelCreditCapPerUnitMinor: 0 } as const;

export function lateFeePolicyOf(settings: MoneySettings): LateFeePolicy {
  return { flatMinor: settings.lateFeeFlatMinor, percent: settings.lateFeeBasisPoints / 100 };
}

export function dueDateFor(date: IsoDate, settings: Pick<MoneySettings, "paymentTermsDays">): IsoDate {
  return addDays(date, settings.paymentTermsDays);
}

/** The club's calendar date now, in its own time zone. */
export function clubToday(club: { timeZone: string }, now: Date = new Date()): IsoDate {
  return isoDateInTimeZone(now, club.timeZone);
}
