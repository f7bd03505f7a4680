// Every flight is charged once, through one write path (db/queries/flight-record.ts): the flight
// log and the flight sheet both post exactly one journal entry per flight, a replayed submission posts
// nothing more, a flight already out on a booking cannot be logged a second time beside it, and
// meters that do not continue are flagged on the flight being entered, explained before it is
// recorded, and listed for the treasurer until settled.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { aircraft, bookings, flights, journalEntries, journalLines, ledgerAccounts, users } from "@/db/schema";
import { listMeterGaps, listUnchargedFlights } from "@/db/queries/flight-record";
import { closeFlightSheet } from "@/lib/actions/bookings/close-flight-sheet";
import { createBooking } from "@/lib/actions/bookings/create-booking";
import { logFlight } from "@/lib/actions/fleet/log-flight";
import { settleMeterGapAction } from "@/lib/actions/money/settle-meter-gap";
import { addDays, isoDateInTimeZone } from "@/lib/dates";
import { lockedThrough } from "@/db/queries/money-post-entry";
import { EMPTY, clubBySlug, db, form, signInAs } from "./helpers";
import { lockBooksThrough } from "./books-helpers";
import { ALL_GUARDS, localAt, planeId, seedScenario, setGuards } from "./bookings-helpers";

const SLUG = "reedwater";
const MEMBER = "member@hangarline.test";
const REG = "N0527L";

const key = () => crypto.randomUUID();
/** Every flight this file records, by whichever entry point. */
const recorded: string[] = [];

function chargesOf(flightId: string) {
  if (!recorded.includes(flightId)) recorded.push(flightId);
  return db().select().from(journalEntries).where(and(eq(journalEntries.sourceType, "flight"), eq(journalEntries.sourceId, flightId))).all();
}

function plane() {
  return db().select().from(aircraft).where(eq(aircraft.id, planeId(SLUG, REG))).get()!;
}

/** Readings that continue exactly from the aircraft's meters, `hours` long. */
function continuing(hours: number, extra: Record<string, string> = {}) {
  const p = plane();
  return {
    hobbsOut: p.currentHobbs!.toFixed(1), hobbsIn: (p.currentHobbs! + hours).toFixed(1),
    tachOut: p.currentTach!.toFixed(1), tachIn: (p.currentTach! + hours - 0.1).toFixed(1),
    dayLandings: "1", nightFullStopLandings: "0", fuelAdded: "0", oilAdded: "0", ...extra,
  };
}

async function bookingInFlight(daysAhead: number): Promise<string> {
  const club = clubBySlug(SLUG);
  signInAs(MEMBER);
  const made = await createBooking(EMPTY, form({ club: SLUG, aircraftId: planeId(SLUG, REG), startsAt: localAt(club, daysAhead, "08:00"), endsAt: localAt(club, daysAhead, "09:00"), acceptedGuards: ALL_GUARDS }));
  expect(made, made.message).toMatchObject({ ok: true });
  const bookingId = (made.data as { bookingId: string }).bookingId;
  // Beginning a flight has its own tests (bookings-flight); here the aircraft is simply out.
  db().update(bookings).set({ status: "dispatched", dispatchedAt: new Date() }).where(eq(bookings.id, bookingId)).run();
  return bookingId;
}

