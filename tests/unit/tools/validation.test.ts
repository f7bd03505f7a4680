import { describe, expect, it } from "vitest";
import type { z } from "zod";
import { createBookingSchema, flightSheetSchema } from "@/lib/validation/bookings";
import { preflightRecordSchema, preflightTemplateSchema, weightBalanceProfileSchema } from "@/lib/validation/tools";

// Same shape as the action wrapper's field errors: "path.joined" → messages.
function errorsOf(r: { success: boolean; error?: z.ZodError }): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const issue of r.error?.issues ?? []) (out[issue.path.join(".") || "_form"] ??= []).push(issue.message);
  return out;
}

describe("booking schemas", () => {
  it("a good booking parses, with guard keys de-duplicated", () => {
    const r = createBookingSchema.parse({ aircraftId: "a", startsAt: "2026-05-04T09:00", endsAt: "2026-05-04T11:00", acceptedGuards: ["notCurrent", "notCurrent"] });
    expect(r).toMatchObject({ memberId: null, instructorId: null, carryingPassengers: false, acceptedGuards: ["notCurrent"] });
  });
  it("says what is wrong with each field", () => {
    const e = errorsOf(createBookingSchema.safeParse({ aircraftId: "", startsAt: "2026-02-30T09:00", endsAt: "2026-05-04T25:00", acceptedGuards: ["flying"] }));
    expect(e.aircraftId?.[0]).toBe("Choose an aircraft.");
    expect(e.startsAt?.[0]).toBe("Enter the start as a date and time.");
    expect(e.endsAt?.[0]).toBe("Enter the end as a date and time.");
    expect(e["acceptedGuards.0"]?.[0]).toBe("Unknown warning.");
    expect(errorsOf(createBookingSchema.safeParse({ aircraftId: "a", startsAt: "2026-05-04T11:00", endsAt: "2026-05-04T09:00" })).endsAt?.[0]).toBe("The end must be after the start.");
  });
  it("flight sheet: meters forward, at least one landing", () => {
    const e = errorsOf(flightSheetSchema.safeParse({ bookingId: "b", hobbsOut: "100.0", hobbsIn: "99.0", tachOut: "abc", tachIn: "1", dayLandings: "0" }));
    expect(e.hobbsIn?.[0]).toBe("Hobbs in cannot be less than Hobbs out.");
    expect(e.tachOut?.[0]).toMatch(/as hours/);
    const landings = errorsOf(flightSheetSchema.safeParse({ bookingId: "b", hobbsOut: "100.0", hobbsIn: "101.0", tachOut: "80", tachIn: "81", dayLandings: "0" }));
    expect(landings.dayLandings?.[0]).toBe("Enter the landings: at least one, day or night.");
  });
});

describe("tools schemas", () => {
  it("reads stations, tanks and envelope corners one per line, naming the bad line", () => {
    const r = weightBalanceProfileSchema.parse({ aircraftId: "a", emptyWeight: "1500", emptyArm: "38", maxTakeoffWeight: "2400", fuelKind: "avgas", stations: "Front | 37\nBaggage | 95 | 120", tanks: "Wings | 48 | 40", envelopeNormal: "35, 1500\n35, 1950\n47.3, 2400\n47.3, 1500" });
    expect(r.stations).toEqual([{ key: "front-1", name: "Front", arm: 37, maxWeight: null }, { key: "baggage-2", name: "Baggage", arm: 95, maxWeight: 120 }]);
    expect(r.envelopeNormal).toEqual([[35, 1500], [35, 1950], [47.3, 2400], [47.3, 1500]]);
    expect(r.envelopeUtility).toBeNull();
    const e = errorsOf(weightBalanceProfileSchema.safeParse({ aircraftId: "a", emptyWeight: "1500", emptyArm: "38", maxTakeoffWeight: "1400", fuelKind: "avgas", stations: "Front seats", tanks: "", envelopeNormal: "35 1500\n40, 2000" }));
    expect(e.stations?.[0]).toMatch(/^Line 1: write "name \| arm \| limit"/);
    expect(e.tanks?.[0]).toBe("Enter at least one fuel tank.");
    expect(e.envelopeNormal).toEqual(['Line 1: write "arm, weight", like "35.0, 1500".', "An envelope needs at least three corners."]);
    // Cross-field checks speak once every field reads.
    const heavy = errorsOf(weightBalanceProfileSchema.safeParse({ aircraftId: "a", emptyWeight: "1500", emptyArm: "38", maxTakeoffWeight: "1400", maxLandingWeight: "1450", fuelKind: "avgas", stations: "Front | 37", tanks: "Wings | 48 | 40", envelopeNormal: "35, 1500\n35, 1950\n47.3, 1500" }));
    expect(heavy.maxTakeoffWeight?.[0]).toBe("The maximum takeoff weight must be more than the empty weight.");
    expect(heavy.maxLandingWeight?.[0]).toBe("The maximum landing weight cannot be more than the maximum takeoff weight.");
  });
  it("checklist lines need a section", () => {
    const e = errorsOf(preflightTemplateSchema.safeParse({ aircraftId: "a", documents: "", checklist: "Tires\nNose: prop", sumpPoints: "", oilMinimum: "5" }));
    expect(e.checklist?.[0]).toMatch(/^Line 1: write "Section: item"/);
    expect(e.sumpPoints?.[0]).toBe("Enter at least one fuel drain point.");
  });
  it("fuel tanks are 'name | capacity' lines, each named once", () => {
    const base = { aircraftId: "a", documents: "", checklist: "Nose: prop", sumpPoints: "Left", oilMinimum: "5" };
    expect(errorsOf(preflightTemplateSchema.safeParse({ ...base, fuelTanks: "Left | 20\nleft | 20" })).fuelTanks?.[0]).toBe('Line 2: "left" is listed twice; give each tank its own name.');
    expect(errorsOf(preflightTemplateSchema.safeParse({ ...base, fuelTanks: "Left | 0" })).fuelTanks?.[0]).toMatch(/^Line 1: write "Tank name \| usable capacity"/);
    expect(preflightTemplateSchema.parse({ ...base, fuelTanks: "Left | 20\nRight | 19.5" }).fuelTanks).toEqual([{ name: "Left", capacity: 20 }, { name: "Right", capacity: 19.5 }]);
    expect(preflightTemplateSchema.parse(base).fuelTanks).toEqual([]);
  });
  it("gathers the record form's per-item fields; a finding is one tap, its words optional but not a scrap", () => {
    const r = preflightRecordSchema.safeParse({ bookingId: "b", "result.i1": "ok", "result.i2": "finding", "note.i2": "bad", sumpPoint: ["Left"], "sump.0": "clear", fuelTank: ["Wings"], fuelQuantity: ["30"], oilQuantity: "6" });
    expect(errorsOf(r)["items.i2.note"]?.[0]).toMatch(/or leave it empty/);
    const tapped = preflightRecordSchema.parse({ bookingId: "b", "result.i2": "finding", sumpPoint: ["Left"], "sump.0": "clear", fuelTank: ["Wings"], fuelQuantity: ["30"], oilQuantity: "6" });
    expect(tapped.items.i2).toEqual({ result: "finding", note: null, grounding: false, photos: [] });
    const ok = preflightRecordSchema.parse({ bookingId: "b", "result.i1": "ok", sumpPoint: "Left", "sump.0": "contaminated", fuelTank: "Wings", fuelQuantity: "30", oilQuantity: "6" });
    expect(ok.items).toEqual({ i1: { result: "ok", note: null, grounding: false, photos: [] } });
    expect(ok.sumps).toEqual([{ point: "Left", result: "contaminated" }]);
  });
});
