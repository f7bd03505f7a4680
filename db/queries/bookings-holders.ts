import "server-only";
import { and, eq, gt, inArray, isNull } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { bookings, users } from "@/db/schema";
import { ACTIVE_BOOKING_STATUSES } from "@/lib/bookings/overlap";
import type { NoticeRecipient } from "./fleet-notices";

type Handle = Db | Tx;

/**
 * The people holding bookings on an aircraft that end after `from` (members and instructors,
 * each once): they must hear first when the aircraft is grounded. This is the body for the
 * fleet feature's hook `listBookingHoldersForGrounding` (db/queries/fleet-notices.ts).
 */
export function listBookingHolders(tx: Handle, clubId: string, aircraftId: string, from: Date): NoticeRecipient[] {
  const rows = tx
    .select({ userId: bookings.userId, instructorId: bookings.instructorId })
    .from(bookings)
    .where(and(eq(bookings.clubId, clubId), eq(bookings.aircraftId, aircraftId), gt(bookings.endsAt, from), inArray(bookings.status, [...ACTIVE_BOOKING_STATUSES])))
    .all();
  const ids = [...new Set(rows.flatMap((r) => [r.userId, r.instructorId]).filter((x): x is string => Boolean(x)))];
  if (ids.length === 0) return [];
  return tx
    .select({ userId: users.id, email: users.email, name: users.name })
    .from(users)
    .where(and(inArray(users.id, ids), isNull(users.disabledAt)))
    .all()
    .map((u) => ({ ...u, why: "booking" as const }));
}
