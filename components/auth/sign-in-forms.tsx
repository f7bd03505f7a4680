"use client";
import { useActionState } from "react";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState } from "@/lib/actions/action-state";
import { requestMagicLink, signInWithPassword } from "@/lib/actions/auth/sign-in";
import { IdempotencyKeyField } from "@/components/ui/idempotency-key-field";

export function PasswordSignInForm({ callbackUrl }: { callbackUrl: string }) {
  const [state, action] = useActionState(signInWithPassword, initialActionState);
  return (
    <form action={action} noValidate aria-label="Sign in with password">
      <IdempotencyKeyField answer={state} />
      <FormMessage state={state} />
      <input type="hidden" name="callbackUrl" value={callbackUrl} />
      <Field label="E-mail" name="email" type="email" autoComplete="email" required errors={state.fieldErrors.email} />
      <Field label="Password" name="password" type="password" autoComplete="current-password" required errors={state.fieldErrors.password} />
      <SubmitButton pendingText="Signing in…">Sign in</SubmitButton>
    </form>
  );
}

export function MagicLinkForm({ callbackUrl }: { callbackUrl: string }) {
  const [state, action] = useActionState(requestMagicLink, initialActionState);
  return (
    <form action={action} noValidate aria-label="Sign in with an e-mail link">
      <IdempotencyKeyField answer={state} />
      <FormMessage state={state} />
      <input type="hidden" name="callbackUrl" value={callbackUrl} />
      <Field label="E-mail" name="email" type="email" autoComplete="email" required errors={state.fieldErrors.email} id="magic-email" />
      <SubmitButton variant="secondary" pendingText="Sending…">E-mail me a sign-in link</SubmitButton>
    </form>
  );
}
