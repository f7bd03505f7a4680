"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { SubmitButton } from "@/components/ui/submit-button";
import { useState } from "react";
import { CheckboxField, Field, FileField, TextAreaField } from "@/components/ui/field";
import { recordPreflight } from "@/lib/actions/preflight/record-preflight";
import { rampAction } from "@/components/ramp/ramp-action";
import { preflightRecordSchema } from "@/lib/validation/tools";

type Item = { id: string; section: string; label: string; kind: "check" | "document" };

// Ramp mode: with no signal the record (photos included) waits on the device and is sent later.
const recordPreflightOnRamp = rampAction("preflight", recordPreflight, preflightRecordSchema);

export function PreflightForm({ slug, bookingId, items, tanks, sumpPoints, oilMinimum, oilMaximum, units }: {
  slug: string;
  bookingId: string;
  items: Item[];
  tanks: { name: string; capacity: number | null }[];
  sumpPoints: string[];
  oilMinimum: number;
  oilMaximum: number | null;
  units: { fuel: string; oil: string };
}) {
  const form = useFormAction(recordPreflightOnRamp);
  const { state } = form;
  const [results, setResults] = useState<Record<string, "ok" | "finding">>({});
  const e = state.fieldErrors;
  const sections = [...new Set(items.map((i) => i.section))];
  if (state.ok) return <p role="status" className="rounded border border-go-600 bg-go-100 px-3 py-2 text-go-800">✓ {state.message}</p>;
  return (
    <FormShell form={form} label="Preflight record">
      {e._form ? <p className="field-error mb-3">{e._form.join(" ")}</p> : null}
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="bookingId" value={bookingId} />
      {sections.map((section) => (
        <fieldset key={section} className="mb-5">
          <legend className="mb-2 text-lg font-bold">{section}</legend>
          <ul className="space-y-3">
            {items.filter((i) => i.section === section).map((item) => {
              const result = results[item.id];
              const err = e[`items.${item.id}.result`];
              return (
                <li key={item.id} className="rounded border border-sand-300 p-3">
                  <div role="radiogroup" aria-label={item.label} aria-invalid={err ? true : undefined} className="flex flex-wrap items-center gap-x-4 gap-y-1">
                    <span className="min-w-0 flex-1 basis-48 font-bold">{item.label}</span>
                    <label className="flex min-h-11 items-center gap-2"><input type="radio" name={`result.${item.id}`} value="ok" checked={result === "ok"} onChange={() => setResults((r) => ({ ...r, [item.id]: "ok" }))} className="h-5 w-5" />{item.kind === "document" ? "Aboard" : "OK"}</label>
                    <label className="flex min-h-11 items-center gap-2"><input type="radio" name={`result.${item.id}`} value="finding" checked={result === "finding"} onChange={() => setResults((r) => ({ ...r, [item.id]: "finding" }))} className="h-5 w-5" />{item.kind === "document" ? "Missing" : "Finding"}</label>
                  </div>
                  {err ? <p className="field-error">{err.join(" ")}</p> : null}
                  {result === "finding" ? (
                    <div className="mt-2 border-l-4 border-sock-500 pl-3">
                      <TextAreaField label={`What you found: ${item.label}`} name={`note.${item.id}`} id={`note-${item.id}`} rows={2} errors={e[`items.${item.id}.note`]} hint="It becomes a squawk for maintenance." />
                      <CheckboxField label="This may affect airworthiness" name={`grounding.${item.id}`} id={`grounding-${item.id}`} />
                      <FileField label="Photos (optional)" name={`photos.${item.id}`} id={`photos-${item.id}`} accept="image/*" multiple capture="environment" errors={e[`items.${item.id}.photos`]} />
                    </div>
                  ) : null}
                </li>
              );
            })}
          </ul>
        </fieldset>
      ))}
      <fieldset className="mb-5">
        <legend className="mb-2 text-lg font-bold">Fuel on board ({units.fuel})</legend>
        <div className="grid gap-x-3 sm:grid-cols-2">
          {tanks.map((t, i) => (
            <div key={t.name}>
              <input type="hidden" name="fuelTank[]" value={t.name} />
              <Field id={`fuel-${i}`} label={`${t.name} (${units.fuel})`} name="fuelQuantity[]" inputMode="decimal" errors={e[`fuelQuantity.${i}`]} hint={t.capacity !== null ? `Usable ${t.capacity} ${units.fuel}` : undefined} />
            </div>
          ))}
        </div>
        {e.fuelQuantity ? <p className="field-error">{e.fuelQuantity.join(" ")}</p> : null}
      </fieldset>
      <fieldset className="mb-5">
        <legend className="mb-2 text-lg font-bold">Fuel samples</legend>
        <p className="mb-2 text-sm text-ink-700">Drain each point and look for water and sediment; they are heavier than fuel and settle in the sumps. Keep draining until the sample is clear.</p>
        <ul className="space-y-2">
          {sumpPoints.map((p, i) => (
            <li key={p} role="radiogroup" aria-label={`Sample from ${p}`} className="flex flex-wrap items-center gap-x-4">
              <input type="hidden" name="sumpPoint[]" value={p} />
              <span className="min-w-0 flex-1 basis-40 font-bold">{p}</span>
              <label className="flex min-h-11 items-center gap-2"><input type="radio" name={`sump.${i}`} value="clear" className="h-5 w-5" />Clear</label>
              <label className="flex min-h-11 items-center gap-2"><input type="radio" name={`sump.${i}`} value="contaminated" className="h-5 w-5" />Water or sediment found</label>
            </li>
          ))}
        </ul>
        {e.sumps || Object.keys(e).some((k) => k.startsWith("sumps.")) ? <p className="field-error">{(e.sumps ?? ["Record a result for every fuel drain point."]).join(" ")}</p> : null}
      </fieldset>
      <Field label={`Oil quantity (${units.oil})`} name="oilQuantity" inputMode="decimal" errors={e.oilQuantity} hint={`Club minimum for this aircraft: ${oilMinimum} ${units.oil}${oilMaximum !== null ? `; maximum ${oilMaximum} ${units.oil}` : ""}.`} />
      <TextAreaField label="Notes (optional)" name="notes" rows={2} errors={e.notes} />
      <SubmitButton pendingText="Recording…">Record the preflight</SubmitButton>
    </FormShell>
  );
}
