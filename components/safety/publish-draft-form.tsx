"use client";
import { useActionState } from "react";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState } from "@/lib/actions/action-state";
import { publishBulletin } from "@/lib/actions/safety/publish-bulletin";
import { remindBulletin } from "@/lib/actions/safety/remind-bulletin";
import { IdempotencyKeyField } from "@/components/ui/idempotency-key-field";

export function PublishDraftForm({ slug, bulletinId }: { slug: string; bulletinId: string }) {
  const [state, action] = useActionState(publishBulletin, initialActionState);
  return (
    <form action={action} aria-label="Publish draft">
      <IdempotencyKeyField answer={state} />
      <FormMessage state={state} />
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="bulletinId" value={bulletinId} />
      <SubmitButton pendingText="Publishing…">Publish and send</SubmitButton>
    </form>
  );
}

export function RemindForm({ slug, bulletinId, outstanding }: { slug: string; bulletinId: string; outstanding: number }) {
  const [state, action] = useActionState(remindBulletin, initialActionState);
  return (
    <form action={action} aria-label="Send reminders">
      <IdempotencyKeyField answer={state} />
      <FormMessage state={state} />
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="bulletinId" value={bulletinId} />
      <SubmitButton variant="secondary" pendingText="Queuing…" disabled={outstanding === 0} title={outstanding === 0 ? "Everyone has acknowledged." : undefined}>
        Remind those who have not acknowledged
      </SubmitButton>
    </form>
  );
}
