import "server-only";
import { and, asc, eq, gt, isNull, lt } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { aircraft, instructorAvailability, maintenanceBlocks, users, type InstructorAvailabilityRow, type MaintenanceBlock } from "@/db/schema";

// Maintenance blocks and instructor availability (migration 0021), always scoped by club_id.
// Removing either keeps the row (removed_at), so what stood on the schedule stays on record.

type Handle = Db | Tx;

export type BlockView = MaintenanceBlock & { registration: string };

/** Blocks in force on the aircraft that overlap [startsAt, endsAt). */
export function listBlocksOverlapping(db: Handle, clubId: string, aircraftId: string, startsAt: Date, endsAt: Date): MaintenanceBlock[] {
  return db
    .select()
    .from(maintenanceBlocks)
    .where(and(eq(maintenanceBlocks.clubId, clubId), eq(maintenanceBlocks.aircraftId, aircraftId), isNull(maintenanceBlocks.removedAt), lt(maintenanceBlocks.startsAt, endsAt), gt(maintenanceBlocks.endsAt, startsAt)))
    .orderBy(asc(maintenanceBlocks.startsAt))
    .all();
}

/** Blocks in force on any aircraft of the club touching [from, to), for the booking page. */
export function listBlocksInRange(db: Handle, clubId: string, from: Date, to: Date): BlockView[] {
  return db
    .select({ b: maintenanceBlocks, registration: aircraft.registration })
    .from(maintenanceBlocks)
    .innerJoin(aircraft, and(eq(aircraft.id, maintenanceBlocks.aircraftId), eq(aircraft.clubId, maintenanceBlocks.clubId)))
    .where(and(eq(maintenanceBlocks.clubId, clubId), isNull(maintenanceBlocks.removedAt), lt(maintenanceBlocks.startsAt, to), gt(maintenanceBlocks.endsAt, from)))
    .orderBy(asc(maintenanceBlocks.startsAt))
    .all()
    .map((r) => ({ ...r.b, registration: r.registration }));
}

export function getBlock(db: Handle, clubId: string, blockId: string): MaintenanceBlock | undefined {
  return db.select().from(maintenanceBlocks).where(and(eq(maintenanceBlocks.clubId, clubId), eq(maintenanceBlocks.id, blockId))).get();
}

export function insertBlock(tx: Tx, values: typeof maintenanceBlocks.$inferInsert): string {
  return tx.insert(maintenanceBlocks).values(values).returning({ id: maintenanceBlocks.id }).all()[0]!.id;
}

export function removeBlockRow(tx: Tx, clubId: string, blockId: string, userId: string, at: Date): void {
  tx.update(maintenanceBlocks).set({ removedAt: at, removedById: userId }).where(and(eq(maintenanceBlocks.clubId, clubId), eq(maintenanceBlocks.id, blockId))).run();
}

export type AvailabilityView = InstructorAvailabilityRow & { name: string | null; email: string };

/** Availability windows in force touching [from, to); one instructor's when `userId` is given. */
export function listAvailability(db: Handle, clubId: string, from: Date, to: Date, userId?: string): AvailabilityView[] {
  return db
    .select({ a: instructorAvailability, name: users.name, email: users.email })
    .from(instructorAvailability)
    .innerJoin(users, eq(users.id, instructorAvailability.userId))
    .where(
      and(
        eq(instructorAvailability.clubId, clubId),
        userId ? eq(instructorAvailability.userId, userId) : undefined,
        isNull(instructorAvailability.removedAt),
        lt(instructorAvailability.startsAt, to),
        gt(instructorAvailability.endsAt, from),
      ),
    )
    .orderBy(asc(instructorAvailability.startsAt))
    .all()
    .map((r) => ({ ...r.a, name: r.name, email: r.email }));
}

/**
 * Whether the instructor keeps an availability list at all (any window in force, past or
 * coming). One who keeps none has not opted in, and is booked as before; one who keeps a list is
 * bookable only inside it.
 */
export function keepsAvailability(db: Handle, clubId: string, userId: string): boolean {
  return Boolean(
    db
      .select({ id: instructorAvailability.id })
      .from(instructorAvailability)
      .where(and(eq(instructorAvailability.clubId, clubId), eq(instructorAvailability.userId, userId), isNull(instructorAvailability.removedAt)))
      .limit(1)
      .get(),
  );
}

/** The people of the club who keep any availability window in force. */
export function listInstructorsKeepingAvailability(db: Handle, clubId: string): Set<string> {
  const rows = db
    .selectDistinct({ userId: instructorAvailability.userId })
    .from(instructorAvailability)
    .where(and(eq(instructorAvailability.clubId, clubId), isNull(instructorAvailability.removedAt)))
    .all();
  return new Set(rows.map((r) => r.userId));
}

export function getAvailability(db: Handle, clubId: string, id: string): InstructorAvailabilityRow | undefined {
  return db.select().from(instructorAvailability).where(and(eq(instructorAvailability.clubId, clubId), eq(instructorAvailability.id, id))).get();
}

export function insertAvailability(tx: Tx, values: typeof instructorAvailability.$inferInsert): string {
  return tx.insert(instructorAvailability).values(values).returning({ id: instructorAvailability.id }).all()[0]!.id;
}

export function removeAvailabilityRow(tx: Tx, clubId: string, id: string, at: Date): void {
  tx.update(instructorAvailability).set({ removedAt: at }).where(and(eq(instructorAvailability.clubId, clubId), eq(instructorAvailability.id, id))).run();
}
