"use client";
import { useState } from "react";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { SubmitButton } from "@/components/ui/submit-button";
import { CheckboxField, FileField, TextAreaField } from "@/components/ui/field";
import { recordPreflight } from "@/lib/actions/preflight/record-preflight";
import { rampAction } from "@/components/ramp/ramp-action";
import { oilChoices } from "@/lib/bookings/preflight-outcome";
import { preflightRecordSchema } from "@/lib/validation/tools";

type Item = { id: string; section: string; label: string; kind: "check" | "document" };
type Result = "ok" | "finding";

// Ramp mode: with no signal the record (photos included) waits on the device and is sent later.
const recordPreflightOnRamp = rampAction("preflight", recordPreflight, preflightRecordSchema);

/** A two-way choice as two buttons (≥ 44 px), the chosen one pressed; the value travels in a hidden field. */
function Choice({ name, value, options, onPick, label, invalid }: {
  name: string;
  value: string | undefined;
  options: { value: string; text: string; tone: "ok" | "bad" }[];
  onPick: (v: string) => void;
  label: string;
  invalid?: boolean;
}) {
  return (
    <div role="group" aria-label={label} aria-invalid={invalid ? true : undefined} className="flex shrink-0 gap-1">
      <input type="hidden" name={name} value={value ?? ""} />
      {options.map((o) => {
        const on = value === o.value;
        const tone = o.tone === "ok" ? "border-go-600 bg-go-100 text-go-800" : "border-sock-500 bg-sock-100 text-sock-700";
        return (
          <button key={o.value} type="button" aria-pressed={on} onClick={() => onPick(o.value)} className={`min-h-11 min-w-11 rounded border-2 px-3 text-sm font-bold ${on ? tone : "border-sand-300 bg-white text-ink-700"}`}>
            {on ? (o.tone === "ok" ? "✓ " : "▲ ") : ""}{o.text}
          </button>
        );
      })}
    </div>
  );
}

