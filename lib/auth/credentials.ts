import { eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { users } from "@/db/schema";
import { passwordSignInSchema } from "@/lib/validation/auth";
import { DUMMY_HASH, verifyPassword } from "./password";
import { isSignInLimited, normaliseEmail, recordSignInAttempt } from "./rate-limit";

export type CredentialsResult =
  | { ok: true; user: { id: string; email: string; name: string | null } }
  | { ok: false; reason: "invalid" | "rate_limited" };

/**
 * Checks an e-mail and password. The answer for an unknown e-mail, a wrong password and a
 * disabled account is the same ("invalid"), and takes as long, so nothing reveals who has an account.
 */
export async function authorizeCredentials(db: Db, raw: unknown, ip: string | null): Promise<CredentialsResult> {
  const parsed = passwordSignInSchema.safeParse(raw);
  if (!parsed.success) return { ok: false, reason: "invalid" };
  const emailKey = normaliseEmail(parsed.data.email);
  if (isSignInLimited(db, emailKey, ip)) return { ok: false, reason: "rate_limited" };
  const user = db.select().from(users).where(eq(users.email, emailKey)).get();
  const hash = user?.passwordHash ?? DUMMY_HASH;
  const matches = await verifyPassword(parsed.data.password, hash);
  const ok = Boolean(user && user.passwordHash && matches && !user.disabledAt);
  recordSignInAttempt(db, emailKey, ip, ok);
  if (!ok || !user) return { ok: false, reason: "invalid" };
  return { ok: true, user: { id: user.id, email: user.email, name: user.name } };
}
