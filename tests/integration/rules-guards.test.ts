import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { auditLog, bookings, memberDocuments, outsideFlightEntries, preflightRecords, uploads, users } from "@/db/schema";
import { getMemberCurrency } from "@/db/queries/currency";
import { createBooking } from "@/lib/actions/bookings/create-booking";
import { beginFlight } from "@/lib/actions/bookings/begin-flight";
import { updateHomePosition } from "@/lib/actions/clubs/update-home-position";
import { recordDocument } from "@/lib/actions/documents/record-document";
import { recordOutsideFlight } from "@/lib/actions/documents/record-outside-flight";
import { verifyRecord } from "@/lib/actions/documents/verify-record";
import { addDays, isoDateInTimeZone } from "@/lib/dates";
import { EMPTY, clubBySlug, db, form, signInAs } from "./helpers";
import { localAt, makePilot, planeId, seedScenario } from "./bookings-helpers";
import { pngFile } from "./fleet-helpers";

// Night passenger currency (14 CFR 61.57(b)), the flight review refusal (61.56(c)), the
// limitation of a deferred item (91.213(d)) at booking and when the flight begins, and claims vs proof.

const SLUG = "reedwater";
const today = () => isoDateInTimeZone(new Date(), clubBySlug(SLUG).timeZone);
const userId = (email: string) => db().select().from(users).where(eq(users.email, email)).get()!.id;
let day = 20;

async function book(email: string, registration: string, time: { from: string; to: string }, extra: Record<string, string | string[]> = {}) {
  const club = clubBySlug(SLUG);
  signInAs(email);
  const d = day++;
  return createBooking(EMPTY, form({ club: SLUG, aircraftId: planeId(SLUG, registration), startsAt: localAt(club, d, time.from), endsAt: localAt(club, d, time.to), ...extra }));
}

const NIGHT = { from: "23:00", to: "23:45" };
const NOON = { from: "12:00", to: "13:00" };
const nightFindings = (s: { fieldErrors: Record<string, string[] | undefined> }) => [...(s.fieldErrors.refusals ?? []), ...(s.fieldErrors.warnings ?? [])].filter((r) => r.includes("14 CFR 61.57(b)"));

