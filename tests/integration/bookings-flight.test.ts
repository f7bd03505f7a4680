import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { aircraft, bookings, flights, journalEntries, preflightRecordItems, squawks, uploads } from "@/db/schema";
import { getPreflightTemplate } from "@/db/queries/tools-preflight";
import { closeFlightSheet } from "@/lib/actions/bookings/close-flight-sheet";
import { createBooking } from "@/lib/actions/bookings/create-booking";
import { beginFlight } from "@/lib/actions/bookings/begin-flight";
import { recordPreflight } from "@/lib/actions/preflight/record-preflight";
import { saveLoading } from "@/lib/actions/tools/save-loading";
import { getWeightBalanceProfile } from "@/db/queries/tools-wb";
import { EMPTY, clubBySlug, db, form, signInAs } from "./helpers";
import { ALL_GUARDS, localAt, planeId, seedScenario, setGuards } from "./bookings-helpers";

const SLUG = "reedwater";
const PNG = Buffer.from("iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==", "base64");

describe("weight and balance, preflight, beginning the flight and its flight sheet on one booking", () => {
  let bookingId = "";
  let aircraftId = "";

  beforeAll(async () => {
    await seedScenario();
    setGuards(SLUG, { notCurrent: "warn", inArrears: "warn" });
    const club = clubBySlug(SLUG);
    aircraftId = planeId(SLUG, "N0527L");
    signInAs("member@hangarline.test");
    const made = await createBooking(EMPTY, form({ club: SLUG, aircraftId, startsAt: localAt(club, 0, "00:00").slice(0, 10) + "T23:00", endsAt: localAt(club, 1, "02:00"), acceptedGuards: ALL_GUARDS }));
    expect(made, made.message).toMatchObject({ ok: true });
    bookingId = (made.data as { bookingId: string }).bookingId;
  });

  it("saves the loading with the booking, with both points checked", async () => {
    signInAs("member@hangarline.test");
    const club = clubBySlug(SLUG);
    const profile = getWeightBalanceProfile(db(), club.id, aircraftId)!;
    const state = await saveLoading(EMPTY, form({
      club: SLUG, bookingId, category: "normal",
      stationKey: profile.stations.map((s) => s.key), stationWeight: ["340", "0", "20"],
      tankKey: profile.tanks.map((t) => t.key), tankVolume: ["40"], burnVolume: "12",
    }));
    expect(state, state.message).toMatchObject({ ok: true });
    expect(state.message).toMatch(/within the envelope/);
    const bad = await saveLoading(EMPTY, form({ club: SLUG, bookingId, stationKey: profile.stations.map((s) => s.key), stationWeight: ["heavy", "0", "0"], tankKey: profile.tanks.map((t) => t.key), tankVolume: ["40"], burnVolume: "12" }));
    expect(bad.fieldErrors["stationWeight.0"]?.[0]).toMatch(/as a number/);
  });

  it("a preflight finding becomes a squawk with its photo, in one step", async () => {
    signInAs("member@hangarline.test");
    const club = clubBySlug(SLUG);
    const template = getPreflightTemplate(db(), club.id, aircraftId)!;
    const fields: Record<string, string | string[] | Blob> = { club: SLUG, bookingId, oilQuantity: "6", sumpPoint: template.sumpPoints, fuelTank: ["Left wing tank", "Right wing tank"], fuelQuantity: ["20", "18"] };
    template.sumpPoints.forEach((_, i) => (fields[`sump.${i}`] = "clear"));
    for (const item of template.items) fields[`result.${item.id}`] = "ok";
    const tire = template.items.find((i) => i.label.includes("tire"))!;
    fields[`result.${tire.id}`] = "finding";
    fields[`note.${tire.id}`] = "Left main tire worn to the cord on one side";
    const fd = form(fields as Record<string, string | string[]>);
    fd.append(`photos.${tire.id}`, new File([PNG], "tire.png", { type: "image/png" }));

    // Missing answers are named per item and nothing is written.
    const partial = form({ club: SLUG, bookingId, oilQuantity: "6", sumpPoint: template.sumpPoints, fuelTank: ["Left wing tank", "Right wing tank"], fuelQuantity: ["20", "18"] });
    template.sumpPoints.forEach((_, i) => partial.append(`sump.${i}`, "clear"));
    const refused = await recordPreflight(EMPTY, partial);
    expect(refused.ok).toBe(false);
    expect(refused.fieldErrors[`items.${template.items[0]!.id}.result`]?.[0]).toMatch(/OK or a finding/);

    const state = await recordPreflight(EMPTY, fd);
    expect(state, JSON.stringify(state)).toMatchObject({ ok: true });
    const { squawkIds, recordId } = state.data as { squawkIds: string[]; recordId: string };
    expect(squawkIds).toHaveLength(1);
    const squawk = db().select().from(squawks).where(eq(squawks.id, squawkIds[0]!)).get()!;
    expect(squawk).toMatchObject({ aircraftId, foundDuring: "preflight", triage: "untriaged", status: "open" });
    expect(squawk.description).toMatch(/tire, brake and strut: Left main tire worn/);
    expect(db().select().from(uploads).where(and(eq(uploads.subjectType, "Squawk"), eq(uploads.subjectId, squawk.id))).all()).toHaveLength(1);
    const item = db().select().from(preflightRecordItems).where(and(eq(preflightRecordItems.recordId, recordId), eq(preflightRecordItems.result, "finding"))).get()!;
    expect(item.squawkId).toBe(squawk.id);
  });

  it("beginning the flight confirms the record; its findings need the member's tick", async () => {
    signInAs("member@hangarline.test");
    const recordId = db().select().from(preflightRecordItems).all().at(-1)!.recordId;
    const unconfirmed = await beginFlight(EMPTY, form({ club: SLUG, bookingId, preflightRecordId: recordId }));
    expect(unconfirmed.fieldErrors.confirmPreflight?.[0]).toMatch(/Confirm/);
    // N0527L flies with a deferred landing light (14 CFR 91.213(d)): its limitation first.
    const limits = await beginFlight(EMPTY, form({ club: SLUG, bookingId, preflightRecordId: recordId, confirmPreflight: "on", acceptFindings: "on" }));
    expect(limits.fieldErrors.acceptLimitations?.join(" ")).toMatch(/No night flight/);
    const findings = await beginFlight(EMPTY, form({ club: SLUG, bookingId, preflightRecordId: recordId, confirmPreflight: "on", acceptLimitations: "on" }));
    expect(findings.fieldErrors.acceptFindings?.join(" ")).toMatch(/tire/);
    const ok = await beginFlight(EMPTY, form({ club: SLUG, bookingId, preflightRecordId: recordId, confirmPreflight: "on", acceptFindings: "on", acceptLimitations: "on" }));
    expect(ok, ok.message).toMatchObject({ ok: true });
    expect(db().select().from(bookings).where(eq(bookings.id, bookingId)).get()!).toMatchObject({ status: "dispatched", preflightRecordId: recordId });
  });

  it("closing the flight sheet logs the flight, moves the meters and posts the charge once, even when sent twice", async () => {
    signInAs("member@hangarline.test");
    const before = db().select().from(aircraft).where(eq(aircraft.id, aircraftId)).get()!;
    const hobbsOut = before.currentHobbs!;
    const tachOut = before.currentTach!;
    const fields = { club: SLUG, bookingId, hobbsOut: hobbsOut.toFixed(1), hobbsIn: (hobbsOut + 1.3).toFixed(1), tachOut: tachOut.toFixed(1), tachIn: (tachOut + 1.1).toFixed(1), fuelOut: "38", fuelIn: "27.5", timeOut: "09:05", timeIn: "10:30", dayLandings: "3", fuelAdded: "10", oilAdded: "0" };
    // A clock time that is not HH:MM is refused by name, and nothing is written.
    const badTime = await closeFlightSheet(EMPTY, form({ ...fields, timeIn: "half past ten" }));
    expect(badTime.ok).toBe(false);
    expect(badTime.fieldErrors.timeIn?.[0]).toMatch(/HH:MM/);
    const first = await closeFlightSheet(EMPTY, form(fields));
    expect(first, first.message).toMatchObject({ ok: true });
    const { flightId, chargeMinor } = first.data as { flightId: string; chargeMinor: number };
    // 1.3 Hobbs hours × $152.00 per hour (the seeded rate) = $197.60.
    expect(chargeMinor).toBe(19_760);
    const again = await closeFlightSheet(EMPTY, form(fields));
    expect(again.ok).toBe(true);
    expect(again.message).toMatch(/already closed/);

    const logged = db().select().from(flights).where(eq(flights.id, flightId)).all();
    expect(logged).toHaveLength(1);
    expect(logged[0]).toMatchObject({ aircraftId, hobbsOut, hobbsIn: Number((hobbsOut + 1.3).toFixed(1)), dayLandings: 3, fuelAdded: 10, continuity: "ok", fuelOut: 38, fuelIn: 27.5, timeOut: "09:05", timeIn: "10:30" });
    const after = db().select().from(aircraft).where(eq(aircraft.id, aircraftId)).get()!;
    expect(after.currentHobbs).toBe(Number((hobbsOut + 1.3).toFixed(1)));
    expect(after.currentTach).toBe(Number((tachOut + 1.1).toFixed(1)));
    const entries = db().select().from(journalEntries).where(and(eq(journalEntries.sourceType, "flight"), eq(journalEntries.sourceId, flightId))).all();
    expect(entries).toHaveLength(1);
    expect(db().select().from(bookings).where(eq(bookings.id, bookingId)).get()!).toMatchObject({ status: "checked_in", flightId });
  });

  it("cannot close the flight sheet of a booking whose flight never began", async () => {
    const club = clubBySlug(SLUG);
    signInAs("member@hangarline.test");
    const made = await createBooking(EMPTY, form({ club: SLUG, aircraftId, startsAt: localAt(club, 12, "10:00"), endsAt: localAt(club, 12, "11:00"), acceptedGuards: ALL_GUARDS }));
    const state = await closeFlightSheet(EMPTY, form({ club: SLUG, bookingId: (made.data as { bookingId: string }).bookingId, hobbsOut: "1.0", hobbsIn: "2.0", tachOut: "1.0", tachIn: "2.0", dayLandings: "1" }));
    expect(state.ok).toBe(false);
    expect(state.message).toMatch(/Begin the flight first/);
  });

  it("another member cannot act on the booking", async () => {
    signInAs("pilot2@hangarline.test");
    const state = await saveLoading(EMPTY, form({ club: SLUG, bookingId, stationKey: [], stationWeight: [], tankKey: [], tankVolume: [], burnVolume: "0" }));
    expect(state.ok).toBe(false);
    expect(state.message).toMatch(/Only the member on this booking/);
  });
});
