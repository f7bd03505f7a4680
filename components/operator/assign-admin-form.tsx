"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { SubmitButton } from "@/components/ui/submit-button";
import { assignClubAdmin } from "@/lib/actions/operator/assign-admin";

export function AssignAdminForm({ clubId, clubName }: { clubId: string; clubName: string }) {
  const form = useFormAction(assignClubAdmin);
  const { state } = form;
  return (
    <FormShell form={form} label={`Appoint an admin for ${clubName}`} className="mt-3">
      <input type="hidden" name="clubId" value={clubId} />
      <label className="field-label" htmlFor={`admin-${clubId}`}>Invite an admin (e-mail)</label>
      <div className="flex flex-wrap gap-2">
        <input id={`admin-${clubId}`} name="adminEmail" type="email" className="field-input min-w-0 flex-1" />
        <SubmitButton variant="secondary">Send invitation</SubmitButton>
      </div>
      {state.fieldErrors.adminEmail ? <p className="field-error">{state.fieldErrors.adminEmail.join(" ")}</p> : null}
    </FormShell>
  );
}
