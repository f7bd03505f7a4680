import "server-only";
import { notFound } from "next/navigation";
import { allows, explainDenied, type Permission } from "@/permissions";
import { requireClubContext, type ClubContext } from "./club-context";

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

/** Pages: session → club → membership → ability → these permissions, or sign-in / the 404 page. */
export async function authorizePage(slug: string, ...permissions: Permission[]): Promise<ClubContext> {
  const ctx = await requireClubContext(slug);
  requirePermission(ctx, ...permissions);
  return ctx;
}

/** Pages where any one of several permissions lets the person in. */
export async function authorizePageAny(slug: string, ...permissions: Permission[]): Promise<ClubContext> {
  const ctx = await requireClubContext(slug);
  if (!authorizedAny(ctx, ...permissions)) notFound();
  return ctx;
}

/** Words for a refused type-level permission (buttons, API 403 bodies). */
export function deniedReason(permission: Permission): string {
  return explainDenied(permission[0], permission[1]);
}
