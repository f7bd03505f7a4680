import { randomUUID } from "node:crypto";
import { eq, sql } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { revokedSessions, users } from "@/db/schema";

// Sessions are encrypted JWTs in a cookie (the Credentials provider of Auth.js works with JWT
// sessions only), so a session cannot be deleted from the server. Two records make one end anyway:
// - users.sessions_valid_after: every session of the person signed in before it is refused
//   (deactivation, a role change, "sign out everywhere");
// - revoked_sessions: one session ended by signing out, kept until it would have expired.
// The JWT callback in auth.ts asks isSessionCurrent() on every read of the session, so auth(),
// getSessionUser() and /api/auth/session all see a revoked session as no session.

export const SESSION_MAX_AGE_SECONDS = 30 * 24 * 3600;

export type SessionClaims = { sub?: unknown; sid?: unknown; authAt?: unknown };

/** The claims a session gets when someone signs in: its own id and the instant of sign-in. */
export function newSessionClaims(now = new Date()): { sid: string; authAt: number } {
  return { sid: randomUUID(), authAt: now.getTime() };
}

// Asked on every request: the two reads are prepared once per connection (its query session,
// shared by the handle and its transactions) and reused.
function buildChecks(db: Db) {
  return {
    user: db.select({ disabledAt: users.disabledAt, validAfter: users.sessionsValidAfter }).from(users).where(eq(users.id, sql.placeholder("id"))).prepare(),
    revoked: db.select({ sid: revokedSessions.sessionId }).from(revokedSessions).where(eq(revokedSessions.sessionId, sql.placeholder("sid"))).prepare(),
  };
}
const preparedChecks = new WeakMap<object, ReturnType<typeof buildChecks>>();

function checks(db: Db) {
  const session = (db as unknown as { session?: object }).session ?? db;
  let c = preparedChecks.get(session);
  if (!c) preparedChecks.set(session, (c = buildChecks(db)));
  return c;
}

/** True while the session's account is active and nothing has revoked the session. */
export function isSessionCurrent(db: Db, claims: SessionClaims): boolean {
  const { sub, sid, authAt } = claims;
  // A session from before revocation existed carries no id: it is asked to sign in again.
  if (typeof sub !== "string" || typeof sid !== "string" || typeof authAt !== "number") return false;
  const q = checks(db);
  const user = q.user.get({ id: sub });
  if (!user || user.disabledAt) return false;
  if (user.validAfter && authAt <= user.validAfter.getTime()) return false;
  const revoked = q.revoked.get({ sid });
  return !revoked;
}

/** Ends every session of this person (call inside the transaction that deactivates or changes roles). */
export function revokeSessions(tx: Db | Tx, userId: string, now = new Date()): void {
  tx.update(users).set({ sessionsValidAfter: now }).where(eq(users.id, userId)).run();
}

/** Ends one session (sign-out). */
export function revokeSession(db: Db | Tx, claims: SessionClaims, now = new Date()): void {
  if (typeof claims.sid !== "string" || typeof claims.sub !== "string") return;
  // Any copy of the cookie may have been refreshed up to now, so it could live until now + max age.
  const expiresAt = new Date(now.getTime() + SESSION_MAX_AGE_SECONDS * 1000);
  const user = db.select({ id: users.id }).from(users).where(eq(users.id, claims.sub)).get();
  if (!user) return;
  db.insert(revokedSessions)
    .values({ sessionId: claims.sid, userId: user.id, expiresAt, createdAt: now })
    .onConflictDoNothing()
    .run();
}
