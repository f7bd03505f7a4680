import "server-only";
import { and, desc, eq, isNull } from "drizzle-orm";
import { alias } from "drizzle-orm/sqlite-core";
import type { Db, Tx } from "@/db/client";
import { listBookingHolders } from "./bookings-holders";
import { aircraft, groundingNotices, memberships, users, type GroundingNoticeRow } from "@/db/schema";

type Handle = Db | Tx;

export function getNotice(db: Handle, clubId: string, noticeId: string): GroundingNoticeRow | undefined {
  return db.select().from(groundingNotices).where(and(eq(groundingNotices.clubId, clubId), eq(groundingNotices.id, noticeId))).get();
}

export type NoticeListRow = GroundingNoticeRow & { registration: string; issuedByName: string | null; liftedByName: string | null };

export function listNotices(db: Handle, clubId: string, opts: { aircraftId?: string; limit?: number } = {}): NoticeListRow[] {
  const issuer = alias(users, "issuer");
  const lifter = alias(users, "lifter");
  const rows = db
    .select({ notice: groundingNotices, registration: aircraft.registration, issuedByName: issuer.name, liftedByName: lifter.name })
    .from(groundingNotices)
    .innerJoin(aircraft, and(eq(aircraft.id, groundingNotices.aircraftId), eq(aircraft.clubId, groundingNotices.clubId)))
    .leftJoin(issuer, eq(issuer.id, groundingNotices.issuedById))
    .leftJoin(lifter, eq(lifter.id, groundingNotices.liftedById))
    .where(and(eq(groundingNotices.clubId, clubId), opts.aircraftId ? eq(groundingNotices.aircraftId, opts.aircraftId) : undefined))
    .orderBy(desc(groundingNotices.effectiveAt))
    .limit(opts.limit ?? 100)
    .all();
  return rows.map((r) => ({ ...r.notice, registration: r.registration, issuedByName: r.issuedByName, liftedByName: r.liftedByName }));
}

export type NoticeRecipient = { userId: string; email: string; name: string | null; why: "booking" | "member" };

/**
 * Hook for the bookings feature: the people holding bookings on this aircraft from the notice's
 * effective time on, who must hear first (db/queries/bookings-holders.ts).
 */
export function listBookingHoldersForGrounding(tx: Handle, clubId: string, aircraftId: string, effectiveAt: Date): NoticeRecipient[] {
  return listBookingHolders(tx, clubId, aircraftId, effectiveAt);
}

/** Booking holders first, then every other active member of the club, each person once. */
export function listGroundingNoticeRecipients(tx: Handle, clubId: string, aircraftId: string, effectiveAt: Date): NoticeRecipient[] {
  const first = listBookingHoldersForGrounding(tx, clubId, aircraftId, effectiveAt);
  const members = tx
    .select({ userId: users.id, email: users.email, name: users.name })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.clubId, clubId), eq(memberships.status, "active"), isNull(users.disabledAt)))
    .all();
  const seen = new Set(first.map((r) => r.userId));
  return [...first, ...members.filter((m) => !seen.has(m.userId)).map((m) => ({ ...m, why: "member" as const }))];
}
