import { describe, expect, it } from "vitest";
import { densityAltitudeCaution } from "@/lib/bookings/density-caution";
import { planFuel, requiredReserveMinutes } from "@/lib/bookings/fuel-plan";

describe("fuel plan against 14 CFR 91.151", () => {
  it("30 minutes by day, 45 at night, plus the club's extra minutes", () => {
    expect(requiredReserveMinutes(false, 0)).toBe(30); // 91.151(a)(1)
    expect(requiredReserveMinutes(true, 0)).toBe(45); // 91.151(a)(2)
    expect(requiredReserveMinutes(false, 15)).toBe(45); // club setting on top
    expect(() => requiredReserveMinutes(false, -5)).toThrow(RangeError);
  });

  it("8.5 gal/h for 2.0 h: 21.25 gal by day, 23.375 at night (REFERENCES example, our arithmetic)", () => {
    const day = planFuel({ usableFuel: 21.25, burnPerHour: 8.5, plannedHours: 2, night: false, unit: "US gal" }, 0);
    expect(day.requiredFuel).toBeCloseTo(21.25, 10);
    expect(day.legal).toBe(true);
    expect(day.verdict).toBe("Enough fuel: 0 min to spare after the leg and a reserve of 30 min (14 CFR 91.151, day).");
    const night = planFuel({ usableFuel: 21.25, burnPerHour: 8.5, plannedHours: 2, night: true, unit: "US gal" }, 0);
    expect(night.requiredFuel).toBeCloseTo(23.375, 10);
    expect(night.legal).toBe(false);
    expect(night.verdict).toBe("Not enough fuel: 15 min short of the leg plus a reserve of 45 min (14 CFR 91.151, night).");
  });

  it("the club's stricter rule shows in the verdict", () => {
    const plan = planFuel({ usableFuel: 40, burnPerHour: 8, plannedHours: 3, night: false, unit: "US gal" }, 30);
    // 40 gal = 5 h; 3 h + 60 min reserve = 4 h → 60 min spare (our arithmetic).
    expect(plan.verdict).toBe("Enough fuel: 60 min to spare after the leg and a reserve of 60 min (14 CFR 91.151 plus the club's 30 min).");
  });
});

describe("density altitude caution (FAA-P-8740-2: high density altitude lengthens takeoff, weakens climb)", () => {
  it("grades the wording and always points to the flight manual", () => {
    expect(densityAltitudeCaution(600, 500).level).toBe("normal");
    expect(densityAltitudeCaution(1800, 500).level).toBe("raised");
    expect(densityAltitudeCaution(1800, 500).text).toMatch(/as if 1,300 ft above the field/);
    expect(densityAltitudeCaution(5200, 4800).level).toBe("high");
    for (const c of [densityAltitudeCaution(0, 0), densityAltitudeCaution(8000, 5000)]) expect(c.text).toMatch(/flight manual/);
  });
});
