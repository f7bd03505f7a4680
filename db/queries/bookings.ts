import "server-only";
import { and, asc, eq, gt, gte, inArray, lt, ne, or, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/sqlite-core";
import type { Db, Tx } from "@/db/client";
import { aircraft, bookings, MAX_BOOKING_MS, users, type BookingRow } from "@/db/schema";
import { ACTIVE_BOOKING_STATUSES, type HeldWindow } from "@/lib/bookings/overlap";

// Reads and writes of bookings, always scoped by club_id. Overlap look-ups use the
// (club_id, aircraft_id | instructor | member, starts_at) indexes, bounded below by the longest
// window a booking may hold, so they read only the bookings near the wanted time.

type Handle = Db | Tx;

/**
 * The action wrapper opens a deferred transaction. Its first statement here is a write (that
 * changes nothing), so the transaction holds SQLite's write lock from the start — as
 * BEGIN IMMEDIATE would — and the overlap check below reads what no other writer can change
 * before the insert. The triggers of migration 0009 guard the same rule inside the database.
 */
export function claimBookingWriteLock(tx: Handle): void {
  tx.run(sql`UPDATE bookings SET id = id WHERE 0`);
}

export class BookingOverlapError extends Error {
  constructor(readonly kind: "aircraft" | "instructor") {
    super(`booking_overlap_${kind}`);
  }
}

/** Maps the triggers' RAISE(ABORT) to a typed error; anything else is rethrown. */
export function rethrowOverlap(error: unknown): never {
  const message = error instanceof Error ? error.message : String(error);
  if (message.includes("booking_overlap_aircraft")) throw new BookingOverlapError("aircraft");
  if (message.includes("booking_overlap_instructor")) throw new BookingOverlapError("instructor");
  throw error;
}

const active = inArray(bookings.status, [...ACTIVE_BOOKING_STATUSES]);

function near(startsAt: Date, endsAt: Date) {
  return and(lt(bookings.startsAt, endsAt), gt(bookings.startsAt, new Date(startsAt.getTime() - MAX_BOOKING_MS)), gt(bookings.endsAt, startsAt), active);
}

const heldColumns = { id: bookings.id, aircraftId: bookings.aircraftId, userId: bookings.userId, instructorId: bookings.instructorId, startsAt: bookings.startsAt, endsAt: bookings.endsAt, status: bookings.status };

/** Active bookings overlapping the window that hold the aircraft, the member or the instructor. */
export function listHeldNear(tx: Handle, clubId: string, wanted: { aircraftId: string; userId: string; instructorId: string | null; startsAt: Date; endsAt: Date }): HeldWindow[] {
  const people = [wanted.userId, ...(wanted.instructorId ? [wanted.instructorId] : [])];
  const window = near(wanted.startsAt, wanted.endsAt);
  const byAircraft = tx.select(heldColumns).from(bookings).where(and(eq(bookings.clubId, clubId), eq(bookings.aircraftId, wanted.aircraftId), window)).all();
  const asMember = tx.select(heldColumns).from(bookings).where(and(eq(bookings.clubId, clubId), inArray(bookings.userId, people), window)).all();
  const asInstructor = tx.select(heldColumns).from(bookings).where(and(eq(bookings.clubId, clubId), inArray(bookings.instructorId, people), window)).all();
  const seen = new Map<string, HeldWindow>();
  for (const b of [...byAircraft, ...asMember, ...asInstructor]) seen.set(b.id, b);
  return [...seen.values()];
}

export function insertBooking(tx: Tx, values: typeof bookings.$inferInsert): string {
  try {
    const [row] = tx.insert(bookings).values(values).returning({ id: bookings.id }).all();
    return row!.id;
  } catch (error) {
    rethrowOverlap(error);
  }
}

export function updateBookingRow(tx: Tx, clubId: string, bookingId: string, change: Partial<typeof bookings.$inferInsert>): void {
  try {
    tx.update(bookings).set(change).where(and(eq(bookings.clubId, clubId), eq(bookings.id, bookingId))).run();
  } catch (error) {
    rethrowOverlap(error);
  }
}

/** The weeks of one weekly series that start at or after `from`, earliest first (every status). */
export function listSeriesFrom(db: Handle, clubId: string, seriesId: string, from: Date): BookingRow[] {
  return db
    .select()
    .from(bookings)
    .where(and(eq(bookings.clubId, clubId), eq(bookings.seriesId, seriesId), gte(bookings.startsAt, from)))
    .orderBy(asc(bookings.startsAt))
    .all();
}

export function getBookingRow(db: Handle, clubId: string, bookingId: string): BookingRow | undefined {
  return db.select().from(bookings).where(and(eq(bookings.clubId, clubId), eq(bookings.id, bookingId))).get();
}

export type BookingView = BookingRow & { registration: string; aircraftName: string; typeGroup: string; memberName: string | null; memberEmail: string; instructorName: string | null };

const member = alias(users, "member");
const instructor = alias(users, "instructor");

function viewQuery(db: Handle) {
  return db
    .select({ b: bookings, registration: aircraft.registration, make: aircraft.make, model: aircraft.model, typeGroup: aircraft.typeGroup, memberName: member.name, memberEmail: member.email, instructorName: instructor.name })
    .from(bookings)
    .innerJoin(aircraft, and(eq(aircraft.id, bookings.aircraftId), eq(aircraft.clubId, bookings.clubId)))
    .innerJoin(member, eq(member.id, bookings.userId))
    .leftJoin(instructor, eq(instructor.id, bookings.instructorId));
}

type ViewRow = { b: BookingRow; registration: string; make: string; model: string; typeGroup: string; memberName: string | null; memberEmail: string; instructorName: string | null };

function toView(r: ViewRow): BookingView {
  return { ...r.b, registration: r.registration, aircraftName: `${r.make} ${r.model}`, typeGroup: r.typeGroup, memberName: r.memberName, memberEmail: r.memberEmail, instructorName: r.instructorName };
}

export function getBooking(db: Handle, clubId: string, bookingId: string): BookingView | undefined {
  const row = viewQuery(db).where(and(eq(bookings.clubId, clubId), eq(bookings.id, bookingId))).get();
  return row ? toView(row) : undefined;
}

/** Bookings touching [from, to), for the fleet views; cancelled ones only when asked. */
export function listBookingsInRange(db: Handle, clubId: string, from: Date, to: Date, opts: { includeCancelled?: boolean } = {}): BookingView[] {
  return viewQuery(db)
    .where(
      and(
        eq(bookings.clubId, clubId),
        lt(bookings.startsAt, to),
        gt(bookings.startsAt, new Date(from.getTime() - MAX_BOOKING_MS)),
        gt(bookings.endsAt, from),
        opts.includeCancelled ? undefined : ne(bookings.status, "cancelled"),
      ),
    )
    .orderBy(asc(bookings.startsAt))
    .all()
    .map(toView);
}

/** A person's bookings as the member or as the instructor, not cancelled, ending after `from`. */
export function listPersonBookings(db: Handle, clubId: string, userId: string, from: Date, limit = 500): BookingView[] {
  return viewQuery(db)
    .where(and(eq(bookings.clubId, clubId), or(eq(bookings.userId, userId), eq(bookings.instructorId, userId)), gt(bookings.endsAt, from), ne(bookings.status, "cancelled")))
    .orderBy(asc(bookings.startsAt))
    .limit(limit)
    .all()
    .map(toView);
}

/** Active bookings of the aircraft that start before `until` and have not ended by `from`. */
export function countActiveBookingsBetween(db: Handle, clubId: string, aircraftId: string, from: Date, until: Date): number {
  const row = db
    .select({ n: sql<number>`count(*)` })
    .from(bookings)
    .where(and(eq(bookings.clubId, clubId), eq(bookings.aircraftId, aircraftId), lt(bookings.startsAt, until), gt(bookings.startsAt, new Date(from.getTime() - MAX_BOOKING_MS)), gt(bookings.endsAt, from), active))
    .get();
  return Number(row?.n ?? 0);
}

export type SheetRow = { id: string; aircraftId: string; userId: string; instructorId: string | null; startsAt: Date; endsAt: Date; status: BookingRow["status"]; registration: string; memberName: string | null; memberEmail: string; instructorName: string | null };

/** The fleet sheet's narrow read: only what a block on the track shows. */
export function listSheetBookings(db: Handle, clubId: string, from: Date, to: Date): SheetRow[] {
  return sheetBookingsQuery(db, clubId, from, to).all();
}

/** The week view's query itself (its plan is checked: the (club_id, starts_at) index, no scan). */
export function sheetBookingsQuery(db: Handle, clubId: string, from: Date, to: Date) {
  return db
    .select({
      id: bookings.id, aircraftId: bookings.aircraftId, userId: bookings.userId, instructorId: bookings.instructorId, startsAt: bookings.startsAt, endsAt: bookings.endsAt, status: bookings.status,
      registration: aircraft.registration, memberName: member.name, memberEmail: member.email, instructorName: instructor.name,
    })
    .from(bookings)
    .innerJoin(aircraft, and(eq(aircraft.id, bookings.aircraftId), eq(aircraft.clubId, bookings.clubId)))
    .innerJoin(member, eq(member.id, bookings.userId))
    .leftJoin(instructor, eq(instructor.id, bookings.instructorId))
    .where(and(eq(bookings.clubId, clubId), lt(bookings.startsAt, to), gt(bookings.startsAt, new Date(from.getTime() - MAX_BOOKING_MS)), gt(bookings.endsAt, from), ne(bookings.status, "cancelled")))
    .orderBy(asc(bookings.startsAt));
}
