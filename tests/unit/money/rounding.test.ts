import { describe, expect, it } from "vitest";
import { roundHalfAwayFromZero, roundQuotient, subtractExact } from "@/lib/money";

// Rounding rule: half away from zero to the minor unit (REFERENCES.md, Money: "fix and document
// the rounding rule"); it is IEEE 754-2008's roundTiesToAway (from memory).
describe("roundHalfAwayFromZero", () => {
  it("rounds ties away from zero on both sides", () => {
    expect(roundHalfAwayFromZero(2.5)).toBe(3); // tie, away from zero
    expect(roundHalfAwayFromZero(-2.5)).toBe(-3); // tie on a negative: away from zero, not toward +∞
    expect(roundHalfAwayFromZero(-0.5)).toBe(-1); // Math.round(-0.5) would give -0
    expect(roundHalfAwayFromZero(0.5)).toBe(1);
    expect(roundHalfAwayFromZero(-1234.5)).toBe(-1235);
  });
  it("rounds non-ties to the nearest integer", () => {
    expect(roundHalfAwayFromZero(-1.4)).toBe(-1);
    expect(roundHalfAwayFromZero(-1.6)).toBe(-2);
    expect(roundHalfAwayFromZero(1.49)).toBe(1);
    expect(roundHalfAwayFromZero(0.49999999999999994)).toBe(0); // just below a half: never a tie
    expect(roundHalfAwayFromZero(-0.4)).toBe(0);
  });
  it("rounds to decimal places on the value's decimal text", () => {
    expect(roundHalfAwayFromZero(1.005, 2)).toBe(1.01); // 1.005 is a tie in decimal (binary float would say 1.00)
    expect(roundHalfAwayFromZero(-1.005, 2)).toBe(-1.01);
    expect(roundHalfAwayFromZero(2.675, 2)).toBe(2.68);
    expect(roundHalfAwayFromZero(1250, -2)).toBe(1300); // to hundreds, tie away from zero
  });
  it("leaves integers alone and rejects non-finite input", () => {
    expect(roundHalfAwayFromZero(17400)).toBe(17400);
    expect(() => roundHalfAwayFromZero(Number.NaN)).toThrow(RangeError);
    expect(() => roundHalfAwayFromZero(Number.POSITIVE_INFINITY)).toThrow(RangeError);
  });
});

describe("exact decimal helpers", () => {
  it("divides exactly before rounding", () => {
    expect(roundQuotient([3_000_000], [2_000])).toBe(1500); // own arithmetic: 3,000,000 ÷ 2,000
    expect(roundQuotient([5], [2])).toBe(3); // 2.5, tie away from zero
    expect(roundQuotient([-5], [2])).toBe(-3); // −2.5, tie away from zero
    expect(roundQuotient([1.2, 14500])).toBe(17400); // own arithmetic: 1.2 × 14,500
  });
  it("subtracts meter readings without float error", () => {
    expect(subtractExact(1234.7, 1233.5)).toBe(1.2); // plain float subtraction gives 1.2000000000000455
    expect(subtractExact(0.3, 0.1)).toBe(0.2);
  });
});
