import type { Metadata } from "next";
import { CheckboxField, Field } from "@/components/ui/field";
import { buttonClass } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { SafetyCaution } from "@/components/ui/safety-caution";
import { zodFieldErrors } from "@/lib/actions/create-action";
import { planFuel, requiredReserveMinutes } from "@/lib/bookings/fuel-plan";
import { fuelToolSchema, queryToObject } from "@/lib/validation/tools";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Fuel and reserve" };
export const dynamic = "force-dynamic";

const fmt = (n: number, digits = 1) => n.toLocaleString("en-US", { maximumFractionDigits: digits, minimumFractionDigits: digits });

export default async function FuelToolPage({ params, searchParams }: { params: Promise<{ club: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { club: slug } = await params;
  const { club } = await authorizePage(slug, ["read", "Tools"]);
  const query = queryToObject(await searchParams);
  const unit = club.unitSystem === "metric" ? "L" : "US gal";
  const extra = club.settings.extraReserveMinutes;
  const submitted = query.usableFuel !== undefined;
  const parsed = submitted ? fuelToolSchema.safeParse(query) : null;
  const errors = parsed && !parsed.success ? zodFieldErrors(parsed.error) : {};
  const plan = parsed?.success ? planFuel({ ...parsed.data, unit }, extra) : null;
  const text = (k: string) => (typeof query[k] === "string" ? (query[k] as string) : "");
  return (
    <div className="max-w-3xl">
      <PageHeader title="Fuel and reserve" lead={`VFR reserve at normal cruise: 30 minutes by day, 45 at night (14 CFR 91.151)${extra ? `, plus ${extra} minutes by the club's own rule` : ""}.`} />
      <div className="mb-4"><SafetyCaution compact /></div>
      <div className="grid gap-4 md:grid-cols-2">
        <form method="get" className="card" aria-label="Fuel plan" noValidate>
          <Field label={`Usable fuel on board (${unit})`} name="usableFuel" inputMode="decimal" defaultValue={text("usableFuel")} errors={errors.usableFuel} />
          <Field label={`Burn at normal cruise (${unit} per hour)`} name="burnPerHour" inputMode="decimal" defaultValue={text("burnPerHour")} errors={errors.burnPerHour} />
          <Field label="Planned flight time to the first landing (hours)" name="plannedHours" inputMode="decimal" defaultValue={text("plannedHours")} errors={errors.plannedHours} hint="1.5 for an hour and a half." />
          <CheckboxField label="At night" name="night" defaultChecked={query.night === "on"} />
          <button type="submit" className={buttonClass("primary")}>Work it out</button>
        </form>
        <section className="card" aria-label="Fuel result">
          {plan ? (
            <div className="space-y-2">
              <p role="status" className={`rounded border-l-4 px-3 py-2 font-bold ${plan.legal ? "border-go-600 bg-go-100 text-go-800" : "border-stop-600 bg-stop-100 text-stop-800"}`}>{plan.legal ? "● " : "■ "}{plan.verdict}</p>
              <dl className="grid grid-cols-2 gap-x-3 gap-y-1 text-sm tabular">
                <dt>Reserve</dt><dd>{plan.reserveMinutes} min = {fmt(plan.reserveFuel)} {unit}</dd>
                <dt>Needed (leg + reserve)</dt><dd>{fmt(plan.requiredFuel)} {unit}</dd>
                <dt>Endurance</dt><dd>{fmt(plan.enduranceHours, 2)} h</dd>
                <dt>Margin</dt><dd>{Math.round(plan.marginMinutes)} min</dd>
              </dl>
              <p className="text-sm text-ink-700">Fuel gauges and burn rates are estimates: check the tanks visually and plan from the flight manual&apos;s figures.</p>
            </div>
          ) : (
            <p className="text-ink-700">Reserve today: {requiredReserveMinutes(false, extra)} min by day, {requiredReserveMinutes(true, extra)} min at night.</p>
          )}
        </section>
      </div>
    </div>
  );
}
