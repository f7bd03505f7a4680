"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { Field } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { acceptInvitation } from "@/lib/actions/invitations/accept-invitation";

export function AcceptInvitationForm({ token, needsAccount }: { token: string; needsAccount: boolean }) {
  const form = useFormAction(acceptInvitation, { fullPageLoad: true });
  const { state } = form;
  return (
    <FormShell form={form} label="Accept invitation">
      <input type="hidden" name="token" value={token} />
      {needsAccount ? (
        <>
          <Field label="Your name" name="name" autoComplete="name" required errors={state.fieldErrors.name} />
          <Field label="Choose a password" name="password" type="password" autoComplete="new-password" required hint="At least 10 characters." errors={state.fieldErrors.password} />
        </>
      ) : null}
      <SubmitButton pendingText="Joining…">{needsAccount ? "Create my account and join" : "Join the club"}</SubmitButton>
    </FormShell>
  );
}
