import { eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { users } from "@/db/schema";
import { passwordSignInSchema } from "@/lib/validation/auth";
import { DUMMY_HASH, verifyPassword } from "./password";
import { normaliseEmail, pruneSignInRecordsNowAndThen, reserveSignInAttempt, settleSignInAttempt } from "./rate-limit";

export type CredentialsResult =
  | { ok: true; user: { id: string; email: string; name: string | null } }
  | { ok: false; reason: "invalid" }
  | { ok: false; reason: "rate_limited"; retryAfterMs: number };

export type CredentialsOptions = {
  /** The clock (tests move it forward instead of waiting). */
  now?: () => Date;
  /** The password check (tests count its calls). */
  verify?: (password: string, hash: string) => Promise<boolean>;
};

/**
 * Checks an e-mail and password. The answer for an unknown e-mail, a wrong password and a
 * disabled account is the same ("invalid"), and takes as long, so nothing reveals who has an account.
 * The attempt is reserved before the password is hashed (see reserveSignInAttempt), so parallel
 * guesses cannot all get through while the first ones are still being checked.
 */
export async function authorizeCredentials(db: Db, raw: unknown, clientKey: string, options: CredentialsOptions = {}): Promise<CredentialsResult> {
  const now = options.now ?? (() => new Date());
  const verify = options.verify ?? verifyPassword;
  const parsed = passwordSignInSchema.safeParse(raw);
  if (!parsed.success) return { ok: false, reason: "invalid" };
  const emailKey = normaliseEmail(parsed.data.email);
  const at = now();
  pruneSignInRecordsNowAndThen(db, at);
  const reservation = reserveSignInAttempt(db, emailKey, clientKey, at);
  if (!reservation.ok) return { ok: false, reason: "rate_limited", retryAfterMs: reservation.retryAfterMs };
  let ok = false;
  let user: typeof users.$inferSelect | undefined;
  try {
    user = db.select().from(users).where(eq(users.email, emailKey)).get();
    const matches = await verify(parsed.data.password, user?.passwordHash ?? DUMMY_HASH);
    ok = Boolean(user && user.passwordHash && matches && !user.disabledAt);
  } finally {
    settleSignInAttempt(db, reservation.attemptId, emailKey, ok);
  }
  if (!ok || !user) return { ok: false, reason: "invalid" };
  return { ok: true, user: { id: user.id, email: user.email, name: user.name } };
}
