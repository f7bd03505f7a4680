import { describe, expect, it } from "vitest";
import { computeLoading, type LoadingProfile } from "@/lib/bookings/loading";

// An invented four-seat aircraft. Check values are our own arithmetic (weight × arm = moment,
// CG = moment ÷ weight, FAA-H-8083-25 Weight and Balance chapter) with avgas at 6 lb per US
// gallon (FAA-H-8083-25).
const profile: LoadingProfile = {
  unitSystem: "imperial",
  emptyWeight: 1500,
  emptyArm: 38,
  maxTakeoffWeight: 2400,
  maxLandingWeight: 2300,
  stations: [
    { key: "front", name: "Front seats", arm: 37, maxWeight: null },
    { key: "rear", name: "Rear seats", arm: 73, maxWeight: null },
    { key: "bags", name: "Baggage", arm: 95, maxWeight: 120 },
  ],
  tanks: [{ key: "wings", name: "Wing tanks", arm: 48, usableCapacity: 40 }],
  fuelKind: "avgas",
  envelopeNormal: [[35, 1500], [35, 1950], [39.5, 2400], [47.3, 2400], [47.3, 1500]],
  envelopeUtility: null,
};

describe("computeLoading", () => {
  it("takeoff and landing points: 340 lb front, 20 lb baggage, 40 gal, 12 gal burned", () => {
    const r = computeLoading(profile, { category: "normal", stationWeights: { front: 340, bags: 20 }, fuelVolumes: { wings: 40 }, burnVolume: 12 });
    // Takeoff: 1500 + 340 + 20 + 240 (40 gal × 6) = 2100 lb; moment 57000 + 12580 + 1900 + 11520 = 83000.
    expect(r.takeoff.weight).toBe(2100);
    expect(r.takeoff.moment).toBe(83_000);
    expect(r.takeoff.cg).toBeCloseTo(39.5238, 4);
    // Landing: 72 lb burned at 48 in → 2028 lb, moment 79544, CG 39.2229.
    expect(r.landing.weight).toBe(2028);
    expect(r.landing.moment).toBe(79_544);
    expect(r.landing.cg).toBeCloseTo(39.2229, 4);
    expect(r.fuelWeight).toBe(240);
    expect(r.burnWeight).toBe(72);
    expect(r.problems).toEqual([]);
    expect(r.takeoff.withinEnvelope && r.landing.withinEnvelope).toBe(true);
  });

  it("names every limit broken: a station, a tank, the burn, the maximum weight and the envelope", () => {
    const r = computeLoading(profile, { category: "normal", stationWeights: { front: 400, rear: 340, bags: 150 }, fuelVolumes: { wings: 45 }, burnVolume: 50 });
    // 1500 + 400 + 340 + 150 + 270 (45 gal) = 2660 lb, moment 123830 → CG 46.55 in; all 270 lb
    // burned (the burn is capped at what is aboard) → 2390 lb, CG 46.39 in, inside the envelope.
    expect(r.problems).toEqual([
      "Baggage: 150 lb is over its limit of 120 lb.",
      "The planned burn of 50 US gal is more than the 45 US gal aboard.",
      "Wing tanks: 45 US gal is more than its usable 40 US gal.",
      "Takeoff weight 2,660 lb is over the maximum of 2,400 lb.",
      "At takeoff the CG (46.6 in at 2,660 lb) is outside the normal envelope.",
      "Landing weight 2,390 lb is over the maximum of 2,300 lb.",
    ]);
    expect(r.landing.withinEnvelope).toBe(true);
  });

  it("writes the figures of its problems as the club's locale writes numbers", () => {
    const r = computeLoading(profile, { category: "normal", stationWeights: { front: 400, rear: 340, bags: 150 }, fuelVolumes: { wings: 45 }, burnVolume: 50 }, "de-DE");
    // The same loading as above (our arithmetic); "." groups thousands and "," marks decimals in de (Unicode CLDR).
    expect(r.problems).toContain("Takeoff weight 2.660 lb is over the maximum of 2.400 lb.");
    expect(r.problems).toContain("At takeoff the CG (46,6 in at 2.660 lb) is outside the normal envelope.");
  });

  it("metric profiles read litres and give kilograms (6 lb/US gal = 0.7190 kg/L, our arithmetic)", () => {
    const metric: LoadingProfile = { ...profile, unitSystem: "metric", emptyWeight: 680, emptyArm: 965, maxTakeoffWeight: 1089, maxLandingWeight: null, stations: [{ key: "front", name: "Front seats", arm: 940, maxWeight: null }], tanks: [{ key: "wings", name: "Wing tanks", arm: 1219, usableCapacity: 151 }], envelopeNormal: [[889, 680], [889, 885], [1003, 1089], [1201, 1089], [1201, 680]] };
    const r = computeLoading(metric, { category: "normal", stationWeights: { front: 154 }, fuelVolumes: { wings: 100 }, burnVolume: 0 });
    expect(r.fuelWeight).toBeCloseTo(71.895, 2);
    expect(r.problems).toEqual([]);
  });

  it("asks for the utility envelope only where there is one", () => {
    const r = computeLoading(profile, { category: "utility", stationWeights: { front: 170 }, fuelVolumes: { wings: 20 }, burnVolume: 5 });
    expect(r.problems[0]).toBe("This aircraft has no utility-category envelope; the normal one is used.");
  });
});
