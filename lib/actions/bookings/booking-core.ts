import "server-only";
import { and, eq } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { memberships, users, type AcceptedWarning, type Aircraft } from "@/db/schema";
import { BookingOverlapError, claimBookingWriteLock, getBookingRow, insertBooking, listHeldNear, updateBookingRow } from "@/db/queries/bookings";
import { loadGuardInput } from "@/db/queries/bookings-guards";
import { keepsAvailability, listAvailability, listBlocksOverlapping } from "@/db/queries/bookings-schedule";
import { getAircraft } from "@/db/queries/fleet";
import { ActionError } from "@/lib/actions/action-state";
import { evaluateBookingGuards, warningsAccepted, type GuardFinding } from "@/lib/bookings/guards";
import { lateChange } from "@/lib/bookings/late-cancellation";
import { checkWindow, findConflicts, type Conflict } from "@/lib/bookings/overlap";
import { scheduleRefusals } from "@/lib/bookings/schedule-guards";
import { formatLocalTime, localTimeToInstant } from "@/lib/fleet/time";
import type { ClubContext } from "@/lib/server/club-context";
import type { ChangeBookingInput, CreateBookingInput } from "@/lib/validation/bookings";
import { canOn } from "@/permissions";

// The one path that makes or moves a booking, used by the server actions and the JSON route:
// write lock first, then the window, the people, the overlap check, the guards and the write,
// all inside the caller's single transaction.

type Ctx = Pick<ClubContext, "club" | "user" | "ability">;

const INVALID = "Some fields need attention; nothing was saved.";

function toWindow(ctx: Ctx, startsAt: string, endsAt: string, now: Date) {
  const window = { startsAt: localTimeToInstant(startsAt, ctx.club.timeZone), endsAt: localTimeToInstant(endsAt, ctx.club.timeZone) };
  const problems = checkWindow(window, now);
  if (Object.keys(problems).length) throw new ActionError(INVALID, problems);
  return window;
}

function activePerson(tx: Tx, clubId: string, userId: string) {
  return tx
    .select({ id: users.id, name: users.name, email: users.email, roles: memberships.roles })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.clubId, clubId), eq(memberships.userId, userId), eq(memberships.status, "active")))
    .get();
}

export function personName(p: { name: string | null; email: string }): string {
  return p.name ?? p.email;
}

function resolveInstructor(tx: Tx, clubId: string, instructorId: string | null, memberId: string) {
  if (!instructorId) return null;
  const person = activePerson(tx, clubId, instructorId);
  if (!person || !person.roles.includes("instructor")) throw new ActionError(INVALID, { instructorId: ["Choose an instructor of this club."] });
  if (person.id === memberId) throw new ActionError(INVALID, { instructorId: ["The instructor cannot be the member flying."] });
  return person;
}

function describeConflict(ctx: Ctx, c: Conflict, registration: string): string {
  const when = `${formatLocalTime(c.booking.startsAt, ctx.club.timeZone)} to ${formatLocalTime(c.booking.endsAt, ctx.club.timeZone)}`;
  if (c.kind === "aircraft") return `${registration} is already booked from ${when}.`;
  if (c.kind === "instructor") return `The instructor is already booked from ${when}.`;
  return `The member already has a booking from ${when}.`;
}

function assertFree(tx: Tx, ctx: Ctx, wanted: { aircraftId: string; userId: string; instructorId: string | null; startsAt: Date; endsAt: Date }, plane: Aircraft, ignoreId?: string) {
  const conflicts = findConflicts(wanted, listHeldNear(tx, ctx.club.id, wanted), ignoreId);
  if (conflicts.length === 0) return;
  const field = conflicts[0]!.kind === "instructor" ? "instructorId" : "startsAt";
  throw new ActionError(`Not booked: ${describeConflict(ctx, conflicts[0]!, plane.registration)}`, { [field]: conflicts.map((c) => describeConflict(ctx, c, plane.registration)) }, "conflict");
}

function overlapRefusal(error: BookingOverlapError, registration: string): ActionError {
  // Another request took the time between our check and our write (another process): the
  // database's trigger refused it, and the member hears the same words as from the check.
  const text = error.kind === "aircraft" ? `${registration} was just booked for that time by someone else.` : "The instructor was just booked for that time.";
  return new ActionError(`Not booked: ${text}`, { [error.kind === "aircraft" ? "startsAt" : "instructorId"]: [text] }, "conflict");
}

/**
 * Maintenance blocks on the aircraft and the instructor's availability (when they keep a list):
 * either refuses the booking outright, with the block's reason or the instructor's own times.
 */
function assertSchedule(tx: Tx, ctx: Ctx, plane: Aircraft, instructor: { id: string; name: string | null; email: string } | null, window: { startsAt: Date; endsAt: Date }) {
  const clubId = ctx.club.id;
  const blocks = listBlocksOverlapping(tx, clubId, plane.id, window.startsAt, window.endsAt).map((b) => ({ start: b.startsAt.getTime(), end: b.endsAt.getTime(), reason: b.reason }));
  const teaching = instructor
    ? {
        name: personName(instructor),
        keepsAvailability: keepsAvailability(tx, clubId, instructor.id),
        windows: listAvailability(tx, clubId, window.startsAt, window.endsAt, instructor.id).map((w) => ({ start: w.startsAt.getTime(), end: w.endsAt.getTime() })),
      }
    : null;
  const refusals = scheduleRefusals({
    wanted: { start: window.startsAt.getTime(), end: window.endsAt.getTime() },
    registration: plane.registration,
    blocks,
    instructor: teaching,
    format: (ms) => formatLocalTime(new Date(ms), ctx.club.timeZone),
  });
  if (!refusals.length) return;
  const fields: Record<string, string[]> = {};
  for (const r of refusals) (fields[r.field] ??= []).push(r.reason);
  throw new ActionError(`Not booked: ${refusals.map((r) => r.reason).join(" ")}`, fields, "conflict");
}

