import "server-only";
import { notFound, redirect } from "next/navigation";
import { allows, canUseOperatorConsole, explainDenied, type Permission } from "@/permissions";
import { requireClubContext, type ClubContext } from "./club-context";
import { getSessionUser, type SessionUser } from "./session";

// Authorization where the data is read. Every page, route handler and server action checks its
// own permission here (a layout renders beside its page and can be skipped by an RSC request, so
// a layout check is a courtesy, never the guard). See permissions/authorize.ts for the three
// questions: [action, Type] (refused for conditional subjects), [action, Type, "all"] and
// [action, Type, { ...record }].

export type { Permission } from "@/permissions";

/** True when every permission holds (an empty list holds). */
export function authorized(ctx: Pick<ClubContext, "ability">, ...permissions: Permission[]): boolean {
  return permissions.every((p) => allows(ctx.ability, p));
}

/** True when at least one permission holds. */
export function authorizedAny(ctx: Pick<ClubContext, "ability">, ...permissions: Permission[]): boolean {
  return permissions.some((p) => allows(ctx.ability, p));
}

/** Pages: the 404 page unless every permission holds (a record one may not see is answered like a missing one). */
export function requirePermission(ctx: Pick<ClubContext, "ability">, ...permissions: Permission[]): void {
  if (!authorized(ctx, ...permissions)) notFound();
}

/** A permission, or one built from the context (e.g. the signed-in person's own account). */
export type PagePermission = Permission | ((ctx: ClubContext) => Permission);

const resolve = (ctx: ClubContext, p: PagePermission): Permission => (typeof p === "function" ? p(ctx) : p);

/**
 * Pages: session → club → membership → ability → these permissions, or sign-in / the 404 page.
 * With no permission at all the page is open to every person with a role in the club (say so
 * beside the call). A record that depends on the URL is checked once it is read:
 * `requirePermission(ctx, ["read", "Account", { userId }])`.
 */
export async function authorizePage(slug: string, ...permissions: PagePermission[]): Promise<ClubContext> {
  const ctx = await requireClubContext(slug);
  requirePermission(ctx, ...permissions.map((p) => resolve(ctx, p)));
  return ctx;
}

/** Pages where any one of several permissions lets the person in. */
export async function authorizePageAny(slug: string, ...permissions: PagePermission[]): Promise<ClubContext> {
  const ctx = await requireClubContext(slug);
  if (!authorizedAny(ctx, ...permissions.map((p) => resolve(ctx, p)))) notFound();
  return ctx;
}

/** The signed-in person's own record of a type with conditions (their account, their currency). */
export function ownRecord(action: Permission[0], type: Permission[1]): (ctx: ClubContext) => Permission {
  return (ctx) => [action, type, { userId: ctx.user.id }];
}

/** Words for a refused type-level permission (buttons, API 403 bodies). */
export function deniedReason(permission: Permission): string {
  return explainDenied(permission[0], permission[1]);
}

/**
 * Pages about the signed-in person alone, outside any club (their list of clubs): the session
 * is the guard, checked in the page itself. Nobody signed in goes to sign-in and comes back to
 * `callbackUrl` (a path of this site).
 */
export async function authorizeSignedInPage(callbackUrl: string): Promise<SessionUser> {
  const user = await getSessionUser();
  if (!user) redirect(`/sign-in?callbackUrl=${encodeURIComponent(callbackUrl)}`);
  return user;
}

/**
 * Operator console pages: the signed-in operator, checked in the page itself (the operator
 * layout's check is a courtesy). Anyone else gets the 404 page; nobody signed in, sign-in.
 */
export async function authorizeOperatorPage(): Promise<SessionUser> {
  const user = await getSessionUser();
  if (!user) redirect("/sign-in?callbackUrl=/operator");
  if (!canUseOperatorConsole({ userId: user.id, isOperator: user.platformRole === "operator", clubIds: [] })) notFound();
  return user;
}
