"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { SubmitButton } from "@/components/ui/submit-button";
import { sendDocumentReminders } from "@/lib/actions/documents/send-document-reminders";

export function SendRemindersForm({ slug, days }: { slug: string; days: number }) {
  const form = useFormAction(sendDocumentReminders);
  return (
    <FormShell form={form} label="Send expiry reminders">
      <input type="hidden" name="club" value={slug} />
      <p className="mb-2 text-sm text-ink-700">E-mails each member whose medical, flight review or other document expires within {days} days (the club setting), once per expiry date.</p>
      <SubmitButton variant="secondary" pendingText="Queuing…">Send expiry reminders</SubmitButton>
    </FormShell>
  );
}
