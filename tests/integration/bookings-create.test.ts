import Database from "better-sqlite3";
import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { aircraft, auditLog, bookings, inspectionCompletions, inspectionItems } from "@/db/schema";
import { claimBookingWriteLock } from "@/db/queries/bookings";
import { createBooking } from "@/lib/actions/bookings/create-booking";
import { databaseFile } from "@/db/client";
import { EMPTY, clubBySlug, db, form, signInAs } from "./helpers";
import { ALL_GUARDS, localAt, planeId, seedScenario } from "./bookings-helpers";

const SLUG = "reedwater";

function bookForm(fields: Record<string, string | string[]>) {
  return form({ club: SLUG, ...fields });
}

function countBookings(aircraftId: string) {
  return db().select().from(bookings).where(eq(bookings.aircraftId, aircraftId)).all().length;
}

describe("booking an aircraft: no double booking", () => {
  let second: Database.Database;
  beforeAll(async () => {
    await seedScenario();
    second = new Database(databaseFile());
    second.pragma("busy_timeout = 0");
  });
  afterAll(() => second.close());

  it("two simultaneous requests for overlapping windows: exactly one wins", async () => {
    const club = clubBySlug(SLUG);
    const id = planeId(SLUG, "N0556L");
    const before = countBookings(id);
    signInAs("member@hangarline.test");
    const first = createBooking(EMPTY, bookForm({ aircraftId: id, startsAt: localAt(club, 6, "10:00"), endsAt: localAt(club, 6, "12:00"), acceptedGuards: ALL_GUARDS }));
    signInAs("pilot2@hangarline.test");
    const other = createBooking(EMPTY, bookForm({ aircraftId: id, startsAt: localAt(club, 6, "11:00"), endsAt: localAt(club, 6, "13:00"), acceptedGuards: ALL_GUARDS }));
    const results = await Promise.all([first, other]);
    expect(results.filter((r) => r.ok)).toHaveLength(1);
    const loser = results.find((r) => !r.ok)!;
    expect(loser.message).toMatch(/N0556L is already booked/);
    expect(countBookings(id)).toBe(before + 1);
  });

  it("a booking may start the minute the previous one ends (windows are half-open)", async () => {
    const club = clubBySlug(SLUG);
    const id = planeId(SLUG, "N0556L");
    const latest = db().select().from(bookings).where(and(eq(bookings.aircraftId, id), eq(bookings.status, "reserved"))).all().sort((a, b) => b.endsAt.getTime() - a.endsAt.getTime())[0]!;
    const end = latest.endsAt.getTime();
    const local = (ms: number) => new Intl.DateTimeFormat("sv-SE", { timeZone: club.timeZone, dateStyle: "short", timeStyle: "short" }).format(new Date(ms)).replace(" ", "T");
    signInAs("member@hangarline.test");
    const next = await createBooking(EMPTY, bookForm({ aircraftId: id, startsAt: local(end), endsAt: local(end + 3_600_000), acceptedGuards: ALL_GUARDS }));
    expect(next, next.message).toMatchObject({ ok: true });
  });

  it("the instructor cannot be booked on two aircraft at once", async () => {
    const club = clubBySlug(SLUG);
    const instructor = signInAs("instructor@hangarline.test")!;
    signInAs("student@hangarline.test");
    const a = await createBooking(EMPTY, bookForm({ aircraftId: planeId(SLUG, "N0527L"), instructorId: instructor.id, startsAt: localAt(club, 8, "09:00"), endsAt: localAt(club, 8, "11:00"), acceptedGuards: ALL_GUARDS }));
    expect(a).toMatchObject({ ok: true });
    signInAs("member@hangarline.test");
    const b = await createBooking(EMPTY, bookForm({ aircraftId: planeId(SLUG, "N0534L"), instructorId: instructor.id, startsAt: localAt(club, 8, "10:00"), endsAt: localAt(club, 8, "12:00"), acceptedGuards: ALL_GUARDS }));
    expect(b.ok).toBe(false);
    expect(b.fieldErrors.instructorId?.[0]).toMatch(/instructor is already booked/);
  });

  it("the database itself refuses an overlapping row written around the application", () => {
    const club = clubBySlug(SLUG);
    const row = db().select().from(bookings).where(and(eq(bookings.clubId, club.id), eq(bookings.status, "reserved"))).get()!;
    const insert = second.prepare("INSERT INTO bookings (id, club_id, aircraft_id, user_id, starts_at, ends_at, status, accepted_warnings, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?, 'reserved', '[]', ?, ?)");
    const start = row.startsAt.getTime() + 30 * 60_000;
    expect(() => insert.run(crypto.randomUUID(), club.id, row.aircraftId, row.userId, start, start + 3_600_000, Date.now(), Date.now())).toThrow(/booking_overlap_aircraft/);
    // A cancelled row does not hold the aircraft, so it may sit anywhere.
    expect(() => second.prepare("INSERT INTO bookings (id, club_id, aircraft_id, user_id, starts_at, ends_at, status, accepted_warnings, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?, 'cancelled', '[]', ?, ?)").run(crypto.randomUUID(), club.id, row.aircraftId, row.userId, start, start + 3_600_000, Date.now(), Date.now())).not.toThrow();
  });

  it("the booking transaction holds the write lock from its first statement, as BEGIN IMMEDIATE would", () => {
    db().transaction((tx) => {
      claimBookingWriteLock(tx);
      expect(() => second.exec("BEGIN IMMEDIATE")).toThrow(/busy|locked/i);
    });
    second.exec("BEGIN IMMEDIATE");
    second.exec("ROLLBACK");
  });

  it("refuses a window that ends before it starts, or is in the past, with field messages and writes nothing", async () => {
    const club = clubBySlug(SLUG);
    const id = planeId(SLUG, "N0527L");
    const before = countBookings(id);
    signInAs("member@hangarline.test");
    const backwards = await createBooking(EMPTY, bookForm({ aircraftId: id, startsAt: localAt(club, 9, "12:00"), endsAt: localAt(club, 9, "10:00") }));
    expect(backwards.fieldErrors.endsAt?.[0]).toMatch(/after the start/);
    const past = await createBooking(EMPTY, bookForm({ aircraftId: id, startsAt: localAt(club, -2, "10:00"), endsAt: localAt(club, -2, "12:00") }));
    expect(past.fieldErrors.startsAt?.[0]).toMatch(/in the past/);
    const garbled = await createBooking(EMPTY, bookForm({ aircraftId: id, startsAt: "tomorrow", endsAt: "" }));
    expect(garbled.fieldErrors.startsAt?.[0]).toMatch(/date and time/);
    expect(garbled.fieldErrors.endsAt?.[0]).toMatch(/Enter the end/);
    expect(countBookings(id)).toBe(before);
  });

  it("another club's aircraft is not found, and nothing is written", async () => {
    const club = clubBySlug(SLUG);
    signInAs("member@hangarline.test");
    const state = await createBooking(EMPTY, bookForm({ aircraftId: planeId("cottonwood-flyers", "N0471C"), startsAt: localAt(club, 9, "10:00"), endsAt: localAt(club, 9, "11:00"), acceptedGuards: ALL_GUARDS }));
    expect(state.ok).toBe(false);
    expect(state.message).toMatch(/not found/);
    expect(countBookings(planeId("cottonwood-flyers", "N0471C"))).toBe(0);
  });

  it("a member books only for themselves; an instructor may book for a student", async () => {
    const club = clubBySlug(SLUG);
    const student = signInAs("student@hangarline.test")!;
    signInAs("member@hangarline.test");
    const refused = await createBooking(EMPTY, bookForm({ aircraftId: planeId(SLUG, "N0549L"), memberId: student.id, startsAt: localAt(club, 10, "10:00"), endsAt: localAt(club, 10, "11:00"), acceptedGuards: ALL_GUARDS }));
    expect(refused.fieldErrors.memberId?.[0]).toMatch(/instructors/);
    const instructor = signInAs("instructor@hangarline.test")!;
    const made = await createBooking(EMPTY, bookForm({ aircraftId: planeId(SLUG, "N0549L"), memberId: student.id, instructorId: instructor.id, startsAt: localAt(club, 10, "10:00"), endsAt: localAt(club, 10, "11:00"), acceptedGuards: ALL_GUARDS }));
    expect(made).toMatchObject({ ok: true });
    const row = db().select().from(bookings).where(eq(bookings.id, (made.data as { bookingId: string }).bookingId)).get()!;
    expect(row).toMatchObject({ userId: student.id, instructorId: instructor.id, createdById: instructor.id });
    expect(db().select().from(auditLog).where(and(eq(auditLog.action, "booking.create"), eq(auditLog.subjectId, row.id))).all()).toHaveLength(1);
  });

  it("an hours-based item coming due inside the window counts the club's average flight length", async () => {
    const club = clubBySlug(SLUG);
    const id = planeId(SLUG, "N0556L");
    const plane = db().select().from(aircraft).where(eq(aircraft.id, id)).get()!;
    // A club item every 10 tach hours, done 9.5 h ago: 0.5 h left, less than an average flight.
    const [item] = db().insert(inspectionItems).values({ clubId: club.id, aircraftId: id, key: "club-10h-check", name: "Club 10-hour check", origin: "club", ruleKind: "hours", hours: 10, required: true }).returning().all();
    db().insert(inspectionCompletions).values({ clubId: club.id, aircraftId: id, itemId: item!.id, doneOn: localAt(club, -1, "00:00").slice(0, 10), hours: plane.currentTach! - 9.5, mechanicName: "Test Mechanic", mechanicCertificate: "A&P 0000000" }).run();
    signInAs("member@hangarline.test");
    const state = await createBooking(EMPTY, bookForm({ aircraftId: id, startsAt: localAt(club, 11, "10:00"), endsAt: localAt(club, 11, "12:00"), acceptedGuards: ALL_GUARDS }));
    expect(state.ok).toBe(false);
    expect(state.fieldErrors.refusals?.join(" ")).toMatch(/N0556L comes due inside this booking \(counting \d+\.\d h per booked flight, the average flight length\): Club 10-hour check/i);
  });
});
