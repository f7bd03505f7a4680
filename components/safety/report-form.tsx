"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { Field, SelectField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { fileReport } from "@/lib/actions/safety/file-report";
import { CONTRIBUTING_FACTORS, FACTOR_LABELS } from "@/lib/safety/labels";

export function ReportForm({ slug, aircraft, today }: { slug: string; aircraft: { id: string; label: string }[]; today: string }) {
  const form = useFormAction(fileReport);
  const { state } = form;
  const e = state.fieldErrors;
  return (
    <FormShell form={form} label="File a safety report" className="max-w-3xl">
      <input type="hidden" name="club" value={slug} />
      <div className="grid gap-x-4 sm:grid-cols-3">
        <Field label="Date it happened" name="occurredOn" type="date" max={today} required errors={e.occurredOn} />
        <Field label="Time (optional)" name="occurredTime" type="time" errors={e.occurredTime} />
        <SelectField label="Aircraft (optional)" name="aircraftId" defaultValue="" errors={e.aircraftId}>
          <option value="">None or not a club aircraft</option>
          {aircraft.map((a) => (
            <option key={a.id} value={a.id}>{a.label}</option>
          ))}
        </SelectField>
      </div>
      <Field label="Where" name="location" required maxLength={200} errors={e.location} hint="An airfield, an area, the hangar, a frequency…" />
      <div className="mb-4">
        <label htmlFor="f-whatHappened" className="field-label">What happened</label>
        <textarea id="f-whatHappened" name="whatHappened" rows={8} className="field-input" aria-invalid={e.whatHappened?.length ? true : undefined} aria-describedby="f-whatHappened-hint" />
        <p id="f-whatHappened-hint" className="mt-1 text-sm text-ink-500">Describe events in the order they happened. Leave out names if you want the report to stay anonymous.</p>
        {e.whatHappened?.length ? <p className="field-error">{e.whatHappened.join(" ")}</p> : null}
      </div>
      <fieldset className="mb-4">
        <legend className="field-label">Contributing factors (any that apply)</legend>
        <div className="grid gap-2 sm:grid-cols-2">
          {CONTRIBUTING_FACTORS.map((f) => (
            <label key={f} className="flex items-center gap-2 rounded border border-sand-300 bg-sand-50 p-2">
              <input type="checkbox" name="contributingFactors[]" value={f} className="size-4" />
              {FACTOR_LABELS[f]}
            </label>
          ))}
        </div>
        {Object.entries(e).filter(([k]) => k.startsWith("contributingFactors")).map(([k, v]) => <p key={k} className="field-error">{v.join(" ")}</p>)}
      </fieldset>
      <Field label="More on the factors (optional)" name="factorsNote" maxLength={2000} errors={e.factorsNote} />
      <label className="mb-4 flex items-start gap-2 rounded border border-ask-600 bg-ask-100 p-3">
        <input type="checkbox" name="anonymous" className="mt-1 size-4" />
        <span>
          <span className="font-bold">File anonymously</span>
          <span className="block text-sm text-ink-700">Your name is not stored with the report at all — not hidden, absent. The safety officer cannot ask you questions, and you will not be able to look the report up later.</span>
        </span>
      </label>
      <SubmitButton pendingText="Filing…">File the report</SubmitButton>
    </FormShell>
  );
}
