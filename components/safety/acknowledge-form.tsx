"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { acknowledgeBulletin } from "@/lib/actions/safety/acknowledge-bulletin";

export function AcknowledgeForm({ slug, bulletinId }: { slug: string; bulletinId: string }) {
  const form = useFormAction(acknowledgeBulletin);
  const { state } = form;
  if (state.ok) return <FormMessage state={state} />;
  return (
    <FormShell form={form} label="Acknowledge bulletin">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="bulletinId" value={bulletinId} />
      <p className="mb-3 text-sm text-ink-700">By acknowledging you confirm that you have read and understood this bulletin.</p>
      <SubmitButton pendingText="Recording…">Acknowledge</SubmitButton>
    </FormShell>
  );
}
