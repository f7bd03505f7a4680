"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { Field, TextAreaField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { savePreflightTemplateAction } from "@/lib/actions/preflight/save-template";

export function TemplateForm({ slug, aircraftId, defaults, oilUnit, fuelUnit }: { slug: string; aircraftId: string; defaults: { documents: string; checklist: string; sumpPoints: string; fuelTanks: string; oilMinimum: string; oilMaximum: string }; oilUnit: string; fuelUnit: string }) {
  const form = useFormAction(savePreflightTemplateAction);
  const { state } = form;
  const e = state.fieldErrors;
  return (
    <FormShell form={form} label="Preflight checklist">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="aircraftId" value={aircraftId} />
      <TextAreaField label="Documents aboard, one per line (checked with the Cabin group)" name="documents" rows={4} defaultValue={defaults.documents} errors={e.documents} />
      <TextAreaField label="Checklist: Section: item, one per line" name="checklist" rows={12} defaultValue={defaults.checklist} errors={e.checklist} hint='Like "Left wing: aileron free and correct". Items keep their history when you edit.' />
      <TextAreaField label={`Fuel tanks: name | usable capacity (${fuelUnit}), one per line`} name="fuelTanks" rows={3} defaultValue={defaults.fuelTanks} errors={e.fuelTanks} hint={`Like "Left wing tank | 20". A preflight reading above a tank's capacity is refused, naming the tank. Empty: the weight-and-balance tanks.`} />
      <TextAreaField label="Fuel drain points, one per line" name="sumpPoints" rows={3} defaultValue={defaults.sumpPoints} errors={e.sumpPoints} />
      <div className="grid gap-x-3 sm:grid-cols-2">
        <Field label={`Oil minimum (${oilUnit})`} name="oilMinimum" inputMode="decimal" defaultValue={defaults.oilMinimum} errors={e.oilMinimum} />
        <Field label={`Oil maximum (${oilUnit}, optional)`} name="oilMaximum" inputMode="decimal" defaultValue={defaults.oilMaximum} errors={e.oilMaximum} />
      </div>
      <SubmitButton>Save checklist</SubmitButton>
    </FormShell>
  );
}
