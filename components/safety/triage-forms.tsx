"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { Field, SelectField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { groundFromReport } from "@/lib/actions/safety/ground-from-report";
import { triageReport } from "@/lib/actions/safety/triage-report";
import type { ReportStatus } from "@/db/schema/safety";
import { REPORT_STATUS_LABELS } from "@/lib/safety/labels";

export function TriageForm({ slug, reportId, next }: { slug: string; reportId: string; next: readonly ReportStatus[] }) {
  const form = useFormAction(triageReport);
  const { state } = form;
  return (
    <FormShell form={form} label="Change report state">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="reportId" value={reportId} />
      <SelectField label="Move to" name="toStatus" defaultValue={next[0]} errors={state.fieldErrors.toStatus}>
        {next.map((s) => (
          <option key={s} value={s}>{REPORT_STATUS_LABELS[s]}</option>
        ))}
      </SelectField>
      <Field label="Note" name="note" maxLength={4000} errors={state.fieldErrors.note} hint="Required for “Action taken” and “Closed”: what was done, or why it is closed." />
      <SubmitButton>Save</SubmitButton>
    </FormShell>
  );
}

export function GroundFromReportForm({ slug, reportId, aircraft, preselected }: { slug: string; reportId: string; aircraft: { id: string; label: string }[]; preselected: string | null }) {
  const form = useFormAction(groundFromReport);
  const { state } = form;
  return (
    <FormShell form={form} label="Ground an aircraft">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="reportId" value={reportId} />
      <SelectField label="Aircraft" name="aircraftId" defaultValue={preselected ?? ""} errors={state.fieldErrors.aircraftId}>
        <option value="">Choose…</option>
        {aircraft.map((a) => (
          <option key={a.id} value={a.id}>{a.label}</option>
        ))}
      </SelectField>
      <Field label="Reason (sent to every member)" name="reason" maxLength={1000} errors={state.fieldErrors.reason} />
      <SubmitButton variant="danger" pendingText="Grounding…">Ground the aircraft</SubmitButton>
    </FormShell>
  );
}