describe("rules before the pilot: night, flight review, limitations, claims", () => {
  beforeAll(async () => {
    await seedScenario();
    const t = today();
    // Checked out, verified review and medical, 3 verified day landings in a single-engine land
    // airplane five days ago, no night landings at all.
    makePilot(SLUG, "daytime@example.test", { checkouts: ["Fernwhistle F160"], medicalExpiresOn: addDays(t, 400), flightReviewOn: addDays(t, -100), flewTypeDaysAgo: 5 });
    makePilot(SLUG, "noreview@example.test", { checkouts: ["Fernwhistle F160"], medicalExpiresOn: addDays(t, 400), flewTypeDaysAgo: 5 });
    makePilot(SLUG, "claims@example.test", { checkouts: ["Fernwhistle F160"], medicalExpiresOn: addDays(t, 400), flewTypeDaysAgo: 5 });
  });

  it("night with passengers and no night currency: a finding citing 14 CFR 61.57(b); by day, none", async () => {
    const night = await book("daytime@example.test", "N0527L", NIGHT, { carryingPassengers: "on" });
    expect(night.ok).toBe(false);
    expect(nightFindings(night)).toEqual([expect.stringMatching(/^This booking touches night .*daytime may not carry passengers then: no 3 full-stop night landings within the preceding 90 days on record \(14 CFR 61\.57\(b\)\)\.$/)]);
    const noon = await book("daytime@example.test", "N0527L", NOON, { carryingPassengers: "on" });
    expect(nightFindings(noon)).toEqual([]);
    // Without passengers, night currency is not weighed (61.57(b) is about passengers).
    const solo = await book("daytime@example.test", "N0527L", NIGHT);
    expect(nightFindings(solo)).toEqual([]);
  });

  it("without the home field position night cannot be computed: with passengers, treated as night and said so", async () => {
    const club = clubBySlug(SLUG);
    signInAs("admin@hangarline.test");
    const cleared = await updateHomePosition(EMPTY, form({ club: SLUG, homeLatitude: "", homeLongitude: "" }));
    expect(cleared, cleared.message).toMatchObject({ ok: true });
    expect(clubBySlug(SLUG).settings).toMatchObject({ homeLatitude: null, homeLongitude: null });
    const noon = await book("daytime@example.test", "N0527L", NOON, { carryingPassengers: "on" });
    expect(nightFindings(noon)).toEqual([expect.stringMatching(/^Night unknown \(missing record: the club's home field position\)/)]);
    // Half a position is refused and nothing changes.
    signInAs("admin@hangarline.test");
    const half = await updateHomePosition(EMPTY, form({ club: SLUG, homeLatitude: "41.7", homeLongitude: "" }));
    expect(half.ok).toBe(false);
    expect(half.fieldErrors.homeLongitude?.[0]).toMatch(/both the latitude and the longitude/);
    // A member may not change it.
    signInAs("member@hangarline.test");
    expect((await updateHomePosition(EMPTY, form({ club: SLUG, homeLatitude: "10", homeLongitude: "10" }))).ok).toBe(false);
    signInAs("admin@hangarline.test");
    const saved = await updateHomePosition(EMPTY, form({ club: SLUG, homeLatitude: String(club.settings.homeLatitude), homeLongitude: String(club.settings.homeLongitude) }));
    expect(saved, saved.message).toMatchObject({ ok: true });
    expect(db().select().from(auditLog).where(and(eq(auditLog.clubId, club.id), eq(auditLog.action, "club.settings.update"))).all().length).toBeGreaterThanOrEqual(2);
  });

  it("no flight review: refused under 14 CFR 61.56(c), whatever warnings are accepted", async () => {
    const refused = await book("noreview@example.test", "N0527L", NOON, { acceptedGuards: ["flightReview", "limitations", "notCurrent"] });
    expect(refused.ok).toBe(false);
    expect(refused.fieldErrors.refusals).toEqual(["noreview may not act as pilot in command: no verified flight review on record (14 CFR 61.56(c)). Book with an instructor, or have an instructor verify your flight review."]);
    // An instructor aboard is pilot in command: bookable.
    const instructor = userId("instructor@hangarline.test");
    const dual = await book("noreview@example.test", "N0527L", NOON, { instructorId: instructor, acceptedGuards: ["limitations"] });
    expect(dual, dual.message).toMatchObject({ ok: true });
  });

  it("a limitation is quoted at booking, kept with it, and must be ticked again when the flight begins", async () => {
    const warned = await book("daytime@example.test", "N0527L", NOON);
    expect(warned.fieldErrors.warningGuards).toEqual(["limitations"]);
    expect(warned.fieldErrors.warnings?.[0]).toContain("“Deferred, placarded inoperative (14 CFR 91.213(d)): Left landing light inoperative. Limitation: No night flight until the left landing light is repaired”");
    const club = clubBySlug(SLUG);
    signInAs("daytime@example.test");
    const made = await createBooking(EMPTY, form({ club: SLUG, aircraftId: planeId(SLUG, "N0527L"), startsAt: localAt(club, 0, "23:15"), endsAt: localAt(club, 0, "23:45"), acceptedGuards: ["limitations"] }));
    expect(made, made.message).toMatchObject({ ok: true });
    const bookingId = (made.data as { bookingId: string }).bookingId;
    expect(db().select().from(bookings).where(eq(bookings.id, bookingId)).get()!.acceptedWarnings.map((w) => w.guard)).toEqual(["limitations"]);
    const [record] = db().insert(preflightRecords).values({ clubId: club.id, bookingId, aircraftId: planeId(SLUG, "N0527L"), userId: userId("daytime@example.test"), fuel: [], fuelUnit: "gal", sumps: [], oilQuantity: 6, oilMinimum: 4, oilUnit: "qt", outcome: "ok" }).returning().all();
    const without = await beginFlight(EMPTY, form({ club: SLUG, bookingId, preflightRecordId: record!.id, confirmPreflight: "on", acceptFindings: "on" }));
    expect(without.ok).toBe(false);
    expect(without.message).toBe("Flight not begun: N0527L flies with limits. Read each limitation and tick that you will fly within it.");
    expect(without.fieldErrors.acceptLimitations).toEqual(["Deferred, placarded inoperative (14 CFR 91.213(d)): Left landing light inoperative. Limitation: No night flight until the left landing light is repaired"]);
    expect(db().select().from(bookings).where(eq(bookings.id, bookingId)).get()!.status).toBe("reserved");
    const ticked = await beginFlight(EMPTY, form({ club: SLUG, bookingId, preflightRecordId: record!.id, confirmPreflight: "on", acceptLimitations: "on" }));
    expect(ticked, ticked.message).toMatchObject({ ok: true });
    expect(db().select().from(bookings).where(eq(bookings.id, bookingId)).get()!.status).toBe("dispatched");
    const audit = db().select().from(auditLog).where(and(eq(auditLog.subjectId, bookingId), eq(auditLog.action, "booking.flight.begin"))).get()!;
    expect((audit.after as { limitationsAccepted: string[] }).limitationsAccepted).toHaveLength(1);
  });

  it("a claimed flight review never clears the refusal; verified by an instructor with the logbook page, it does", async () => {
    const club = clubBySlug(SLUG);
    signInAs("claims@example.test");
    const claimed = await recordDocument(EMPTY, form({ club: SLUG, kind: "flight_review", issuedOn: addDays(today(), -30), details: "Another club's instructor" }));
    expect(claimed, claimed.message).toMatchObject({ ok: true });
    const reviewId = (claimed.data as { documentId: string }).documentId;
    const refused = await book("claims@example.test", "N0527L", NOON, { acceptedGuards: ["limitations"] });
    expect(refused.fieldErrors.refusals?.[0]).toMatch(/no verified flight review on record \(14 CFR 61\.56\(c\)\)/);
    const claimsId = userId("claims@example.test");
    const item = getMemberCurrency(db(), club, claimsId, today()).items.find((i) => i.key === "flight_review")!;
    expect(item).toMatchObject({ state: "missing", lastDay: null, claim: { state: "current" } });

    // The member cannot verify their own claim; nor can another member.
    expect((await verifyRecord(EMPTY, form({ club: SLUG, kind: "flight_review", recordId: reviewId, evidenceSeen: "on", file: pngFile("page.png") }))).ok).toBe(false);
    signInAs("member@hangarline.test");
    expect((await verifyRecord(EMPTY, form({ club: SLUG, kind: "flight_review", recordId: reviewId, evidenceSeen: "on", file: pngFile("page.png") }))).ok).toBe(false);

    // An instructor: without the logbook page (no file on the record) it is refused, nothing written.
    signInAs("instructor@hangarline.test");
    const noEvidence = await verifyRecord(EMPTY, form({ club: SLUG, kind: "flight_review", recordId: reviewId, evidenceSeen: "on" }));
    expect(noEvidence.ok).toBe(false);
    expect(noEvidence.fieldErrors.file?.[0]).toMatch(/Attach the logbook page or certificate/);
    const notTicked = await verifyRecord(EMPTY, form({ club: SLUG, kind: "flight_review", recordId: reviewId, file: pngFile("page.png") }));
    expect(notTicked.fieldErrors.evidenceSeen?.[0]).toMatch(/checked the record/);
    expect(db().select().from(memberDocuments).where(eq(memberDocuments.id, reviewId)).get()!.verifiedAt).toBeNull();
    expect(db().select().from(uploads).where(eq(uploads.subjectId, reviewId)).all()).toHaveLength(0);

    const verified = await verifyRecord(EMPTY, form({ club: SLUG, kind: "flight_review", recordId: reviewId, evidenceSeen: "on", file: pngFile("page.png"), idempotencyKey: "11111111-2222-4333-8444-555555555555" }));
    expect(verified, verified.message).toMatchObject({ ok: true });
    const row = db().select().from(memberDocuments).where(eq(memberDocuments.id, reviewId)).get()!;
    expect(row.verifiedById).toBe(userId("instructor@hangarline.test"));
    expect(db().select().from(uploads).where(eq(uploads.id, row.verificationUploadId!)).get()).toMatchObject({ subjectType: "MemberDocument", ownerUserId: claimsId });
    expect(db().select().from(auditLog).where(and(eq(auditLog.subjectId, reviewId), eq(auditLog.action, "currency.verify"))).all()).toHaveLength(1);
    // The same submission again answers the same and writes nothing more.
    const again = await verifyRecord(EMPTY, form({ club: SLUG, kind: "flight_review", recordId: reviewId, evidenceSeen: "on", file: pngFile("page.png"), idempotencyKey: "11111111-2222-4333-8444-555555555555" }));
    expect(again.message).toBe(verified.message);
    expect(db().select().from(auditLog).where(and(eq(auditLog.subjectId, reviewId), eq(auditLog.action, "currency.verify"))).all()).toHaveLength(1);

    const booked = await book("claims@example.test", "N0527L", NOON, { acceptedGuards: ["limitations"] });
    expect(booked, booked.message).toMatchObject({ ok: true });
  });

  it("claimed outside landings are shown, never counted, until the safety officer verifies them", async () => {
    const club = clubBySlug(SLUG);
    const member = userId("claims@example.test");
    signInAs("claims@example.test");
    const added = await recordOutsideFlight(EMPTY, form({ club: SLUG, flownOn: today(), aircraftDescription: "Rental at Pinecrest Strip (PINESTRIP)", category: "Airplane", classRating: "Single-engine land", dayLandings: "0", nightFullStopLandings: "3" }));
    expect(added, added.message).toMatchObject({ ok: true });
    const key = "passenger_night:airplane/singleengineland";
    const before = getMemberCurrency(db(), club, member, today()).items.find((i) => i.key === key)!;
    expect(before).toMatchObject({ state: "missing", lastDay: null, claim: { state: "current", lastDay: addDays(today(), 89) } }); // 14 CFR 61.57(b): D + 89
    const night = await book("claims@example.test", "N0527L", NIGHT, { carryingPassengers: "on", acceptedGuards: ["limitations"] });
    expect(night.ok).toBe(false);
    expect(nightFindings(night)).toHaveLength(1);

    const entry = db().select().from(outsideFlightEntries).where(and(eq(outsideFlightEntries.userId, member), eq(outsideFlightEntries.flownOn, today()))).get()!;
    signInAs("safety@hangarline.test");
    const verified = await verifyRecord(EMPTY, form({ club: SLUG, kind: "outside_flight", recordId: entry.id, evidenceSeen: "on", file: pngFile("logbook.png") }));
    expect(verified, verified.message).toMatchObject({ ok: true });
    const after = getMemberCurrency(db(), club, member, today()).items.find((i) => i.key === key)!;
    expect(after).toEqual({ key, label: "Passengers at night — Airplane single-engine land", state: "current", lastDay: addDays(today(), 89) }); // 14 CFR 61.57(b)
    const nightAgain = await book("claims@example.test", "N0527L", NIGHT, { carryingPassengers: "on", acceptedGuards: ["limitations"] });
    expect(nightAgain, nightAgain.message).toMatchObject({ ok: true });
    // Verifying twice is refused: it is already verified.
    signInAs("safety@hangarline.test");
    expect((await verifyRecord(EMPTY, form({ club: SLUG, kind: "outside_flight", recordId: entry.id, evidenceSeen: "on", file: pngFile("logbook.png") }))).message).toMatch(/already verified/);
    // Another club's record is not found.
    signInAs("cottonwood.maint@hangarline.test");
    expect((await verifyRecord(EMPTY, form({ club: "cottonwood-flyers", kind: "outside_flight", recordId: entry.id, evidenceSeen: "on", file: pngFile("logbook.png") }))).message).toMatch(/not found/);
  });
});
