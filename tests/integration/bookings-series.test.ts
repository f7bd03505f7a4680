import { randomUUID } from "node:crypto";
import { and, eq, like } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { auditLog, bookings } from "@/db/schema";
import { cancelBooking } from "@/lib/actions/bookings/cancel-booking";
import { cancelBookingSeries } from "@/lib/actions/bookings/cancel-booking-series";
import { createBooking } from "@/lib/actions/bookings/create-booking";
import { moveBookingSeries } from "@/lib/actions/bookings/move-booking-series";
import { localTimeToInstant } from "@/lib/fleet/time";
import { EMPTY, clubBySlug, db, form, signInAs } from "./helpers";
import { ALL_GUARDS, localAt, planeId, seedScenario, setGuards } from "./bookings-helpers";

// A weekly series against a real migrated SQLite file: the weeks one weekly booking made share a
// series id; "cancel this and the later weeks" and "move this and the later weeks" act on exactly
// those weeks, each through the single cancel or change path, once per idempotency key, and only
// for someone who may act on each week.

const SLUG = "reedwater";
const row = (id: string) => db().select().from(bookings).where(eq(bookings.id, id)).get()!;
const seriesAudits = (action: string) => db().select().from(auditLog).where(and(eq(auditLog.action, action), like(auditLog.after, '%"series"%'))).all();

async function bookWeekly(email: string, registration: string, days: number, from: string, to: string, weeks: number): Promise<string[]> {
  const club = clubBySlug(SLUG);
  signInAs(email);
  const state = await createBooking(EMPTY, form({ club: SLUG, aircraftId: planeId(SLUG, registration), startsAt: localAt(club, days, from), endsAt: localAt(club, days, to), repeatWeeks: String(weeks), acceptedGuards: ALL_GUARDS }));
  expect(state, state.message).toMatchObject({ ok: true });
  const ids = (state.data as { booked: { bookingId: string }[] }).booked.map((b) => b.bookingId);
  expect(ids).toHaveLength(weeks);
  return ids;
}

async function bookOnce(email: string, registration: string, days: number, from: string, to: string): Promise<string> {
  const club = clubBySlug(SLUG);
  signInAs(email);
  const state = await createBooking(EMPTY, form({ club: SLUG, aircraftId: planeId(SLUG, registration), startsAt: localAt(club, days, from), endsAt: localAt(club, days, to), acceptedGuards: ALL_GUARDS }));
  expect(state, state.message).toMatchObject({ ok: true });
  return (state.data as { bookingId: string }).bookingId;
}

