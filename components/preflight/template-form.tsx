"use client";
import { useActionState } from "react";
import { TextAreaField } from "@/components/fleet/form-bits";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState } from "@/lib/actions/action-state";
import { savePreflightTemplateAction } from "@/lib/actions/preflight/save-template";
import { IdempotencyKeyField } from "@/components/ui/idempotency-key-field";

export function TemplateForm({ slug, aircraftId, defaults, oilUnit }: { slug: string; aircraftId: string; defaults: { documents: string; checklist: string; sumpPoints: string; oilMinimum: string; oilMaximum: string }; oilUnit: string }) {
  const [state, action] = useActionState(savePreflightTemplateAction, initialActionState);
  const e = state.fieldErrors;
  return (
    <form action={action} noValidate aria-label="Preflight checklist">
      <IdempotencyKeyField answer={state} />
      <FormMessage state={state} />
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="aircraftId" value={aircraftId} />
      <TextAreaField label="Documents aboard, one per line" name="documents" rows={4} defaultValue={defaults.documents} errors={e.documents} />
      <TextAreaField label="Checklist: Section: item, one per line" name="checklist" rows={12} defaultValue={defaults.checklist} errors={e.checklist} hint='Like "Left wing: aileron free and correct". Items keep their history when you edit.' />
      <TextAreaField label="Fuel drain points, one per line" name="sumpPoints" rows={3} defaultValue={defaults.sumpPoints} errors={e.sumpPoints} />
      <div className="grid gap-x-3 sm:grid-cols-2">
        <Field label={`Oil minimum (${oilUnit})`} name="oilMinimum" inputMode="decimal" defaultValue={defaults.oilMinimum} errors={e.oilMinimum} />
        <Field label={`Oil maximum (${oilUnit}, optional)`} name="oilMaximum" inputMode="decimal" defaultValue={defaults.oilMaximum} errors={e.oilMaximum} />
      </div>
      <SubmitButton>Save checklist</SubmitButton>
    </form>
  );
}
