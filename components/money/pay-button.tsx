"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { SubmitButton } from "@/components/ui/submit-button";
import { startCardPayment } from "@/lib/actions/money/start-card-payment";

/** "Pay my balance": the action sends the browser to the provider's hosted payment page. */
export function PayButton({ slug, amountText }: { slug: string; amountText: string }) {
  const form = useFormAction(startCardPayment);
  return (
    <FormShell form={form} label="Pay by card">
      <input type="hidden" name="club" value={slug} />
      <SubmitButton pendingText="Opening the payment page…">Pay {amountText} by card</SubmitButton>
      <p className="mt-2 text-sm text-ink-500">You pay on the payment provider&apos;s page; Hangarline never sees your card number.</p>
    </FormShell>
  );
}
