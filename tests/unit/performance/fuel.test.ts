import { describe, expect, it } from "vitest";
import {
  AVGAS_LB_PER_US_GAL,
  KG_PER_LB,
  LITRES_PER_US_GAL,
  fuelEndurance,
  fuelReserveMinutes,
  fuelWeight,
  kgFromLb,
  lbFromKg,
  litresFromUsGallons,
  usGallonsFromLitres,
} from "@/lib/performance";

describe("fuel and oil weights — FAA-H-8083-25 PHAK, Weight and Balance", () => {
  it("uses the handbook's standard weights", () => {
    expect(AVGAS_LB_PER_US_GAL).toBe(6); // PHAK: avgas 6 lb/US gal (V)
    expect(fuelWeight(75, "usgal").lb).toBe(450); // PHAK: 75 gal avgas = 450 lb (V)
    expect(fuelWeight(10, "usgal", "jet").lb).toBeCloseTo(67, 9); // PHAK: jet fuel 6.7 lb/US gal (V)
    expect(fuelWeight(8, "usqt", "oil").lb).toBeCloseTo(15, 9); // PHAK: oil 7.5 lb/US gal → 8 qt = 15 lb (V)
  });

  it("converts with the exact unit definitions", () => {
    expect(LITRES_PER_US_GAL).toBe(3.785411784); // US gallon = 231 in³ exactly (NIST Handbook 44, from memory)
    expect(KG_PER_LB).toBe(0.45359237); // international pound, exact (1959 agreement, from memory)
    expect(fuelWeight(75, "usgal").kg).toBeCloseTo(204.1165665, 7); // own arithmetic: 450 × 0.45359237
    // 100 L avgas = 26.417 gal = 158.503 lb = 71.896 kg; about 0.72 kg/L (common practice)
    const hundredLitres = fuelWeight(100, "litre");
    expect(hundredLitres.lb).toBeCloseTo(158.503, 3);
    expect(hundredLitres.kg).toBeCloseTo(71.896, 3);
    expect(litresFromUsGallons(usGallonsFromLitres(123.4))).toBeCloseTo(123.4, 10);
    expect(lbFromKg(kgFromLb(2400))).toBeCloseTo(2400, 10);
  });
});

describe("fuelReserveMinutes and fuelEndurance — 14 CFR 91.151", () => {
  it("requires 30 minutes by day and 45 at night", () => {
    expect(fuelReserveMinutes(false)).toBe(30); // 14 CFR 91.151(a)(1)
    expect(fuelReserveMinutes(true)).toBe(45); // 14 CFR 91.151(a)(2)
  });

  it("computes the minimum for 8.5 gal/h on a 2.0 h leg", () => {
    // 14 CFR 91.151; arithmetic: 8.5 × 2.0 + 8.5 × 0.5 = 21.25 gal by day (from memory, own arithmetic)
    const dayPlan = fuelEndurance({ usableFuel: 21.25, burnPerHour: 8.5, plannedHours: 2, night: false });
    expect(dayPlan.requiredFuel).toBeCloseTo(21.25, 9);
    expect(dayPlan.reserveFuel).toBeCloseTo(4.25, 9);
    expect(dayPlan.legal).toBe(true); // exactly enough is legal
    expect(dayPlan.marginMinutes).toBeCloseTo(0, 9);
    // 14 CFR 91.151; arithmetic: 8.5 × 2.0 + 8.5 × 0.75 = 23.375 gal at night
    const nightPlan = fuelEndurance({ usableFuel: 21.25, burnPerHour: 8.5, plannedHours: 2, night: true });
    expect(nightPlan.requiredFuel).toBeCloseTo(23.375, 9);
    expect(nightPlan.reserveFuel).toBeCloseTo(6.375, 9);
    expect(nightPlan.legal).toBe(false);
    expect(nightPlan.marginMinutes).toBeCloseTo(-15, 9); // 2.125 gal short = 15 min at 8.5 gal/h
  });

  it("reports endurance and margin", () => {
    // own arithmetic: 40 gal / 8.5 gal/h = 4.70588 h; margin (40 − 21.25) / 8.5 × 60 = 132.35 min
    const plan = fuelEndurance({ usableFuel: 40, burnPerHour: 8.5, plannedHours: 2, night: false });
    expect(plan.enduranceHours).toBeCloseTo(4.70588, 5);
    expect(plan.marginMinutes).toBeCloseTo(132.353, 3);
    expect(plan.legal).toBe(true);
    const short = fuelEndurance({ usableFuel: 21, burnPerHour: 8.5, plannedHours: 2, night: false });
    expect(short.legal).toBe(false);
    expect(short.marginMinutes).toBeCloseTo(-1.765, 3);
  });

  it("applies the club's reserve only when stricter", () => {
    // club setting 60 min > 30 min of 91.151: 17 + 8.5 = 25.5 gal (own arithmetic)
    expect(fuelEndurance({ usableFuel: 24, burnPerHour: 8.5, plannedHours: 2, night: false, reserveMinutes: 60 })).toMatchObject({
      requiredFuel: 25.5,
      reserveFuel: 8.5,
      legal: false,
    });
    // club setting 20 min < 45 min night: 91.151(a)(2) still applies
    expect(fuelEndurance({ usableFuel: 24, burnPerHour: 8.5, plannedHours: 2, night: true, reserveMinutes: 20 }).requiredFuel).toBeCloseTo(23.375, 9);
  });

  it("refuses impossible plans", () => {
    expect(() => fuelEndurance({ usableFuel: 20, burnPerHour: 0, plannedHours: 1, night: false })).toThrow(RangeError);
    expect(() => fuelEndurance({ usableFuel: -1, burnPerHour: 8, plannedHours: 1, night: false })).toThrow(RangeError);
    expect(() => fuelEndurance({ usableFuel: 20, burnPerHour: 8, plannedHours: 1, night: false, reserveMinutes: -5 })).toThrow(RangeError);
  });
});
