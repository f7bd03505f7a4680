"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { Field, SelectField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { recordCheckout } from "@/lib/actions/checkouts/record-checkout";
import { revokeCheckout } from "@/lib/actions/checkouts/revoke-checkout";

export function RecordCheckoutForm({ slug, members, typeGroups, today }: { slug: string; members: { userId: string; label: string }[]; typeGroups: string[]; today: string }) {
  const form = useFormAction(recordCheckout);
  const { state } = form;
  const e = state.fieldErrors;
  return (
    <FormShell form={form} label="Record a checkout">
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
      <SubmitButton>Record checkout</SubmitButton>
    </FormShell>
  );
}

export function RevokeCheckoutForm({ slug, checkoutId, label }: { slug: string; checkoutId: string; label: string }) {
  const form = useFormAction(revokeCheckout);
  const { state } = form;
  return (
    <details className="mt-1">
      <summary className="cursor-pointer text-sm font-bold text-stop-800">Revoke…</summary>
      <FormShell form={form} label={`Revoke checkout: ${label}`} className="mt-2">
        <input type="hidden" name="club" value={slug} />
        <input type="hidden" name="checkoutId" value={checkoutId} />
        <Field label="Reason" name="reason" id={`reason-${checkoutId}`} maxLength={500} errors={state.fieldErrors.reason} />
        <SubmitButton variant="danger" pendingText="Revoking…">Revoke checkout</SubmitButton>
      </FormShell>
    </details>
  );
}
