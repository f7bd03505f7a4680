import { describe, expect, it } from "vitest";
import { createInspectionItemSchema, logFlightSchema, reportSquawkSchema, triageSquawkSchema } from "@/lib/validation/fleet";

const flight = { aircraftId: "a1", flownOn: "2026-05-01", hobbsOut: "100.0", hobbsIn: "101.3", tachOut: "80.0", tachIn: "81.1" };

function errors(result: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }): Record<string, string> {
  return Object.fromEntries((result.error?.issues ?? []).map((i) => [i.path.join("."), i.message]));
}

describe("fleet form schemas", () => {
  it("parses a flight, defaulting landings, fuel and oil to zero", () => {
    const r = logFlightSchema.safeParse(flight);
    expect(r.success).toBe(true);
    expect(r.data).toMatchObject({ hobbsOut: 100, hobbsIn: 101.3, dayLandings: 0, nightFullStopLandings: 0, fuelAdded: 0, oilAdded: 0, squawk: null });
  });

  it("refuses meters in below out, typed junk and impossible durations, field by field", () => {
    expect(errors(logFlightSchema.safeParse({ ...flight, hobbsIn: "99.9" }))).toEqual({ hobbsIn: "Hobbs in cannot be less than Hobbs out." });
    expect(errors(logFlightSchema.safeParse({ ...flight, tachOut: "eighty" }))).toMatchObject({ tachOut: "Enter tach out as hours, like 1234.5." });
    expect(errors(logFlightSchema.safeParse({ ...flight, hobbsIn: "130.0" }))).toEqual({ hobbsIn: "More than 24 h on one flight: check the Hobbs readings." });
    expect(errors(logFlightSchema.safeParse({ ...flight, flownOn: "2026-02-30" }))).toEqual({ flownOn: "Enter the date flown as a date (YYYY-MM-DD)." });
    expect(errors(logFlightSchema.safeParse({ ...flight, dayLandings: "-1" }))).toEqual({ dayLandings: "Enter the day landings as a whole number." });
  });

  it("turns a checkbox into a boolean and a blank file input into no files", () => {
    const blank = new File([], "undefined", { type: "application/octet-stream" });
    const r = reportSquawkSchema.safeParse({ aircraftId: "a1", description: "Oil on the cowling", foundDuring: "preflight", suspectedGrounding: "on", photos: blank });
    expect(r.success && r.data).toMatchObject({ suspectedGrounding: true, photos: [] });
    expect(reportSquawkSchema.safeParse({ aircraftId: "a1", description: "Oil on the cowling", foundDuring: "preflight" }).data).toMatchObject({ suspectedGrounding: false });
  });

  it("needs the three parts of a 91.213(d) deferral only when deferring", () => {
    expect(triageSquawkSchema.safeParse({ squawkId: "s", triage: "grounding" }).success).toBe(true);
    expect(Object.keys(errors(triageSquawkSchema.safeParse({ squawkId: "s", triage: "deferred" }))).sort()).toEqual(["deferralDeterminedBy", "limitation", "placarded"]);
  });

  it("needs the interval that the chosen rule counts", () => {
    expect(errors(createInspectionItemSchema.safeParse({ aircraftId: "a", name: "Club item", origin: "club", ruleKind: "months-or-hours", months: "4" }))).toEqual({ hours: "Enter the number of hours for this rule." });
    expect(createInspectionItemSchema.safeParse({ aircraftId: "a", name: "Club item", origin: "club", ruleKind: "fixed-date" }).success).toBe(true);
  });
});