describe("acting on a weekly series", () => {
  beforeAll(async () => {
    await seedScenario();
    setGuards(SLUG, { grounded: "warn", inspectionDue: "warn", notCheckedOut: "warn", notCurrent: "warn", flightReview: "warn", medicalExpired: "warn", inArrears: "warn" }, { lateCancellationHours: 24 });
  }, 120_000);

  it("the weeks of one weekly booking share a series id; a single booking has none", async () => {
    const weeks = await bookWeekly("member@hangarline.test", "N0534L", 120, "06:00", "07:00", 3);
    const seriesIds = weeks.map((id) => row(id).seriesId);
    expect(seriesIds[0]).toEqual(expect.any(String));
    expect(new Set(seriesIds).size).toBe(1);
    const other = await bookWeekly("member@hangarline.test", "N0534L", 121, "06:00", "07:00", 2);
    expect(row(other[0]!).seriesId).not.toBe(seriesIds[0]);
    const single = await bookOnce("member@hangarline.test", "N0534L", 122, "06:00", "07:00");
    expect(row(single).seriesId).toBeNull();
    signInAs("member@hangarline.test");
    const refused = await cancelBookingSeries(EMPTY, form({ club: SLUG, bookingId: single }));
    expect(refused.ok).toBe(false);
    expect(refused.message).toMatch(/not as part of a weekly series/);
    expect(row(single).status).toBe("reserved");
  });

  it("cancel-the-rest cancels exactly this and the later reserved weeks of the same series, once per key", async () => {
    const weeks = await bookWeekly("member@hangarline.test", "N0534L", 30, "06:00", "07:00", 6);
    const otherSeries = await bookWeekly("member@hangarline.test", "N0534L", 31, "06:00", "07:00", 3);
    const single = await bookOnce("member@hangarline.test", "N0534L", 44, "08:00", "09:00");
    // Week 3 was cancelled on its own before; week 4's flight has begun (a status the series never touches).
    signInAs("member@hangarline.test");
    const own = await cancelBooking(EMPTY, form({ club: SLUG, bookingId: weeks[3]!, reason: "Away that week" }));
    expect(own, own.message).toMatchObject({ ok: true });
    db().update(bookings).set({ status: "dispatched" }).where(eq(bookings.id, weeks[4]!)).run();
    const auditsBefore = seriesAudits("booking.cancel").length;

    const fields = { club: SLUG, bookingId: weeks[1]!, reason: "Lessons over", idempotencyKey: randomUUID() };
    const first = await cancelBookingSeries(EMPTY, form(fields));
    expect(first, first.message).toMatchObject({ ok: true });
    expect(first.message).toMatch(/^Cancelled 3 weeks: (Sun|Mon|Tue|Wed|Thu|Fri|Sat) \d{1,2} [A-Z][a-z]{2} \d{4}; /);
    expect(first.message).toContain("Left as they were:");
    expect(first.message).toContain("The flight on this week has begun.");
    const data = first.data as { cancelled: { bookingId: string }[]; refused: { bookingId: string; reason: string }[] };
    expect(data.cancelled.map((c) => c.bookingId)).toEqual([weeks[1], weeks[2], weeks[5]]);
    expect(data.refused.map((r) => r.bookingId)).toEqual([weeks[4]]);

    expect(weeks.map((id) => row(id).status)).toEqual(["reserved", "cancelled", "cancelled", "cancelled", "dispatched", "cancelled"]);
    expect(row(weeks[1]!)).toMatchObject({ cancelReason: "Lessons over", lateCancel: false });
    expect(row(weeks[3]!).cancelReason).toBe("Away that week");
    expect(otherSeries.map((id) => row(id).status)).toEqual(["reserved", "reserved", "reserved"]);
    expect(row(single).status).toBe("reserved");
    expect(seriesAudits("booking.cancel").length).toBe(auditsBefore + 3);

    // The same submission again (same key): the first answer, nothing more written.
    const updatedAt = weeks.map((id) => row(id).updatedAt.getTime());
    const again = await cancelBookingSeries(EMPTY, form(fields));
    expect(again.message).toBe(first.message);
    expect(seriesAudits("booking.cancel").length).toBe(auditsBefore + 3);
    expect(weeks.map((id) => row(id).updatedAt.getTime())).toEqual(updatedAt);
    // A new submission finds nothing left to cancel from that week on.
    const fresh = await cancelBookingSeries(EMPTY, form({ ...fields, idempotencyKey: randomUUID() }));
    expect(fresh.message).toMatch(/^Nothing to cancel/);
    expect(seriesAudits("booking.cancel").length).toBe(auditsBefore + 3);
  });

  it("a week inside the club's late-cancellation window is cancelled late, and the answer says so", async () => {
    const club = clubBySlug(SLUG);
    const soon = Date.now() + 3 * 3_600_000;
    const local = (ms: number) => new Intl.DateTimeFormat("sv-SE", { timeZone: club.timeZone, dateStyle: "short", timeStyle: "short" }).format(new Date(ms)).replace(" ", "T");
    signInAs("member@hangarline.test");
    const made = await createBooking(EMPTY, form({ club: SLUG, aircraftId: planeId(SLUG, "N0556L"), startsAt: local(soon), endsAt: local(soon + 3_600_000), repeatWeeks: "2", acceptedGuards: ALL_GUARDS }));
    expect(made, made.message).toMatchObject({ ok: true });
    const weeks = (made.data as { booked: { bookingId: string }[] }).booked.map((b) => b.bookingId);
    expect(weeks).toHaveLength(2);
    const state = await cancelBookingSeries(EMPTY, form({ club: SLUG, bookingId: weeks[0]!, idempotencyKey: randomUUID() }));
    expect(state, state.message).toMatchObject({ ok: true });
    expect(state.message).toMatch(/^Cancelled 2 weeks: .*: Late cancellation: \d\.\d h before the start, inside the club's 24-hour rule\./);
    expect(weeks.map((id) => row(id).lateCancel)).toEqual([true, false]);
  });

  it("moving lists a week refused by another member's booking, and moves the others", async () => {
    const club = clubBySlug(SLUG);
    const weeks = await bookWeekly("member@hangarline.test", "N0549L", 60, "06:00", "07:00", 4);
    const before = weeks.map((id) => row(id));
    // Another member holds the aircraft on the third week's morning.
    const blocker = await bookOnce("pilot2@hangarline.test", "N0549L", 74, "09:00", "10:00");

    signInAs("member@hangarline.test");
    const state = await moveBookingSeries(EMPTY, form({ club: SLUG, bookingId: weeks[0]!, startTime: "08:30", endTime: "10:30", acceptedGuards: ALL_GUARDS, idempotencyKey: randomUUID() }));
    expect(state, state.message).toMatchObject({ ok: true });
    expect(state.message).toMatch(/^Moved 3 weeks to 08:30–10:30 club time: /);
    expect(state.message).toMatch(/Not moved \(left as they were\): (Sun|Mon|Tue|Wed|Thu|Fri|Sat) \d{1,2} [A-Z][a-z]{2} \d{4} — N0549L is already booked from /);
    const data = state.data as { moved: { bookingId: string }[]; refused: { bookingId: string; reason: string }[] };
    expect(data.moved.map((m) => m.bookingId)).toEqual([weeks[0], weeks[1], weeks[3]]);
    expect(data.refused).toHaveLength(1);
    expect(data.refused[0]!.bookingId).toBe(weeks[2]);
    expect(data.refused[0]!.reason).toMatch(/N0549L is already booked/);

    for (const [i, days] of [[0, 60], [1, 67], [3, 81]] as const) {
      expect(row(weeks[i]!).startsAt.getTime()).toBe(localTimeToInstant(localAt(club, days, "08:30"), club.timeZone).getTime());
      expect(row(weeks[i]!).endsAt.getTime()).toBe(localTimeToInstant(localAt(club, days, "10:30"), club.timeZone).getTime());
    }
    expect(row(weeks[2]!)).toMatchObject({ startsAt: before[2]!.startsAt, endsAt: before[2]!.endsAt, status: "reserved" });
    expect(row(blocker)).toMatchObject({ status: "reserved" });
    expect(seriesAudits("booking.change")).toHaveLength(3);
  });

  it("a bad time is refused with a specific message, nothing moved", async () => {
    const weeks = await bookWeekly("member@hangarline.test", "N0556L", 90, "06:00", "07:00", 2);
    const before = weeks.map((id) => row(id));
    signInAs("member@hangarline.test");
    const state = await moveBookingSeries(EMPTY, form({ club: SLUG, bookingId: weeks[0]!, startTime: "11:00", endTime: "10:00" }));
    expect(state.ok).toBe(false);
    expect(state.fieldErrors.endTime?.[0]).toMatch(/after the start/);
    const badClock = await moveBookingSeries(EMPTY, form({ club: SLUG, bookingId: weeks[0]!, startTime: "9am", endTime: "10:00" }));
    expect(badClock.fieldErrors.startTime?.[0]).toMatch(/HH:MM on a 24-hour clock/);
    expect(weeks.map((id) => row(id))).toEqual(before);
  });

  it("a member cannot cancel or move another member's series", async () => {
    const weeks = await bookWeekly("member@hangarline.test", "N0556L", 100, "06:00", "07:00", 3);
    const before = weeks.map((id) => row(id));
    signInAs("pilot2@hangarline.test");
    const cancel = await cancelBookingSeries(EMPTY, form({ club: SLUG, bookingId: weeks[0]!, idempotencyKey: randomUUID() }));
    expect(cancel.ok).toBe(false);
    expect(cancel.message).toMatch(/Only the member who booked, or an instructor/);
    const move = await moveBookingSeries(EMPTY, form({ club: SLUG, bookingId: weeks[0]!, startTime: "12:00", endTime: "13:00", acceptedGuards: ALL_GUARDS, idempotencyKey: randomUUID() }));
    expect(move.ok).toBe(false);
    expect(move.message).toMatch(/Only the member who booked, or an instructor/);
    expect(weeks.map((id) => row(id))).toEqual(before);

    // An instructor may (the same permission as a single cancel), week by week.
    signInAs("instructor@hangarline.test");
    const byInstructor = await cancelBookingSeries(EMPTY, form({ club: SLUG, bookingId: weeks[1]!, idempotencyKey: randomUUID() }));
    expect(byInstructor, byInstructor.message).toMatchObject({ ok: true });
    expect(byInstructor.message).toMatch(/^Cancelled 2 weeks/);
    expect(weeks.map((id) => row(id).status)).toEqual(["reserved", "cancelled", "cancelled"]);
  });
});
