import { describe, expect, it } from "vitest";
import { evaluatePreflight, findingDescription, fuelAboveCapacity, oilChoices, type PreflightInput } from "@/lib/bookings/preflight-outcome";

const base: PreflightInput = {
  items: [
    { section: "Documents aboard", label: "Registration certificate", kind: "document", result: "ok" },
    { section: "Left wing", label: "Aileron free and secure", kind: "check", result: "ok" },
  ],
  sumps: [{ point: "Left wing sump", result: "clear" }],
  oilQuantity: 6,
  oilMinimum: 5,
  oilMaximum: 8,
  oilUnit: "qt",
  fuel: [{ tank: "Wing tanks", quantity: 30, capacity: 40 }],
  fuelUnit: "US gal",
};

describe("evaluatePreflight", () => {
  it("all in order is OK", () => expect(evaluatePreflight(base)).toEqual({ outcome: "ok", findings: [] }));

  it("a missing document, a finding, a dirty sample and low oil are each a finding in words", () => {
    const out = evaluatePreflight({
      ...base,
      items: [
        { ...base.items[0]!, result: "finding" },
        { ...base.items[1]!, result: "finding", note: "hinge bolt loose" },
      ],
      // Water and sediment settle in the sumps: drain until clear (FAA-H-8083-25, fuel sumps).
      sumps: [{ point: "Left wing sump", result: "contaminated" }],
      oilQuantity: 4.5,
    });
    expect(out.outcome).toBe("findings");
    expect(out.findings).toEqual([
      "Not aboard: Registration certificate",
      "Left wing — Aileron free and secure: hinge bolt loose",
      "Water or sediment in the fuel sample from Left wing sump: keep draining until the sample is clear; if it does not clear, do not fly.",
      "Oil 4.5 qt is below the club's minimum of 5 qt for this aircraft.",
    ]);
  });

  it("exactly the minimum is enough; over the maximum is a finding", () => {
    // The club's own minimum and maximum for the aircraft (common practice: the dipstick's marks).
    expect(evaluatePreflight({ ...base, oilQuantity: 5 }).outcome).toBe("ok");
    expect(evaluatePreflight({ ...base, oilQuantity: 9 }).findings).toEqual(["Oil 9 qt is above the maximum of 8 qt."]);
  });

  it("more fuel than a tank holds is not a finding: it is refused, naming the tank", () => {
    // A tank holds no more than its usable capacity (common practice: a reading above it is a misread).
    const fuel = [{ tank: "Left wing tank", quantity: 20, capacity: 20 }, { tank: "Right wing tank", quantity: 21, capacity: 20 }, { tank: "Ferry tank", quantity: 99, capacity: null }];
    expect(evaluatePreflight({ ...base, fuel }).findings).toEqual([]);
    expect(fuelAboveCapacity(fuel, "US gal")).toEqual([{ index: 1, message: "Right wing tank holds at most 20 US gal; 21 US gal cannot be in it. Check the reading." }]);
    // Exactly full is fine (common practice: filled to the tank's capacity).
    expect(fuelAboveCapacity([{ tank: "Left wing tank", quantity: 20, capacity: 20 }], "US gal")).toEqual([]);
  });

  it("a finding tapped without words still says what and where", () => {
    expect(findingDescription({ section: "Nose", label: "Propeller free of nicks", kind: "check" }, null)).toBe("Nose — Propeller free of nicks: not as expected (found during the preflight).");
    expect(findingDescription({ section: "Cabin", label: "Registration certificate", kind: "document" }, "torn")).toBe("Not aboard: Registration certificate: torn");
  });

  it("oil choices run from one step below the minimum to the maximum", () => {
    // Quarts in whole steps, litres in halves (common practice: the dipstick's marks).
    expect(oilChoices(5, 8, "qt")).toEqual([4, 5, 6, 7, 8]);
    expect(oilChoices(4, null, "qt")).toEqual([3, 4, 5, 6]);
    expect(oilChoices(5.7, 7.6, "L")).toEqual([5, 5.5, 6, 6.5, 7, 7.5, 8]);
  });
});
