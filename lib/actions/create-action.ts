import "server-only";
import { z } from "zod";
import { getDb, type Db, type Tx } from "@/db/client";
import { resolveClubContext, type ClubContext } from "@/lib/server/club-context";
import { getSessionUser, type SessionUser } from "@/lib/server/session";
import { allows, explainDenied, type AppAbility, type Permission as Grant } from "@/permissions";
import { ActionError, type ActionState } from "./action-state";
import { logError } from "@/lib/server/log";
import { IDEMPOTENCY_FIELD, NO_CLUB_SCOPE, onceInTx, peekIdempotentAnswer, readIdempotencyKey, type Claim, type KeyRead } from "@/lib/server/idempotency";

type Schema = z.ZodType<unknown, unknown>;

/** Form keys that would reach an object's prototype rather than a field; no schema has them. */
const PROTOTYPE_KEYS = new Set(["__proto__", "constructor", "prototype"]);

export function formDataToObject(formData: FormData): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const key of new Set(formData.keys())) {
    const all = formData.getAll(key);
    const k = key.endsWith("[]") ? key.slice(0, -2) : key;
    if (PROTOTYPE_KEYS.has(k)) continue;
    out[k] = key.endsWith("[]") || all.length > 1 ? all : all[0];
  }
  return out;
}

export function zodFieldErrors(error: z.ZodError): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join(".") : "_form";
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

/**
 * What `run` returns. Never revalidate or redirect here: `redirectTo` and `refresh` ride on the answer
 * and the form's hook (components/ui/use-form-action.ts) follows them after showing it.
 */
type Outcome<R> = { message?: string; data?: R; redirectTo?: string; refresh?: boolean };

function fail(message: string, fieldErrors: Record<string, string[]> = {}, data?: unknown): ActionState<never> {
  return data === undefined ? { ok: false, message, fieldErrors } : { ok: false, message, fieldErrors, data: data as never };
}

async function settle<R>(work: () => Promise<Outcome<R>>, successMessage: string): Promise<ActionState<R>> {
  let outcome: Outcome<R>;
  try {
    outcome = await work();
  } catch (error) {
    if (error instanceof ActionError) return fail(error.message, error.fieldErrors, error.data);
    logError("action", "unexpected failure", error);
    return fail("Something went wrong and nothing was saved. Try again; if it keeps failing, tell a club admin.");
  }
  // The answer, with its follow-up for the browser; nothing here revalidates or redirects, so the
  // response carries only this answer and the form shows it at once (DEVELOPERS.md "Forms and their answers").
  // An answer stored by an earlier version (idempotent replay) may still name paths to revalidate.
  const legacyRevalidate = (outcome as { revalidate?: unknown }).revalidate;
  const refresh = outcome.refresh === true || (Array.isArray(legacyRevalidate) && legacyRevalidate.length > 0);
  const state: ActionState<R> = { ok: true, message: outcome.message ?? successMessage, fieldErrors: {}, data: outcome.data };
  if (outcome.redirectTo) state.redirectTo = outcome.redirectTo;
  else if (refresh) state.refresh = true;
  return state;
}

/**
 * A fixed permission through the one helper ([action, Type] — refused for conditional subjects —
 * or [action, Type, "all"]), or a function of the input that asks the helper about the record
 * (canOn / canAll / can from "@/permissions"). A check that needs the stored record (a booking's
 * owner, a report's reporter) is repeated inside `run` against the row read in the transaction.
 */
type Permission<I> = Grant | ((ability: AppAbility, input: I, ctx: ClubContext) => boolean);

/**
 * The one way a club server action is built: session → club (slug from the form's "club" field)
 * → membership → ability → zod → one transaction (with its audit rows) → ActionState.
 */
export function clubAction<S extends Schema, P = undefined, R = unknown>(def: {
  schema: S;
  permission: Permission<z.output<S>>;
  /** Async work before the transaction (hashing, file checks). Must not write club data. */
  prepare?: (ctx: ClubContext, input: z.output<S>) => Promise<P>;
  run: (tx: Tx, ctx: ClubContext, input: z.output<S>, prepared: P) => Outcome<R> | void;
  /** After commit: nudges (outbox), never data changes. */
  after?: (ctx: ClubContext, input: z.output<S>) => void;
  success: string;
  /** Names the action for its idempotency keys; derived from permission, success and fields when absent. */
  name?: string;
  /** True for a write that must not be linked to its author (an anonymous report): its key row keeps no actor. */
  anonymous?: (input: z.output<S>) => boolean;
  /** Undoes `prepare`'s side effects (stored files) when a racing duplicate turns out to be a replay. */
  discard?: (prepared: P) => void;
}) {
  const name = def.name ?? actionName(def.permission, def.success, def.schema);
  return async (_prev: ActionState, formData: FormData): Promise<ActionState<R>> => {
    const raw = formDataToObject(formData);
    const key = takeIdempotencyKey(raw);
    if (!key.ok) return fail(key.message, { [IDEMPOTENCY_FIELD]: [key.message] });
    const slug = typeof raw.club === "string" ? raw.club : "";
    const resolved = await resolveClubContext(slug);
    if (!resolved.ok) {
      return fail(resolved.code === "unauthenticated" ? "Your session has ended. Sign in again." : "That club was not found.");
    }
    const ctx = resolved.ctx;
    const parsed = def.schema.safeParse(raw);
    if (!parsed.success) return fail("Some fields need attention; nothing was saved.", zodFieldErrors(parsed.error));
    const input = parsed.data as z.output<S>;
    const allowed = typeof def.permission === "function" ? def.permission(ctx.ability, input, ctx) : allows(ctx.ability, def.permission);
    if (!allowed) {
      return fail(typeof def.permission === "function" ? "You do not have permission to do this." : explainDenied(def.permission[0], def.permission[1]));
    }
    const unlinked = def.anonymous?.(input) ?? false;
    const claim = claimFor(key, ctx.club.id, name, unlinked ? null : ctx.user.id, unlinked);
    return settle(
      () =>
        writeOnce(ctx.db, claim, def.success, {
          prepare: async () => (def.prepare ? await def.prepare(ctx, input) : undefined) as P,
          run: (tx, prepared) => def.run(tx, ctx, input, prepared),
          after: () => def.after?.(ctx, input),
          discard: def.discard,
        }),
      def.success,
    );
  };
}

