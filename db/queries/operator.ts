import "server-only";
import { and, count, eq, inArray } from "drizzle-orm";
import type { Db } from "@/db/client";
import { clubs, memberships } from "@/db/schema";
import { listClubsByIds, listOperatorClubIds } from "./clubs";

export type ClubSummary = { id: string; slug: string; name: string; timeZone: string; currency: string; unitSystem: string; activeMembers: number; admins: number };

/** Counts only: an operator sees no member-level detail. */
export function listOperatorClubSummaries(db: Db, operatorId: string): ClubSummary[] {
  const ids = listOperatorClubIds(db, operatorId);
  const list = listClubsByIds(db, ids);
  if (list.length === 0) return [];
  const members = db
    .select({ clubId: memberships.clubId, n: count() })
    .from(memberships)
    .where(and(inArray(memberships.clubId, ids), eq(memberships.status, "active")))
    .groupBy(memberships.clubId)
    .all();
  const adminRows = db
    .select({ clubId: memberships.clubId, roles: memberships.roles })
    .from(memberships)
    .where(and(inArray(memberships.clubId, ids), eq(memberships.status, "active")))
    .all();
  return list.map((c) => ({
    id: c.id, slug: c.slug, name: c.name, timeZone: c.timeZone, currency: c.currency, unitSystem: c.unitSystem,
    activeMembers: members.find((m) => m.clubId === c.id)?.n ?? 0,
    admins: adminRows.filter((m) => m.clubId === c.id && m.roles.includes("admin")).length,
  }));
}

export function clubExists(db: Db, id: string): boolean {
  return Boolean(db.select({ id: clubs.id }).from(clubs).where(eq(clubs.id, id)).get());
}
