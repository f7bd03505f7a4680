"use server";
import { and, eq, isNull } from "drizzle-orm";
import { invitations, memberships, users } from "@/db/schema";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { enqueueEmail } from "@/lib/email/outbox";
import { kickOutbox } from "@/lib/email/runner";
import { writeAudit } from "@/lib/server/audit";
import { hashToken, newSecretToken } from "@/lib/server/tokens";
import { appUrl } from "@/lib/server/urls";
import { inviteMemberSchema } from "@/lib/validation/members";
import { ROLE_LABELS } from "@/permissions";
import { formatLocalTime } from "@/lib/fleet/time";

const VALID_DAYS = 14;

export const inviteMember = clubAction({
  schema: inviteMemberSchema,
  permission: ["invite", "Member"],
  success: "Invitation sent.",
  run(tx, { club, user }, input) {
    const existing = tx
      .select({ status: memberships.status })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(and(eq(memberships.clubId, club.id), eq(users.email, input.email)))
      .get();
    if (existing?.status === "active") throw new ActionError(`${input.email} is already a member of ${club.name}.`, { email: ["Already a member."] });
    if (existing) throw new ActionError(`${input.email} was a member; reactivate them from the roster instead.`, { email: ["Former member: reactivate instead."] });
    // A new invitation replaces any earlier one still open for the same address.
    tx.update(invitations)
      .set({ revokedAt: new Date() })
      .where(and(eq(invitations.clubId, club.id), eq(invitations.email, input.email), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)))
      .run();
    const token = newSecretToken();
    const expiresAt = new Date(Date.now() + VALID_DAYS * 86_400_000);
    const [row] = tx
      .insert(invitations)
      .values({ clubId: club.id, email: input.email, roles: input.roles, tokenHash: hashToken(token), invitedById: user.id, expiresAt })
      .returning({ id: invitations.id })
      .all();
    enqueueEmail(tx, {
      clubId: club.id,
      to: input.email,
      subject: `You are invited to ${club.name} on Hangarline`,
      template: "invitation",
      payload: {
        url: appUrl(`/invitations/${token}`),
        clubName: club.name,
        invitedBy: user.name ?? user.email,
        roles: input.roles.map((r) => ROLE_LABELS[r]),
        expiresOn: formatLocalTime(expiresAt, club.timeZone),
      },
    });
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "member.invite", subjectType: "Invitation", subjectId: row!.id, after: { email: input.email, roles: input.roles } });
    return { refresh: true };
  },
  after: () => kickOutbox(),
});
