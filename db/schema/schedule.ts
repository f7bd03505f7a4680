import { sql } from "drizzle-orm";
import { check, index, integer, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import { users } from "./auth";
import { clubs } from "./clubs";
import { id, timestamps } from "./columns";
import { aircraft } from "./fleet";
import { bookings } from "./bookings";

// What stands beside the bookings on the schedule (migration 0021): maintenance blocks on an
// aircraft, the windows an instructor is available, and the day-before reminders already queued.
// Times are UTC instants; blocks and windows are never deleted, only removed (kept for the record).

export const maintenanceBlocks = sqliteTable(
  "maintenance_blocks",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    aircraftId: text("aircraft_id").notNull().references(() => aircraft.id),
    startsAt: integer("starts_at", { mode: "timestamp_ms" }).notNull(),
    endsAt: integer("ends_at", { mode: "timestamp_ms" }).notNull(),
    reason: text("reason").notNull(),
    createdById: text("created_by_id").references(() => users.id),
    removedAt: integer("removed_at", { mode: "timestamp_ms" }),
    removedById: text("removed_by_id").references(() => users.id),
    ...timestamps(),
  },
  (t) => [
    index("maintenance_blocks_club_id").on(t.clubId),
    index("maintenance_blocks_aircraft_time").on(t.clubId, t.aircraftId, t.startsAt),
    check("maintenance_blocks_window", sql`${t.endsAt} > ${t.startsAt}`),
  ],
);

export const instructorAvailability = sqliteTable(
  "instructor_availability",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    userId: text("user_id").notNull().references(() => users.id),
    startsAt: integer("starts_at", { mode: "timestamp_ms" }).notNull(),
    endsAt: integer("ends_at", { mode: "timestamp_ms" }).notNull(),
    removedAt: integer("removed_at", { mode: "timestamp_ms" }),
    ...timestamps(),
  },
  (t) => [
    index("instructor_availability_club_id").on(t.clubId),
    index("instructor_availability_user_time").on(t.clubId, t.userId, t.startsAt),
    check("instructor_availability_window", sql`${t.endsAt} > ${t.startsAt}`),
  ],
);

/** One row per booking and start time whose day-before reminder is queued: sent once. */
export const bookingReminders = sqliteTable(
  "booking_reminders",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    bookingId: text("booking_id").notNull().references(() => bookings.id),
    startsAt: integer("starts_at", { mode: "timestamp_ms" }).notNull(),
    outboxId: text("outbox_id"),
    ...timestamps(),
  },
  (t) => [index("booking_reminders_club_id").on(t.clubId), uniqueIndex("booking_reminders_once").on(t.bookingId, t.startsAt)],
);

export type MaintenanceBlock = typeof maintenanceBlocks.$inferSelect;
export type InstructorAvailabilityRow = typeof instructorAvailability.$inferSelect;
