// Sources: billing meter time (Hobbs or tach) × hourly rate is common practice for flying clubs
// (from memory); rounding half away from zero per REFERENCES.md. Values are own arithmetic.
import { describe, expect, it } from "vitest";
import { flightCharge, meterTimeCharge, previewFlightCharge } from "@/lib/money";

// Flight charge = (meterIn − meterOut) h × rate, half away from zero, minus the fuel credit.
// Expected values are our own arithmetic on that rule.
describe("flightCharge", () => {
  it("charges meter hours × rate exactly", () => {
    // 1234.7 − 1233.5 = 1.2 h; 1.2 × 14500 = 17400 (own arithmetic)
    expect(flightCharge({ meterOut: 1233.5, meterIn: 1234.7, ratePerHourMinor: 14500 })).toBe(17400);
    // 0.3 h × 14505 = 4351.5 → 4352 (half away from zero); float arithmetic gives 4351.4999…
    expect(flightCharge({ meterOut: 1000, meterIn: 1000.3, ratePerHourMinor: 14505 })).toBe(4352);
    // 0.9 h × 12125 = 10912.5 → 10913 (own arithmetic)
    expect(flightCharge({ meterOut: 1000, meterIn: 1000.9, ratePerHourMinor: 12125 })).toBe(10913);
    // tach read to hundredths: 0.25 h × 14500 = 3625 (own arithmetic)
    expect(meterTimeCharge(2210.5, 2210.75, 14500)).toBe(3625);
  });
  it("subtracts the fuel credit", () => {
    // 17400 − 5000 = 12400 (own arithmetic)
    expect(flightCharge({ meterOut: 1233.5, meterIn: 1234.7, ratePerHourMinor: 14500, fuelCreditMinor: 5000 })).toBe(
      12400,
    );
  });
  it("returns a negative net when the fuel credit exceeds the time charge (the club owes the member)", () => {
    // 0.5 h × 14500 = 7250; 7250 − 9000 = −1750 (own arithmetic; documented: not clamped)
    expect(flightCharge({ meterOut: 50, meterIn: 50.5, ratePerHourMinor: 14500, fuelCreditMinor: 9000 })).toBe(-1750);
  });
  it("charges nothing for zero meter time", () => {
    expect(flightCharge({ meterOut: 812.4, meterIn: 812.4, ratePerHourMinor: 14500 })).toBe(0);
  });
  it("refuses a meter that ran backwards or non-finite input", () => {
    expect(() => flightCharge({ meterOut: 100.5, meterIn: 100.4, ratePerHourMinor: 14500 })).toThrow(RangeError);
    expect(() => flightCharge({ meterOut: Number.NaN, meterIn: 100.4, ratePerHourMinor: 14500 })).toThrow(RangeError);
    expect(() => flightCharge({ meterOut: 100, meterIn: Infinity, ratePerHourMinor: 14500 })).toThrow(RangeError);
    expect(() => flightCharge({ meterOut: 100, meterIn: 101, ratePerHourMinor: Number.NaN })).toThrow(RangeError);
    expect(() =>
      flightCharge({ meterOut: 100, meterIn: 101, ratePerHourMinor: 14500, fuelCreditMinor: Infinity }),
    ).toThrow(RangeError);
    expect(() => flightCharge({ meterOut: 100, meterIn: 101, ratePerHourMinor: 14500, fuelCreditMinor: -1 })).toThrow(
      RangeError,
    );
  });
});

describe("previewFlightCharge (the flight sheet's live figure)", () => {
  it("is the same figure the server posts, once both readings are typed", () => {
    // 1.2 h × $145.00 = $174.00 (common practice: meter hours × the hourly rate).
    expect(previewFlightCharge("1233.5", "1234.7", 14_500, "Hobbs")).toEqual({ ok: true, hours: 1.2, chargeMinor: 17_400 });
    expect(previewFlightCharge("1233.5", "1234.7", 14_500, "Hobbs")).toEqual({ ok: true, hours: 1.2, chargeMinor: meterTimeCharge(1233.5, 1234.7, 14_500) });
  });
  it("says what is missing instead of throwing while the pilot types", () => {
    expect(previewFlightCharge("1233.5", "", 14_500, "Hobbs")).toEqual({ ok: false, reason: "Enter Hobbs in to see the charge." });
    expect(previewFlightCharge("", "1", 14_500, "Tach")).toEqual({ ok: false, reason: "Enter Tach out to see the charge." });
    expect(previewFlightCharge("1233.5", "1233.", 14_500, "Hobbs")).toEqual({ ok: false, reason: "Enter Hobbs in to see the charge." });
    // A meter never runs backwards (common practice).
    expect(previewFlightCharge("1233.5", "1230.0", 14_500, "Hobbs")).toEqual({ ok: false, reason: "Hobbs in is below Hobbs out." });
  });
});
