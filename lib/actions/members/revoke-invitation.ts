"use server";
import { and, eq, isNull } from "drizzle-orm";
import { invitations } from "@/db/schema";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { writeAudit } from "@/lib/server/audit";
import { revokeInvitationSchema } from "@/lib/validation/members";

export const revokeInvitation = clubAction({
  schema: revokeInvitationSchema,
  permission: ["update", "Invitation"],
  success: "Invitation withdrawn.",
  run(tx, { club, user }, input) {
    const result = tx
      .update(invitations)
      .set({ revokedAt: new Date() })
      .where(and(eq(invitations.clubId, club.id), eq(invitations.id, input.invitationId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)))
      .run();
    if (result.changes === 0) throw new ActionError("That invitation is not open any more.", {}, "not_found");
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "member.invitation.revoke", subjectType: "Invitation", subjectId: input.invitationId });
    return { refresh: true };
  },
});
