"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { Field } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { requestMagicLink, signInWithPassword } from "@/lib/actions/auth/sign-in";

export function PasswordSignInForm({ callbackUrl }: { callbackUrl: string }) {
  const form = useFormAction(signInWithPassword, { fullPageLoad: true });
  const { state } = form;
  return (
    <FormShell form={form} label="Sign in with password">
      <input type="hidden" name="callbackUrl" value={callbackUrl} />
      <Field label="E-mail" name="email" type="email" autoComplete="email" required errors={state.fieldErrors.email} />
      <Field label="Password" name="password" type="password" autoComplete="current-password" required errors={state.fieldErrors.password} />
      <SubmitButton pendingText="Signing in…">Sign in</SubmitButton>
    </FormShell>
  );
}

export function MagicLinkForm({ callbackUrl }: { callbackUrl: string }) {
  const form = useFormAction(requestMagicLink);
  const { state } = form;
  return (
    <FormShell form={form} label="Sign in with an e-mail link">
      <input type="hidden" name="callbackUrl" value={callbackUrl} />
      <Field label="E-mail" name="email" type="email" autoComplete="email" required errors={state.fieldErrors.email} id="magic-email" />
      <SubmitButton variant="secondary" pendingText="Sending…">E-mail me a sign-in link</SubmitButton>
    </FormShell>
  );
}
