"use client";
import { scrollArea } from "@/components/ui/scroll-area";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { useMemo, useState } from "react";
import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { SubmitButton } from "@/components/ui/submit-button";
import { saveRateProfile } from "@/lib/actions/money/save-rates";
import { currencyExponent, formatMoney, hourlyRate, minorToDecimalString, rateTable, toMinorUnits } from "@/lib/money";

export type RateInputs = {
  name: string;
  fixedAnnualCosts: string;
  expectedHours: string;
  fuelBurn: string;
  fuelPrice: string;
  oilPerHour: string;
  maintenanceReserve: string;
  overhaulCost: string;
  tboHours: string;
};

const FIELDS: { key: keyof RateInputs; label: (unit: string, cur: string) => string; mode: "decimal" | "numeric" | "text" }[] = [
  { key: "name", label: () => "Aircraft or scenario", mode: "text" },
  { key: "fixedAnnualCosts", label: (_u, c) => `Fixed costs per year (${c}): insurance, hangar, annual, loan`, mode: "decimal" },
  { key: "expectedHours", label: () => "Hours flown per year", mode: "numeric" },
  { key: "fuelBurn", label: (u) => `Fuel burn (${u} per hour)`, mode: "decimal" },
  { key: "fuelPrice", label: (u, c) => `Fuel price (${c} per ${u})`, mode: "decimal" },
  { key: "oilPerHour", label: (_u, c) => `Oil per hour (${c})`, mode: "decimal" },
  { key: "maintenanceReserve", label: (_u, c) => `Maintenance reserve per hour (${c}), engine aside`, mode: "decimal" },
  { key: "overhaulCost", label: (_u, c) => `Engine overhaul cost (${c})`, mode: "decimal" },
  { key: "tboHours", label: () => "Engine TBO (hours)", mode: "numeric" },
];

const HOURS = [100, 150, 200, 250, 300, 350, 400, 450, 500, 600];

function compute(v: RateInputs, currency: string) {
  try {
    const m = (s: string) => toMinorUnits(s || "0", currency);
    const base = {
      fixedAnnualCostsMinor: m(v.fixedAnnualCosts),
      fuelBurnPerHour: Number(v.fuelBurn),
      fuelPriceMinor: m(v.fuelPrice),
      oilPerHourMinor: m(v.oilPerHour),
      maintenanceReservePerHourMinor: m(v.maintenanceReserve),
      overhaulCostMinor: m(v.overhaulCost),
      tboHours: Number(v.tboHours),
    };
    const hours = Number(v.expectedHours);
    return { rate: hourlyRate({ ...base, expectedHours: hours }), table: rateTable(base, [...new Set([...HOURS, hours])].filter((h) => h > 0).sort((a, b) => a - b)) };
  } catch {
    return null;
  }
}

