import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { GET as getBookingRoute } from "@/app/api/clubs/[club]/bookings/[bookingId]/route";
import { GET as listRoute, POST as createRoute } from "@/app/api/clubs/[club]/bookings/route";
import { auditLog, bookings, emailOutbox } from "@/db/schema";
import { listBookingHolders } from "@/db/queries/bookings-holders";
import { cancelBooking } from "@/lib/actions/bookings/cancel-booking";
import { changeBooking } from "@/lib/actions/bookings/change-booking";
import { createBooking } from "@/lib/actions/bookings/create-booking";
import { emailBookingHoldersOfGrounding } from "@/lib/actions/bookings/notify-grounding";
import { issueGroundingNotice } from "@/lib/actions/fleet/issue-grounding-notice";
import { triageSquawk } from "@/lib/actions/fleet/triage-squawk";
import { squawks } from "@/db/schema";
import { EMPTY, clubBySlug, db, form, signInAs } from "./helpers";
import { ALL_GUARDS, localAt, planeId, seedScenario, setGuards } from "./bookings-helpers";

const SLUG = "reedwater";

async function book(email: string, registration: string, days: number, from: string, to: string, extra: Record<string, string> = {}) {
  const club = clubBySlug(SLUG);
  signInAs(email);
  const state = await createBooking(EMPTY, form({ club: SLUG, aircraftId: planeId(SLUG, registration), startsAt: localAt(club, days, from), endsAt: localAt(club, days, to), acceptedGuards: ALL_GUARDS, ...extra }));
  expect(state, state.message).toMatchObject({ ok: true });
  return (state.data as { bookingId: string }).bookingId;
}

