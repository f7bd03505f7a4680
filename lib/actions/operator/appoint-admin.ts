import { and, eq, isNull } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { invitations, memberships, users, type Club } from "@/db/schema";
import { isoDateInTimeZone } from "@/lib/dates";
import { enqueueEmail } from "@/lib/email/outbox";
import { writeAudit } from "@/lib/server/audit";
import { hashToken, newSecretToken } from "@/lib/server/tokens";
import { appUrl } from "@/lib/server/urls";

/** Makes the person an admin of the club, or invites them as one when they have no account yet. */
export function appointAdmin(tx: Tx, club: Club, email: string, actor: { id: string; name: string | null; email: string }): "appointed" | "invited" {
  const account = tx.select({ id: users.id }).from(users).where(eq(users.email, email)).get();
  if (account) {
    const existing = tx.select().from(memberships).where(and(eq(memberships.clubId, club.id), eq(memberships.userId, account.id))).get();
    if (existing) {
      const roles = existing.roles.includes("admin") ? existing.roles : [...existing.roles.filter((r) => r !== "mechanic"), "admin" as const];
      tx.update(memberships).set({ roles, status: "active", deactivatedAt: null }).where(eq(memberships.id, existing.id)).run();
      writeAudit(tx, { clubId: club.id, actorId: actor.id, action: "club.admin.assign", subjectType: "Membership", subjectId: existing.id, before: { roles: existing.roles, status: existing.status }, after: { roles, status: "active" } });
    } else {
      const [m] = tx.insert(memberships).values({ clubId: club.id, userId: account.id, roles: ["member", "admin"], joinedOn: isoDateInTimeZone(new Date(), club.timeZone) }).returning({ id: memberships.id }).all();
      writeAudit(tx, { clubId: club.id, actorId: actor.id, action: "club.admin.assign", subjectType: "Membership", subjectId: m!.id, after: { roles: ["member", "admin"] } });
    }
    return "appointed";
  }
  tx.update(invitations).set({ revokedAt: new Date() }).where(and(eq(invitations.clubId, club.id), eq(invitations.email, email), isNull(invitations.acceptedAt), isNull(invitations.revokedAt))).run();
  const token = newSecretToken();
  const expiresAt = new Date(Date.now() + 14 * 86_400_000);
  const [inv] = tx.insert(invitations).values({ clubId: club.id, email, roles: ["member", "admin"], tokenHash: hashToken(token), invitedById: actor.id, expiresAt }).returning({ id: invitations.id }).all();
  enqueueEmail(tx, {
    clubId: club.id,
    to: email,
    subject: `You are invited to run ${club.name} on Hangarline`,
    template: "invitation",
    payload: { url: appUrl(`/invitations/${token}`), clubName: club.name, invitedBy: actor.name ?? actor.email, roles: ["Member", "Club admin"], expiresOn: expiresAt.toISOString().slice(0, 10) },
  });
  writeAudit(tx, { clubId: club.id, actorId: actor.id, action: "member.invite", subjectType: "Invitation", subjectId: inv!.id, after: { email, roles: ["member", "admin"] } });
  return "invited";
}
