import { describe, expect, it } from "vitest";
import {
  AVGAS_LB_PER_US_GAL,
  isWithinEnvelope,
  takeoffAndLandingWeightAndBalance,
  weightAndBalance,
  type EnvelopePoint,
} from "@/lib/performance";

describe("weightAndBalance — FAA-H-8083-25 PHAK, Weight and Balance, computational method", () => {
  // PHAK example (V for the givens and totals): max gross weight 3,400 lb, CG range 78–86 in;
  // front seats 340 lb, rear seats 350 lb, 75 gal fuel, 80 lb baggage in area 1; result
  // 3,320 lb with CG 84.8 in, within limits. The empty weight and the per-item arms below
  // are from memory (they reproduce the handbook's totals exactly).
  // The CG range is drawn as a rectangle; its 2,000 lb floor is our own choice.
  const aircraft = {
    emptyWeight: 2100, // from memory
    emptyArm: 78.3, // from memory
    maxTakeoffWeight: 3400, // PHAK (V)
    envelope: [[78, 2000], [78, 3400], [86, 3400], [86, 2000]] as EnvelopePoint[], // PHAK CG range 78–86 (V)
  };
  const loads = [
    { weight: 340, arm: 85 }, // front seats: 340 lb PHAK (V), arm from memory
    { weight: 350, arm: 121 }, // rear seats: 350 lb PHAK (V), arm from memory
    { weight: 75 * AVGAS_LB_PER_US_GAL, arm: 75 }, // 75 gal × 6 lb/gal = 450 lb PHAK (V), arm from memory
    { weight: 80, arm: 150 }, // baggage area 1: 80 lb PHAK (V), arm from memory
  ];

  it("reproduces the handbook totals", () => {
    const r = weightAndBalance(aircraft, loads);
    expect(r.weight).toBe(3320); // PHAK: total loaded weight 3,320 lb (V)
    expect(r.moment).toBeCloseTo(281_430, 6); // own arithmetic from the arms above (from memory)
    expect(r.cg).toBeCloseTo(84.8, 1); // PHAK: CG 84.8 in (V)
    expect(r.withinEnvelope).toBe(true); // PHAK: loaded within limits (V)
    expect(r.overweight).toBe(false); // PHAK: 3,320 ≤ 3,400 lb (V)
  });

  it("moves the CG forward after burning 40 gal from tanks at 75 in", () => {
    // own arithmetic: 3,320 − 240 = 3,080 lb; 281,430 − 18,000 = 263,430 lb-in; CG 85.529 in
    const { takeoff, landing } = takeoffAndLandingWeightAndBalance(aircraft, loads, [{ weight: 40 * 6, arm: 75 }]);
    expect(takeoff.weight).toBe(3320);
    expect(landing.weight).toBe(3080);
    expect(landing.moment).toBeCloseTo(263_430, 6);
    expect(landing.cg).toBeCloseTo(85.529, 3);
    expect(landing.withinEnvelope).toBe(true);
  });
});

