import "server-only";
import { and, asc, eq, inArray, sql } from "drizzle-orm";
import type { Db } from "@/db/client";
import { clubs, memberships, operatorAssignments, type Club, type Membership } from "@/db/schema";
import { sessionOf } from "./club-snapshot";

// Every club request asks these: prepared once per connection and reused (building and
// preparing a statement costs more than running it).
function buildRequestQueries(db: Db) {
  return {
    clubBySlug: db.select().from(clubs).where(eq(clubs.slug, sql.placeholder("slug"))).prepare(),
    activeMembership: db
      .select()
      .from(memberships)
      .where(and(eq(memberships.clubId, sql.placeholder("clubId")), eq(memberships.userId, sql.placeholder("userId")), eq(memberships.status, "active")))
      .prepare(),
    clubsForUser: db
      .select({ slug: clubs.slug, name: clubs.name, roles: memberships.roles })
      .from(memberships)
      .innerJoin(clubs, eq(clubs.id, memberships.clubId))
      .where(and(eq(memberships.userId, sql.placeholder("userId")), eq(memberships.status, "active")))
      .orderBy(asc(clubs.name))
      .prepare(),
  };
}

const requestQueries = new WeakMap<object, ReturnType<typeof buildRequestQueries>>();

function queries(db: Db) {
  const session = sessionOf(db);
  let q = requestQueries.get(session);
  if (!q) requestQueries.set(session, (q = buildRequestQueries(db)));
  return q;
}

export function getClubBySlug(db: Db, slug: string): Club | undefined {
  return queries(db).clubBySlug.get({ slug });
}

export function getActiveMembership(db: Db, clubId: string, userId: string): Membership | undefined {
  return queries(db).activeMembership.get({ clubId, userId });
}

export type ClubLink = { slug: string; name: string; roles: Membership["roles"] };

/** Clubs where the person holds an active membership, for the club switcher. */
export function listClubsForUser(db: Db, userId: string): ClubLink[] {
  return queries(db).clubsForUser.all({ userId });
}

export function listOperatorClubIds(db: Db, userId: string): string[] {
  return db.select({ clubId: operatorAssignments.clubId }).from(operatorAssignments).where(eq(operatorAssignments.userId, userId)).all().map((r) => r.clubId);
}

export function listClubsByIds(db: Db, ids: string[]): Club[] {
  if (ids.length === 0) return [];
  return db.select().from(clubs).where(inArray(clubs.id, ids)).orderBy(asc(clubs.name)).all();
}
