// Exactly once: a form's idempotency key (and the API's Idempotency-Key header) makes a second
// press, a retry or a replay return the first answer and write nothing — no row, no audit row,
// no outbox e-mail, no journal entry. Checked against every table's row count.
import fs from "node:fs";
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { POST as createBookingRoute } from "@/app/api/clubs/[club]/bookings/route";
import { aircraft, bookings, bulletinAcknowledgements, flights, groundingNotices, idempotentWrites, journalEntries, payments, safetyReportEvents, safetyReports, uploads, squawkEvents, squawks, users } from "@/db/schema";
import type { ActionState } from "@/lib/actions/action-state";
import { createBooking } from "@/lib/actions/bookings/create-booking";
import { issueGroundingNotice } from "@/lib/actions/fleet/issue-grounding-notice";
import { logFlight } from "@/lib/actions/fleet/log-flight";
import { reportSquawk } from "@/lib/actions/fleet/report-squawk";
import { triageSquawk } from "@/lib/actions/fleet/triage-squawk";
import { recordManualPayment } from "@/lib/actions/money/record-manual-payment";
import { acknowledgeBulletin } from "@/lib/actions/safety/acknowledge-bulletin";
import { createBulletin } from "@/lib/actions/safety/create-bulletin";
import { fileReport } from "@/lib/actions/safety/file-report";
import { groundFromReport } from "@/lib/actions/safety/ground-from-report";
import { clubToday } from "@/lib/actions/safety/bulletin-publishing";
import { IDEMPOTENCY_TTL_MS, KEY_REUSED_MESSAGE, MALFORMED_KEY_MESSAGE, pruneIdempotentWrites } from "@/lib/server/idempotency";
import { EMPTY, clubBySlug, db, expectRedirect, squawkIdOf, form, signInAs } from "./helpers";
import { pngFile } from "./fleet-helpers";
import { ALL_GUARDS, localAt, planeId, seedScenario, setGuards } from "./bookings-helpers";

const CLUB = "reedwater";
const MEMBER = "member@hangarline.test";
type Action = (prev: ActionState, fd: FormData) => Promise<ActionState>;

const key = () => crypto.randomUUID();

function tableCounts(): Record<string, number> {
  const tables = (db().$client.prepare("select name from sqlite_master where type = 'table' and name not like 'sqlite_%'").all() as { name: string }[]).map((t) => t.name);
  return Object.fromEntries(tables.map((t) => [t, (db().$client.prepare(`select count(*) as n from "${t}"`).get() as { n: number }).n]));
}

/** The action's whole answer: its state (with `redirectTo` when it sends the browser on; actions never redirect themselves). */
async function answerOf(action: Action, fields: Record<string, string | string[]>): Promise<{ state?: ActionState; redirect?: string }> {
  const state = await action(EMPTY, form(fields));
  return state.redirectTo ? { state, redirect: state.redirectTo } : { state };
}

/**
 * Sends `fields` with one key, then the same again: the second answer equals the first and not one
 * row in any table changed (so no audit row, outbox e-mail or journal entry either).
 */
async function onceThenReplay(action: Action, fields: Record<string, string | string[]>) {
  const k = key();
  const first = await answerOf(action, { ...fields, idempotencyKey: k });
  if (first.state) expect(first.state, first.state.message).toMatchObject({ ok: true });
  const after = tableCounts();
  const second = await answerOf(action, { ...fields, idempotencyKey: k });
  expect(second).toEqual(first);
  expect(tableCounts()).toEqual(after);
  return { first, key: k, counts: after };
}

const uid = (email: string) => db().select().from(users).where(eq(users.email, email)).get()!.id;

