"use client";
import { useActionState } from "react";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState } from "@/lib/actions/action-state";
import { assignClubAdmin } from "@/lib/actions/operator/assign-admin";
import { IdempotencyKeyField } from "@/components/ui/idempotency-key-field";

export function AssignAdminForm({ clubId, clubName }: { clubId: string; clubName: string }) {
  const [state, action] = useActionState(assignClubAdmin, initialActionState);
  return (
    <form action={action} noValidate aria-label={`Appoint an admin for ${clubName}`} className="mt-3">
      <IdempotencyKeyField answer={state} />
      <FormMessage state={state} />
      <input type="hidden" name="clubId" value={clubId} />
      <label className="field-label" htmlFor={`admin-${clubId}`}>Invite an admin (e-mail)</label>
      <div className="flex flex-wrap gap-2">
        <input id={`admin-${clubId}`} name="adminEmail" type="email" className="field-input min-w-0 flex-1" />
        <SubmitButton variant="secondary">Send invitation</SubmitButton>
      </div>
      {state.fieldErrors.adminEmail ? <p className="field-error">{state.fieldErrors.adminEmail.join(" ")}</p> : null}
    </form>
  );
}
