"use client";
import { useState } from "react";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { SubmitButton } from "@/components/ui/submit-button";
import { Field, TextAreaField } from "@/components/ui/field";
import { closeFlightSheet } from "@/lib/actions/bookings/close-flight-sheet";
import { formatMoney } from "@/lib/money/format";
import { previewFlightCharge } from "@/lib/money/flight-charge";

export type FlightSheetDefaults = { hobbsOut: string; tachOut: string; fuelOut: string; timeOut: string };

/** One row of the sheet: the row's name, then its Out and In inputs side by side. */
function SheetRow({ what, unit, name, out, inn, errors, inputMode, placeholder }: {
  what: string;
  unit?: string;
  name: string;
  out: { value: string; onChange: (v: string) => void };
  inn: { value: string; onChange: (v: string) => void };
  errors: Record<string, string[] | undefined>;
  inputMode: "decimal" | "numeric" | "text";
  placeholder?: string;
}) {
  const cell = (side: "Out" | "In", bind: { value: string; onChange: (v: string) => void }) => {
    const field = `${name}${side}`;
    const id = `sheet-${field}`;
    const err = errors[field];
    return (
      <div>
        <label htmlFor={id} className="sr-only">{`${what} ${side.toLowerCase()}`}</label>
        <input
          id={id}
          name={field}
          inputMode={inputMode}
          placeholder={placeholder}
          value={bind.value}
          onChange={(e) => bind.onChange(e.target.value)}
          className="field-input min-h-11 w-full tabular-nums"
          aria-invalid={err?.length ? true : undefined}
          aria-describedby={err?.length ? `${id}-error` : undefined}
        />
        {err?.length ? <p id={`${id}-error`} className="field-error">{err.join(" ")}</p> : null}
      </div>
    );
  };
  return (
    <div role="row" className="grid grid-cols-[5.5rem_1fr_1fr] items-start gap-x-2 border-t border-sand-200 py-2 sm:grid-cols-[8rem_1fr_1fr] sm:gap-x-4">
      <span role="rowheader" className="pt-2 font-bold">{what}{unit ? <span className="block text-xs font-normal text-ink-500">{unit}</span> : null}</span>
      <div role="cell">{cell("Out", out)}</div>
      <div role="cell">{cell("In", inn)}</div>
    </div>
  );
}

export function FlightSheetForm({ slug, bookingId, defaults, metric, rate, closed }: {
  slug: string;
  bookingId: string;
  defaults: FlightSheetDefaults;
  metric: boolean;
  /** The aircraft's rate: the server posts the charge with the same rule; this is the preview. */
  rate: { perHourMinor: number; currency: string; meter: "hobbs" | "tach" };
  closed: boolean;
}) {
  const form = useFormAction(closeFlightSheet);
  const { state } = form;
  const e = state.fieldErrors;
  const [v, setV] = useState({ hobbsOut: defaults.hobbsOut, hobbsIn: "", tachOut: defaults.tachOut, tachIn: "", fuelOut: defaults.fuelOut, fuelIn: "", timeOut: defaults.timeOut, timeIn: "" });
  const bind = (k: keyof typeof v) => ({ value: v[k], onChange: (value: string) => setV((s) => ({ ...s, [k]: value })) });
  if (state.ok) {
    return <p role="status" className="rounded border border-go-600 bg-go-100 px-3 py-2 text-go-800">✓ {state.message}</p>;
  }
  // Kept mounted when the page re-renders after the sheet closes, so the message above survives.
  if (closed) return <p role="status">✓ This flight sheet is closed; the flight is in the log.</p>;
  const meterName = rate.meter === "tach" ? "Tach" : "Hobbs";
  const preview = rate.meter === "tach" ? previewFlightCharge(v.tachOut, v.tachIn, rate.perHourMinor, meterName) : previewFlightCharge(v.hobbsOut, v.hobbsIn, rate.perHourMinor, meterName);
  const fuelUnit = metric ? "litres" : "US gal";
  return (
    <FormShell form={form} label="Flight sheet">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="bookingId" value={bookingId} />
      <div role="table" aria-label="Out and in readings" className="mb-4">
        <div role="row" className="grid grid-cols-[5.5rem_1fr_1fr] gap-x-2 pb-1 text-sm font-bold uppercase tracking-wide text-ink-700 sm:grid-cols-[8rem_1fr_1fr] sm:gap-x-4">
          <span role="columnheader"><span className="sr-only">Reading</span></span>
          <span role="columnheader">Out</span>
          <span role="columnheader">In</span>
        </div>
        <SheetRow what="Hobbs" unit="hours" name="hobbs" out={bind("hobbsOut")} inn={bind("hobbsIn")} errors={e} inputMode="decimal" />
        <SheetRow what="Tach" unit="hours" name="tach" out={bind("tachOut")} inn={bind("tachIn")} errors={e} inputMode="decimal" />
        <SheetRow what="Fuel" unit={`on board, ${fuelUnit}`} name="fuel" out={bind("fuelOut")} inn={bind("fuelIn")} errors={e} inputMode="decimal" />
        <SheetRow what="Time" unit="club clock" name="time" out={bind("timeOut")} inn={bind("timeIn")} errors={e} inputMode="numeric" placeholder="HH:MM" />
      </div>
      <div className="mb-4 rounded border-2 border-ink-700 px-3 py-2" aria-live="polite">
        <p className="text-sm text-ink-700">Charge for this flight, as you type ({formatMoney(rate.perHourMinor, rate.currency)} per {meterName} hour)</p>
        {preview.ok ? (
          <p className="text-xl font-bold tabular-nums" data-testid="charge-preview">{formatMoney(preview.chargeMinor, rate.currency)} <span className="text-base font-normal">for {preview.hours.toFixed(1)} {meterName} h</span></p>
        ) : (
          <p className="font-bold" data-testid="charge-preview">{preview.reason}</p>
        )}
        <p className="text-xs text-ink-500">Posted to your account once, when you close the sheet; the club&apos;s books work it out again.</p>
      </div>
      <div className="grid grid-cols-2 gap-x-3 sm:grid-cols-3">
        <Field label="Day landings" name="dayLandings" inputMode="numeric" defaultValue="1" errors={e.dayLandings} />
        <Field label="Night full-stop landings" name="nightFullStopLandings" inputMode="numeric" defaultValue="0" errors={e.nightFullStopLandings} />
        <Field label="Full stops among the day landings (optional)" name="dayFullStopLandings" inputMode="numeric" defaultValue="" errors={e.dayFullStopLandings} hint="Counts for tailwheel currency (14 CFR 61.57(a)(1)(ii))." />
        <Field label={`Fuel bought (${fuelUnit})`} name="fuelAdded" inputMode="decimal" defaultValue="0" errors={e.fuelAdded} />
        <Field label={`Oil added (${metric ? "litres" : "quarts"})`} name="oilAdded" inputMode="decimal" defaultValue="0" errors={e.oilAdded} />
      </div>
      <TextAreaField label="Squawk (optional)" name="squawk" errors={e.squawk} hint="Anything wrong with the aircraft: it goes to maintenance with this flight." />
      <TextAreaField label="Notes (optional)" name="notes" errors={e.notes} rows={2} />
      <TextAreaField label="Meter explanation (only when the meters do not continue)" name="meterExplanation" errors={e.meterExplanation} rows={2} hint="Needed when your Hobbs or tach out differs from the aircraft's last in reading; it is recorded on this flight for maintenance and the treasurer." />
      <SubmitButton pendingText="Closing…">Close the flight sheet</SubmitButton>
    </FormShell>
  );
}
