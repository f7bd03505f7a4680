"use client";
import { useActionState } from "react";
import { Field, SelectField } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState } from "@/lib/actions/action-state";
import { keepFormOnSubmit, useResetOnSuccess } from "@/components/safety/kept-form";
import { recordCheckout } from "@/lib/actions/checkouts/record-checkout";
import { revokeCheckout } from "@/lib/actions/checkouts/revoke-checkout";
import { IdempotencyKeyField } from "@/components/ui/idempotency-key-field";

export function RecordCheckoutForm({ slug, members, typeGroups, today }: { slug: string; members: { userId: string; label: string }[]; typeGroups: string[]; today: string }) {
  const [state, action, pending] = useActionState(recordCheckout, initialActionState);
  const formRef = useResetOnSuccess(state);
  const e = state.fieldErrors;
  return (
    <form ref={formRef} action={action} onSubmit={keepFormOnSubmit(action)} noValidate aria-label="Record a checkout">
      <IdempotencyKeyField answer={state} />
      <FormMessage state={state} />
      <input type="hidden" name="club" value={slug} />
      <div className="grid gap-x-4 sm:grid-cols-2">
        <SelectField label="Member" name="userId" defaultValue="" errors={e.userId}>
          <option value="">Choose…</option>
          {members.map((m) => (
            <option key={m.userId} value={m.userId}>{m.label}</option>
          ))}
        </SelectField>
        <SelectField label="Type group" name="typeGroup" defaultValue="" errors={e.typeGroup}>
          <option value="">Choose…</option>
          {typeGroups.map((g) => (
            <option key={g} value={g}>{g}</option>
          ))}
        </SelectField>
        <Field label="Checkout date" name="checkedOutOn" type="date" max={today} defaultValue={today} errors={e.checkedOutOn} />
        <Field label="Your instructor certificate number" name="instructorCertificateNumber" maxLength={40} autoComplete="off" errors={e.instructorCertificateNumber} />
      </div>
      <Field label="Conditions (optional)" name="conditions" maxLength={300} errors={e.conditions} hint="For example: day VFR only; no passengers until 5 more hours in type." />
      <SubmitButton disabled={pending}>Record checkout</SubmitButton>
    </form>
  );
}

export function RevokeCheckoutForm({ slug, checkoutId, label }: { slug: string; checkoutId: string; label: string }) {
  const [state, action, pending] = useActionState(revokeCheckout, initialActionState);
  const formRef = useResetOnSuccess(state);
  return (
    <details className="mt-1">
      <summary className="cursor-pointer text-sm font-bold text-stop-800">Revoke…</summary>
      <form ref={formRef} action={action} onSubmit={keepFormOnSubmit(action)} noValidate aria-label={`Revoke checkout: ${label}`} className="mt-2">
        <IdempotencyKeyField answer={state} />
        <FormMessage state={state} />
        <input type="hidden" name="club" value={slug} />
        <input type="hidden" name="checkoutId" value={checkoutId} />
        <Field label="Reason" name="reason" id={`reason-${checkoutId}`} maxLength={500} errors={state.fieldErrors.reason} />
        <SubmitButton disabled={pending} variant="danger" pendingText="Revoking…">Revoke checkout</SubmitButton>
      </form>
    </details>
  );
}
