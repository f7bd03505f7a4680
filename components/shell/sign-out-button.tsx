"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { signOutAction } from "@/lib/actions/auth/sign-out";

export function SignOutButton() {
  const form = useFormAction(signOutAction, { fullPageLoad: true });
  return (
    <FormShell form={form} answer="none">
      <button type="submit" disabled={form.pending} className="rounded px-3 py-2 text-sm text-sand-50 underline-offset-2 hover:underline">
        {form.pending ? "Signing out…" : "Sign out"}
      </button>
    </FormShell>
  );
}
