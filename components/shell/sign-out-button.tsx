"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { forgetRampPages } from "@/components/ramp/forget-pages";
import { signOutAction } from "@/lib/actions/auth/sign-out";

/** Signing out first forgets the pages this device kept for the ramp, then ends the session. */
async function signOutHere() {
  await forgetRampPages();
  return signOutAction();
}

export function SignOutButton() {
  const form = useFormAction(signOutHere, { fullPageLoad: true });
  return (
    <FormShell form={form} answer="none">
      <button type="submit" disabled={form.pending} className="rounded px-3 py-2 text-sm text-sand-50 underline-offset-2 hover:underline">
        {form.pending ? "Signing out…" : "Sign out"}
      </button>
    </FormShell>
  );
}
