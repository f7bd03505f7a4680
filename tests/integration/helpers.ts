import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { clubs, emailOutbox, memberships, users } from "@/db/schema";
import { seedFoundation, type SeededFoundation } from "@/db/seed/foundation";
import type { ActionState } from "@/lib/actions/action-state";

type TestUser = { id: string; email: string; name: string | null; platformRole: "operator" | null };
const session = (globalThis as unknown as { __testSession: { user: TestUser | null } }).__testSession;

export function db() {
  return getDb();
}

let seeded: SeededFoundation | null = null;
/** The invented demo people and clubs (db/seed/scenario.ts), once per test file. */
export async function seedOnce(): Promise<SeededFoundation> {
  seeded ??= await seedFoundation(getDb());
  return seeded;
}

export function signInAs(email: string | null): TestUser | null {
  if (!email) {
    session.user = null;
    return null;
  }
  const u = getDb().select().from(users).where(eq(users.email, email)).get();
  if (!u) throw new Error(`No test user ${email}`);
  session.user = { id: u.id, email: u.email, name: u.name, platformRole: u.platformRole };
  return session.user;
}

export function form(fields: Record<string, string | string[] | Blob>): FormData {
  const fd = new FormData();
  for (const [k, v] of Object.entries(fields)) {
    if (Array.isArray(v)) for (const item of v) fd.append(`${k}[]`, item);
    else fd.append(k, v);
  }
  return fd;
}

export const EMPTY: ActionState = { ok: false, message: "", fieldErrors: {} };

export function clubBySlug(slug: string) {
  const c = getDb().select().from(clubs).where(eq(clubs.slug, slug)).get();
  if (!c) throw new Error(`No club ${slug}`);
  return c;
}

export function outboxFor(address: string) {
  return getDb().select().from(emailOutbox).where(eq(emailOutbox.toAddress, address)).all();
}

export function membershipOf(email: string, slug: string) {
  const u = getDb().select().from(users).where(eq(users.email, email)).get();
  const c = clubBySlug(slug);
  return getDb().select().from(memberships).where(eq(memberships.userId, u!.id)).all().find((m) => m.clubId === c.id);
}

/**
 * Where an action's answer sends the browser (its `redirectTo`: actions never redirect themselves),
 * or where a page redirected (a page still may).
 */
export async function expectRedirect(run: () => Promise<unknown>): Promise<string> {
  let result: unknown;
  try {
    result = await run();
  } catch (error) {
    if (error instanceof Error && error.message.startsWith("redirect:")) return error.message.slice("redirect:".length);
    throw error;
  }
  const to = (result as { redirectTo?: unknown } | null)?.redirectTo;
  if (typeof to === "string") return to;
  throw new Error(`Expected an answer with redirectTo, got ${JSON.stringify(result)}`);
}

/** The new squawk's id from a squawk report's answer (ok, quoting the description, with a refresh). */
export async function squawkIdOf(run: () => Promise<{ ok: boolean; message: string; data?: unknown; refresh?: boolean }>): Promise<string> {
  const state = await run();
  if (!state.ok) throw new Error(`Expected the squawk to be reported, got: ${state.message}`);
  if (!/^Squawk reported: “.+”\.( [^“”]+\.)?$/.test(state.message)) throw new Error(`The answer does not quote the squawk: ${state.message}`);
  const id = (state.data as { squawkId?: unknown } | undefined)?.squawkId;
  if (typeof id !== "string") throw new Error("The answer carries no squawk id");
  return id;
}
