import "server-only";
import { and, asc, desc, eq, inArray, isNull, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/sqlite-core";
import type { Db, Tx } from "@/db/client";
import { aircraft, emailOutbox, memberships, squawkEvents, squawks, users, type SquawkRow } from "@/db/schema";
import { listBookingHolders } from "./bookings-holders";

type Handle = Db | Tx;

export function getSquawk(db: Handle, clubId: string, squawkId: string): SquawkRow | undefined {
  return db.select().from(squawks).where(and(eq(squawks.clubId, clubId), eq(squawks.id, squawkId))).get();
}

export type SquawkListRow = SquawkRow & { registration: string; reportedByName: string | null };

export function listSquawks(db: Handle, clubId: string, opts: { aircraftId?: string; status?: "open" | "closed"; limit?: number } = {}): SquawkListRow[] {
  const rows = db
    .select({ squawk: squawks, registration: aircraft.registration, reportedByName: users.name })
    .from(squawks)
    .innerJoin(aircraft, and(eq(aircraft.id, squawks.aircraftId), eq(aircraft.clubId, squawks.clubId)))
    .leftJoin(users, eq(users.id, squawks.reportedById))
    .where(
      and(
        eq(squawks.clubId, clubId),
        opts.aircraftId ? eq(squawks.aircraftId, opts.aircraftId) : undefined,
        opts.status ? eq(squawks.status, opts.status) : undefined,
      ),
    )
    .orderBy(desc(squawks.createdAt))
    .limit(opts.limit ?? 200)
    .all();
  return rows.map((r) => ({ ...r.squawk, registration: r.registration, reportedByName: r.reportedByName }));
}

export type SquawkEventView = { id: string; squawkId: string; kind: "reported" | "triaged" | "closed"; fromTriage: string | null; toTriage: string | null; note: string | null; actorName: string | null; at: Date };

export function listSquawkEvents(db: Handle, clubId: string, squawkIds: string[]): SquawkEventView[] {
  if (squawkIds.length === 0) return [];
  const actor = alias(users, "actor");
  return db
    .select({ id: squawkEvents.id, squawkId: squawkEvents.squawkId, kind: squawkEvents.kind, fromTriage: squawkEvents.fromTriage, toTriage: squawkEvents.toTriage, note: squawkEvents.note, actorName: actor.name, at: squawkEvents.createdAt })
    .from(squawkEvents)
    .leftJoin(actor, eq(actor.id, squawkEvents.actorId))
    .where(and(eq(squawkEvents.clubId, clubId), inArray(squawkEvents.squawkId, squawkIds)))
    .orderBy(asc(squawkEvents.createdAt))
    .all();
}

export function recordSquawkEvent(tx: Tx, event: { clubId: string; squawkId: string; kind: "reported" | "triaged" | "closed"; actorId: string; fromTriage?: string | null; toTriage?: string | null; note?: string | null }): void {
  tx.insert(squawkEvents)
    .values({ clubId: event.clubId, squawkId: event.squawkId, kind: event.kind, actorId: event.actorId, fromTriage: event.fromTriage ?? null, toTriage: event.toTriage ?? null, note: event.note ?? null })
    .run();
}

export type NewSquawk = {
  clubId: string;
  aircraftId: string;
  reportedById: string;
  description: string;
  foundDuring: "preflight" | "flight" | "postflight" | "maintenance";
  suspectedGrounding?: boolean;
  /** The flight it was reported with, when it came from the flight log or a flight sheet. */
  flightId?: string | null;
  /** The "reported" event's note: where it was reported. */
  note?: string | null;
};

/**
 * The one write path of a squawk: the row and its "reported" event, in the caller's
 * transaction. The squawk report, the preflight (a finding) and a flight's entry all call it.
 */
export function createSquawk(tx: Tx, s: NewSquawk): string {
  const [row] = tx
    .insert(squawks)
    .values({ clubId: s.clubId, aircraftId: s.aircraftId, flightId: s.flightId ?? null, reportedById: s.reportedById, description: s.description, foundDuring: s.foundDuring, suspectedGrounding: s.suspectedGrounding ?? false })
    .returning({ id: squawks.id })
    .all();
  recordSquawkEvent(tx, { clubId: s.clubId, squawkId: row!.id, kind: "reported", actorId: s.reportedById, toTriage: "untriaged", note: s.note ?? null });
  return row!.id;
}

export type SquawkAlertRecipient = { userId: string; email: string; name: string | null; why: "maintenance" | "booking" };

/**
 * Who hears at once of a squawk reported as possibly unsafe: the club's maintenance people
 * (maintenance officers and mechanics, who triage squawks), then the holders of bookings on
 * the aircraft that end after `from`; each person once, the reporter left out.
 */
export function listSquawkAlertRecipients(tx: Handle, clubId: string, aircraftId: string, from: Date, reporterId: string): SquawkAlertRecipient[] {
  const maintenance = tx
    .select({ userId: users.id, email: users.email, name: users.name, roles: memberships.roles })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.clubId, clubId), eq(memberships.status, "active"), isNull(users.disabledAt)))
    .all()
    .filter((m) => m.roles.includes("maintenance") || m.roles.includes("mechanic"))
    .map(({ roles: _roles, ...m }) => ({ ...m, why: "maintenance" as const }));
  const holders = listBookingHolders(tx, clubId, aircraftId, from).map((h) => ({ userId: h.userId, email: h.email, name: h.name, why: "booking" as const }));
  const seen = new Set<string>([reporterId]);
  const out: SquawkAlertRecipient[] = [];
  for (const r of [...maintenance, ...holders]) {
    if (seen.has(r.userId)) continue;
    seen.add(r.userId);
    out.push(r);
  }
  return out;
}

/** How many "possibly unsafe" alerts one squawk report queued, by why each person heard. */
export function countSquawkAlerts(db: Handle, clubId: string, squawkId: string): { maintenance: number; booking: number } {
  const rows = db
    .select({ because: sql<string>`json_extract(${emailOutbox.payload}, '$.because')`, n: sql<number>`count(*)` })
    .from(emailOutbox)
    .where(and(eq(emailOutbox.clubId, clubId), eq(emailOutbox.template, "squawk-alert"), sql`json_extract(${emailOutbox.payload}, '$.squawkId') = ${squawkId}`))
    .groupBy(sql`json_extract(${emailOutbox.payload}, '$.because')`)
    .all();
  return {
    maintenance: rows.find((r) => r.because === "maintenance")?.n ?? 0,
    booking: rows.find((r) => r.because === "booking")?.n ?? 0,
  };
}
