"use client";
import { useActionState } from "react";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState } from "@/lib/actions/action-state";
import { acknowledgeBulletin } from "@/lib/actions/safety/acknowledge-bulletin";
import { IdempotencyKeyField } from "@/components/ui/idempotency-key-field";

export function AcknowledgeForm({ slug, bulletinId }: { slug: string; bulletinId: string }) {
  const [state, action] = useActionState(acknowledgeBulletin, initialActionState);
  if (state.ok) return <FormMessage state={state} />;
  return (
    <form action={action} aria-label="Acknowledge bulletin">
      <IdempotencyKeyField answer={state} />
      <FormMessage state={state} />
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="bulletinId" value={bulletinId} />
      <p className="mb-3 text-sm text-ink-700">By acknowledging you confirm that you have read and understood this bulletin.</p>
      <SubmitButton pendingText="Recording…">Acknowledge</SubmitButton>
    </form>
  );
}
