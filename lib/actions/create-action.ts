import "server-only";
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { z } from "zod";
import { getDb, type Db, type Tx } from "@/db/client";
import { resolveClubContext, type ClubContext } from "@/lib/server/club-context";
import { getSessionUser, type SessionUser } from "@/lib/server/session";
import { allows, explainDenied, type AppAbility, type Permission as Grant } from "@/permissions";
import { ActionError, type ActionState } from "./action-state";
import { logError } from "@/lib/server/log";

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

type Outcome<R> = { message?: string; data?: R; redirectTo?: string; revalidate?: string[] };

function fail(message: string, fieldErrors: Record<string, string[]> = {}): ActionState<never> {
  return { ok: false, message, fieldErrors };
}

async function settle<R>(work: () => Promise<Outcome<R>>, successMessage: string): Promise<ActionState<R>> {
  let outcome: Outcome<R>;
  try {
    outcome = await work();
  } catch (error) {
    if (error instanceof ActionError) return fail(error.message, error.fieldErrors);
    logError("action", "unexpected failure", error);
    return fail("Something went wrong and nothing was saved. Try again; if it keeps failing, tell a club admin.");
  }
  // Framework control flow stays outside the try/catch above.
  for (const path of outcome.revalidate ?? []) revalidatePath(path);
  if (outcome.redirectTo) redirect(outcome.redirectTo);
  return { ok: true, message: outcome.message ?? successMessage, fieldErrors: {}, data: outcome.data };
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
}) {
  return async (_prev: ActionState, formData: FormData): Promise<ActionState<R>> => {
    const raw = formDataToObject(formData);
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
    return settle(async () => {
      const prepared = (def.prepare ? await def.prepare(ctx, input) : undefined) as P;
      const outcome = ctx.db.transaction((tx) => def.run(tx, ctx, input, prepared)) ?? {};
      def.after?.(ctx, input);
      return outcome;
    }, def.success);
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
}) {
  return async (_prev: ActionState, formData: FormData): Promise<ActionState<R>> => {
    const user = await getSessionUser();
    if (def.requireUser && !user) return fail("Your session has ended. Sign in again.");
    const parsed = def.schema.safeParse(formDataToObject(formData));
    if (!parsed.success) return fail("Some fields need attention; nothing was saved.", zodFieldErrors(parsed.error));
    const input = parsed.data as z.output<S>;
    const db = getDb();
    if (def.permission && !def.permission(user, input, db)) return fail("You do not have permission to do this.");
    return settle(async () => {
      const prepared = (def.prepare ? await def.prepare(user, input, db) : undefined) as P;
      const outcome = db.transaction((tx) => def.run(tx, user, input, prepared)) ?? {};
      def.after?.();
      return outcome;
    }, def.success);
  };
}
