import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import type { Db } from "@/db/client";
import { aircraft, invitations, memberships, users } from "@/db/schema";
import { describeAuditEntry, type DescribedAuditEntry } from "@/lib/audit/describe";
import { listAudit } from "./members";

export type AuditEntryView = DescribedAuditEntry & { id: string; action: string };

function collectIds(value: unknown, into: Set<string>, depth = 0): void {
  if (depth > 2 || value === null || value === undefined) return;
  if (typeof value === "string") {
    if (/^[A-Za-z0-9_-]{8,64}$/.test(value)) into.add(value);
  } else if (Array.isArray(value)) {
    for (const v of value) collectIds(v, into, depth + 1);
  } else if (typeof value === "object") {
    for (const v of Object.values(value as Record<string, unknown>)) collectIds(v, into, depth + 1);
  }
}

/**
 * The club's audit log, newest first, each entry in words in the club's time zone. Ids in an entry
 * are named when they are this club's members (membership or person), aircraft or invitations;
 * every lookup is limited to this club.
 */
export function listAuditEntries(db: Db, club: { id: string; timeZone: string; currency: string }, limit = 200): AuditEntryView[] {
  const rows = listAudit(db, club.id, limit);
  const ids = new Set<string>();
  for (const r of rows) {
    ids.add(r.subjectId);
    collectIds(r.before, ids);
    collectIds(r.after, ids);
  }
  const list = [...ids];
  const names = new Map<string, string>();
  for (let i = 0; i < list.length; i += 500) {
    const chunk = list.slice(i, i + 500);
    for (const m of db
      .select({ id: memberships.id, userId: memberships.userId, name: users.name, email: users.email })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(and(eq(memberships.clubId, club.id), inArray(memberships.id, chunk)))
      .all()) names.set(m.id, m.name ?? m.email);
    for (const m of db
      .select({ userId: memberships.userId, name: users.name, email: users.email })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(and(eq(memberships.clubId, club.id), inArray(memberships.userId, chunk)))
      .all()) names.set(m.userId, m.name ?? m.email);
    for (const a of db.select({ id: aircraft.id, registration: aircraft.registration }).from(aircraft).where(and(eq(aircraft.clubId, club.id), inArray(aircraft.id, chunk))).all()) names.set(a.id, a.registration);
    for (const inv of db.select({ id: invitations.id, email: invitations.email }).from(invitations).where(and(eq(invitations.clubId, club.id), inArray(invitations.id, chunk))).all()) names.set(inv.id, `invitation for ${inv.email}`);
  }
  return rows.map((r) => ({
    id: r.id,
    action: r.action,
    ...describeAuditEntry({ ...r, actorName: r.actorName ?? r.actorEmail }, { timeZone: club.timeZone, currency: club.currency, names }),
  }));
}
