import { and, count, eq, gte, lt, max, ne } from "drizzle-orm";
import type { Db } from "@/db/client";
import { revokedSessions, signInAttempts, signInLinkRequests, verificationTokens } from "@/db/schema";
import { UNKNOWN_CLIENT } from "./client-key";

// Password guesses: each account and each client may fail a few times freely; after that every
// further attempt must wait, and the wait doubles with each failure up to a cap. Nobody is locked
// out for good: the owner can sign in once the wait has passed (or at once with an e-mail link),
// and a successful sign-in clears the account's count. Failures are remembered for a day.
export const FAILURE_MEMORY_MS = 24 * 3600_000;
export const FREE_FAILURES_PER_ACCOUNT = 5;
export const FREE_FAILURES_PER_CLIENT = 20;
/** The shared bucket of clients we cannot tell apart (no trusted proxy) gets more room. */
export const FREE_FAILURES_UNKNOWN_CLIENT = 50;
export const FIRST_WAIT_MS = 30_000;
export const MAX_WAIT_MS = 15 * 60_000;

// E-mail sign-in links: a few per address and a few more per client in a quarter of an hour.
export const LINK_WINDOW_MS = 15 * 60_000;
export const MAX_LINKS_PER_ADDRESS = 5;
export const MAX_LINKS_PER_CLIENT = 10;
export const MAX_LINKS_UNKNOWN_CLIENT = 30;

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

/** How long after the latest failure the next attempt must wait, given the failures so far. */
export function requiredWaitMs(failures: number, freeFailures: number): number {
  if (failures < freeFailures) return 0;
  return Math.min(FIRST_WAIT_MS * 2 ** Math.min(failures - freeFailures, 30), MAX_WAIT_MS);
}

type Counted = { n: number; latest: Date | number | null } | undefined;

function waitLeft(row: Counted, freeFailures: number, now: Date): number {
  const failures = row?.n ?? 0;
  const wait = requiredWaitMs(failures, freeFailures);
  if (!wait || row?.latest == null) return 0;
  const latest = row.latest instanceof Date ? row.latest.getTime() : Number(row.latest);
  return Math.max(0, latest + wait - now.getTime());
}

export type Reservation = { ok: true; attemptId: string } | { ok: false; retryAfterMs: number };

/**
 * Reserves one password attempt for this account and client, or refuses it. Runs as one
 * synchronous write transaction, so parallel requests are counted one after another and every
 * reserved attempt (still "pending" while its hash is computed) already counts as a failure.
 * A refused attempt writes nothing: hammering during the wait does not lengthen it.
 */
export function reserveSignInAttempt(db: Db, emailKey: string, clientKey: string, now = new Date()): Reservation {
  return db.transaction(
    (tx) => {
      const since = new Date(now.getTime() - FAILURE_MEMORY_MS);
      const byAccount = tx
        .select({ n: count(), latest: max(signInAttempts.createdAt) })
        .from(signInAttempts)
        .where(and(eq(signInAttempts.emailKey, emailKey), eq(signInAttempts.countsForAccount, true), ne(signInAttempts.outcome, "succeeded"), gte(signInAttempts.createdAt, since)))
        .get();
      const byClient = tx
        .select({ n: count(), latest: max(signInAttempts.createdAt) })
        .from(signInAttempts)
        .where(and(eq(signInAttempts.clientKey, clientKey), ne(signInAttempts.outcome, "succeeded"), gte(signInAttempts.createdAt, since)))
        .get();
      const clientFree = clientKey === UNKNOWN_CLIENT ? FREE_FAILURES_UNKNOWN_CLIENT : FREE_FAILURES_PER_CLIENT;
      const retryAfterMs = Math.max(waitLeft(byAccount, FREE_FAILURES_PER_ACCOUNT, now), waitLeft(byClient, clientFree, now));
      if (retryAfterMs > 0) return { ok: false as const, retryAfterMs };
      const row = tx.insert(signInAttempts).values({ emailKey, clientKey, outcome: "pending", createdAt: now }).returning({ id: signInAttempts.id }).get();
      return { ok: true as const, attemptId: row.id };
    },
    { behavior: "immediate" },
  );
}

/** Records how a reserved attempt ended. Success clears the account's failures (not the client's). */
export function settleSignInAttempt(db: Db, attemptId: string, emailKey: string, succeeded: boolean): void {
  db.transaction(
    (tx) => {
      tx.update(signInAttempts).set({ outcome: succeeded ? "succeeded" : "failed" }).where(eq(signInAttempts.id, attemptId)).run();
      if (succeeded) tx.update(signInAttempts).set({ countsForAccount: false }).where(eq(signInAttempts.emailKey, emailKey)).run();
    },
    { behavior: "immediate" },
  );
}

/**
 * Decides whether to send one more sign-in link to this address for this client, and records it
 * when it is sent. The person asking is told the same thing either way.
 */
export function reserveSignInLink(db: Db, emailKey: string, clientKey: string, now = new Date()): boolean {
  return db.transaction(
    (tx) => {
      const since = new Date(now.getTime() - LINK_WINDOW_MS);
      const byAddress = tx
        .select({ n: count() })
        .from(signInLinkRequests)
        .where(and(eq(signInLinkRequests.emailKey, emailKey), gte(signInLinkRequests.createdAt, since)))
        .get();
      if ((byAddress?.n ?? 0) >= MAX_LINKS_PER_ADDRESS) return false;
      const byClient = tx
        .select({ n: count() })
        .from(signInLinkRequests)
        .where(and(eq(signInLinkRequests.clientKey, clientKey), gte(signInLinkRequests.createdAt, since)))
        .get();
      const clientMax = clientKey === UNKNOWN_CLIENT ? MAX_LINKS_UNKNOWN_CLIENT : MAX_LINKS_PER_CLIENT;
      if ((byClient?.n ?? 0) >= clientMax) return false;
      tx.insert(signInLinkRequests).values({ emailKey, clientKey, createdAt: now }).run();
      return true;
    },
    { behavior: "immediate" },
  );
}

const PRUNE_EVERY_MS = 10 * 60_000;
const pruneState = globalThis as unknown as { __hangarlineAuthPrunedAt?: number };

/**
 * Deletes throttling rows older than they can matter, revocations of sessions that have expired
 * and sign-in link tokens past their time (Auth.js stores one per request, even for unknown addresses).
 */
export function pruneSignInRecords(db: Db, now = new Date()): void {
  const failuresBefore = new Date(now.getTime() - FAILURE_MEMORY_MS);
  const linksBefore = new Date(now.getTime() - Math.max(LINK_WINDOW_MS, FAILURE_MEMORY_MS));
  db.delete(signInAttempts).where(lt(signInAttempts.createdAt, failuresBefore)).run();
  db.delete(signInLinkRequests).where(lt(signInLinkRequests.createdAt, linksBefore)).run();
  db.delete(revokedSessions).where(lt(revokedSessions.expiresAt, now)).run();
  db.delete(verificationTokens).where(lt(verificationTokens.expires, now)).run();
}

/** Prunes at most once every ten minutes per process (called on the sign-in path). */
export function pruneSignInRecordsNowAndThen(db: Db, now = new Date()): void {
  const last = pruneState.__hangarlineAuthPrunedAt ?? 0;
  if (now.getTime() - last < PRUNE_EVERY_MS && now.getTime() >= last) return;
  pruneState.__hangarlineAuthPrunedAt = now.getTime();
  pruneSignInRecords(db, now);
}