/** Actions outside any club (operator console, invitation accept). */
export function userAction<S extends Schema, P = undefined, R = unknown>(def: {
  schema: S;
  requireUser: boolean;
  permission?: (user: SessionUser | null, input: z.output<S>, db: Db) => boolean;
  prepare?: (user: SessionUser | null, input: z.output<S>, db: Db) => Promise<P>;
  run: (tx: Tx, user: SessionUser | null, input: z.output<S>, prepared: P) => Outcome<R> | void;
  after?: () => void;
  success: string;
  /** Names the action for its idempotency keys; derived from success and fields when absent. */
  name?: string;
}) {
  const name = def.name ?? actionName(null, def.success, def.schema);
  return async (_prev: ActionState, formData: FormData): Promise<ActionState<R>> => {
    const user = await getSessionUser();
    if (def.requireUser && !user) return fail("Your session has ended. Sign in again.");
    const raw = formDataToObject(formData);
    const key = takeIdempotencyKey(raw);
    if (!key.ok) return fail(key.message, { [IDEMPOTENCY_FIELD]: [key.message] });
    const parsed = def.schema.safeParse(raw);
    if (!parsed.success) return fail("Some fields need attention; nothing was saved.", zodFieldErrors(parsed.error));
    const input = parsed.data as z.output<S>;
    const db = getDb();
    if (def.permission && !def.permission(user, input, db)) return fail("You do not have permission to do this.");
    const claim = claimFor(key, NO_CLUB_SCOPE, name, user?.id ?? null, false);
    return settle(
      () =>
        writeOnce(db, claim, def.success, {
          prepare: async () => (def.prepare ? await def.prepare(user, input, db) : undefined) as P,
          run: (tx, prepared) => def.run(tx, user, input, prepared),
          after: () => def.after?.(),
        }),
      def.success,
    );
  };
}

// ---------------------------------------------------------------------------------------------
// Exactly once (lib/server/idempotency.ts). Kept apart from the answer handling above: the
// wrapper only swaps its "prepare → transaction → after" step for writeOnce.

/** Takes the form's idempotency key out of the fields (no schema sees it) and checks its shape. */
function takeIdempotencyKey(raw: Record<string, unknown>): KeyRead {
  const value = raw[IDEMPOTENCY_FIELD];
  delete raw[IDEMPOTENCY_FIELD];
  return readIdempotencyKey(value);
}

function claimFor(key: KeyRead, scope: string, actionName: string, actorUserId: string | null, unlinked: boolean): Claim | null {
  return key.ok && key.key ? { scope, key: key.key, actionName, actorUserId, unlinked } : null;
}

/** A stable name per action (the same in every process): its permission, success text and field names. */
function actionName(permission: unknown, success: string, schema: Schema): string {
  const grant = Array.isArray(permission) ? permission.join(" ") : permission ? "custom" : "user";
  const shape = (schema as { shape?: Record<string, unknown> }).shape;
  const fields = shape && typeof shape === "object" ? Object.keys(shape).sort().join(",") : "";
  return `${grant}|${success}|${fields}`;
}

/**
 * prepare → one transaction (write lock first) → after, once per key: a key already used for this
 * action by this person returns the first answer before any prepare work (no second upload check or
 * payment session), and again inside the transaction for a duplicate that raced this one (whose
 * prepared files are then discarded); `after` runs only for the write that happened. Without a key, the same steps run as they always did.
 */
async function writeOnce<P, R>(
  db: Db,
  claim: Claim | null,
  successMessage: string,
  steps: { prepare: () => Promise<P>; run: (tx: Tx, prepared: P) => Outcome<R> | void; after: () => void; discard?: (prepared: P) => void },
): Promise<Outcome<R>> {
  const earlier = peekIdempotentAnswer<Outcome<R>>(db, claim);
  if (earlier) return earlier;
  const prepared = await steps.prepare();
  const { answer, replayed } = onceInTx(db, claim, (tx) => {
    const outcome = steps.run(tx, prepared) ?? {};
    return { ...outcome, message: outcome.message ?? successMessage };
  });
  if (replayed) steps.discard?.(prepared);
  else steps.after();
  return answer;
}
