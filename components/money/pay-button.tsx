"use client";
import { useActionState } from "react";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState } from "@/lib/actions/action-state";
import { startCardPayment } from "@/lib/actions/money/start-card-payment";
import { IdempotencyKeyField } from "@/components/ui/idempotency-key-field";

/** "Pay my balance": the action sends the browser to the provider's hosted payment page. */
export function PayButton({ slug, amountText }: { slug: string; amountText: string }) {
  const [state, action] = useActionState(startCardPayment, initialActionState);
  return (
    <form action={action} aria-label="Pay by card">
      <IdempotencyKeyField answer={state} />
      <FormMessage state={state} />
      <input type="hidden" name="club" value={slug} />
      <SubmitButton pendingText="Opening the payment page…">Pay {amountText} by card</SubmitButton>
      <p className="mt-2 text-sm text-ink-500">You pay on the payment provider&apos;s page; Hangarline never sees your card number.</p>
    </form>
  );
}
