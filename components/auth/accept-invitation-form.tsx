"use client";
import { useActionState } from "react";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState } from "@/lib/actions/action-state";
import { acceptInvitation } from "@/lib/actions/invitations/accept-invitation";
import { IdempotencyKeyField } from "@/components/ui/idempotency-key-field";

export function AcceptInvitationForm({ token, needsAccount }: { token: string; needsAccount: boolean }) {
  const [state, action] = useActionState(acceptInvitation, initialActionState);
  return (
    <form action={action} noValidate aria-label="Accept invitation">
      <IdempotencyKeyField answer={state} />
      <FormMessage state={state} />
      <input type="hidden" name="token" value={token} />
      {needsAccount ? (
        <>
          <Field label="Your name" name="name" autoComplete="name" required errors={state.fieldErrors.name} />
          <Field label="Choose a password" name="password" type="password" autoComplete="new-password" required hint="At least 10 characters." errors={state.fieldErrors.password} />
        </>
      ) : null}
      <SubmitButton pendingText="Joining…">{needsAccount ? "Create my account and join" : "Join the club"}</SubmitButton>
    </form>
  );
}