/** Break-even hourly rate: fixed ÷ hours + variable per hour + engine reserve (overhaul ÷ TBO). */
export function RateCalculator({ slug, currency, locale, unit, profiles, canSave }: { slug: string; currency: string; locale?: string; unit: string; profiles: RateInputs[]; canSave: boolean }) {
  const [values, setValues] = useState<RateInputs>(profiles[0] ?? { name: "", fixedAnnualCosts: "", expectedHours: "300", fuelBurn: "8.5", fuelPrice: "", oilPerHour: "", maintenanceReserve: "", overhaulCost: "", tboHours: "2000" });
  const form = useFormAction(saveRateProfile);
  const { state } = form;
  const result = useMemo(() => compute(values, currency), [values, currency]);
  const money = (m: number) => formatMoney(m, currency, locale);
  const major = (m: number) => Number(minorToDecimalString(m, currencyExponent(currency)));
  return (
    <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,22rem)_minmax(0,1fr)]">
      <FormShell form={form} label="Hourly-rate calculator" className="card">
        <input type="hidden" name="club" value={slug} />
        {profiles.length > 1 ? (
          <label className="mb-4 block">
            <span className="field-label">Start from a saved calculation</span>
            <select className="field-input" onChange={(e) => setValues(profiles.find((p) => p.name === e.target.value) ?? values)} defaultValue={values.name}>
              {profiles.map((p) => (
                <option key={p.name} value={p.name}>{p.name}</option>
              ))}
            </select>
          </label>
        ) : null}
        {FIELDS.map((f) => (
          <div key={f.key} className="mb-3">
            <label htmlFor={`rate-${f.key}`} className="field-label">{f.label(unit, currency)}</label>
            <input id={`rate-${f.key}`} name={f.key} className="field-input" inputMode={f.mode} value={values[f.key]} onChange={(e) => setValues({ ...values, [f.key]: e.target.value })} aria-invalid={state.fieldErrors[f.key]?.length ? true : undefined} />
            {state.fieldErrors[f.key]?.length ? <p className="field-error">{state.fieldErrors[f.key]!.join(" ")}</p> : null}
          </div>
        ))}
        {canSave ? <SubmitButton pendingText="Saving…">Save this calculation</SubmitButton> : null}
      </FormShell>
      <div className="grid min-w-0 grid-cols-1 gap-6">
        <section className="card" aria-label="Break-even rate" aria-live="polite">
          {result ? (
            <dl className="grid grid-cols-2 gap-3 sm:grid-cols-3">
              <div><dt className="text-sm text-ink-500">Fixed per hour</dt><dd className="font-mono text-lg tabular">{money(result.rate.fixedPerHour)}</dd></div>
              <div><dt className="text-sm text-ink-500">Fuel, oil, maintenance</dt><dd className="font-mono text-lg tabular">{money(result.rate.variablePerHour)}</dd></div>
              <div><dt className="text-sm text-ink-500">Engine reserve</dt><dd className="font-mono text-lg tabular">{money(result.rate.engineReserve)}</dd></div>
              <div><dt className="text-sm text-ink-500">Break-even wet rate</dt><dd className="font-mono text-2xl font-bold tabular" data-testid="wet-rate">{money(result.rate.wetRate)}</dd></div>
              <div><dt className="text-sm text-ink-500">Dry rate (no fuel)</dt><dd className="font-mono text-lg tabular">{money(result.rate.dryRate)}</dd></div>
            </dl>
          ) : (
            <p role="alert" className="text-stop-800">Enter amounts as numbers, hours above zero and a TBO above zero to see the rate.</p>
          )}
        </section>
        {result ? (
          <>
            <section className="card min-w-0" aria-label="Rate by hours flown per year">
              <h2 className="mb-2 font-bold">Break-even rate by hours flown per year</h2>
              <div className="h-64 w-full">
                <ResponsiveContainer width="100%" height="100%">
                  <LineChart data={result.table.map((r) => ({ hours: r.expectedHours, wet: major(r.wetRate), dry: major(r.dryRate) }))} margin={{ left: 8, right: 8, top: 8, bottom: 8 }}>
                    <CartesianGrid strokeDasharray="3 3" stroke="#d9d4c5" />
                    <XAxis dataKey="hours" label={{ value: "hours per year", position: "insideBottom", offset: -4 }} />
                    <YAxis width={56} />
                    <Tooltip formatter={(v) => `${Number(v).toFixed(2)} ${currency}`} />
                    <Legend />
                    <Line type="monotone" dataKey="wet" name="Wet rate" stroke="#1f4e5f" strokeWidth={2} dot />
                    <Line type="monotone" dataKey="dry" name="Dry rate" stroke="#d9731f" strokeWidth={2} strokeDasharray="6 3" dot={{ r: 3 }} />
                  </LineChart>
                </ResponsiveContainer>
              </div>
            </section>
            <section className="card" aria-label="Rate table">
              <div className="overflow-x-auto" {...scrollArea("Rate breakdown")}>
                <table className="w-full min-w-[28rem] text-right text-sm">
                  <thead><tr><th className="py-1 text-left">Hours per year</th><th className="py-1">Fixed per hour</th><th className="py-1">Wet rate</th><th className="py-1">Dry rate</th></tr></thead>
                  <tbody>
                    {result.table.map((r) => (
                      <tr key={r.expectedHours} className={`border-t border-sand-200 ${String(r.expectedHours) === values.expectedHours ? "font-bold" : ""}`}>
                        <td className="py-1 text-left tabular">{r.expectedHours}{String(r.expectedHours) === values.expectedHours ? " (expected)" : ""}</td>
                        <td className="py-1 font-mono tabular">{money(r.fixedPerHour)}</td>
                        <td className="py-1 font-mono tabular">{money(r.wetRate)}</td>
                        <td className="py-1 font-mono tabular">{money(r.dryRate)}</td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              </div>
            </section>
          </>
        ) : null}
      </div>
    </div>
  );
}