describe("every flight is charged once, through one write path", () => {
  beforeAll(async () => {
    await seedScenario();
    setGuards(SLUG, { notCurrent: "warn", inArrears: "warn" });
  });

  it("the flight log charges a flight entered without a booking: one balanced entry, member debited hours × rate", async () => {
    signInAs(MEMBER);
    const club = clubBySlug(SLUG);
    const p = plane();
    const today = isoDateInTimeZone(new Date(), club.timeZone);
    const state = await logFlight(EMPTY, form({ club: SLUG, aircraftId: p.id, flownOn: today, ...continuing(1.5), idempotencyKey: key() }));
    expect(state, state.message).toMatchObject({ ok: true, data: { continuity: "ok" } });
    const { flightId, chargeMinor } = state.data as { flightId: string; chargeMinor: number };
    // 1.5 Hobbs hours × the aircraft's rate per hour (arithmetic).
    expect(chargeMinor).toBe(Math.round(1.5 * p.hourlyRateMinor));
    expect(p.hourlyRateMinor).toBeGreaterThan(0);
    const entries = chargesOf(flightId);
    expect(entries).toHaveLength(1);
    const lines = db().select({ debit: journalLines.debitMinor, credit: journalLines.creditMinor, code: ledgerAccounts.code }).from(journalLines).innerJoin(ledgerAccounts, eq(ledgerAccounts.id, journalLines.accountId)).where(eq(journalLines.entryId, entries[0]!.id)).all();
    expect(lines.reduce((s, l) => s + l.debit, 0)).toBe(chargeMinor);
    expect(lines.reduce((s, l) => s + l.credit, 0)).toBe(chargeMinor);
    expect(lines.find((l) => l.code === "flight-income")?.credit).toBe(chargeMinor);
    expect(lines.find((l) => l.code.startsWith("member-receivables:"))?.debit).toBe(chargeMinor);
    expect(state.message).toMatch(/charged to the pilot's account/);
  });

  it("replaying the flight log with the same idempotency key writes no second flight and no second charge", async () => {
    signInAs(MEMBER);
    const club = clubBySlug(SLUG);
    const fields = { club: SLUG, aircraftId: plane().id, flownOn: isoDateInTimeZone(new Date(), club.timeZone), ...continuing(0.8), idempotencyKey: key() };
    const first = await logFlight(EMPTY, form(fields));
    expect(first, first.message).toMatchObject({ ok: true });
    const flightCount = db().select().from(flights).all().length;
    const entryCount = db().select().from(journalEntries).all().length;
    const again = await logFlight(EMPTY, form(fields));
    expect(again).toEqual(first);
    expect(db().select().from(flights).all().length).toBe(flightCount);
    expect(db().select().from(journalEntries).all().length).toBe(entryCount);
    expect(chargesOf((first.data as { flightId: string }).flightId)).toHaveLength(1);
  });

  it("the same flight typed in again with a fresh key is refused: same start reading, nothing written", async () => {
    signInAs(MEMBER);
    const club = clubBySlug(SLUG);
    const last = db().select().from(flights).where(eq(flights.aircraftId, plane().id)).all().sort((a, b) => b.hobbsOut - a.hobbsOut)[0]!;
    const before = { flights: db().select().from(flights).all().length, entries: db().select().from(journalEntries).all().length };
    const state = await logFlight(EMPTY, form({
      club: SLUG, aircraftId: plane().id, flownOn: isoDateInTimeZone(new Date(), club.timeZone),
      hobbsOut: last.hobbsOut.toFixed(1), hobbsIn: last.hobbsIn.toFixed(1), tachOut: last.tachOut.toFixed(1), tachIn: last.tachIn.toFixed(1),
      dayLandings: "1", nightFullStopLandings: "0", fuelAdded: "0", oilAdded: "0", meterExplanation: "typed again", idempotencyKey: key(),
    }));
    expect(state.ok).toBe(false);
    expect(state.message).toMatch(/already in the log .* charge it twice/);
    expect({ flights: db().select().from(flights).all().length, entries: db().select().from(journalEntries).all().length }).toEqual(before);
  });

  it("closing the flight sheet charges once; a replay with the same key and a second press with a new key change nothing", async () => {
    const bookingId = await bookingInFlight(3);
    const fields = { club: SLUG, bookingId, ...continuing(1.2) };
    const k = key();
    const first = await closeFlightSheet(EMPTY, form({ ...fields, idempotencyKey: k }));
    expect(first, first.message).toMatchObject({ ok: true });
    const { flightId } = first.data as { flightId: string };
    expect(chargesOf(flightId)).toHaveLength(1);
    const counts = { flights: db().select().from(flights).all().length, entries: db().select().from(journalEntries).all().length };
    const replay = await closeFlightSheet(EMPTY, form({ ...fields, idempotencyKey: k }));
    expect(replay).toEqual(first);
    const second = await closeFlightSheet(EMPTY, form({ ...fields, idempotencyKey: key() }));
    expect(second.message).toMatch(/already closed/);
    expect({ flights: db().select().from(flights).all().length, entries: db().select().from(journalEntries).all().length }).toEqual(counts);
    expect(db().select().from(flights).where(eq(flights.id, flightId)).get()!.bookingId).toBe(bookingId);
  });

  it("a flight out on a booking cannot also be entered in the flight log", async () => {
    const bookingId = await bookingInFlight(4);
    const club = clubBySlug(SLUG);
    const before = db().select().from(journalEntries).all().length;
    const state = await logFlight(EMPTY, form({ club: SLUG, aircraftId: plane().id, flownOn: isoDateInTimeZone(new Date(), club.timeZone), ...continuing(1.0), idempotencyKey: key() }));
    expect(state.ok).toBe(false);
    expect(state.message).toMatch(/close the booking.s flight sheet instead/);
    expect(db().select().from(journalEntries).all().length).toBe(before);
    // Closed on the booking's flight sheet instead: one flight, one charge.
    const done = await closeFlightSheet(EMPTY, form({ club: SLUG, bookingId, ...continuing(1.0), idempotencyKey: key() }));
    expect(done, done.message).toMatchObject({ ok: true });
    expect(chargesOf((done.data as { flightId: string }).flightId)).toHaveLength(1);
  });

  it("the flight sheet flags a mismatch with the aircraft's last in reading on THIS flight and needs an explanation before it closes", async () => {
    const bookingId = await bookingInFlight(5);
    const p = plane();
    // The previous pilot came in at currentHobbs; this one says the meter read 0.7 h more.
    const fields = {
      club: SLUG, bookingId, hobbsOut: (p.currentHobbs! + 0.7).toFixed(1), hobbsIn: (p.currentHobbs! + 1.9).toFixed(1),
      tachOut: p.currentTach!.toFixed(1), tachIn: (p.currentTach! + 1.0).toFixed(1), dayLandings: "2", nightFullStopLandings: "0", fuelAdded: "0", oilAdded: "0",
    };
    const before = { flights: db().select().from(flights).all().length, entries: db().select().from(journalEntries).all().length };
    const refused = await closeFlightSheet(EMPTY, form({ ...fields, idempotencyKey: key() }));
    expect(refused.ok).toBe(false);
    // 0.7 h between the previous Hobbs in and this Hobbs out (arithmetic).
    expect(refused.fieldErrors.hobbsOut?.[0]).toMatch(/0\.7 h not logged/);
    expect(refused.fieldErrors.meterExplanation?.[0]).toMatch(/say why/);
    expect({ flights: db().select().from(flights).all().length, entries: db().select().from(journalEntries).all().length }).toEqual(before);
    expect(db().select().from(bookings).where(eq(bookings.id, bookingId)).get()!.status).toBe("dispatched");

    const explained = await closeFlightSheet(EMPTY, form({ ...fields, meterExplanation: "The Hobbs read this when I untied the aircraft", idempotencyKey: key() }));
    expect(explained, explained.message).toMatchObject({ ok: true, data: { continuity: "gap" } });
    const { flightId } = explained.data as { flightId: string };
    const row = db().select().from(flights).where(eq(flights.id, flightId)).get()!;
    expect(row).toMatchObject({ continuity: "gap", meterExplanation: "The Hobbs read this when I untied the aircraft", bookingId });
    expect(chargesOf(flightId)).toHaveLength(1);

    // The treasurer sees it until settled; a member may not settle it.
    const club = clubBySlug(SLUG);
    expect(listMeterGaps(db(), club.id).map((g) => g.flightId)).toContain(flightId);
    signInAs(MEMBER);
    const denied = await settleMeterGapAction(EMPTY, form({ club: SLUG, flightId, note: "fine", idempotencyKey: key() }));
    expect(denied.ok).toBe(false);
    signInAs("treasurer@hangarline.test");
    const settled = await settleMeterGapAction(EMPTY, form({ club: SLUG, flightId, note: "0.7 h charged to the previous pilot by adjustment", idempotencyKey: key() }));
    expect(settled, settled.message).toMatchObject({ ok: true });
    expect(listMeterGaps(db(), club.id).map((g) => g.flightId)).not.toContain(flightId);
    const twice = await settleMeterGapAction(EMPTY, form({ club: SLUG, flightId, note: "again", idempotencyKey: key() }));
    expect(twice.message).toMatch(/already settled/);
  });

  it("a flight flown in a locked period is still charged, on the first open day, its memo naming the day flown", async () => {
    const club = clubBySlug(SLUG);
    const today = isoDateInTimeZone(new Date(), club.timeZone);
    lockBooksThrough(club.id, addDays(today, -40), addDays(today, -10));
    const through = lockedThrough(db(), club.id);
    expect(through).toBe(addDays(today, -10));
    signInAs("instructor@hangarline.test");
    const p = plane();
    // A late paper-log entry: it started after every logged flight of this aircraft, on a locked day.
    const state = await logFlight(EMPTY, form({
      club: SLUG, aircraftId: p.id, flownOn: through!, pilotId: db().select().from(users).where(eq(users.email, MEMBER)).get()!.id,
      ...continuing(0.6, { meterExplanation: "Paper log entry, typed in late" }), idempotencyKey: key(),
    }));
    expect(state, state.message).toMatchObject({ ok: true });
    const [entry] = chargesOf((state.data as { flightId: string }).flightId);
    expect(entry!.entryDate).toBe(addDays(through!, 1));
    expect(entry!.memo).toContain(through!);
    expect(entry!.memo).toMatch(/locked period/);
    expect(state.message).toMatch(/first open day/);
  });

  it("every flight recorded here, by either entry point, has exactly one charge and none is listed as uncharged", () => {
    const club = clubBySlug(SLUG);
    expect(recorded.length).toBeGreaterThanOrEqual(6);
    for (const id of recorded) expect(chargesOf(id), id).toHaveLength(1);
    const uncharged = new Set(listUnchargedFlights(db(), club.id).map((f) => f.flightId));
    expect(recorded.filter((id) => uncharged.has(id))).toEqual([]);
  });
});
