"use server";
import { and, eq } from "drizzle-orm";
import { moneySettings, rateProfiles } from "@/db/schema";
import { clubAction } from "@/lib/actions/create-action";
import { writeAudit } from "@/lib/server/audit";
import { moneySettingsSchema, rateProfileSchema } from "@/lib/validation/money";
import { minorOf } from "./amounts";

export const saveRateProfile = clubAction({
  schema: rateProfileSchema,
  permission: ["update", "Rates"],
  success: "Rate calculation saved.",
  run(tx, { club, user }, input) {
    const m = (v: string, f: string) => minorOf(v, club.currency, f);
    const values = {
      fixedAnnualCostsMinor: m(input.fixedAnnualCosts, "fixedAnnualCosts"),
      expectedHours: input.expectedHours,
      fuelBurnTenthsPerHour: Math.round(Number(input.fuelBurn) * 10),
      fuelPriceMinor: m(input.fuelPrice, "fuelPrice"),
      oilPerHourMinor: m(input.oilPerHour, "oilPerHour"),
      maintenanceReservePerHourMinor: m(input.maintenanceReserve, "maintenanceReserve"),
      overhaulCostMinor: m(input.overhaulCost, "overhaulCost"),
      tboHours: input.tboHours,
    };
    const existing = tx.select({ id: rateProfiles.id }).from(rateProfiles).where(and(eq(rateProfiles.clubId, club.id), eq(rateProfiles.name, input.name))).get();
    let id = existing?.id;
    if (id) tx.update(rateProfiles).set(values).where(and(eq(rateProfiles.clubId, club.id), eq(rateProfiles.id, id))).run();
    else id = tx.insert(rateProfiles).values({ clubId: club.id, name: input.name, ...values }).returning({ id: rateProfiles.id }).all()[0]!.id;
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "money.rates.save", subjectType: "RateProfile", subjectId: id, after: { name: input.name, ...values } });
    return { refresh: true };
  },
});

export const saveMoneySettings = clubAction({
  schema: moneySettingsSchema,
  permission: ["update", "Rates"],
  success: "Money settings saved.",
  run(tx, { club, user }, input) {
    const values = {
      paymentTermsDays: input.paymentTermsDays,
      lateFeeFlatMinor: minorOf(input.lateFeeFlat, club.currency, "lateFeeFlat"),
      lateFeeBasisPoints: Math.round(Number(input.lateFeePercent) * 100),
      fuelCreditCapPerUnitMinor: minorOf(input.fuelCreditCap, club.currency, "fuelCreditCap"),
    };
    const before = tx.select().from(moneySettings).where(eq(moneySettings.clubId, club.id)).get();
    tx.insert(moneySettings).values({ clubId: club.id, ...values }).onConflictDoUpdate({ target: moneySettings.clubId, set: values }).run();
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "money.settings.save", subjectType: "MoneySettings", subjectId: club.id, before, after: values });
    return { refresh: true };
  },
});
