import "server-only";
import { and, eq, lt } from "drizzle-orm";
import { NextResponse } from "next/server";
import type { Db, Tx } from "@/db/client";
import { idempotentWrites } from "@/db/schema";
import { ActionError } from "@/lib/actions/action-state";

/**
 * Exactly once. Every form carries a key made when it is shown (components/ui/idempotency-key-field.tsx,
 * field `idempotencyKey`); a JSON call sends the `Idempotency-Key` header. The first accepted write
 * stores its answer with the key, in the same transaction (taken with the write lock first) as the
 * write itself; a second press, a retry or a replay with the same key gets that answer back and
 * writes nothing (no rows, no audit, no outbox). A refused write stores nothing, so the person can
 * correct it and resend with the same key. A key used by someone else, or for another action, is
 * refused. Keys are optional on the server for now; without one, a write runs as before.
 */

export const IDEMPOTENCY_FIELD = "idempotencyKey";
export const IDEMPOTENCY_HEADER = "Idempotency-Key";
/** Scope for writes outside any club (operator console, invitations, sign-in). */
export const NO_CLUB_SCOPE = "";
/** How long a key is remembered. A replay older than this is treated as a new submission. */
export const IDEMPOTENCY_TTL_MS = 30 * 24 * 60 * 60 * 1000;

/** 16–128 characters: letters, digits and - _ . : (a UUID fits; nothing that needs escaping). */
const KEY_PATTERN = /^[A-Za-z0-9][A-Za-z0-9_.:-]{15,127}$/;

export const MALFORMED_KEY_MESSAGE = "This form's submission key is not valid, so nothing was saved. Reload the page and send it again.";
export const KEY_REUSED_MESSAGE =
  "This submission's key was already used for a different form or by someone else, so nothing was saved. Reload the page and send it again.";

export type KeyRead = { ok: true; key: string | null } | { ok: false; message: string };

/** Reads a key from a form value or header: absent or empty means "no key"; anything else must be well formed. */
export function readIdempotencyKey(value: unknown): KeyRead {
  if (value === undefined || value === null || value === "") return { ok: true, key: null };
  if (typeof value !== "string" || !KEY_PATTERN.test(value)) return { ok: false, message: MALFORMED_KEY_MESSAGE };
  return { ok: true, key: value };
}

export type Claim = {
  /** The club's id, or NO_CLUB_SCOPE. */
  scope: string;
  key: string;
  /** Names the action, so that a key cannot be replayed against another one. */
  actionName: string;
  /** Null for a write with no user, and for an unlinked (anonymous) write. */
  actorUserId: string | null;
  /** Anonymous write: no actor kept, and the row's time is the start of its UTC day, so it links no one to it. */
  unlinked?: boolean;
};

type Reader = Pick<Db, "select">;

function storedAnswer<A>(db: Reader, claim: Claim): A | null {
  const row = db
    .select()
    .from(idempotentWrites)
    .where(and(eq(idempotentWrites.clubId, claim.scope), eq(idempotentWrites.key, claim.key)))
    .get();
  if (!row) return null;
  if (row.actionName !== claim.actionName || row.actorUserId !== claim.actorUserId) {
    throw new ActionError(KEY_REUSED_MESSAGE, { [IDEMPOTENCY_FIELD]: ["This key belongs to another submission."] }, "conflict");
  }
  return JSON.parse(row.answerJson) as A;
}

/**
 * Before any slow or outside work (file checks, a payment provider call): the stored answer when the
 * key was already used for this action by this person, else null. Throws ActionError("conflict")
 * when the key belongs to another action or person. The authoritative check is in `onceInTx`.
 */
export function peekIdempotentAnswer<A>(db: Db, claim: Claim | null): A | null {
  return claim ? storedAnswer<A>(db, claim) : null;
}

function startOfUtcDay(now: Date): Date {
  return new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate()));
}

/**
 * Runs `write` in one transaction that takes the write lock first (BEGIN IMMEDIATE), so two
 * submissions with one key, in this process or another, cannot both write: the second waits for
 * the lock, then finds the first one's row and returns its answer. `write` returns the answer to
 * keep (JSON-serialisable); if it throws, nothing is written and no key is stored.
 */
export function onceInTx<A>(db: Db, claim: Claim | null, write: (tx: Tx) => A): { answer: A; replayed: boolean } {
  const result = db.transaction(
    (tx) => {
      if (claim) {
        const earlier = storedAnswer<A>(tx, claim);
        if (earlier !== null) return { answer: earlier, replayed: true };
      }
      const answer = write(tx);
      if (claim) {
        const now = new Date();
        tx.insert(idempotentWrites)
          .values({
            clubId: claim.scope,
            key: claim.key,
            actionName: claim.actionName,
            actorUserId: claim.unlinked ? null : claim.actorUserId,
            answerJson: JSON.stringify(answer ?? null),
            createdAt: claim.unlinked ? startOfUtcDay(now) : now,
          })
          .run();
      }
      return { answer, replayed: false };
    },
    { behavior: "immediate" },
  );
  maybePrune(db);
  return result;
}

/** Deletes keys older than the TTL; returns how many went. */
export function pruneIdempotentWrites(db: Db, now: Date = new Date()): number {
  return db.delete(idempotentWrites).where(lt(idempotentWrites.createdAt, new Date(now.getTime() - IDEMPOTENCY_TTL_MS))).run().changes;
}

const PRUNE_EVERY_MS = 60 * 60 * 1000;
const pruneClock = globalThis as unknown as { __hangarlineIdempotencyPrunedAt?: number };

/** At most once an hour per process, after a keyed write has committed. */
function maybePrune(db: Db): void {
  const now = Date.now();
  if (pruneClock.__hangarlineIdempotencyPrunedAt && now - pruneClock.__hangarlineIdempotencyPrunedAt < PRUNE_EVERY_MS) return;
  pruneClock.__hangarlineIdempotencyPrunedAt = now;
  pruneIdempotentWrites(db, new Date(now));
}

/** The first answer of a JSON route handler, replayed as it was. */
export type StoredResponse = { status: number; body: unknown };

/**
 * For route handlers that write: reads the `Idempotency-Key` header (malformed → 400, nothing
 * written) and runs `write` once per (club, key). A replay answers the first status and body with
 * `Idempotent-Replayed: true`. `write` may throw ActionError for a refusal; the caller maps it as
 * before (a key used by someone else or for another call is an ActionError with code "conflict").
 */
export function idempotentJson(
  request: Request,
  claimBase: { scope: string; actionName: string; actorUserId: string | null },
  db: Db,
  write: (tx: Tx) => StoredResponse,
): Response {
  const read = readIdempotencyKey(request.headers.get(IDEMPOTENCY_HEADER) ?? undefined);
  if (!read.ok) {
    return NextResponse.json({ error: { code: "invalid", message: read.message, fields: { [IDEMPOTENCY_HEADER]: [read.message] } } }, { status: 400 });
  }
  const claim = read.key ? { ...claimBase, key: read.key } : null;
  const { answer, replayed } = onceInTx(db, claim, write);
  return NextResponse.json(answer.body, { status: answer.status, headers: replayed ? { "Idempotent-Replayed": "true" } : undefined });
}
