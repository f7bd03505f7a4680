// The preflight in few taps: tanks and drain points from the aircraft's template, fuel above a
// tank's capacity refused naming the tank (nothing written), a finding tapped without words
// becoming a squawk through the one squawk write path (with its "reported" event and photo),
// and the club's template keeping its tanks.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { preflightRecords, squawkEvents, squawks, uploads } from "@/db/schema";
import { getPreflightTemplate } from "@/db/queries/tools-preflight";
import { createBooking } from "@/lib/actions/bookings/create-booking";
import { recordPreflight } from "@/lib/actions/preflight/record-preflight";
import { savePreflightTemplateAction } from "@/lib/actions/preflight/save-template";
import { EMPTY, clubBySlug, db, form, signInAs } from "./helpers";
import { ALL_GUARDS, localAt, planeId, seedScenario, setGuards } from "./bookings-helpers";

const SLUG = "reedwater";
const PNG = Buffer.from("iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==", "base64");

describe("preflight in few taps", () => {
  let bookingId = "";
  let aircraftId = "";

  beforeAll(async () => {
    await seedScenario();
    setGuards(SLUG, { notCurrent: "warn", inArrears: "warn" });
    const club = clubBySlug(SLUG);
    aircraftId = planeId(SLUG, "N0527L");
    signInAs("member@hangarline.test");
    const made = await createBooking(EMPTY, form({ club: SLUG, aircraftId, startsAt: localAt(club, 9, "09:00"), endsAt: localAt(club, 9, "11:00"), acceptedGuards: ALL_GUARDS }));
    expect(made, made.message).toMatchObject({ ok: true });
    bookingId = (made.data as { bookingId: string }).bookingId;
  });

  /** Every item as expected, every sample clear, both tanks at the given readings. */
  function allAsExpected(fuel: [string, string]): Record<string, string | string[]> {
    const template = getPreflightTemplate(db(), clubBySlug(SLUG).id, aircraftId)!;
    const fields: Record<string, string | string[]> = { club: SLUG, bookingId, oilQuantity: "6", sumpPoint: template.sumpPoints, fuelTank: template.fuelTanks.map((t) => t.name), fuelQuantity: fuel };
    template.sumpPoints.forEach((_, i) => (fields[`sump.${i}`] = "clear"));
    for (const item of template.items) fields[`result.${item.id}`] = "ok";
    return fields;
  }

  it("the seeded template has its tanks with capacities and groups the documents with the cabin", () => {
    const template = getPreflightTemplate(db(), clubBySlug(SLUG).id, aircraftId)!;
    expect(template.fuelTanks).toEqual([{ name: "Left wing tank", capacity: 20 }, { name: "Right wing tank", capacity: 20 }]);
    expect([...new Set(template.items.map((i) => i.section))]).toEqual(["Cabin", "Left wing", "Nose", "Right wing", "Tail"]);
  });

  it("fuel above a tank's capacity is refused naming that tank, and nothing is written", async () => {
    signInAs("member@hangarline.test");
    const before = db().select().from(preflightRecords).all().length;
    const refused = await recordPreflight(EMPTY, form(allAsExpected(["20", "26"])));
    expect(refused.ok).toBe(false);
    expect(refused.message).toBe("Right wing tank holds at most 20 US gal; 26 US gal cannot be in it. Check the reading. Nothing was saved.");
    expect(refused.fieldErrors["fuelQuantity.1"]).toEqual(["Right wing tank holds at most 20 US gal; 26 US gal cannot be in it. Check the reading."]);
    expect(refused.fieldErrors["fuelQuantity.0"]).toBeUndefined();
    expect(db().select().from(preflightRecords).all()).toHaveLength(before);
  });

  it("all as expected with full tanks is an OK record", async () => {
    signInAs("member@hangarline.test");
    const state = await recordPreflight(EMPTY, form(allAsExpected(["20", "20"])));
    expect(state, state.message).toMatchObject({ ok: true, message: "Preflight recorded: everything as expected. You can begin the flight." });
    const { recordId } = state.data as { recordId: string };
    expect(db().select().from(preflightRecords).where(eq(preflightRecords.id, recordId)).get()).toMatchObject({ outcome: "ok", fuel: [{ tank: "Left wing tank", quantity: 20 }, { tank: "Right wing tank", quantity: 20 }] });
  });

  it("a finding tapped without words becomes a squawk naming the item, with its reported event and photo", async () => {
    signInAs("member@hangarline.test");
    const template = getPreflightTemplate(db(), clubBySlug(SLUG).id, aircraftId)!;
    const prop = template.items.find((i) => i.label.startsWith("propeller"))!;
    const fields = allAsExpected(["20", "15"]);
    fields[`result.${prop.id}`] = "finding";
    const fd = form(fields);
    fd.append(`photos.${prop.id}`, new File([PNG], "prop.png", { type: "image/png" }));
    const state = await recordPreflight(EMPTY, fd);
    expect(state, state.message).toMatchObject({ ok: true });
    const { squawkIds } = state.data as { squawkIds: string[] };
    expect(squawkIds).toHaveLength(1);
    const squawk = db().select().from(squawks).where(eq(squawks.id, squawkIds[0]!)).get()!;
    expect(squawk).toMatchObject({ aircraftId, foundDuring: "preflight", triage: "untriaged", description: "Nose — propeller free of nicks, spinner secure: not as expected (found during the preflight)." });
    expect(db().select().from(squawkEvents).where(and(eq(squawkEvents.squawkId, squawk.id), eq(squawkEvents.kind, "reported"))).all()).toHaveLength(1);
    expect(db().select().from(uploads).where(and(eq(uploads.subjectType, "Squawk"), eq(uploads.subjectId, squawk.id))).all()).toHaveLength(1);
  });

  it("maintenance keeps the tanks in the template; a line without a capacity is refused by line", async () => {
    signInAs("maintenance@hangarline.test");
    const base = { club: SLUG, aircraftId, documents: "Registration certificate", checklist: "Cabin: master off\nNose: oil cap secure", sumpPoints: "Left wing sump", oilMinimum: "5", oilMaximum: "8" };
    const bad = await savePreflightTemplateAction(EMPTY, form({ ...base, fuelTanks: "Left wing tank | 20\nRight wing tank" }));
    expect(bad.ok).toBe(false);
    expect(bad.fieldErrors.fuelTanks?.[0]).toMatch(/^Line 2: write "Tank name \| usable capacity"/);
    const ok = await savePreflightTemplateAction(EMPTY, form({ ...base, fuelTanks: "Left wing tank | 20\nRight wing tank | 19.5" }));
    expect(ok, ok.message).toMatchObject({ ok: true });
    const template = getPreflightTemplate(db(), clubBySlug(SLUG).id, aircraftId)!;
    expect(template.fuelTanks).toEqual([{ name: "Left wing tank", capacity: 20 }, { name: "Right wing tank", capacity: 19.5 }]);
    // The documents join the cabin group.
    expect(template.items.filter((i) => i.kind === "document").map((i) => i.section)).toEqual(["Cabin"]);
  });
});
