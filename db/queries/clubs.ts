import "server-only";
import { and, asc, eq, inArray } from "drizzle-orm";
import type { Db } from "@/db/client";
import { clubs, memberships, operatorAssignments, type Club, type Membership } from "@/db/schema";

export function getClubBySlug(db: Db, slug: string): Club | undefined {
  return db.select().from(clubs).where(eq(clubs.slug, slug)).get();
}

export function getActiveMembership(db: Db, clubId: string, userId: string): Membership | undefined {
  return db
    .select()
    .from(memberships)
    .where(and(eq(memberships.clubId, clubId), eq(memberships.userId, userId), eq(memberships.status, "active")))
    .get();
}

export type ClubLink = { slug: string; name: string; roles: Membership["roles"] };

/** Clubs where the person holds an active membership, for the club switcher. */
export function listClubsForUser(db: Db, userId: string): ClubLink[] {
  return db
    .select({ slug: clubs.slug, name: clubs.name, roles: memberships.roles })
    .from(memberships)
    .innerJoin(clubs, eq(clubs.id, memberships.clubId))
    .where(and(eq(memberships.userId, userId), eq(memberships.status, "active")))
    .orderBy(asc(clubs.name))
    .all();
}

export function listOperatorClubIds(db: Db, userId: string): string[] {
  return db.select({ clubId: operatorAssignments.clubId }).from(operatorAssignments).where(eq(operatorAssignments.userId, userId)).all().map((r) => r.clubId);
}

export function listClubsByIds(db: Db, ids: string[]): Club[] {
  if (ids.length === 0) return [];
  return db.select().from(clubs).where(inArray(clubs.id, ids)).orderBy(asc(clubs.name)).all();
}
