"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { Field, SelectField, TextAreaField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { issueGroundingNotice } from "@/lib/actions/fleet/issue-grounding-notice";
import { liftGroundingNotice } from "@/lib/actions/fleet/lift-grounding-notice";

export function IssueNoticeForm({ slug, aircraftId, registration, defaultCategory }: { slug: string; aircraftId: string; registration: string; defaultCategory: "safety" | "maintenance" }) {
  const form = useFormAction(issueGroundingNotice);
  const { state } = form;
  return (
    <FormShell form={form} label={`Ground ${registration}`}>
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="aircraftId" value={aircraftId} />
      <TextAreaField label="Reason" name="reason" id="notice-reason" required errors={state.fieldErrors.reason} />
      <SelectField label="Kind" name="category" id="notice-category" defaultValue={defaultCategory} errors={state.fieldErrors.category} hint="A maintenance notice is lifted with the return-to-service entry.">
        <option value="maintenance">Maintenance</option>
        <option value="safety">Safety</option>
      </SelectField>
      <Field label="Effective from (club time; empty = now)" name="effectiveAt" id="notice-effective" type="datetime-local" errors={state.fieldErrors.effectiveAt} />
      <SubmitButton variant="danger" pendingText="Issuing…">Issue grounding notice and e-mail members</SubmitButton>
    </FormShell>
  );
}

export function LiftNoticeForm({ slug, noticeId, category }: { slug: string; noticeId: string; category: "safety" | "maintenance" }) {
  const form = useFormAction(liftGroundingNotice);
  const { state } = form;
  const rts = category === "maintenance";
  return (
    <FormShell form={form} label="Lift grounding notice">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="noticeId" value={noticeId} />
      <TextAreaField label="Why it is lifted" name="liftNote" id={`lift-note-${noticeId}`} required errors={state.fieldErrors.liftNote} />
      {rts ? (
        <>
          <Field label="Mechanic's name (return to service)" name="liftMechanicName" id={`lift-mech-${noticeId}`} errors={state.fieldErrors.liftMechanicName} />
          <Field label="Certificate number" name="liftCertificate" id={`lift-cert-${noticeId}`} errors={state.fieldErrors.liftCertificate} />
        </>
      ) : null}
      <SubmitButton>Lift notice</SubmitButton>
    </FormShell>
  );
}