describe("weightAndBalance — envelope edges (invented aircraft, own arithmetic)", () => {
  // Invented envelope, lb and in: forward limit 82 in up to 2,000 lb, sloping to 85 in at the
  // 2,600 lb maximum; aft limit 93 in. On the sloped edge, arm = 82 + (weight − 2,000) / 200.
  const envelope: EnvelopePoint[] = [[82, 1500], [82, 2000], [85, 2600], [93, 2600], [93, 1500]];
  const aircraft = { emptyWeight: 1600, emptyArm: 80, maxTakeoffWeight: 2600, envelope };

  it("counts a CG exactly on the sloped forward limit as inside", () => {
    // 1,600 × 80 + 500 × 86 + 100 × 120 + 200 × 93 = 201,600 lb-in over 2,400 lb → CG 84.0 in,
    // exactly the forward limit at 2,400 lb (own arithmetic)
    const r = weightAndBalance(aircraft, [
      { weight: 500, arm: 86 },
      { weight: 100, arm: 120 },
      { weight: 200, arm: 93 },
    ]);
    expect(r).toEqual({ weight: 2400, moment: 201_600, cg: 84, withinEnvelope: true, overweight: false });
  });

  it("puts a CG just forward of the limit outside", () => {
    // baggage 0.1 in further forward: 201,590 / 2,400 = 83.9958 in < 84.0 limit (own arithmetic)
    const r = weightAndBalance(aircraft, [
      { weight: 500, arm: 86 },
      { weight: 100, arm: 119.9 },
      { weight: 200, arm: 93 },
    ]);
    expect(r.cg).toBeCloseTo(83.9958, 4);
    expect(r.withinEnvelope).toBe(false);
    expect(r.overweight).toBe(false);
  });

  it("accepts exactly the maximum weight and flags anything above it", () => {
    // 2,600 lb at 88 in sits on the top edge; 2,600.5 lb is over the maximum (own arithmetic)
    const atMax = weightAndBalance(aircraft, [{ weight: 1000, arm: 100.8 }]);
    expect(atMax.weight).toBe(2600);
    expect(atMax.cg).toBeCloseTo(88, 9);
    expect(atMax).toMatchObject({ withinEnvelope: true, overweight: false });
    const over = weightAndBalance(aircraft, [{ weight: 1000.5, arm: 100.8 }]);
    expect(over).toMatchObject({ withinEnvelope: false, overweight: true });
  });

  it("treats corners and edges as inside, and a closed polygon like an open one", () => {
    expect(isWithinEnvelope(85, 2600, envelope)).toBe(true); // corner
    expect(isWithinEnvelope(93, 1800, envelope)).toBe(true); // aft limit
    expect(isWithinEnvelope(93.001, 1800, envelope)).toBe(false); // just aft
    expect(isWithinEnvelope(88, 1499.99, envelope)).toBe(false); // below the floor
    const closed: EnvelopePoint[] = [...envelope, [82, 1500]];
    expect(isWithinEnvelope(84, 2400, closed)).toBe(true);
    expect(isWithinEnvelope(83.99, 2400, closed)).toBe(false);
  });

  it("handles a concave envelope", () => {
    // a notch cut into the aft edge between 1,900 and 2,100 lb (invented shape)
    const notched: EnvelopePoint[] = [[82, 1500], [82, 2600], [93, 2600], [93, 2100], [88, 2000], [93, 1900], [93, 1500]];
    expect(isWithinEnvelope(90, 2000, notched)).toBe(false); // in the notch
    expect(isWithinEnvelope(88, 2000, notched)).toBe(true); // notch tip
    expect(isWithinEnvelope(90, 2200, notched)).toBe(true);
  });

  it("works the same in kg and mm", () => {
    // invented metric aircraft: 700 kg at 2,100 mm, pilot 80 kg at 2,050 mm, fuel 72 kg at 2,400 mm
    // → 852 kg; 1,470,000 + 164,000 + 172,800 = 1,806,800 kg·mm; CG 2,120.66 mm (own arithmetic)
    const metric = {
      emptyWeight: 700,
      emptyArm: 2100,
      maxTakeoffWeight: 1000,
      envelope: [[2000, 600], [2000, 1000], [2300, 1000], [2300, 600]] as EnvelopePoint[],
    };
    const r = weightAndBalance(metric, [{ weight: 80, arm: 2050 }, { weight: 72, arm: 2400 }]);
    expect(r.weight).toBe(852);
    expect(r.moment).toBe(1_806_800);
    expect(r.cg).toBeCloseTo(2120.66, 2);
    expect(r.withinEnvelope).toBe(true);
  });

  it("checks landing weight against a maximum landing weight when given", () => {
    // invented: max landing 2,400 lb; takeoff 2,600 lb, burn 150 lb → 2,450 lb, over (own arithmetic)
    const r = takeoffAndLandingWeightAndBalance({ ...aircraft, maxLandingWeight: 2400 }, [{ weight: 1000, arm: 100.8 }], [{ weight: 150, arm: 93 }]);
    expect(r.takeoff.overweight).toBe(false);
    expect(r.landing.weight).toBe(2450);
    expect(r.landing.overweight).toBe(true);
  });

  it("refuses bad data", () => {
    expect(() => weightAndBalance({ ...aircraft, envelope: [[82, 1500], [93, 1500]] }, [])).toThrow(RangeError);
    expect(() => weightAndBalance(aircraft, [{ weight: Number.NaN, arm: 80 }])).toThrow(RangeError);
    expect(() => weightAndBalance({ ...aircraft, emptyWeight: 0 }, [])).toThrow(RangeError);
    expect(() => takeoffAndLandingWeightAndBalance(aircraft, [], [{ weight: -10, arm: 93 }])).toThrow(RangeError);
  });
});
