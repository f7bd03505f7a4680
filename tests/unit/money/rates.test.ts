import { describe, expect, it } from "vitest";
import { engineReservePerHour, hourlyRate, rateTable, type HourlyRateInput } from "@/lib/money";

describe("engineReservePerHour", () => {
  it("spreads the overhaul over the TBO", () => {
    // $30,000 ÷ 2,000 h = $15.00/h (common practice: overhaul cost ÷ TBO)
    expect(engineReservePerHour(3_000_000, 2_000)).toBe(1500);
    // $25,000 ÷ 1,800 h = 1388.88… → 1389 minor units (own arithmetic, half away from zero)
    expect(engineReservePerHour(2_500_000, 1_800)).toBe(1389);
    expect(() => engineReservePerHour(3_000_000, 0)).toThrow(RangeError);
  });
});

// Worked example (invented club, own arithmetic by hand):
//   fixed costs per year: insurance $6,000 + hangar $4,800 + annual inspection $3,600
//     + subscriptions and loan $3,600 = $18,000 = 1,800,000 minor
//   expected 300 h/yr → fixed per hour 1,800,000 ÷ 300 = 6,000 ($60.00)
//   fuel 8.5 gal/h × $6.40/gal (640) = 5,440 ($54.40)
//   oil $1.50/h (150) + maintenance reserve $12.00/h (1,200)
//   variable per hour = 5,440 + 150 + 1,200 = 6,790 ($67.90)
//   engine reserve $30,000 ÷ 2,000 h = 1,500 ($15.00) (common practice)
//   wet = 6,000 + 6,790 + 1,500 = 14,290 ($142.90); dry = 14,290 − 5,440 = 8,850 ($88.50)
const club: HourlyRateInput = {
  fixedAnnualCostsMinor: 1_800_000,
  expectedHours: 300,
  fuelBurnPerHour: 8.5,
  fuelPriceMinor: 640,
  oilPerHourMinor: 150,
  maintenanceReservePerHourMinor: 1_200,
  overhaulCostMinor: 3_000_000,
  tboHours: 2_000,
};

describe("hourlyRate", () => {
  it("matches the worked example", () => {
    expect(hourlyRate(club)).toEqual({
      fixedPerHour: 6_000, // own arithmetic above
      variablePerHour: 6_790, // own arithmetic above
      engineReserve: 1_500, // common practice: overhaul ÷ TBO
      wetRate: 14_290, // own arithmetic above
      dryRate: 8_850, // own arithmetic above
    });
  });
  it("rounds each component half away from zero to the minor unit", () => {
    // 1,000,000 ÷ 333 = 3003.003 → 3003; 8.7 × 639 = 5559.3 → 5559 (own arithmetic)
    const r = hourlyRate({ ...club, fixedAnnualCostsMinor: 1_000_000, expectedHours: 333, fuelBurnPerHour: 8.7, fuelPriceMinor: 639 });
    expect(r.fixedPerHour).toBe(3003);
    expect(r.variablePerHour).toBe(5559 + 150 + 1200); // 6909
    expect(r.wetRate).toBe(3003 + 6909 + 1500); // 11412
    expect(r.dryRate).toBe(11412 - 5559); // 5853
  });
  it("refuses zero expected hours", () => {
    expect(() => hourlyRate({ ...club, expectedHours: 0 })).toThrow(RangeError);
    expect(() => hourlyRate({ ...club, fuelBurnPerHour: -1 })).toThrow(RangeError);
  });
});

describe("rateTable", () => {
  it("shows the wet rate falling as the fleet flies more", () => {
    const { expectedHours: _ignored, ...perYear } = club;
    const rows = rateTable(perYear, [100, 200, 300]);
    // fixed per hour 1,800,000 ÷ 100/200/300 = 18,000 / 9,000 / 6,000; wet = fixed + 6,790 + 1,500 (own arithmetic)
    expect(rows.map((r) => [r.expectedHours, r.fixedPerHour, r.wetRate])).toEqual([
      [100, 18_000, 26_290],
      [200, 9_000, 17_290],
      [300, 6_000, 14_290],
    ]);
  });
});
