"use client";
import { useActionState } from "react";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState } from "@/lib/actions/action-state";
import { inviteMember } from "@/lib/actions/members/invite-member";
import { RoleCheckboxes } from "./role-checkboxes";
import { IdempotencyKeyField } from "@/components/ui/idempotency-key-field";

export function InviteForm({ slug }: { slug: string }) {
  const [state, action] = useActionState(inviteMember, initialActionState);
  return (
    <form action={action} noValidate aria-label="Invite a member" key={state.ok ? state.message + Date.now() : "invite"}>
      <IdempotencyKeyField answer={state} />
      <FormMessage state={state} />
      <input type="hidden" name="club" value={slug} />
      <Field label="E-mail address" name="email" type="email" required errors={state.fieldErrors.email} />
      <RoleCheckboxes selected={["member"]} errors={state.fieldErrors.roles} />
      <SubmitButton pendingText="Sending…">Send invitation</SubmitButton>
    </form>
  );
}
