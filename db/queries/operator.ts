import "server-only";
import { and, count, eq, inArray } from "drizzle-orm";
import type { Db } from "@/db/client";
import { clubs, memberships } from "@/db/schema";
import { isoDateInTimeZone } from "@/lib/dates";
import type { AircraftStatus } from "@/lib/airworthiness";
import { listClubsByIds, listOperatorClubIds } from "./clubs";
import { getFlightLine } from "./fleet-status";
import { ageingByMember } from "./money-member-accounts";

export type ClubSummary = {
  id: string; slug: string; name: string; timeZone: string; currency: string; locale: string; unitSystem: string; activeMembers: number; admins: number;
  fleet: Record<AircraftStatus, number>;
  receivables: { totalMinor: number; over30Minor: number; over90Minor: number };
};

/**
 * Counts and totals only: an operator sees no member-level detail (no names, addresses, balances
 * of a person, bookings or reports), and only for the clubs assigned to them. Anyone who is not
 * an operator gets nothing.
 */
export function listOperatorClubSummaries(db: Db, operator: { id: string; platformRole: "operator" | null }): ClubSummary[] {
  if (operator.platformRole !== "operator") return [];
  const ids = listOperatorClubIds(db, operator.id);
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
  return list.map((c) => {
    const fleet: Record<AircraftStatus, number> = { flyable: 0, limited: 0, grounded: 0, unknown: 0 };
    for (const entry of getFlightLine(db, c).entries) fleet[entry.status] += 1;
    const { totals } = ageingByMember(db, c.id, isoDateInTimeZone(new Date(), c.timeZone));
    return {
      id: c.id, slug: c.slug, name: c.name, timeZone: c.timeZone, currency: c.currency, locale: c.locale, unitSystem: c.unitSystem,
      activeMembers: members.find((m) => m.clubId === c.id)?.n ?? 0,
      admins: adminRows.filter((m) => m.clubId === c.id && m.roles.includes("admin")).length,
      fleet,
      receivables: { totalMinor: totals.totalMinor, over30Minor: totals.days31To60 + totals.days61To90 + totals.over90, over90Minor: totals.over90 },
    };
  });
}

export function clubExists(db: Db, id: string): boolean {
  return Boolean(db.select({ id: clubs.id }).from(clubs).where(eq(clubs.id, id)).get());
}
