import { describe, expect, it } from "vitest";
import { evaluatePreflight, type PreflightInput } from "@/lib/bookings/preflight-outcome";

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

  it("exactly the minimum is enough; over the maximum, or more fuel than the tank holds, is a finding", () => {
    expect(evaluatePreflight({ ...base, oilQuantity: 5 }).outcome).toBe("ok");
    expect(evaluatePreflight({ ...base, oilQuantity: 9 }).findings).toEqual(["Oil 9 qt is above the maximum of 8 qt."]);
    expect(evaluatePreflight({ ...base, fuel: [{ tank: "Wing tanks", quantity: 41, capacity: 40 }] }).findings[0]).toMatch(/more than the tank's usable 40/);
  });
});
