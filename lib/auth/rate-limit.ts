import { and, count, eq, gte } from "drizzle-orm";
import type { Db } from "@/db/client";
import { signInAttempts } from "@/db/schema";

export const RATE_WINDOW_MS = 15 * 60_000;
export const MAX_FAILURES_PER_EMAIL = 5;
export const MAX_FAILURES_PER_IP = 30;

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

/** True when this e-mail (whether or not an account exists) or this IP has failed too often. */
export function isSignInLimited(db: Db, emailKey: string, ip: string | null, now = new Date()): boolean {
  const since = new Date(now.getTime() - RATE_WINDOW_MS);
  const byEmail = db
    .select({ n: count() })
    .from(signInAttempts)
    .where(and(eq(signInAttempts.emailKey, emailKey), eq(signInAttempts.succeeded, false), gte(signInAttempts.createdAt, since)))
    .get();
  if ((byEmail?.n ?? 0) >= MAX_FAILURES_PER_EMAIL) return true;
  if (!ip) return false;
  const byIp = db
    .select({ n: count() })
    .from(signInAttempts)
    .where(and(eq(signInAttempts.ip, ip), eq(signInAttempts.succeeded, false), gte(signInAttempts.createdAt, since)))
    .get();
  return (byIp?.n ?? 0) >= MAX_FAILURES_PER_IP;
}

export function recordSignInAttempt(db: Db, emailKey: string, ip: string | null, succeeded: boolean, now = new Date()): void {
  db.insert(signInAttempts).values({ emailKey, ip, succeeded, createdAt: now }).run();
}
