import "server-only";
import { eq } from "drizzle-orm";
import { clubs, moneySettings } from "@/db/schema";
import { DEFAULT_MONEY_SETTINGS, type MoneySettings } from "@/lib/money/settings";
import type { DbLike } from "./money-accounts";

/** The club's money terms (payment terms, late fee, fuel credit cap), defaults where unset. */
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