describe("exactly once: forms", () => {
  beforeAll(async () => {
    await seedScenario();
    setGuards(CLUB, { notCurrent: "warn", inArrears: "warn" });
  });

  it("a squawk report sent twice with one key: one squawk, the same answer, nothing else written", async () => {
    signInAs(MEMBER);
    const plane = planeId(CLUB, "N0556L");
    const before = db().select().from(squawks).all().length;
    const { first } = await onceThenReplay(reportSquawk, { club: CLUB, aircraftId: plane, description: "Nose tire worn to the cord", foundDuring: "preflight" });
    expect(first.state?.message).toBe("Squawk reported: “Nose tire worn to the cord”.");
    expect(db().select().from(squawks).all().length).toBe(before + 1);
    const stored = db().select().from(idempotentWrites).all().at(-1)!;
    expect(stored).toMatchObject({ clubId: clubBySlug(CLUB).id, actorUserId: uid(MEMBER) });
  });

  it("parallel duplicates (a double tap) write one squawk and both get the same answer", async () => {
    signInAs(MEMBER);
    const plane = planeId(CLUB, "N0556L");
    const before = db().select().from(squawks).all().length;
    const fields = { club: CLUB, aircraftId: plane, description: "Left strobe flickers", foundDuring: "preflight", idempotencyKey: key() };
    const [a, b, c] = await Promise.all([answerOf(reportSquawk, fields), answerOf(reportSquawk, fields), answerOf(reportSquawk, fields)]);
    expect(a.state?.message).toBe("Squawk reported: “Left strobe flickers”.");
    expect(b).toEqual(a);
    expect(c).toEqual(a);
    expect(db().select().from(squawks).all().length).toBe(before + 1);
  });

  it("a double tap with a photo keeps one photo on disk: the duplicate's stored file is discarded", async () => {
    signInAs(MEMBER);
    const plane = planeId(CLUB, "N0556L");
    const filesOnDisk = () => (fs.existsSync(process.env.UPLOAD_DIR!) ? fs.readdirSync(process.env.UPLOAD_DIR!, { recursive: true, withFileTypes: true }).filter((e) => e.isFile()).length : 0);
    const before = filesOnDisk();
    const k = key();
    const send = () => reportSquawk(EMPTY, form({ club: CLUB, aircraftId: plane, description: "Cracked fairing", foundDuring: "preflight", idempotencyKey: k, photos: pngFile() }));
    const [a, b] = await Promise.all([send(), send()]);
    expect(a).toMatchObject({ ok: true, message: "Squawk reported: “Cracked fairing”." });
    expect(b).toEqual(a);
    expect(filesOnDisk()).toBe(before + 1);
    expect(db().select().from(uploads).all().length).toBeGreaterThan(0);
  });

  it("a different key is a different submission: a second squawk", async () => {
    signInAs(MEMBER);
    const plane = planeId(CLUB, "N0556L");
    const fields = { club: CLUB, aircraftId: plane, description: "Oil on the nose gear leg", foundDuring: "preflight" };
    const before = db().select().from(squawks).all().length;
    const one = await answerOf(reportSquawk, { ...fields, idempotencyKey: key() });
    const two = await answerOf(reportSquawk, { ...fields, idempotencyKey: key() });
    expect(one.state?.data).not.toEqual(two.state?.data);
    expect(db().select().from(squawks).all().length).toBe(before + 2);
  });

  it("the same key from another person, or for another action, is refused and writes nothing", async () => {
    signInAs(MEMBER);
    const plane = planeId(CLUB, "N0556L");
    const k = key();
    await answerOf(reportSquawk, { club: CLUB, aircraftId: plane, description: "Pitot cover missing", foundDuring: "preflight", idempotencyKey: k });
    const before = tableCounts();
    signInAs("pilot2@hangarline.test");
    const other = await answerOf(reportSquawk, { club: CLUB, aircraftId: plane, description: "Pitot cover missing", foundDuring: "preflight", idempotencyKey: k });
    expect(other.state).toMatchObject({ ok: false, message: KEY_REUSED_MESSAGE });
    signInAs(MEMBER);
    const otherAction = await answerOf(logFlight, { club: CLUB, aircraftId: plane, flownOn: "2026-01-15", hobbsOut: "1", hobbsIn: "2", tachOut: "1", tachIn: "2", dayLandings: "1", idempotencyKey: k });
    expect(otherAction.state).toMatchObject({ ok: false, message: KEY_REUSED_MESSAGE });
    expect(tableCounts()).toEqual(before);
  });

  it("a refused first submission stores no key: the corrected one with the same key goes through", async () => {
    signInAs(MEMBER);
    const plane = planeId(CLUB, "N0556L");
    const k = key();
    const before = tableCounts();
    const refused = await answerOf(reportSquawk, { club: CLUB, aircraftId: plane, description: "", foundDuring: "preflight", idempotencyKey: k });
    expect(refused.state?.ok).toBe(false);
    expect(refused.state?.fieldErrors.description?.length).toBeGreaterThan(0);
    expect(tableCounts()).toEqual(before);
    const fixed = await answerOf(reportSquawk, { club: CLUB, aircraftId: plane, description: "Door seal torn at the hinge", foundDuring: "preflight", idempotencyKey: k });
    expect(fixed.state).toMatchObject({ ok: true, message: "Squawk reported: “Door seal torn at the hinge”." });
  });

  it("a malformed key is refused with a clear message and nothing is written", async () => {
    signInAs(MEMBER);
    const plane = planeId(CLUB, "N0556L");
    const before = tableCounts();
    for (const bad of ["short", "x".repeat(200), "has spaces in it, which no key has", "<script>alert(1)</script>-0000"]) {
      const state = await answerOf(reportSquawk, { club: CLUB, aircraftId: plane, description: "Bad key test", foundDuring: "preflight", idempotencyKey: bad });
      expect(state.state).toMatchObject({ ok: false, message: MALFORMED_KEY_MESSAGE });
      expect(state.state?.fieldErrors.idempotencyKey).toEqual([MALFORMED_KEY_MESSAGE]);
    }
    const twoKeys = await answerOf(reportSquawk, { club: CLUB, aircraftId: plane, description: "Bad key test", foundDuring: "preflight", idempotencyKey: [key(), key()] });
    expect(twoKeys.state?.ok).toBe(false);
    expect(tableCounts()).toEqual(before);
  });

  it("triage replayed: one triage event, the same answer", async () => {
    signInAs(MEMBER);
    const plane = planeId(CLUB, "N0556L");
    const squawkId = await squawkIdOf(() => reportSquawk(EMPTY, form({ club: CLUB, aircraftId: plane, description: "Cowling fastener missing", foundDuring: "preflight" })));
    signInAs("maintenance@hangarline.test");
    await onceThenReplay(triageSquawk, { club: CLUB, squawkId, triage: "grounding", note: "Replace before flight" });
    expect(db().select().from(squawkEvents).where(and(eq(squawkEvents.squawkId, squawkId), eq(squawkEvents.kind, "triaged"))).all()).toHaveLength(1);
  });

  it("a booking: replayed and raced with one key, one booking; another key books again", async () => {
    signInAs(MEMBER);
    const club = clubBySlug(CLUB);
    const plane = planeId(CLUB, "N0527L");
    const fields = { club: CLUB, aircraftId: plane, startsAt: localAt(club, 21, "09:00"), endsAt: localAt(club, 21, "10:00"), acceptedGuards: ALL_GUARDS };
    const count = () => db().select().from(bookings).where(eq(bookings.aircraftId, plane)).all().length;
    const before = count();
    const { first } = await onceThenReplay(createBooking as Action, fields);
    expect(count()).toBe(before + 1);
    expect(first.state?.data).toMatchObject({ bookingId: expect.any(String) });

    const raced = { ...fields, startsAt: localAt(club, 22, "09:00"), endsAt: localAt(club, 22, "10:00"), idempotencyKey: key() };
    const answers = await Promise.all([answerOf(createBooking as Action, raced), answerOf(createBooking as Action, raced)]);
    expect(answers[0]!.state?.ok).toBe(true);
    expect(answers[1]).toEqual(answers[0]);
    expect(count()).toBe(before + 2);

    const another = await answerOf(createBooking as Action, { ...fields, startsAt: localAt(club, 23, "09:00"), endsAt: localAt(club, 23, "10:00"), idempotencyKey: key() });
    expect(another.state?.ok).toBe(true);
    expect(count()).toBe(before + 3);
  });

  it("a manual payment: one payment and one journal entry, however often it is sent", async () => {
    signInAs("treasurer@hangarline.test");
    const club = clubBySlug(CLUB);
    const journal = () => db().select().from(journalEntries).where(eq(journalEntries.clubId, club.id)).all().length;
    const paid = () => db().select().from(payments).where(eq(payments.clubId, club.id)).all().length;
    const [j0, p0] = [journal(), paid()];
    const fields = { club: CLUB, memberUserId: uid(MEMBER), method: "cheque", amount: "75.00", receivedOn: clubToday({ club }), reference: "2231" };
    await onceThenReplay(recordManualPayment as Action, fields);
    expect([journal(), paid()]).toEqual([j0 + 1, p0 + 1]);
    const k = key();
    await Promise.all([answerOf(recordManualPayment as Action, { ...fields, idempotencyKey: k }), answerOf(recordManualPayment as Action, { ...fields, idempotencyKey: k })]);
    expect([journal(), paid()]).toEqual([j0 + 2, p0 + 2]);
  });

  it("a grounding notice: one notice and one e-mail per member, however often it is sent", async () => {
    signInAs("safety@hangarline.test");
    const plane = planeId(CLUB, "N0549L");
    const before = db().select().from(groundingNotices).where(eq(groundingNotices.aircraftId, plane)).all().length;
    const { counts } = await onceThenReplay(issueGroundingNotice as Action, { club: CLUB, aircraftId: plane, category: "safety", reason: "Fuel smell in the cabin" });
    expect(db().select().from(groundingNotices).where(eq(groundingNotices.aircraftId, plane)).all().length).toBe(before + 1);
    expect(counts.email_outbox).toBeGreaterThan(0);
  });

  it("a bulletin and its acknowledgement: the replay answers as the first did", async () => {
    signInAs("safety@hangarline.test");
    const published = await onceThenReplay(createBulletin as Action, { club: CLUB, title: "Hand-prop ban", bodyMarkdown: "No hand-propping on the club ramp.", urgency: "priority", audience: "everyone", intent: "publish" });
    const bulletinId = /\/safety\/bulletins\/([^?]+)/.exec(published.first.redirect ?? "")?.[1];
    expect(bulletinId).toBeTruthy();
    signInAs(MEMBER);
    const ack = await onceThenReplay(acknowledgeBulletin as Action, { club: CLUB, bulletinId: bulletinId! });
    expect(ack.first.state?.message).toBe("Acknowledged. Thank you.");
    expect(db().select().from(bulletinAcknowledgements).where(eq(bulletinAcknowledgements.bulletinId, bulletinId!)).all()).toHaveLength(1);
  });

  it("a flight: one flight and the meters move once", async () => {
    signInAs("maintenance@hangarline.test");
    const planeRow = db().select().from(aircraft).where(eq(aircraft.id, planeId(CLUB, "N0512L"))).get()!;
    const hobbs = planeRow.currentHobbs!;
    const tach = planeRow.currentTach!;
    const before = db().select().from(flights).where(eq(flights.aircraftId, planeRow.id)).all().length;
    await onceThenReplay(logFlight as Action, {
      club: CLUB, aircraftId: planeRow.id, flownOn: "2026-01-15", dayLandings: "2", nightFullStopLandings: "0", fuelAdded: "0", oilAdded: "0",
      hobbsOut: hobbs.toFixed(1), hobbsIn: (hobbs + 1).toFixed(1), tachOut: tach.toFixed(1), tachIn: (tach + 0.8).toFixed(1),
    });
    expect(db().select().from(flights).where(eq(flights.aircraftId, planeRow.id)).all().length).toBe(before + 1);
    expect(db().select().from(aircraft).where(eq(aircraft.id, planeRow.id)).get()!.currentHobbs).toBe(Number((hobbs + 1).toFixed(1)));
  });

  it("an anonymous safety report's key row keeps no actor and only the day", async () => {
    signInAs(MEMBER);
    const fields = { club: CLUB, occurredOn: "2026-01-10", location: "Fuel farm", whatHappened: "A fuel truck backed up without a marshaller while a pilot walked behind it.", contributingFactors: ["aircraft_equipment"], anonymous: "on" };
    const before = db().select().from(safetyReports).all().length;
    const { key: k } = await onceThenReplay(fileReport as Action, fields);
    expect(db().select().from(safetyReports).all().length).toBe(before + 1);
    const row = db().select().from(idempotentWrites).where(eq(idempotentWrites.key, k)).get()!;
    expect(row.actorUserId).toBeNull();
    expect(row.createdAt.getUTCHours() + row.createdAt.getUTCMinutes() + row.createdAt.getUTCSeconds() + row.createdAt.getUTCMilliseconds()).toBe(0);
  });

  it("grounding from a safety report replayed: one notice, one link on the report, the same answer", async () => {
    signInAs(MEMBER);
    await expectRedirect(() => fileReport(EMPTY, form({ club: CLUB, occurredOn: "2026-01-11", location: "Runway 27 hold", whatHappened: "The left brake faded during the run-up and the aircraft crept past the hold line.", contributingFactors: ["aircraft_equipment"] })));
    const report = db().select().from(safetyReports).all().at(-1)!;
    signInAs("safety@hangarline.test");
    const plane = planeId(CLUB, "N0534L");
    const notices = () => db().select().from(groundingNotices).where(eq(groundingNotices.aircraftId, plane)).all().length;
    const before = notices();
    await onceThenReplay(groundFromReport as Action, { club: CLUB, reportId: report.id, aircraftId: plane, reason: "Brake fade reported on the run-up" });
    expect(notices()).toBe(before + 1);
    expect(db().select().from(safetyReportEvents).where(and(eq(safetyReportEvents.reportId, report.id), eq(safetyReportEvents.kind, "grounding"))).all()).toHaveLength(1);
  });

  it("actions called without a key write as before", async () => {
    signInAs(MEMBER);
    const plane = planeId(CLUB, "N0556L");
    const before = db().select().from(squawks).all().length;
    const keys = db().select().from(idempotentWrites).all().length;
    await answerOf(reportSquawk, { club: CLUB, aircraftId: plane, description: "Wingtip scuffed", foundDuring: "preflight" });
    await answerOf(reportSquawk, { club: CLUB, aircraftId: plane, description: "Wingtip scuffed", foundDuring: "preflight" });
    expect(db().select().from(squawks).all().length).toBe(before + 2);
    expect(db().select().from(idempotentWrites).all().length).toBe(keys);
  });

  it("keys older than 30 days are pruned; newer ones stay", () => {
    const club = clubBySlug(CLUB);
    const now = new Date();
    db().insert(idempotentWrites).values({ clubId: club.id, key: key(), actionName: "old", actorUserId: null, answerJson: "{}", createdAt: new Date(now.getTime() - IDEMPOTENCY_TTL_MS - 1000) }).run();
    const fresh = db().select().from(idempotentWrites).all().length - 1;
    expect(pruneIdempotentWrites(db(), now)).toBe(1);
    expect(db().select().from(idempotentWrites).all().length).toBe(fresh);
  });
});

