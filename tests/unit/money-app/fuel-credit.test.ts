// Source: common practice (flying clubs credit members' fuel receipts up to a club price); no published rule is cited.
// Fuel credits: quantity × the lower of the price paid and the club's cap per unit, rounded half
// away from zero to the cent (the club's own rule; figures are our own arithmetic).
import { describe, expect, it } from "vitest";
import { fuelCreditMinor } from "@/lib/money/fuel-credit";

describe("fuelCreditMinor", () => {
  it("credits at the price paid when it is under the cap", () => {
    // 18.4 gal × $6.20 = $114.08 (own arithmetic)
    expect(fuelCreditMinor({ quantity: 18.4, paidPerUnitMinor: 620, capPerUnitMinor: 640 })).toBe(11408);
  });
  it("caps the price per unit at the club's figure", () => {
    // 18.4 gal × min($7.15, $6.40) = 18.4 × 640 = 11,776 (own arithmetic)
    expect(fuelCreditMinor({ quantity: 18.4, paidPerUnitMinor: 715, capPerUnitMinor: 640 })).toBe(11776);
    // 42.5 l × min(€2.59, €2.45) = 42.5 × 245 = 10,412.5 → 10,413 (half away from zero, own arithmetic)
    expect(fuelCreditMinor({ quantity: 42.5, paidPerUnitMinor: 259, capPerUnitMinor: 245 })).toBe(10413);
  });
  it("uses the price paid with no cap, and refuses nonsense", () => {
    expect(fuelCreditMinor({ quantity: 10, paidPerUnitMinor: 700 })).toBe(7000);
    expect(fuelCreditMinor({ quantity: 10, paidPerUnitMinor: 700, capPerUnitMinor: 0 })).toBe(0);
    expect(() => fuelCreditMinor({ quantity: -1, paidPerUnitMinor: 700 })).toThrow(RangeError);
    expect(() => fuelCreditMinor({ quantity: 1, paidPerUnitMinor: 6.4 })).toThrow(RangeError);
  });
});
