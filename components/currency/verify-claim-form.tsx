"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { CheckboxField, Field } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { verifyRecord } from "@/lib/actions/documents/verify-record";

/** Verify one claimed record against the logbook page or certificate the verifier has seen. */
export function VerifyClaimForm({ slug, kind, recordId, hasFile, label }: { slug: string; kind: "flight_review" | "medical" | "outside_flight"; recordId: string; hasFile: boolean; label: string }) {
  const form = useFormAction(verifyRecord);
  const { state } = form;
  const e = state.fieldErrors;
  return (
    <FormShell form={form} label={`Verify: ${label}`}>
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="kind" value={kind} />
      <input type="hidden" name="recordId" value={recordId} />
      <Field
        label={hasFile ? "Logbook page or certificate (optional: the member's file is on the record)" : "Logbook page or certificate"}
        name="file"
        type="file"
        accept="application/pdf,image/jpeg,image/png,image/webp,image/heic"
        errors={e.file}
        hint="PDF or photo, up to 10 MB."
      />
      <CheckboxField label="I checked this against the logbook page or certificate." name="evidenceSeen" errors={e.evidenceSeen} />
      <SubmitButton variant="secondary" pendingText="Verifying…">Verify</SubmitButton>
    </FormShell>
  );
}
