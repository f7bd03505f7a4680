import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { auditLog, bookingReminders, bookings, emailOutbox, maintenanceBlocks } from "@/db/schema";
import { blockAircraft, removeBlock } from "@/lib/actions/bookings/block-aircraft";
import { createBooking } from "@/lib/actions/bookings/create-booking";
import { addAvailability } from "@/lib/actions/bookings/instructor-availability";
import { composeBookingReminders } from "@/lib/email/booking-reminders";
import { localTimeToInstant } from "@/lib/fleet/time";
import { EMPTY, clubBySlug, db, form, signInAs } from "./helpers";
import { ALL_GUARDS, localAt, planeId, seedScenario } from "./bookings-helpers";

// The schedule beside the bookings, against a real migrated SQLite file: maintenance blocks and
// instructor availability refuse bookings over them through the one booking path, a weekly
// booking lists each week booked or refused and lands once, and the day-before reminder is queued
// once per booking through the outbox.

const SLUG = "reedwater";
const count = (aircraftId: string) => db().select().from(bookings).where(eq(bookings.aircraftId, aircraftId)).all().length;

describe("the schedule beside the bookings", () => {
  // The whole demo scenario is seeded once; on a loaded machine that takes longer than the default hook time.
  beforeAll(async () => {
    await seedScenario();
  }, 120_000);

  it("maintenance blocks an aircraft; a booking over the block is refused with the block's reason, nothing written", async () => {
    const club = clubBySlug(SLUG);
    const plane = planeId(SLUG, "N0556L");
    signInAs("member@hangarline.test");
    const refusedRole = await blockAircraft(EMPTY, form({ club: SLUG, aircraftId: plane, startsAt: localAt(club, 30, "08:00"), endsAt: localAt(club, 30, "17:00"), reason: "100-hour inspection" }));
    expect(refusedRole.ok).toBe(false);
    expect(db().select().from(maintenanceBlocks).all()).toHaveLength(0);

    signInAs("maintenance@hangarline.test");
    const made = await blockAircraft(EMPTY, form({ club: SLUG, aircraftId: plane, startsAt: localAt(club, 30, "08:00"), endsAt: localAt(club, 30, "17:00"), reason: "100-hour inspection" }));
    expect(made, made.message).toMatchObject({ ok: true });
    expect(made.message).toContain("N0556L blocked for maintenance");

    signInAs("member@hangarline.test");
    const before = count(plane);
    const over = await createBooking(EMPTY, form({ club: SLUG, aircraftId: plane, startsAt: localAt(club, 30, "16:00"), endsAt: localAt(club, 30, "18:00"), acceptedGuards: ALL_GUARDS }));
    expect(over.ok).toBe(false);
    expect(over.message).toMatch(/^Not booked: N0556L is blocked for maintenance from .* 08:00 to .* 17:00: 100-hour inspection\./);
    expect(over.fieldErrors.startsAt?.[0]).toContain("100-hour inspection");
    expect(count(plane)).toBe(before);

    // The minute the block ends the aircraft is free again (half-open windows).
    const after = await createBooking(EMPTY, form({ club: SLUG, aircraftId: plane, startsAt: localAt(club, 30, "17:00"), endsAt: localAt(club, 30, "18:00"), acceptedGuards: ALL_GUARDS }));
    expect(after, after.message).toMatchObject({ ok: true });
  });

  it("a removed block no longer refuses; removing needs the maintenance permission", async () => {
    const club = clubBySlug(SLUG);
    const plane = planeId(SLUG, "N0556L");
    signInAs("maintenance@hangarline.test");
    const made = await blockAircraft(EMPTY, form({ club: SLUG, aircraftId: plane, startsAt: localAt(club, 31, "08:00"), endsAt: localAt(club, 31, "12:00"), reason: "Avionics repair" }));
    const blockId = (made.data as { blockId: string }).blockId;
    signInAs("member@hangarline.test");
    expect((await removeBlock(EMPTY, form({ club: SLUG, blockId }))).ok).toBe(false);
    signInAs("maintenance@hangarline.test");
    expect(await removeBlock(EMPTY, form({ club: SLUG, blockId }))).toMatchObject({ ok: true });
    signInAs("member@hangarline.test");
    const booked = await createBooking(EMPTY, form({ club: SLUG, aircraftId: plane, startsAt: localAt(club, 31, "09:00"), endsAt: localAt(club, 31, "10:00"), acceptedGuards: ALL_GUARDS }));
    expect(booked, booked.message).toMatchObject({ ok: true });
  });

  it("an instructor who keeps available times is bookable only inside them, and not twice at once", async () => {
    const club = clubBySlug(SLUG);
    const instructor = signInAs("instructor@hangarline.test")!;
    const saved = await addAvailability(EMPTY, form({ club: SLUG, startsAt: localAt(club, 33, "09:00"), endsAt: localAt(club, 33, "12:00") }));
    expect(saved, saved.message).toMatchObject({ ok: true });

    signInAs("student@hangarline.test");
    const plane = planeId(SLUG, "N0527L");
    const outside = await createBooking(EMPTY, form({ club: SLUG, aircraftId: plane, instructorId: instructor.id, startsAt: localAt(club, 33, "11:00"), endsAt: localAt(club, 33, "13:00"), acceptedGuards: ALL_GUARDS }));
    expect(outside.ok).toBe(false);
    expect(outside.fieldErrors.instructorId?.[0]).toMatch(/^Imani Ostrowski is not available for the whole of .* 11:00 to .* 13:00\. Available then only .* 09:00 to .* 12:00\./);
    const inside = await createBooking(EMPTY, form({ club: SLUG, aircraftId: plane, instructorId: instructor.id, startsAt: localAt(club, 33, "09:30"), endsAt: localAt(club, 33, "11:30"), acceptedGuards: ALL_GUARDS }));
    expect(inside, inside.message).toMatchObject({ ok: true });

    signInAs("pilot2@hangarline.test");
    const twice = await createBooking(EMPTY, form({ club: SLUG, aircraftId: planeId(SLUG, "N0556L"), instructorId: instructor.id, startsAt: localAt(club, 33, "10:00"), endsAt: localAt(club, 33, "11:00"), acceptedGuards: ALL_GUARDS }));
    expect(twice.ok).toBe(false);
    expect(twice.message).toContain("The instructor is already booked");
  });

  it("a member cannot keep available times (instructors only)", async () => {
    const club = clubBySlug(SLUG);
    signInAs("member@hangarline.test");
    const r = await addAvailability(EMPTY, form({ club: SLUG, startsAt: localAt(club, 34, "09:00"), endsAt: localAt(club, 34, "12:00") }));
    expect(r.ok).toBe(false);
  });

  it("a weekly booking: each week through the same guard, the refused week named with its reason, and it lands once", async () => {
    const club = clubBySlug(SLUG);
    const plane = planeId(SLUG, "N0556L");
    signInAs("maintenance@hangarline.test");
    await blockAircraft(EMPTY, form({ club: SLUG, aircraftId: plane, startsAt: localAt(club, 50, "07:00"), endsAt: localAt(club, 50, "20:00"), reason: "Annual inspection" }));
    signInAs("member@hangarline.test");
    const before = count(plane);
    const fields = { club: SLUG, aircraftId: plane, startsAt: localAt(club, 36, "14:00"), endsAt: localAt(club, 36, "16:00"), repeatWeeks: "4", acceptedGuards: ALL_GUARDS, idempotencyKey: randomUUID() };
    const first = await createBooking(EMPTY, form(fields));
    expect(first, first.message).toMatchObject({ ok: true });
    const data = first.data as { booked: { startsAt: string }[]; refused: { startsAt: string; reason: string }[] };
    expect(data.booked.map((b) => b.startsAt)).toEqual([localAt(club, 36, "14:00"), localAt(club, 43, "14:00"), localAt(club, 57, "14:00")]);
    expect(data.refused).toHaveLength(1);
    expect(data.refused[0]!.startsAt).toBe(localAt(club, 50, "14:00"));
    expect(data.refused[0]!.reason).toContain("blocked for maintenance");
    expect(first.message).toMatch(/^N0556L booked 3 of 4 weeks: .* Not booked: .*Annual inspection/);
    expect(count(plane)).toBe(before + 3);

    const again = await createBooking(EMPTY, form(fields));
    expect(again).toEqual(first);
    expect(count(plane)).toBe(before + 3);
    const audits = db().select().from(auditLog).where(eq(auditLog.action, "booking.create")).all().filter((a) => (a.after as { weekly?: number } | null)?.weekly === 4);
    expect(audits).toHaveLength(3);
  });

  it("a weekly booking with every week refused writes nothing and says why", async () => {
    const club = clubBySlug(SLUG);
    const plane = planeId(SLUG, "N0556L");
    signInAs("member@hangarline.test");
    const before = count(plane);
    // Week one is already booked (the weekly booking above), week two is blocked.
    const r = await createBooking(EMPTY, form({ club: SLUG, aircraftId: plane, startsAt: localAt(club, 43, "14:00"), endsAt: localAt(club, 43, "16:00"), repeatWeeks: "2", acceptedGuards: ALL_GUARDS }));
    expect(r.ok).toBe(false);
    expect(r.message).toMatch(/^Nothing booked: none of the 2 weeks is free\./);
    expect(r.message).toContain("N0556L is already booked");
    expect(r.message).toContain("Annual inspection");
    expect(count(plane)).toBe(before);
  });

  it("the day-before reminder is queued once per booking, in the club's time zone, to the member and the instructor", () => {
    const club = clubBySlug(SLUG);
    const booking = db().select().from(bookings).where(and(eq(bookings.status, "reserved"), eq(bookings.startsAt, localTimeToInstant(localAt(club, 33, "09:30"), club.timeZone)))).get()!;
    expect(booking.instructorId).not.toBeNull();
    // 10:00 club time on the day before the booking.
    const dayBefore = localAt(club, 32, "10:00");
    const now = localTimeToInstant(dayBefore, club.timeZone);
    const first = composeBookingReminders(db(), now);
    expect(first.bookings).toBeGreaterThanOrEqual(1);
    const rows = db().select().from(emailOutbox).where(eq(emailOutbox.template, "booking-reminder")).all().filter((m) => (m.payload as { url: string }).url.endsWith(`/bookings/${booking.id}`));
    expect(rows.map((r) => r.toAddress).sort()).toEqual(["instructor@hangarline.test", "student@hangarline.test"]);
    expect(rows.find((r) => r.toAddress === "student@hangarline.test")!.subject).toBe("Tomorrow: N0527L at 09:30");
    expect(db().select().from(bookingReminders).where(eq(bookingReminders.bookingId, booking.id)).all()).toHaveLength(1);

    const second = composeBookingReminders(db(), new Date(now.getTime() + 3_600_000));
    expect(second).toEqual({ bookings: 0, messages: 0 });
  });
});
