"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { Field } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { inviteMember } from "@/lib/actions/members/invite-member";
import { RoleCheckboxes } from "./role-checkboxes";

export function InviteForm({ slug }: { slug: string }) {
  const form = useFormAction(inviteMember);
  const { state } = form;
  return (
    <FormShell form={form} label="Invite a member">
      <input type="hidden" name="club" value={slug} />
      <Field label="E-mail address" name="email" type="email" required errors={state.fieldErrors.email} />
      <RoleCheckboxes selected={["member"]} errors={state.fieldErrors.roles} />
      <SubmitButton pendingText="Sending…">Send invitation</SubmitButton>
    </FormShell>
  );
}
