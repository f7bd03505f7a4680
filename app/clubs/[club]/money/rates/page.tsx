import type { Metadata } from "next";
import { MoneyNav } from "@/components/money/money-nav";
import { RateCalculator, type RateInputs } from "@/components/money/rate-calculator";
import { PageHeader } from "@/components/ui/page-header";
import { listRateProfiles } from "@/db/queries/money-billing";
import { currencyExponent, minorToDecimalString } from "@/lib/money";
import { can } from "@/permissions";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Hourly rates" };

export default async function RatesPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club, ability } = await authorizePage(slug, ["read", "Rates"]);
  const exp = currencyExponent(club.currency);
  const major = (m: number) => minorToDecimalString(m, exp);
  const profiles: RateInputs[] = listRateProfiles(db, club.id).map((p) => ({
    name: p.name,
    fixedAnnualCosts: major(p.fixedAnnualCostsMinor),
    expectedHours: String(p.expectedHours),
    fuelBurn: (p.fuelBurnTenthsPerHour / 10).toFixed(1),
    fuelPrice: major(p.fuelPriceMinor),
    oilPerHour: major(p.oilPerHourMinor),
    maintenanceReserve: major(p.maintenanceReservePerHourMinor),
    overhaulCost: major(p.overhaulCostMinor),
    tboHours: String(p.tboHours),
  }));
  return (
    <>
      <PageHeader title="Hourly rates" lead="The break-even rate for an aircraft: fixed costs spread over the hours it flies, plus what each hour costs, plus the engine reserve (overhaul cost ÷ TBO). Each part is rounded to the cent before adding, so the table adds up." />
      <MoneyNav slug={club.slug} ability={ability} current={`/clubs/${club.slug}/money/rates`} />
      <RateCalculator slug={club.slug} currency={club.currency} locale={club.locale} unit={club.unitSystem === "metric" ? "litre" : "gallon"} profiles={profiles} canSave={can(ability, "update", "Rates")} />
    </>
  );
}
