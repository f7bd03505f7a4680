import "server-only";
import { and, asc, eq, gte, isNull, lt } from "drizzle-orm";
import { alias } from "drizzle-orm/sqlite-core";
import type { Db, Tx } from "@/db/client";
import { aircraft, bookingReminders, bookings, clubs, users } from "@/db/schema";

// The day-before reminders: reserved bookings starting in a window that have no reminder row for
// their current start time yet. The row and the outbox messages are written in one transaction.

type Handle = Db | Tx;

const member = alias(users, "member");
const instructor = alias(users, "instructor");

export type ReminderCandidate = {
  id: string;
  startsAt: Date;
  endsAt: Date;
  registration: string;
  memberName: string | null;
  memberEmail: string;
  instructorName: string | null;
  instructorEmail: string | null;
};

export function listReminderClubs(db: Handle) {
  return db.select({ id: clubs.id, slug: clubs.slug, name: clubs.name, timeZone: clubs.timeZone }).from(clubs).where(isNull(clubs.archivedAt)).orderBy(asc(clubs.slug)).all();
}

export function listBookingsToRemind(db: Handle, clubId: string, from: Date, to: Date): ReminderCandidate[] {
  return db
    .select({
      id: bookings.id, startsAt: bookings.startsAt, endsAt: bookings.endsAt, registration: aircraft.registration,
      memberName: member.name, memberEmail: member.email, instructorName: instructor.name, instructorEmail: instructor.email,
    })
    .from(bookings)
    .innerJoin(aircraft, and(eq(aircraft.id, bookings.aircraftId), eq(aircraft.clubId, bookings.clubId)))
    .innerJoin(member, eq(member.id, bookings.userId))
    .leftJoin(instructor, eq(instructor.id, bookings.instructorId))
    .leftJoin(bookingReminders, and(eq(bookingReminders.bookingId, bookings.id), eq(bookingReminders.startsAt, bookings.startsAt)))
    .where(and(eq(bookings.clubId, clubId), eq(bookings.status, "reserved"), gte(bookings.startsAt, from), lt(bookings.startsAt, to), isNull(bookingReminders.id)))
    .orderBy(asc(bookings.startsAt))
    .all();
}

export function recordReminder(tx: Tx, values: { clubId: string; bookingId: string; startsAt: Date; outboxId: string }): void {
  tx.insert(bookingReminders).values(values).onConflictDoNothing().run();
}
