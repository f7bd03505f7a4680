import "server-only";
import { eq } from "drizzle-orm";
import { clubs, moneySettings } from "@/db/schema";
import { addDays, isoDateInTimeZone, type IsoDate } from "@/lib/dates";
import type { LateFeePolicy } from "@/lib/money";
import type { DbLike } from "./money-accounts";

export type MoneySettings = {
  paymentTermsDays: number;
  lateFeeFlatMinor: number;
  lateFeeBasisPoints: number;
  fuelCreditCapPerUnitMinor: number;
  /** From the club's settings: days past due before a member is in arrears and a late fee applies. */
  lateFeeAfterDays: number;
};

export const DEFAULT_MONEY_SETTINGS = { paymentTermsDays: 14, lateFeeFlatMinor: 0, lateFeeBasisPoints: 0, fuelCreditCapPerUnitMinor: 0 } as const;

export function getMoneySettings(tx: DbLike, clubId: string): MoneySettings {
  const row = tx.select().from(moneySettings).where(eq(moneySettings.clubId, clubId)).get();
  const club = tx.select({ settings: clubs.settings }).from(clubs).where(eq(clubs.id, clubId)).get();
  return {
    paymentTermsDays: row?.paymentTermsDays ?? DEFAULT_MONEY_SETTINGS.paymentTermsDays,
    lateFeeFlatMinor: row?.lateFeeFlatMinor ?? DEFAULT_MONEY_SETTINGS.lateFeeFlatMinor,
    lateFeeBasisPoints: row?.lateFeeBasisPoints ?? DEFAULT_MONEY_SETTINGS.lateFeeBasisPoints,
    fuelCreditCapPerUnitMinor: row?.fuelCreditCapPerUnitMinor ?? DEFAULT_MONEY_SETTINGS.fuelCreditCapPerUnitMinor,
    lateFeeAfterDays: club?.settings.lateFeeAfterDays ?? 30,
  };
}

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
