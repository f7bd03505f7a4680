import "server-only";
import { eq } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { clubs, invitations, users } from "@/db/schema";
import { hashToken } from "@/lib/server/tokens";

export type InvitationView = {
  id: string;
  clubId: string;
  clubName: string;
  clubSlug: string;
  email: string;
  roles: (typeof invitations.$inferSelect)["roles"];
  state: "open" | "accepted" | "revoked" | "expired";
  accountExists: boolean;
};

export function findInvitationByToken(db: Db | Tx, token: string, now = new Date()): InvitationView | null {
  const row = db
    .select({ inv: invitations, clubName: clubs.name, clubSlug: clubs.slug })
    .from(invitations)
    .innerJoin(clubs, eq(clubs.id, invitations.clubId))
    .where(eq(invitations.tokenHash, hashToken(token)))
    .get();
  if (!row) return null;
  const { inv } = row;
  const state = inv.acceptedAt ? "accepted" : inv.revokedAt ? "revoked" : inv.expiresAt <= now ? "expired" : "open";
  const account = db.select({ id: users.id }).from(users).where(eq(users.email, inv.email)).get();
  return { id: inv.id, clubId: inv.clubId, clubName: row.clubName, clubSlug: row.clubSlug, email: inv.email, roles: inv.roles, state, accountExists: Boolean(account) };
}