describe("exactly once: the JSON booking route's Idempotency-Key header", () => {
  const post = (payload: unknown, headers: Record<string, string>) =>
    createBookingRoute(new Request(`http://app.test/api/clubs/${CLUB}/bookings`, { method: "POST", body: JSON.stringify(payload), headers }), { params: Promise.resolve({ club: CLUB }) });

  it("a retry answers the first 201 and body; a malformed key is a 400; another person's key is refused", async () => {
    await seedScenario();
    setGuards(CLUB, { notCurrent: "warn", inArrears: "warn" });
    signInAs(MEMBER);
    const club = clubBySlug(CLUB);
    const plane = planeId(CLUB, "N0527L");
    const payload = { aircraftId: plane, startsAt: localAt(club, 25, "09:00"), endsAt: localAt(club, 25, "10:00"), acceptedGuards: ALL_GUARDS };
    const k = key();
    const first = await post(payload, { "Idempotency-Key": k });
    expect(first.status).toBe(201);
    const body = await first.json();
    const counts = tableCounts();
    const again = await post(payload, { "Idempotency-Key": k });
    expect(again.status).toBe(201);
    expect(again.headers.get("Idempotent-Replayed")).toBe("true");
    expect(await again.json()).toEqual(body);
    expect(tableCounts()).toEqual(counts);

    const bad = await post({ ...payload, startsAt: localAt(club, 26, "09:00"), endsAt: localAt(club, 26, "10:00") }, { "Idempotency-Key": "nope" });
    expect(bad.status).toBe(400);
    expect(((await bad.json()) as { error: { message: string } }).error.message).toBe(MALFORMED_KEY_MESSAGE);
    expect(tableCounts()).toEqual(counts);

    signInAs("pilot2@hangarline.test");
    const stolen = await post(payload, { "Idempotency-Key": k });
    expect(stolen.status).toBe(409);
    expect(((await stolen.json()) as { error: { message: string } }).error.message).toBe(KEY_REUSED_MESSAGE);
    expect(tableCounts()).toEqual(counts);
  });
});
