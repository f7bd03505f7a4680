import "server-only";
import { and, asc, desc, eq, isNull } from "drizzle-orm";
import { alias } from "drizzle-orm/sqlite-core";
import type { Db, Tx } from "@/db/client";
import { aircraft, checkouts, memberships, outsideFlightEntries, users, type Checkout, type OutsideFlightEntry } from "@/db/schema";
import { normalizeTypeGroup } from "@/lib/safety/audience";

type Reader = Db | Tx;

export type CheckoutRow = Checkout & { memberName: string | null; memberEmail: string; instructorName: string | null; revokedByName: string | null };

const instructor = alias(users, "instructor");
const revoker = alias(users, "revoker");

export function listCheckouts(db: Reader, clubId: string, opts: { userId?: string; includeRevoked?: boolean } = {}): CheckoutRow[] {
  const rows = db
    .select({ c: checkouts, memberName: users.name, memberEmail: users.email, instructorName: instructor.name, revokedByName: revoker.name })
    .from(checkouts)
    .innerJoin(users, eq(users.id, checkouts.userId))
    .innerJoin(instructor, eq(instructor.id, checkouts.instructorId))
    .leftJoin(revoker, eq(revoker.id, checkouts.revokedById))
    .where(and(eq(checkouts.clubId, clubId), opts.userId ? eq(checkouts.userId, opts.userId) : undefined, opts.includeRevoked ? undefined : isNull(checkouts.revokedAt)))
    .orderBy(asc(users.name), asc(checkouts.typeGroup), desc(checkouts.checkedOutOn))
    .all();
  return rows.map((r) => ({ ...r.c, memberName: r.memberName, memberEmail: r.memberEmail, instructorName: r.instructorName, revokedByName: r.revokedByName }));
}

export function getCheckout(db: Reader, clubId: string, checkoutId: string): Checkout | undefined {
  return db.select().from(checkouts).where(and(eq(checkouts.clubId, clubId), eq(checkouts.id, checkoutId))).get();
}

export function findStandingCheckout(db: Reader, clubId: string, userId: string, typeGroup: string): Checkout | undefined {
  const wanted = normalizeTypeGroup(typeGroup);
  return db
    .select()
    .from(checkouts)
    .where(and(eq(checkouts.clubId, clubId), eq(checkouts.userId, userId), isNull(checkouts.revokedAt)))
    .all()
    .find((c) => normalizeTypeGroup(c.typeGroup) === wanted);
}

/** Type groups of the club's fleet (not retired aircraft), spelled as the fleet records spell them. */
export function listFleetTypeGroups(db: Reader, clubId: string): string[] {
  const rows = db.select({ typeGroup: aircraft.typeGroup }).from(aircraft).where(and(eq(aircraft.clubId, clubId), isNull(aircraft.retiredAt))).all();
  const byKey = new Map<string, string>();
  for (const r of rows) if (!byKey.has(normalizeTypeGroup(r.typeGroup))) byKey.set(normalizeTypeGroup(r.typeGroup), r.typeGroup);
  return [...byKey.values()].sort((a, b) => a.localeCompare(b));
}

export function listOutsideFlights(db: Reader, clubId: string, userId: string): OutsideFlightEntry[] {
  return db
    .select()
    .from(outsideFlightEntries)
    .where(and(eq(outsideFlightEntries.clubId, clubId), eq(outsideFlightEntries.userId, userId)))
    .orderBy(desc(outsideFlightEntries.flownOn), desc(outsideFlightEntries.createdAt))
    .all();
}

export function getActiveMember(db: Reader, clubId: string, userId: string) {
  return db
    .select({ userId: memberships.userId, roles: memberships.roles })
    .from(memberships)
    .where(and(eq(memberships.clubId, clubId), eq(memberships.userId, userId), eq(memberships.status, "active")))
    .get();
}
