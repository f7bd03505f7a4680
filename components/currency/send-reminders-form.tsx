"use client";
import { useActionState } from "react";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState } from "@/lib/actions/action-state";
import { sendDocumentReminders } from "@/lib/actions/documents/send-document-reminders";
import { IdempotencyKeyField } from "@/components/ui/idempotency-key-field";

export function SendRemindersForm({ slug, days }: { slug: string; days: number }) {
  const [state, action] = useActionState(sendDocumentReminders, initialActionState);
  return (
    <form action={action} aria-label="Send expiry reminders">
      <IdempotencyKeyField answer={state} />
      <FormMessage state={state} />
      <input type="hidden" name="club" value={slug} />
      <p className="mb-2 text-sm text-ink-700">E-mails each member whose medical, flight review or other document lapses within {days} days (the club setting), once per expiry date.</p>
      <SubmitButton variant="secondary" pendingText="Queuing…">Send expiry reminders</SubmitButton>
    </form>
  );
}
