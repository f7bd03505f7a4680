import "server-only";
import { notFound, redirect } from "next/navigation";
import { cache } from "react";
import { getDb, type Db } from "@/db/client";
import { getActiveMembership, getClubBySlug } from "@/db/queries/clubs";
import type { Club, Membership } from "@/db/schema";
import { LruCache } from "@/lib/cache/lru";
import { defineAbilityFor, type AppAbility } from "@/permissions";
import { getSessionUser, type SessionUser } from "./session";

/** Who, in which club, may do what: the first thing every page, handler and action resolves. */
export type ClubContext = { db: Db; user: SessionUser; club: Club; membership: Membership; ability: AppAbility };

export type ClubContextResult =
  | { ok: true; ctx: ClubContext }
  | { ok: false; code: "unauthenticated" | "not_found" };

// An ability depends only on the person and their set of roles, and building one (CASL compiles
// every rule) costs more than the rest of the lookup: built once per (person, roles in their order), kept in a
// bounded map. A role change makes another key; the old entry just ages out.
const abilities = new LruCache<string, AppAbility>({ maxEntries: 5_000, maxBytes: 5_000 });

export function abilityFor(userId: string, roles: Membership["roles"]): AppAbility {
  const key = `${userId}\u0000${roles.join(",")}`;
  let ability = abilities.get(key);
  if (!ability) {
    ability = defineAbilityFor({ userId, roles });
    abilities.set(key, ability, 1);
  }
  return ability;
}

/**
 * A club the person has no active role in is answered exactly like a club that does not exist.
 */
export async function resolveClubContext(slug: string): Promise<ClubContextResult> {
  const user = await getSessionUser();
  if (!user) return { ok: false, code: "unauthenticated" };
  const db = getDb();
  const club = getClubBySlug(db, slug);
  if (!club || club.archivedAt) return { ok: false, code: "not_found" };
  const membership = getActiveMembership(db, club.id, user.id);
  if (!membership) return { ok: false, code: "not_found" };
  const ability = abilityFor(user.id, membership.roles);
  return { ok: true, ctx: { db, user, club, membership, ability } };
}

/** For pages and layouts: redirects to sign-in or renders the 404 page. Cached per request. */
export const requireClubContext = cache(async (slug: string): Promise<ClubContext> => {
  const result = await resolveClubContext(slug);
  if (result.ok) return result.ctx;
  if (result.code === "unauthenticated") redirect(`/sign-in?callbackUrl=${encodeURIComponent(`/clubs/${slug}`)}`);
  notFound();
});