export function PreflightForm({ slug, bookingId, items, tanks, sumpPoints, oilMinimum, oilMaximum, units }: {
  slug: string;
  bookingId: string;
  items: Item[];
  tanks: { name: string; capacity: number | null }[];
  sumpPoints: string[];
  oilMinimum: number;
  oilMaximum: number | null;
  units: { fuel: string; oil: "qt" | "L" };
}) {
  const form = useFormAction(recordPreflightOnRamp);
  const { state } = form;
  const e = state.fieldErrors;
  const [results, setResults] = useState<Record<string, Result>>({});
  const [open, setOpen] = useState<Record<string, boolean>>({});
  const [fuel, setFuel] = useState<string[]>(() => tanks.map(() => ""));
  const [sumps, setSumps] = useState<(string | undefined)[]>(() => sumpPoints.map(() => undefined));
  const [oil, setOil] = useState("");
  const sections = [...new Set(items.map((i) => i.section))];
  const fullTanks = tanks.filter((t) => t.capacity !== null);
  if (state.ok) return <p role="status" className="rounded border border-go-600 bg-go-100 px-3 py-2 text-go-800">✓ {state.message}</p>;

  const allAsExpected = (section: string) => setResults((r) => {
    const next = { ...r };
    for (const i of items) if (i.section === section && next[i.id] !== "finding") next[i.id] = "ok";
    return next;
  });
  const fuelAsExpected = () => {
    setFuel((f) => tanks.map((t, i) => (t.capacity !== null ? String(t.capacity) : f[i] ?? "")));
    setSumps((s) => s.map((v) => v ?? "clear"));
  };

  return (
    <FormShell form={form} label="Preflight record">
      {e._form ? <p className="field-error mb-3">{e._form.join(" ")}</p> : null}
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="bookingId" value={bookingId} />
      <p className="mb-4 text-sm text-ink-700">Walk round in this order. Tap <strong>All as expected</strong> when a whole area is fine, or <strong>Finding</strong> on one item: it goes to maintenance as a squawk (words and a photo are optional).</p>
      {sections.map((section) => {
        const mine = items.filter((i) => i.section === section);
        const findings = mine.filter((i) => results[i.id] === "finding").length;
        const done = mine.every((i) => results[i.id] !== undefined);
        const missing = mine.some((i) => e[`items.${i.id}.result`]);
        const showItems = open[section] ?? !(done && findings === 0);
        return (
          <fieldset key={section} className={`mb-4 rounded border-2 p-3 ${missing ? "border-stop-600" : done ? "border-go-600" : "border-sand-300"}`}>
            <legend className="px-1 text-lg font-bold">{section}</legend>
            <div className="flex flex-wrap items-center gap-2">
              <p className="min-w-0 flex-1 basis-40 text-sm" aria-live="polite">
                {done ? (findings ? `▲ ${findings} finding${findings === 1 ? "" : "s"}, the rest as expected` : `✓ All ${mine.length} as expected`) : `${mine.filter((i) => results[i.id]).length} of ${mine.length} marked`}
              </p>
              <button type="button" onClick={() => allAsExpected(section)} aria-label={`All as expected: ${section}`} className="min-h-11 rounded border-2 border-go-600 bg-go-100 px-4 font-bold text-go-800">✓ All as expected</button>
              <button type="button" onClick={() => setOpen((o) => ({ ...o, [section]: !showItems }))} aria-expanded={showItems} className="min-h-11 rounded border-2 border-sand-300 px-3 text-sm">{showItems ? "Hide items" : "Show items"}</button>
            </div>
            {missing ? <p className="field-error">Mark every item in {section}: as expected, or a finding.</p> : null}
            <ul className={`mt-2 divide-y divide-sand-200 ${showItems ? "" : "hidden"}`}>
              {mine.map((item) => {
                const result = results[item.id];
                return (
                  <li key={item.id} className="py-2">
                    <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
                      <span className="min-w-0 flex-1 basis-44">{item.kind === "document" ? `Aboard: ${item.label}` : item.label}</span>
                      <Choice
                        name={`result.${item.id}`}
                        value={result}
                        label={item.label}
                        invalid={Boolean(e[`items.${item.id}.result`])}
                        onPick={(v) => setResults((r) => ({ ...r, [item.id]: v as Result }))}
                        options={[{ value: "ok", text: item.kind === "document" ? "Aboard" : "OK", tone: "ok" }, { value: "finding", text: item.kind === "document" ? "Missing" : "Finding", tone: "bad" }]}
                      />
                    </div>
                    {result === "finding" ? (
                      <div className="mt-2 border-l-4 border-sock-500 pl-3">
                        <TextAreaField label={`What you found (optional): ${item.label}`} name={`note.${item.id}`} id={`note-${item.id}`} rows={2} errors={e[`items.${item.id}.note`]} hint="It becomes a squawk for maintenance, naming this item." />
                        <CheckboxField label="This may affect airworthiness" name={`grounding.${item.id}`} id={`grounding-${item.id}`} />
                        <FileField label="Photo (optional)" name={`photos.${item.id}`} id={`photos-${item.id}`} accept="image/*" multiple capture="environment" errors={e[`items.${item.id}.photos`]} />
                      </div>
                    ) : null}
                  </li>
                );
              })}
            </ul>
          </fieldset>
        );
      })}

      <fieldset className="mb-4 rounded border-2 border-sand-300 p-3">
        <legend className="px-1 text-lg font-bold">Fuel and samples</legend>
        {fullTanks.length || sumpPoints.length ? (
          <button type="button" onClick={fuelAsExpected} className="mb-2 min-h-11 rounded border-2 border-go-600 bg-go-100 px-4 font-bold text-go-800">
            ✓ {fullTanks.length ? "Every tank full" : ""}{fullTanks.length && sumpPoints.length ? ", " : ""}{sumpPoints.length ? "every sample clear" : ""}
          </button>
        ) : null}
        <ul className="divide-y divide-sand-200">
          {tanks.map((t, i) => {
            const err = e[`fuelQuantity.${i}`];
            const id = `fuel-${i}`;
            return (
              <li key={t.name} className="flex flex-wrap items-center gap-x-3 gap-y-1 py-2">
                <input type="hidden" name="fuelTank[]" value={t.name} />
                <label htmlFor={id} className="min-w-0 flex-1 basis-36 font-bold">{t.name} ({units.fuel}){t.capacity !== null ? <span className="block text-xs font-normal text-ink-500">holds {t.capacity}</span> : null}</label>
                <input id={id} name="fuelQuantity[]" inputMode="decimal" value={fuel[i] ?? ""} onChange={(ev) => setFuel((f) => f.map((v, j) => (j === i ? ev.target.value : v)))} className="field-input min-h-11 w-24" aria-invalid={err ? true : undefined} aria-describedby={err ? `${id}-error` : undefined} />
                {t.capacity !== null ? <button type="button" onClick={() => setFuel((f) => f.map((v, j) => (j === i ? String(t.capacity) : v)))} className="min-h-11 rounded border-2 border-sand-300 px-3 text-sm" aria-label={`${t.name} full`}>Full</button> : null}
                {err ? <p id={`${id}-error`} className="field-error basis-full">{err.join(" ")}</p> : null}
              </li>
            );
          })}
          {sumpPoints.map((p, i) => (
            <li key={p} className="flex flex-wrap items-center gap-x-3 gap-y-1 py-2">
              <input type="hidden" name="sumpPoint[]" value={p} />
              <span className="min-w-0 flex-1 basis-36"><span className="font-bold">Sample: {p}</span></span>
              <Choice name={`sump.${i}`} value={sumps[i]} label={`Sample from ${p}`} onPick={(v) => setSumps((s) => s.map((x, j) => (j === i ? v : x)))} options={[{ value: "clear", text: "Clear", tone: "ok" }, { value: "contaminated", text: "Water or sediment", tone: "bad" }]} />
            </li>
          ))}
        </ul>
        {e.fuelQuantity ? <p className="field-error">{e.fuelQuantity.join(" ")}</p> : null}
        {e.sumps || Object.keys(e).some((k) => k.startsWith("sumps.")) ? <p className="field-error">{(e.sumps ?? ["Record a result for every fuel drain point."]).join(" ")}</p> : null}
        <p className="mt-2 text-xs text-ink-500">Water and sediment are heavier than fuel and settle in the sumps: keep draining until the sample is clear.</p>
      </fieldset>

      <fieldset className="mb-4 rounded border-2 border-sand-300 p-3">
        <legend className="px-1 text-lg font-bold">Oil ({units.oil})</legend>
        <p className="mb-2 text-sm text-ink-700">Club minimum {oilMinimum} {units.oil}{oilMaximum !== null ? `, maximum ${oilMaximum} ${units.oil}` : ""}. Tap what the dipstick shows.</p>
        <div role="group" aria-label="Oil on the dipstick" className="mb-2 flex flex-wrap gap-2">
          {oilChoices(oilMinimum, oilMaximum, units.oil).map((q) => (
            <button key={q} type="button" aria-pressed={oil === String(q)} onClick={() => setOil(String(q))} className={`min-h-11 min-w-12 rounded border-2 px-3 font-bold tabular-nums ${oil === String(q) ? "border-ink-900 bg-ink-900 text-white" : "border-sand-300 bg-white"} ${q < oilMinimum ? "border-dashed" : ""}`} aria-label={`Oil ${q} ${units.oil}${q < oilMinimum ? ", below the minimum" : ""}`}>
              {q}
            </button>
          ))}
        </div>
        <label htmlFor="f-oilQuantity" className="field-label">Oil quantity ({units.oil})</label>
        <input id="f-oilQuantity" name="oilQuantity" inputMode="decimal" value={oil} onChange={(ev) => setOil(ev.target.value)} className="field-input min-h-11 w-28" aria-invalid={e.oilQuantity ? true : undefined} aria-describedby={e.oilQuantity ? "f-oilQuantity-error" : undefined} />
        {e.oilQuantity ? <p id="f-oilQuantity-error" className="field-error">{e.oilQuantity.join(" ")}</p> : null}
      </fieldset>
      <TextAreaField label="Notes (optional)" name="notes" rows={2} errors={e.notes} />
      <SubmitButton pendingText="Recording…">Record the preflight</SubmitButton>
    </FormShell>
  );
}
