"use server";
import { and, eq } from "drizzle-orm";
import { findInvitationByToken } from "@/db/queries/invitations";
import { invitations, memberships, users } from "@/db/schema";
import { userAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { hashPassword } from "@/lib/auth/password";
import { isoDateInTimeZone } from "@/lib/dates";
import { writeAudit } from "@/lib/server/audit";
import { acceptInvitationSchema } from "@/lib/validation/auth";
import { clubs } from "@/db/schema";

/**
 * Accepting creates the account when the address has none (this is how people sign up), or
 * adds the membership to the signed-in account that owns the invited address.
 */
export const acceptInvitation = userAction({
  schema: acceptInvitationSchema,
  requireUser: false,
  success: "Welcome to the club.",
  async prepare(_user, input) {
    return input.password ? await hashPassword(input.password) : null;
  },
  run(tx, user, input, passwordHash) {
    const invitation = findInvitationByToken(tx, input.token);
    if (!invitation || invitation.state !== "open") throw new ActionError("This invitation is no longer valid. Ask the club for a new one.");
    let userId: string;
    if (invitation.accountExists) {
      if (!user || user.email !== invitation.email) {
        throw new ActionError(`Sign in as ${invitation.email} to accept this invitation.`);
      }
      userId = user.id;
    } else {
      if (!input.name) throw new ActionError("Enter your name.", { name: ["Enter your name."] });
      if (!passwordHash) throw new ActionError("Choose a password.", { password: ["Use at least 10 characters for your password."] });
      const [created] = tx.insert(users).values({ email: invitation.email, name: input.name, passwordHash, emailVerified: new Date() }).returning({ id: users.id }).all();
      userId = created!.id;
    }
    const club = tx.select({ timeZone: clubs.timeZone }).from(clubs).where(eq(clubs.id, invitation.clubId)).get();
    const existing = tx.select().from(memberships).where(and(eq(memberships.clubId, invitation.clubId), eq(memberships.userId, userId))).get();
    let membershipId: string;
    if (existing) {
      const merged = [...new Set([...existing.roles, ...invitation.roles])];
      // "mechanic" is records access for outsiders and never combines with club roles.
      const roles = merged.length > 1 ? merged.filter((r) => r !== "mechanic") : merged;
      tx.update(memberships).set({ roles, status: "active", deactivatedAt: null }).where(eq(memberships.id, existing.id)).run();
      membershipId = existing.id;
    } else {
      const [m] = tx
        .insert(memberships)
        .values({ clubId: invitation.clubId, userId, roles: invitation.roles, joinedOn: isoDateInTimeZone(new Date(), club?.timeZone ?? "UTC") })
        .returning({ id: memberships.id })
        .all();
      membershipId = m!.id;
    }
    tx.update(invitations).set({ acceptedAt: new Date() }).where(eq(invitations.id, invitation.id)).run();
    writeAudit(tx, { clubId: invitation.clubId, actorId: userId, action: "member.join", subjectType: "Membership", subjectId: membershipId, after: { roles: invitation.roles, via: "invitation" } });
    return user
      ? { redirectTo: `/clubs/${invitation.clubSlug}` }
      : { redirectTo: `/sign-in?joined=1&callbackUrl=${encodeURIComponent(`/clubs/${invitation.clubSlug}`)}` };
  },
});
