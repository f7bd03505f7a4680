"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { useState } from "react";
import { CheckboxField, Field, FileField, SelectField, TextAreaField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { closeSquawk } from "@/lib/actions/fleet/close-squawk";
import { reportSquawk } from "@/lib/actions/fleet/report-squawk";
import { triageSquawk } from "@/lib/actions/fleet/triage-squawk";
import { rampAction } from "@/components/ramp/ramp-action";
import { reportSquawkSchema } from "@/lib/validation/fleet";

// Ramp mode: with no signal the squawk (photos included) waits on the device and is sent later
// through the same action, under the same idempotency key.
const reportSquawkOnRamp = rampAction("squawk", reportSquawk, reportSquawkSchema);

export function ReportSquawkForm({ slug, aircraftId, registration }: { slug: string; aircraftId: string; registration: string }) {
  const form = useFormAction(reportSquawkOnRamp);
  const { state } = form;
  return (
    <FormShell form={form} label={`Report a squawk on ${registration}`}>
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="aircraftId" value={aircraftId} />
      <TextAreaField label="What did you find?" name="description" required errors={state.fieldErrors.description} placeholder="e.g. Oil on the lower cowling after engine run" />
      <SelectField label="Found during" name="foundDuring" defaultValue="preflight" errors={state.fieldErrors.foundDuring}>
        <option value="preflight">Preflight</option>
        <option value="flight">In flight</option>
        <option value="postflight">After flight</option>
      </SelectField>
      <CheckboxField name="suspectedGrounding" label="I think this may make the aircraft unsafe to fly" hint="The aircraft shows grounded until maintenance has looked at it." errors={state.fieldErrors.suspectedGrounding} />
      <FileField label="Photos (optional)" name="photos" accept="image/jpeg,image/png,image/webp,image/heic" multiple capture="environment" hint="Up to 6 photos, 10 MB each: JPEG, PNG, WebP or HEIC." errors={state.fieldErrors.photos} />
      <SubmitButton pendingText="Sending…">Report squawk</SubmitButton>
    </FormShell>
  );
}

export function TriageSquawkForm({ slug, squawkId, current, limitation, determinedBy, placarded }: { slug: string; squawkId: string; current: string; limitation?: string | null; determinedBy?: string | null; placarded?: boolean }) {
  const form = useFormAction(triageSquawk);
  const { state } = form;
  const [choice, setChoice] = useState(current === "untriaged" ? "grounding" : current);
  return (
    <FormShell form={form} label="Triage squawk">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="squawkId" value={squawkId} />
      <SelectField label="Triage" name="triage" id={`triage-${squawkId}`} value={choice} onChange={(e) => setChoice(e.target.value)} errors={state.fieldErrors.triage}>
        <option value="grounding">Grounding: not to be flown</option>
        <option value="deferred">Deferred: placarded inoperative, flyable with a limitation</option>
        <option value="note">Note: no effect on airworthiness</option>
      </SelectField>
      {choice === "deferred" ? (
        <>
          <Field label="Limitation (what the pilot may not do)" name="limitation" id={`limitation-${squawkId}`} defaultValue={limitation ?? ""} errors={state.fieldErrors.limitation} placeholder="e.g. No night flight" />
          <Field label="Determination by (pilot or mechanic, with certificate)" name="deferralDeterminedBy" id={`determined-${squawkId}`} defaultValue={determinedBy ?? ""} errors={state.fieldErrors.deferralDeterminedBy} />
          <CheckboxField name="placarded" id={`placarded-${squawkId}`} label="Deactivated or removed, and placarded inoperative (14 CFR 91.213(d))" defaultChecked={placarded} errors={state.fieldErrors.placarded} />
        </>
      ) : null}
      <Field label="Note (optional)" name="note" id={`triage-note-${squawkId}`} errors={state.fieldErrors.note} />
      <SubmitButton>Save triage</SubmitButton>
    </FormShell>
  );
}

export function CloseSquawkForm({ slug, squawkId, today, needsMechanic }: { slug: string; squawkId: string; today: string; needsMechanic: boolean }) {
  const form = useFormAction(closeSquawk);
  const { state } = form;
  // "Return to service" is said only of what grounded or limited the aircraft; a note is just closed.
  return (
    <FormShell form={form} label={needsMechanic ? "Close squawk with return to service" : "Close note"}>
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="squawkId" value={squawkId} />
      <TextAreaField label="What was done" name="repairNotes" id={`repair-${squawkId}`} required errors={state.fieldErrors.repairNotes} />
      <Field label={`Mechanic's name${needsMechanic ? "" : " (optional)"}`} name="rtsMechanicName" id={`rts-name-${squawkId}`} errors={state.fieldErrors.rtsMechanicName} />
      <Field label={`Certificate number${needsMechanic ? "" : " (optional)"}`} name="rtsCertificate" id={`rts-cert-${squawkId}`} errors={state.fieldErrors.rtsCertificate} />
      <Field label={needsMechanic ? "Return-to-service date" : "Date closed"} name="rtsOn" id={`rts-on-${squawkId}`} type="date" defaultValue={today} max={today} errors={state.fieldErrors.rtsOn} />
      <FileField label="Work order or logbook page (optional)" name="document" id={`rts-doc-${squawkId}`} accept="image/jpeg,image/png,image/webp,image/heic,application/pdf" hint="PDF or photo, up to 10 MB." errors={state.fieldErrors.document} />
      <SubmitButton variant="primary">{needsMechanic ? "Close and return to service" : "Close note"}</SubmitButton>
    </FormShell>
  );
}
