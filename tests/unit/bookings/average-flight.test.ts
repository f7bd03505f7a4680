import { describe, expect, it } from "vitest";
import { averageFlightHours, DEFAULT_FLIGHT_HOURS, projectedMeterHours } from "@/lib/bookings/average-flight";

// Our own arithmetic: the mean of meter differences, and one mean flight per booking ahead.
describe("averageFlightHours", () => {
  it("averages the meter durations and ignores impossible ones", () => {
    expect(averageFlightHours([{ out: 100, in: 101.2 }, { out: 101.2, in: 102 }, { out: 102, in: 101 }])).toBeCloseTo(1.0, 10);
  });
  it("is null without flights (callers fall back to 1.5 h)", () => {
    expect(averageFlightHours([])).toBeNull();
    expect(DEFAULT_FLIGHT_HOURS).toBe(1.5);
  });
});

describe("projectedMeterHours", () => {
  it("adds one average flight per booking up to and including the new one, to tenths", () => {
    expect(projectedMeterHours(1234.5, 1.25, 3)).toBe(1238.3);
    expect(projectedMeterHours(null, 1.2, 1)).toBeNull();
  });
  it("refuses nonsense", () => {
    expect(() => projectedMeterHours(1, -1, 1)).toThrow(RangeError);
    expect(() => projectedMeterHours(1, 1, 1.5)).toThrow(RangeError);
  });
});
