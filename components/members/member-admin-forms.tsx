"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { SubmitButton } from "@/components/ui/submit-button";
import { changeRoles } from "@/lib/actions/members/change-roles";
import { revokeInvitation } from "@/lib/actions/members/revoke-invitation";
import { setMembershipStatus } from "@/lib/actions/members/set-membership-status";
import type { Role } from "@/permissions/roles";
import { RoleCheckboxes } from "./role-checkboxes";

export function ChangeRolesForm({ slug, membershipId, roles }: { slug: string; membershipId: string; roles: Role[] }) {
  // An edit form: after saving, the boxes keep what was saved (a reset would show the old roles).
  const form = useFormAction(changeRoles, { keepValuesAfterOk: true });
  return (
    <FormShell form={form} label="Change roles">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="membershipId" value={membershipId} />
      <RoleCheckboxes selected={roles} errors={form.state.fieldErrors.roles} />
      <SubmitButton>Save roles</SubmitButton>
    </FormShell>
  );
}

export function MembershipStatusForm({ slug, membershipId, status }: { slug: string; membershipId: string; status: "active" | "inactive" }) {
  const form = useFormAction(setMembershipStatus);
  const next = status === "active" ? "inactive" : "active";
  return (
    <FormShell form={form} label="Membership status">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="membershipId" value={membershipId} />
      <input type="hidden" name="status" value={next} />
      <SubmitButton variant={next === "inactive" ? "danger" : "primary"}>{next === "inactive" ? "Deactivate membership" : "Reactivate membership"}</SubmitButton>
    </FormShell>
  );
}

export function RevokeInvitationButton({ slug, invitationId }: { slug: string; invitationId: string }) {
  const form = useFormAction(revokeInvitation);
  return (
    <FormShell form={form} className="inline" answer="inline-after">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="invitationId" value={invitationId} />
      <SubmitButton variant="secondary" pendingText="Withdrawing…">Withdraw</SubmitButton>
    </FormShell>
  );
}
