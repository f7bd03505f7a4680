import { and, eq, isNull } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { invitations, memberships, users, type Club } from "@/db/schema";
import { ActionError } from "@/lib/actions/action-state";
import { formatLocalTime } from "@/lib/fleet/time";
import { enqueueEmail } from "@/lib/email/outbox";
import { writeAudit } from "@/lib/server/audit";
import { hashToken, newSecretToken } from "@/lib/server/tokens";
import { appUrl } from "@/lib/server/urls";

const VALID_DAYS = 14;

/**
 * An operator appoints a club admin by invitation only: the appointee accepts through the
 * ordinary invitation flow (lib/actions/invitations/accept-invitation.ts), and until then no
 * membership or role exists. An operator can never appoint themselves: the console is for
 * running clubs, not for reading a club's member data.
 */
export function appointAdmin(tx: Tx, club: Club, email: string, actor: { id: string; name: string | null; email: string }): "invited" {
  const address = email.trim().toLowerCase();
  if (address === actor.email.trim().toLowerCase()) {
    throw new ActionError("You cannot appoint yourself: an operator does not become a club's admin. Appoint someone from the club.", {
      adminEmail: ["Enter the address of the person who will run the club, not your own."],
    });
  }
  const held = tx
    .select({ roles: memberships.roles, status: memberships.status })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.clubId, club.id), eq(users.email, address)))
    .get();
  if (held?.status === "active" && held.roles.includes("admin")) {
    throw new ActionError(`${address} is already an admin of ${club.name}.`, { adminEmail: ["Already an admin of this club."] });
  }
  // A new invitation replaces any earlier one still open for the same address.
  tx.update(invitations)
    .set({ revokedAt: new Date() })
    .where(and(eq(invitations.clubId, club.id), eq(invitations.email, address), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)))
    .run();
  const token = newSecretToken();
  const expiresAt = new Date(Date.now() + VALID_DAYS * 86_400_000);
  const [inv] = tx
    .insert(invitations)
    .values({ clubId: club.id, email: address, roles: ["member", "admin"], tokenHash: hashToken(token), invitedById: actor.id, expiresAt })
    .returning({ id: invitations.id })
    .all();
  enqueueEmail(tx, {
    clubId: club.id,
    to: address,
    subject: `You are invited to run ${club.name} on Hangarline`,
    template: "invitation",
    payload: { url: appUrl(`/invitations/${token}`), clubName: club.name, invitedBy: actor.name ?? actor.email, roles: ["Member", "Club admin"], expiresOn: formatLocalTime(expiresAt, club.timeZone) },
  });
  writeAudit(tx, { clubId: club.id, actorId: actor.id, action: "member.invite", subjectType: "Invitation", subjectId: inv!.id, after: { email: address, roles: ["member", "admin"], via: "operator" } });
  return "invited";
}
