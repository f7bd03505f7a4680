"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { SubmitButton } from "@/components/ui/submit-button";
import { publishBulletin } from "@/lib/actions/safety/publish-bulletin";
import { remindBulletin } from "@/lib/actions/safety/remind-bulletin";

export function PublishDraftForm({ slug, bulletinId }: { slug: string; bulletinId: string }) {
  const form = useFormAction(publishBulletin);
  return (
    <FormShell form={form} label="Publish draft">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="bulletinId" value={bulletinId} />
      <SubmitButton pendingText="Publishing…">Publish and send</SubmitButton>
    </FormShell>
  );
}

export function RemindForm({ slug, bulletinId, outstanding }: { slug: string; bulletinId: string; outstanding: number }) {
  const form = useFormAction(remindBulletin);
  return (
    <FormShell form={form} label="Send reminders">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="bulletinId" value={bulletinId} />
      <SubmitButton variant="secondary" pendingText="Queuing…" disabled={outstanding === 0} title={outstanding === 0 ? "Everyone has acknowledged." : undefined}>
        Remind those who have not acknowledged
      </SubmitButton>
    </FormShell>
  );
}
