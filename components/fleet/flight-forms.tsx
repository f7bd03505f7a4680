"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { Field, SelectField, TextAreaField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { logFlight } from "@/lib/actions/fleet/log-flight";
import { reviewMeterFlag } from "@/lib/actions/fleet/review-meter-flag";

type PlaneChoice = { id: string; registration: string; hobbs: number | null; tach: number | null };

export function LogFlightForm({ slug, aircraft, today, metric, fixedAircraftId }: { slug: string; aircraft: PlaneChoice[]; today: string; metric: boolean; fixedAircraftId?: string }) {
  const form = useFormAction(logFlight);
  const { state } = form;
  const fixed = fixedAircraftId ? aircraft.find((a) => a.id === fixedAircraftId) : undefined;
  const e = state.fieldErrors;
  return (
    <FormShell form={form} label="Log a flight">
      <input type="hidden" name="club" value={slug} />
      {fixed ? (
        <input type="hidden" name="aircraftId" value={fixed.id} />
      ) : (
        <SelectField label="Aircraft" name="aircraftId" errors={e.aircraftId} defaultValue="">
          <option value="" disabled>Choose an aircraft</option>
          {aircraft.map((a) => (
            <option key={a.id} value={a.id}>{a.registration}{a.hobbs !== null ? ` (Hobbs now ${a.hobbs.toFixed(1)})` : ""}</option>
          ))}
        </SelectField>
      )}
      <Field label="Date flown" name="flownOn" type="date" defaultValue={today} max={today} errors={e.flownOn} />
      <div className="grid grid-cols-2 gap-x-3">
        <Field label="Hobbs out" name="hobbsOut" inputMode="decimal" defaultValue={fixed?.hobbs?.toFixed(1) ?? ""} errors={e.hobbsOut} />
        <Field label="Hobbs in" name="hobbsIn" inputMode="decimal" errors={e.hobbsIn} />
        <Field label="Tach out" name="tachOut" inputMode="decimal" defaultValue={fixed?.tach?.toFixed(1) ?? ""} errors={e.tachOut} />
        <Field label="Tach in" name="tachIn" inputMode="decimal" errors={e.tachIn} />
        <Field label="Day landings" name="dayLandings" inputMode="numeric" defaultValue="1" errors={e.dayLandings} />
        <Field label="Full stops among them (optional)" name="dayFullStopLandings" inputMode="numeric" defaultValue="" errors={e.dayFullStopLandings} hint="Counts for tailwheel currency (14 CFR 61.57(a)(1)(ii))." />
        <Field label="Night full-stop landings" name="nightFullStopLandings" inputMode="numeric" defaultValue="0" errors={e.nightFullStopLandings} />
        <Field label={`Fuel added (${metric ? "litres" : "US gal"})`} name="fuelAdded" inputMode="decimal" defaultValue="0" errors={e.fuelAdded} />
        <Field label={`Oil added (${metric ? "litres" : "quarts"})`} name="oilAdded" inputMode="decimal" defaultValue="0" errors={e.oilAdded} />
      </div>
      <TextAreaField label="Squawk found (optional)" name="squawk" rows={2} errors={e.squawk} hint="Becomes a squawk for maintenance to triage. Use the aircraft page to add photos." />
      <Field label="Notes (optional)" name="notes" errors={e.notes} />
      <TextAreaField label="Meter explanation (only when the meters do not continue)" name="meterExplanation" rows={2} errors={e.meterExplanation} hint="Needed when Hobbs or tach out differs from where the previous flight came in; the treasurer sees it." />
      <SubmitButton pendingText="Logging…">Log flight</SubmitButton>
    </FormShell>
  );
}

export function ReviewMeterFlagForm({ slug, flightId }: { slug: string; flightId: string }) {
  const form = useFormAction(reviewMeterFlag);
  const { state } = form;
  return (
    <FormShell form={form} label="Review meter flag">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="flightId" value={flightId} />
      <TextAreaField label="What was found" name="note" id={`review-${flightId}`} rows={2} errors={state.fieldErrors.note} hint="E.g. a ground run not logged, or a typing error confirmed with the pilot." />
      <SubmitButton>Mark reviewed</SubmitButton>
    </FormShell>
  );
}
