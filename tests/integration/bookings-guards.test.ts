import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { bookings, inspectionCompletions, inspectionItems } from "@/db/schema";
import { createBooking } from "@/lib/actions/bookings/create-booking";
import { addDays, isoDateInTimeZone } from "@/lib/dates";
import { postFlightCharge } from "@/db/queries/money-flight-charges";
import { EMPTY, clubBySlug, db, form, signInAs } from "./helpers";
import { localAt, makePilot, planeId, seedScenario, setGuards } from "./bookings-helpers";

const SLUG = "reedwater";
let day = 0;

/** Each attempt gets a day of its own, so that no two collide with each other. */
async function attempt(email: string, registration: string, extra: Record<string, string | string[]> = {}) {
  const club = clubBySlug(SLUG);
  signInAs(email);
  const d = day++;
  return createBooking(EMPTY, form({ club: SLUG, aircraftId: planeId(SLUG, registration), startsAt: localAt(club, 1 + d, "15:00"), endsAt: localAt(club, 1 + d, "16:30"), ...extra }));
}

function today() {
  return isoDateInTimeZone(new Date(), clubBySlug(SLUG).timeZone);
}

describe("booking guards: refused or warned as the club decides, always with the reason", () => {
  beforeAll(async () => {
    await seedScenario();
    const t = today();
    const good = { medicalExpiresOn: addDays(t, 400), flightReviewOn: addDays(t, -180), flewTypeDaysAgo: 5 };
    makePilot(SLUG, "ready@example.test", { checkouts: ["Fernwhistle F160", "Brightwing BW-4"], ...good });
    makePilot(SLUG, "kestrel.only@example.test", { checkouts: ["Fernwhistle F160"], ...good });
    makePilot(SLUG, "stale@example.test", { checkouts: ["Fernwhistle F160"], medicalExpiresOn: addDays(t, 400), flightReviewOn: addDays(t, -900), flewTypeDaysAgo: 5 });
    makePilot(SLUG, "nomedical@example.test", { checkouts: ["Fernwhistle F160"], medicalExpiresOn: addDays(t, -1), flightReviewOn: addDays(t, -180), flewTypeDaysAgo: 5 });
    const owes = makePilot(SLUG, "owes@example.test", { checkouts: ["Fernwhistle F160"], ...good });
    const club = clubBySlug(SLUG);
    db().transaction((tx) => {
      // A flight charge due long ago and never paid (terms + the club's 30 days' grace passed).
      postFlightCharge(tx, { club, user: null }, { clubId: club.id, memberUserId: owes, flightId: crypto.randomUUID(), meterOut: 100, meterIn: 101.2, ratePerHourMinor: 15_000, date: addDays(t, -100), aircraftLabel: "N0527L" });
    });
  });

  it("a pilot with everything in order books a flyable aircraft without any warning", async () => {
    const state = await attempt("ready@example.test", "N0534L");
    expect(state, state.message).toMatchObject({ ok: true });
    const row = db().select().from(bookings).where(eq(bookings.id, (state.data as { bookingId: string }).bookingId)).get()!;
    expect(row.acceptedWarnings).toEqual([]);
  });

  it("an aircraft flyable with limits: the warning quotes each limitation (14 CFR 91.213(d)); once read it is kept with the booking", async () => {
    const warned = await attempt("ready@example.test", "N0527L");
    expect(warned.ok).toBe(false);
    expect(warned.fieldErrors.warningGuards).toEqual(["limitations"]);
    expect(warned.fieldErrors.warnings?.[0]).toContain("Limitation: No night flight until the left landing light is repaired");
    const accepted = await attempt("ready@example.test", "N0527L", { acceptedGuards: ["limitations"] });
    expect(accepted, accepted.message).toMatchObject({ ok: true });
    const row = db().select().from(bookings).where(eq(bookings.id, (accepted.data as { bookingId: string }).bookingId)).get()!;
    expect(row.acceptedWarnings).toEqual([{ guard: "limitations", reason: warned.fieldErrors.warnings![0] }]);
  });

  it("grounded: refused with the grounding reason, or warned and then booked once read", async () => {
    setGuards(SLUG, { grounded: "refuse" });
    const refused = await attempt("ready@example.test", "N0512L", { acceptedGuards: ["grounded"] });
    expect(refused.ok).toBe(false);
    expect(refused.fieldErrors.refusals?.[0]).toMatch(/^N0512L is grounded: Grounding squawk: Right brake fades/);

    setGuards(SLUG, { grounded: "warn" });
    const warned = await attempt("ready@example.test", "N0512L");
    expect(warned.ok).toBe(false);
    expect(warned.fieldErrors.warningGuards).toEqual(["grounded"]);
    expect(warned.fieldErrors.warnings?.[0]).toMatch(/N0512L is grounded/);
    const accepted = await attempt("ready@example.test", "N0512L", { acceptedGuards: ["grounded"] });
    expect(accepted, accepted.message).toMatchObject({ ok: true });
    const row = db().select().from(bookings).where(eq(bookings.id, (accepted.data as { bookingId: string }).bookingId)).get()!;
    expect(row.acceptedWarnings[0]).toMatchObject({ guard: "grounded" });
    setGuards(SLUG, { grounded: "refuse" });
  });

  it("inspection due inside the window (by date): refused or warned", async () => {
    const club = clubBySlug(SLUG);
    const id = planeId(SLUG, "N0549L");
    const [item] = db().insert(inspectionItems).values({ clubId: club.id, aircraftId: id, key: "club-fixed", name: "Club insurance inspection", origin: "club", ruleKind: "fixed-date", required: true }).returning().all();
    db().insert(inspectionCompletions).values({ clubId: club.id, aircraftId: id, itemId: item!.id, doneOn: addDays(today(), -300), expiresOn: addDays(today(), 1), mechanicName: "Test Mechanic", mechanicCertificate: "A&P 0000000" }).run();
    const window = { startsAt: localAt(club, 3, "13:00"), endsAt: localAt(club, 3, "14:00") };
    signInAs("ready@example.test");
    setGuards(SLUG, { inspectionDue: "refuse" });
    const refused = await createBooking(EMPTY, form({ club: SLUG, aircraftId: id, ...window }));
    expect(refused.fieldErrors.refusals?.[0], refused.message).toMatch(/^N0549L comes due inside this booking .*Club insurance inspection overdue since/);
    setGuards(SLUG, { inspectionDue: "warn" });
    const warned = await createBooking(EMPTY, form({ club: SLUG, aircraftId: id, ...window }));
    expect(warned.fieldErrors.warningGuards).toContain("inspectionDue");
    // Tomorrow is still inside the expiry: no warning at all.
    const fine = await createBooking(EMPTY, form({ club: SLUG, aircraftId: id, startsAt: localAt(club, 1, "13:00"), endsAt: localAt(club, 1, "14:00") }));
    expect(fine, fine.message).toMatchObject({ ok: true });
    setGuards(SLUG, { inspectionDue: "refuse" });
  });

  it("not checked out in the type group: refused or warned; an instructor aboard lifts it", async () => {
    setGuards(SLUG, { notCheckedOut: "refuse" });
    const refused = await attempt("kestrel.only@example.test", "N0556L");
    expect(refused.fieldErrors.refusals?.[0]).toBe("kestrel.only is not checked out in the Larkspur L-2: book with an instructor, or ask one for a checkout.");
    setGuards(SLUG, { notCheckedOut: "warn" });
    const warned = await attempt("kestrel.only@example.test", "N0556L");
    expect(warned.fieldErrors.warningGuards).toEqual(["notCheckedOut"]);
    setGuards(SLUG, { notCheckedOut: "refuse" });
    const instructor = signInAs("instructor@hangarline.test")!;
    const dual = await attempt("kestrel.only@example.test", "N0556L", { instructorId: instructor.id });
    expect(dual, dual.message).toMatchObject({ ok: true });
  });

  it("flight review run out: refused by default (14 CFR 61.56(c)), warned only when the club says so", async () => {
    const refused = await attempt("stale@example.test", "N0527L", { acceptedGuards: ["limitations", "flightReview"] });
    expect(refused.ok).toBe(false);
    expect(refused.fieldErrors.refusals).toEqual([expect.stringMatching(/^stale may not act as pilot in command after \d{4}-\d{2}-\d{2}: the flight review expires before the booking ends \(14 CFR 61\.56\(c\)\)/)]);
    expect(refused.message).toMatch(/^Not booked: stale may not act as pilot in command/);
    setGuards(SLUG, { flightReview: "warn" });
    const warned = await attempt("stale@example.test", "N0527L");
    expect(warned.fieldErrors.warningGuards).toEqual(["limitations", "flightReview"]);
    setGuards(SLUG, { flightReview: "refuse" });
  });

  it("medical expired: refused or warned, with the expiry date", async () => {
    setGuards(SLUG, { medicalExpired: "refuse" });
    const refused = await attempt("nomedical@example.test", "N0527L");
    expect(refused.fieldErrors.refusals?.[0]).toBe(`nomedical's medical certificate expires after ${addDays(today(), -1)}, before the booking ends (14 CFR 61.23).`);
    setGuards(SLUG, { medicalExpired: "warn" });
    const warned = await attempt("nomedical@example.test", "N0527L");
    expect(warned.fieldErrors.warningGuards).toEqual(["limitations", "medicalExpired"]);
    setGuards(SLUG, { medicalExpired: "refuse" });
  });

  it("in arrears: warned by default with the amount, refused when the club says so", async () => {
    setGuards(SLUG, { inArrears: "warn" });
    const warned = await attempt("owes@example.test", "N0527L");
    expect(warned.fieldErrors.warningGuards).toEqual(["limitations", "inArrears"]);
    expect(warned.fieldErrors.warnings?.[1]).toMatch(/^owes's account is overdue: \$180\.00 owed, unpaid since \d{4}-\d{2}-\d{2}\.$/);
    setGuards(SLUG, { inArrears: "refuse" });
    const refused = await attempt("owes@example.test", "N0527L", { acceptedGuards: ["inArrears"] });
    expect(refused.fieldErrors.refusals?.[0]).toMatch(/account is overdue/);
    setGuards(SLUG, { inArrears: "warn" });
  });
});