describe("changing and cancelling, the late rule, grounding e-mails, and the JSON routes", () => {
  beforeAll(async () => {
    await seedScenario();
    setGuards(SLUG, { grounded: "warn", inspectionDue: "warn", notCheckedOut: "warn", notCurrent: "warn", flightReview: "warn", medicalExpired: "warn", inArrears: "warn" }, { lateCancellationHours: 24 });
  });

  it("cancelling well ahead is on time; the aircraft is free again", async () => {
    const id = await book("member@hangarline.test", "N0534L", 6, "09:00", "10:00");
    const state = await cancelBooking(EMPTY, form({ club: SLUG, bookingId: id, reason: "Weather" }));
    expect(state).toMatchObject({ ok: true, data: { late: false } });
    expect(db().select().from(bookings).where(eq(bookings.id, id)).get()).toMatchObject({ status: "cancelled", lateCancel: false, cancelReason: "Weather" });
    await book("pilot2@hangarline.test", "N0534L", 6, "09:00", "10:00");
    expect(db().select().from(auditLog).where(and(eq(auditLog.action, "booking.cancel"), eq(auditLog.subjectId, id))).all()).toHaveLength(1);
  });

  it("cancelling inside the club's 24 hours is flagged late, and said so", async () => {
    const club = clubBySlug(SLUG);
    const soon = new Date(Date.now() + 3 * 3_600_000);
    const local = (ms: number) => new Intl.DateTimeFormat("sv-SE", { timeZone: club.timeZone, dateStyle: "short", timeStyle: "short" }).format(new Date(ms)).replace(" ", "T");
    signInAs("member@hangarline.test");
    const made = await createBooking(EMPTY, form({ club: SLUG, aircraftId: planeId(SLUG, "N0556L"), startsAt: local(soon.getTime()), endsAt: local(soon.getTime() + 3_600_000), acceptedGuards: ALL_GUARDS }));
    expect(made, made.message).toMatchObject({ ok: true });
    const state = await cancelBooking(EMPTY, form({ club: SLUG, bookingId: (made.data as { bookingId: string }).bookingId }));
    expect(state.message).toMatch(/Late cancellation: \d\.\d h before the start, inside the club's 24-hour rule\./);
    expect(db().select().from(bookings).where(eq(bookings.id, (made.data as { bookingId: string }).bookingId)).get()!.lateCancel).toBe(true);
  });

  it("a change runs the overlap check again, and only the member or an instructor may change", async () => {
    const club = clubBySlug(SLUG);
    const mine = await book("member@hangarline.test", "N0549L", 7, "09:00", "10:00");
    await book("pilot2@hangarline.test", "N0549L", 7, "11:00", "12:00");
    signInAs("member@hangarline.test");
    const clash = await changeBooking(EMPTY, form({ club: SLUG, bookingId: mine, startsAt: localAt(club, 7, "10:30"), endsAt: localAt(club, 7, "11:30"), acceptedGuards: ALL_GUARDS }));
    expect(clash.fieldErrors.startsAt?.[0]).toMatch(/N0549L is already booked/);
    const moved = await changeBooking(EMPTY, form({ club: SLUG, bookingId: mine, startsAt: localAt(club, 7, "08:00"), endsAt: localAt(club, 7, "11:00"), acceptedGuards: ALL_GUARDS }));
    expect(moved, moved.message).toMatchObject({ ok: true });
    signInAs("pilot2@hangarline.test");
    const other = await changeBooking(EMPTY, form({ club: SLUG, bookingId: mine, startsAt: localAt(club, 7, "08:00"), endsAt: localAt(club, 7, "09:00") }));
    expect(other.message).toMatch(/Only the member who booked, or an instructor/);
    const cancel = await cancelBooking(EMPTY, form({ club: SLUG, bookingId: mine }));
    expect(cancel.ok).toBe(false);
    expect(db().select().from(bookings).where(eq(bookings.id, mine)).get()!.status).toBe("reserved");
  });

  it("booking holders of a grounded aircraft are found, each once, and e-mailed through the outbox", async () => {
    const club = clubBySlug(SLUG);
    const aircraftId = planeId(SLUG, "N0556L");
    const instructor = signInAs("instructor@hangarline.test")!;
    await book("student@hangarline.test", "N0556L", 9, "09:00", "10:00", { instructorId: instructor.id });
    await book("student@hangarline.test", "N0556L", 9, "10:00", "11:00");
    const holders = listBookingHolders(db(), club.id, aircraftId, new Date());
    const emails = holders.map((h) => h.email).sort();
    expect(emails).toEqual(expect.arrayContaining(["instructor@hangarline.test", "student@hangarline.test"]));
    expect(new Set(emails).size).toBe(emails.length);
    expect(holders.every((h) => h.why === "booking")).toBe(true);
    const before = db().select().from(emailOutbox).where(eq(emailOutbox.template, "grounding-notice")).all().length;
    const queued = db().transaction((tx) => emailBookingHoldersOfGrounding(tx, club, { id: aircraftId, registration: "N0556L", make: "Larkspur", model: "L-2 Trainer" }, { reason: "Grounding squawk: nose strut", effectiveAt: new Date(), issuedBy: "Mei Lindqvist" }));
    expect(queued).toBe(holders.length);
    const rows = db().select().from(emailOutbox).where(eq(emailOutbox.template, "grounding-notice")).all().slice(before);
    expect(rows.map((r) => r.toAddress).sort()).toEqual(emails);
    expect(rows[0]!.payload).toMatchObject({ registration: "N0556L", because: "booking" });
  });

  it("a squawk triaged as grounding e-mails the members holding bookings on that aircraft", async () => {
    await book("pilot2@hangarline.test", "N0549L", 10, "13:00", "14:00");
    const club = clubBySlug(SLUG);
    const aircraftId = planeId(SLUG, "N0549L");
    const [sq] = db().insert(squawks).values({ clubId: club.id, aircraftId, description: "Left brake soft and fading", foundDuring: "postflight", reportedById: signInAs("member@hangarline.test")!.id }).returning().all();
    const before = db().select().from(emailOutbox).where(eq(emailOutbox.template, "grounding-notice")).all().length;
    signInAs("maintenance@hangarline.test");
    const state = await triageSquawk(EMPTY, form({ club: SLUG, squawkId: sq!.id, triage: "grounding" }));
    expect(state, state.message).toMatchObject({ ok: true });
    expect(state.message).toMatch(/with bookings on this aircraft will be e-mailed/);
    const rows = db().select().from(emailOutbox).where(eq(emailOutbox.template, "grounding-notice")).all().slice(before);
    expect(rows.map((r) => r.toAddress)).toContain("pilot2@hangarline.test");
    expect(rows.find((r) => r.toAddress === "pilot2@hangarline.test")!.payload).toMatchObject({ registration: "N0549L", because: "booking", reason: "Left brake soft and fading" });
  });

  it("a grounding notice reaches the booking holders first, marked as such", async () => {
    signInAs("safety@hangarline.test");
    const before = db().select().from(emailOutbox).where(eq(emailOutbox.template, "grounding-notice")).all().length;
    const state = await issueGroundingNotice(EMPTY, form({ club: SLUG, aircraftId: planeId(SLUG, "N0556L"), category: "safety", reason: "Fuel smell in the cabin reported" }));
    expect(state, state.message).toMatchObject({ ok: true });
    const rows = db().select().from(emailOutbox).where(eq(emailOutbox.template, "grounding-notice")).all().slice(before);
    const student = rows.find((r) => r.toAddress === "student@hangarline.test")!;
    expect(student.payload).toMatchObject({ because: "booking" });
    expect(rows.find((r) => r.toAddress === "treasurer@hangarline.test")!.payload).toMatchObject({ because: "member" });
    // Booking holders are queued first.
    expect(rows.findIndex((r) => (r.payload as { because: string }).because === "member")).toBeGreaterThan(rows.findIndex((r) => r.toAddress === "student@hangarline.test"));
  });

  it("the JSON routes: a week of bookings, one booking, creation with typed errors; another club's is a 404", async () => {
    const club = clubBySlug(SLUG);
    signInAs("member@hangarline.test");
    const week = await listRoute(new Request("http://app.test/api/clubs/reedwater/bookings?view=week"), { params: Promise.resolve({ club: SLUG }) });
    expect(week.status).toBe(200);
    const body = (await week.json()) as { data: { days: string[]; bookings: { id: string }[] } };
    expect(body.data.days).toHaveLength(7);
    const bad = await listRoute(new Request("http://app.test/api/clubs/reedwater/bookings?date=tomorrow"), { params: Promise.resolve({ club: SLUG }) });
    expect(bad.status).toBe(400);

    const post = (payload: unknown) => createRoute(new Request("http://app.test/api/clubs/reedwater/bookings", { method: "POST", body: JSON.stringify(payload) }), { params: Promise.resolve({ club: SLUG }) });
    const created = await post({ aircraftId: planeId(SLUG, "N0534L"), startsAt: localAt(club, 10, "09:00"), endsAt: localAt(club, 10, "10:00"), acceptedGuards: ALL_GUARDS });
    expect(created.status).toBe(201);
    const { data } = (await created.json()) as { data: { id: string } };
    expect((await post({ aircraftId: planeId(SLUG, "N0534L"), startsAt: localAt(club, 10, "09:30"), endsAt: localAt(club, 10, "10:30"), acceptedGuards: ALL_GUARDS })).status).toBe(409);
    setGuards(SLUG, { grounded: "refuse" });
    const refused = await post({ aircraftId: planeId(SLUG, "N0512L"), startsAt: localAt(club, 10, "13:00"), endsAt: localAt(club, 10, "14:00"), acceptedGuards: ALL_GUARDS });
    expect(refused.status).toBe(422);
    expect(((await refused.json()) as { error: { fields: { refusals: string[] } } }).error.fields.refusals[0]).toMatch(/N0512L is grounded/);
    setGuards(SLUG, { grounded: "warn" });
    expect((await post({ aircraftId: "", startsAt: "x" })).status).toBe(400);

    const one = await getBookingRoute(new Request("http://app.test"), { params: Promise.resolve({ club: SLUG, bookingId: data.id }) });
    expect(one.status).toBe(200);
    // A booking of another club, asked for through this club, is answered like a missing one.
    const cottonwood = clubBySlug("cottonwood-flyers");
    const theirs = db().select().from(bookings).where(eq(bookings.clubId, cottonwood.id)).get()!;
    expect((await getBookingRoute(new Request("http://app.test"), { params: Promise.resolve({ club: SLUG, bookingId: theirs.id }) })).status).toBe(404);
    // And a club the person has no role in is a 404 too.
    expect((await getBookingRoute(new Request("http://app.test"), { params: Promise.resolve({ club: "cottonwood-flyers", bookingId: theirs.id }) })).status).toBe(404);
    signInAs(null);
    expect((await listRoute(new Request("http://app.test/api/clubs/reedwater/bookings"), { params: Promise.resolve({ club: SLUG }) })).status).toBe(401);
  });
});
