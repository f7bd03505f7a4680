"use server";
import { and, eq } from "drizzle-orm";
import { signIn } from "@/auth";
import { findInvitationByToken } from "@/db/queries/invitations";
import { invitations, memberships, users } from "@/db/schema";
import { userAction } from "@/lib/actions/create-action";
import { ActionError, type ActionState } from "@/lib/actions/action-state";
import { hashPassword } from "@/lib/auth/password";
import { isoDateInTimeZone } from "@/lib/dates";
import { writeAudit } from "@/lib/server/audit";
import { acceptInvitationSchema } from "@/lib/validation/auth";
import { clubs } from "@/db/schema";

type Joined = { clubSlug: string; newAccountEmail: string | null };

/**
 * Accepting creates the account when the address has none (this is how people sign up), or
 * adds the membership to the signed-in account that owns the invited address.
 */
const joinClub = userAction<typeof acceptInvitationSchema, string | null, Joined>({
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
      if (!input.name) throw new ActionError("Some fields need attention; nothing was saved.", { name: ["Enter your name."] });
      if (!passwordHash) throw new ActionError("Some fields need attention; nothing was saved.", { password: ["Use at least 10 characters for your password."] });
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
    return {
      redirectTo: `/clubs/${invitation.clubSlug}`,
      data: { clubSlug: invitation.clubSlug, newAccountEmail: invitation.accountExists ? null : invitation.email },
    };
  },
});

/**
 * Joins, and signs a newly made account in at once with the password just chosen (no second
 * sign-in). Should that sign-in not complete, the answer sends the person to the sign-in page,
 * which says their account is ready.
 */
export async function acceptInvitation(prev: ActionState, formData: FormData): Promise<ActionState<Joined>> {
  const answer = await joinClub(prev, formData);
  const joined = answer.ok ? answer.data : undefined;
  if (!joined?.newAccountEmail) return answer;
  const password = formData.get("password");
  const club = `/clubs/${joined.clubSlug}`;
  try {
    await signIn("credentials", { email: joined.newAccountEmail, password: typeof password === "string" ? password : "", redirect: false });
    return { ...answer, message: "Welcome to the club. You are signed in.", redirectTo: club };
  } catch {
    return { ...answer, redirectTo: `/sign-in?joined=1&callbackUrl=${encodeURIComponent(club)}` };
  }
}
