"use client";
import { useActionState } from "react";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState } from "@/lib/actions/action-state";
import { changeRoles } from "@/lib/actions/members/change-roles";
import { revokeInvitation } from "@/lib/actions/members/revoke-invitation";
import { setMembershipStatus } from "@/lib/actions/members/set-membership-status";
import type { Role } from "@/permissions/roles";
import { RoleCheckboxes } from "./role-checkboxes";
import { IdempotencyKeyField } from "@/components/ui/idempotency-key-field";

export function ChangeRolesForm({ slug, membershipId, roles }: { slug: string; membershipId: string; roles: Role[] }) {
  const [state, action] = useActionState(changeRoles, initialActionState);
  return (
    <form action={action} aria-label="Change roles">
      <IdempotencyKeyField answer={state} />
      <FormMessage state={state} />
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="membershipId" value={membershipId} />
      <RoleCheckboxes selected={roles} errors={state.fieldErrors.roles} />
      <SubmitButton>Save roles</SubmitButton>
    </form>
  );
}

export function MembershipStatusForm({ slug, membershipId, status }: { slug: string; membershipId: string; status: "active" | "inactive" }) {
  const [state, action] = useActionState(setMembershipStatus, initialActionState);
  const next = status === "active" ? "inactive" : "active";
  return (
    <form action={action} aria-label="Membership status">
      <IdempotencyKeyField answer={state} />
      <FormMessage state={state} />
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="membershipId" value={membershipId} />
      <input type="hidden" name="status" value={next} />
      <SubmitButton variant={next === "inactive" ? "danger" : "primary"}>{next === "inactive" ? "Deactivate membership" : "Reactivate membership"}</SubmitButton>
    </form>
  );
}

export function RevokeInvitationButton({ slug, invitationId }: { slug: string; invitationId: string }) {
  const [state, action] = useActionState(revokeInvitation, initialActionState);
  return (
    <form action={action} className="inline">
      <IdempotencyKeyField answer={state} />
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="invitationId" value={invitationId} />
      <SubmitButton variant="secondary" pendingText="Withdrawing…">Withdraw</SubmitButton>
      {state.message && !state.ok ? <span className="ml-2 text-sm text-stop-800">{state.message}</span> : null}
    </form>
  );
}
