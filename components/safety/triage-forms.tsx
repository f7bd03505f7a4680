"use client";
import { useActionState } from "react";
import { Field, SelectField } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState } from "@/lib/actions/action-state";
import { keepFormOnSubmit, useResetOnSuccess } from "@/components/safety/kept-form";
import { groundFromReport } from "@/lib/actions/safety/ground-from-report";
import { triageReport } from "@/lib/actions/safety/triage-report";
import type { ReportStatus } from "@/db/schema/safety";
import { REPORT_STATUS_LABELS } from "@/lib/safety/labels";
import { IdempotencyKeyField } from "@/components/ui/idempotency-key-field";

export function TriageForm({ slug, reportId, next }: { slug: string; reportId: string; next: readonly ReportStatus[] }) {
  const [state, action, pending] = useActionState(triageReport, initialActionState);
  const formRef = useResetOnSuccess(state);
  return (
    <form ref={formRef} action={action} onSubmit={keepFormOnSubmit(action)} noValidate aria-label="Change report state">
      <IdempotencyKeyField answer={state} />
      <FormMessage state={state} />
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="reportId" value={reportId} />
      <SelectField label="Move to" name="toStatus" defaultValue={next[0]} errors={state.fieldErrors.toStatus}>
        {next.map((s) => (
          <option key={s} value={s}>{REPORT_STATUS_LABELS[s]}</option>
        ))}
      </SelectField>
      <Field label="Note" name="note" maxLength={4000} errors={state.fieldErrors.note} hint="Required for “Action taken” and “Closed”: what was done, or why it is closed." />
      <SubmitButton disabled={pending}>Save</SubmitButton>
    </form>
  );
}

export function GroundFromReportForm({ slug, reportId, aircraft, preselected }: { slug: string; reportId: string; aircraft: { id: string; label: string }[]; preselected: string | null }) {
  const [state, action, pending] = useActionState(groundFromReport, initialActionState);
  const formRef = useResetOnSuccess(state);
  return (
    <form ref={formRef} action={action} onSubmit={keepFormOnSubmit(action)} noValidate aria-label="Ground an aircraft">
      <IdempotencyKeyField answer={state} />
      <FormMessage state={state} />
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="reportId" value={reportId} />
      <SelectField label="Aircraft" name="aircraftId" defaultValue={preselected ?? ""} errors={state.fieldErrors.aircraftId}>
        <option value="">Choose…</option>
        {aircraft.map((a) => (
          <option key={a.id} value={a.id}>{a.label}</option>
        ))}
      </SelectField>
      <Field label="Reason (sent to every member)" name="reason" maxLength={1000} errors={state.fieldErrors.reason} />
      <SubmitButton disabled={pending} variant="danger" pendingText="Grounding…">Ground the aircraft</SubmitButton>
    </form>
  );
}