/** Refusals stop the booking; warnings need the member's "I have read these" first. */
function applyGuards(refusals: GuardFinding[], warnings: GuardFinding[], accepted: readonly string[]): AcceptedWarning[] {
  if (refusals.length) {
    throw new ActionError(`Not booked: ${refusals.map((r) => r.reason).join(" ")}`, { refusals: refusals.map((r) => r.reason), warnings: warnings.map((w) => w.reason), warningGuards: warnings.map((w) => w.guard) });
  }
  if (warnings.length && !warningsAccepted(warnings, accepted)) {
    throw new ActionError("Read the warnings below. Tick that you have read them to book anyway.", { warnings: warnings.map((w) => w.reason), warningGuards: warnings.map((w) => w.guard) });
  }
  return warnings.map((w) => ({ guard: w.guard, reason: w.reason }));
}

function loadPlane(tx: Tx, clubId: string, aircraftId: string): Aircraft {
  const plane = getAircraft(tx, clubId, aircraftId);
  if (!plane || plane.retiredAt) throw new ActionError("That aircraft was not found in this club.", { aircraftId: ["Choose an aircraft of this club."] }, "not_found");
  return plane;
}

/** `seriesId` is given only by the weekly path (booking-recurring.ts): the weeks made together share it. */
export function createBookingInTx(tx: Tx, ctx: Ctx, input: CreateBookingInput, now: Date = new Date(), opts: { seriesId?: string } = {}) {
  claimBookingWriteLock(tx);
  const memberId = input.memberId ?? ctx.user.id;
  if (memberId !== ctx.user.id && !canOn(ctx.ability, "update", "Booking", { userId: memberId })) {
    throw new ActionError("You can book only for yourself.", { memberId: ["Only instructors book for other members."] }, "forbidden");
  }
  const member = activePerson(tx, ctx.club.id, memberId);
  if (!member) throw new ActionError(INVALID, { memberId: ["That person is not an active member of this club."] });
  const plane = loadPlane(tx, ctx.club.id, input.aircraftId);
  const window = toWindow(ctx, input.startsAt, input.endsAt, now);
  const instructor = resolveInstructor(tx, ctx.club.id, input.instructorId, memberId);
  const wanted = { aircraftId: plane.id, userId: memberId, instructorId: instructor?.id ?? null, ...window };
  assertFree(tx, ctx, wanted, plane);
  assertSchedule(tx, ctx, plane, instructor, window);

  const guardInput = loadGuardInput(tx, ctx.club, { plane, memberId, memberName: personName(member), ...window, withInstructor: Boolean(instructor), carryingPassengers: input.carryingPassengers }, now);
  const { refusals, warnings } = evaluateBookingGuards(guardInput, ctx.club.settings);
  const acceptedWarnings = applyGuards(refusals, warnings, input.acceptedGuards);
  let bookingId: string;
  try {
    bookingId = insertBooking(tx, { clubId: ctx.club.id, ...wanted, purpose: input.purpose, carryingPassengers: input.carryingPassengers, acceptedWarnings, createdById: ctx.user.id, seriesId: opts.seriesId ?? null });
  } catch (error) {
    if (error instanceof BookingOverlapError) throw overlapRefusal(error, plane.registration);
    throw error;
  }
  return { bookingId, plane, member, window, acceptedWarnings };
}

export function changeBookingInTx(tx: Tx, ctx: Ctx, input: ChangeBookingInput, now: Date = new Date()) {
  claimBookingWriteLock(tx);
  const booking = getBookingRow(tx, ctx.club.id, input.bookingId);
  if (!booking) throw new ActionError("That booking was not found in this club.", {}, "not_found");
  if (!canOn(ctx.ability, "update", "Booking", { userId: booking.userId })) throw new ActionError("Only the member who booked, or an instructor, can change this booking.", {}, "forbidden");
  if (booking.status !== "reserved") throw new ActionError(`This booking is ${booking.status.replace("_", " ")} and can no longer be changed.`, {}, "conflict");
  const member = activePerson(tx, ctx.club.id, booking.userId);
  if (!member) throw new ActionError("The member of this booking is no longer active in the club.", {}, "conflict");
  const plane = loadPlane(tx, ctx.club.id, booking.aircraftId);
  const window = toWindow(ctx, input.startsAt, input.endsAt, now);
  const instructor = resolveInstructor(tx, ctx.club.id, input.instructorId, booking.userId);
  const wanted = { aircraftId: plane.id, userId: booking.userId, instructorId: instructor?.id ?? null, ...window };
  assertFree(tx, ctx, wanted, plane, booking.id);
  assertSchedule(tx, ctx, plane, instructor, window);

  const guardInput = loadGuardInput(tx, ctx.club, { plane, memberId: booking.userId, memberName: personName(member), ...window, withInstructor: Boolean(instructor), carryingPassengers: booking.carryingPassengers, excludeBookingId: booking.id }, now);
  const { refusals, warnings } = evaluateBookingGuards(guardInput, ctx.club.settings);
  const acceptedWarnings = applyGuards(refusals, warnings, input.acceptedGuards);
  const late = lateChange(booking, window, now, ctx.club.settings.lateCancellationHours);
  try {
    updateBookingRow(tx, ctx.club.id, booking.id, { ...window, instructorId: instructor?.id ?? null, acceptedWarnings, lateCancel: booking.lateCancel || late.late });
  } catch (error) {
    if (error instanceof BookingOverlapError) throw overlapRefusal(error, plane.registration);
    throw error;
  }
  return { booking, plane, window, late, acceptedWarnings };
}
