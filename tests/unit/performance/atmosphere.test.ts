import { describe, expect, it } from "vitest";
import { densityAltitude, inHgFromHpa, isaTemperatureC, pressureAltitude } from "@/lib/performance";
import {
  airDensity,
  isaPressureHpa,
  isaTemperatureK,
  referenceDensityAltitudeFt,
  referencePressureAltitudeFt,
} from "./isa-reference";

const ft = (feet: number) => feet * 0.3048;

describe("test reference itself — ICAO Doc 7488 / US Standard Atmosphere 1976", () => {
  it("matches the standard's table at a few altitudes", () => {
    expect(isaPressureHpa(0)).toBeCloseTo(1013.25, 2); // ICAO Doc 7488, sea level (V)
    expect(airDensity(1013.25, 288.15)).toBeCloseTo(1.225, 3); // ICAO Doc 7488, sea-level density (from memory)
    expect(isaPressureHpa(ft(5000))).toBeCloseTo(843.1, 1); // ICAO standard atmosphere table, 5,000 ft (from memory)
    expect(isaPressureHpa(ft(10000))).toBeCloseTo(696.8, 1); // ICAO standard atmosphere table, 10,000 ft (from memory)
    expect(isaTemperatureK(ft(10000)) - 273.15).toBeCloseTo(-4.81, 2); // 6.5 K/km lapse (V)
  });
});

describe("pressureAltitude", () => {
  it("equals field elevation when 29.92 is set (PHAK FAA-H-8083-25)", () => {
    // PHAK: pressure altitude is what the altimeter shows with 29.92 set; the 0.0013 inHg between
    // 29.92 and the exact standard 29.9213 is worth about 1.2 ft (own arithmetic)
    expect(pressureAltitude(0, 29.92)).toBeCloseTo(1.2, 1);
    expect(pressureAltitude(5000, 29.92) - 5000).toBeCloseTo(1.2, 1);
  });

  it("matches the ICAO-formula reference within 3 ft", () => {
    // reference: ICAO Doc 7488 troposphere formula (test helper); tolerance 3 ft covers the
    // difference between the NWS fit constants and the ICAO constants
    for (const [elevation, setting] of [
      [0, 28.5], [0, 29.42], [0, 30.42], [0, 31.0], [1200, 30.12], [5430, 29.68], [-100, 30.5],
    ] as const) {
      expect(Math.abs(pressureAltitude(elevation, setting) - referencePressureAltitudeFt(elevation, setting))).toBeLessThan(3);
    }
  });

  it("puts the standard pressure of 5,000 ft at 5,000 ft", () => {
    // ICAO standard atmosphere table: 843.07 hPa at 5,000 ft (from memory; helper agrees above)
    expect(Math.abs(pressureAltitude(0, inHgFromHpa(843.07)) - 5000)).toBeLessThan(5);
  });

  it("is close to the rule of thumb elevation + (29.92 − setting) × 1,000 ft", () => {
    // common practice rule of thumb; within ±1 inHg of 29.92 it is off by up to ~9 %, tolerance 100 ft
    for (const setting of [28.92, 29.42, 29.72, 30.12, 30.42, 30.92]) {
      const thumb = 2000 + (29.92 - setting) * 1000;
      expect(Math.abs(pressureAltitude(2000, setting) - thumb)).toBeLessThan(100);
    }
    // own arithmetic with the exact formula: 28.92 inHg at sea level → 938 ft, not 1,000
    expect(pressureAltitude(0, 28.92)).toBeCloseTo(938.5, 0);
  });

  it("refuses nonsense", () => {
    expect(() => pressureAltitude(0, 0)).toThrow(RangeError);
    expect(() => pressureAltitude(Number.NaN, 29.92)).toThrow(RangeError);
  });
});

describe("densityAltitude", () => {
  it("equals pressure altitude on a standard day", () => {
    // ICAO Doc 7488: in the standard atmosphere density altitude is pressure altitude (tolerance 1 ft)
    for (const pa of [0, 2000, 5000, 8000, 10000, 20000]) {
      expect(Math.abs(densityAltitude(pa, isaTemperatureC(pa)) - pa)).toBeLessThan(1);
    }
    // above the tropopause the model is isothermal at −56.5 °C (US Standard Atmosphere 1976, V)
    expect(Math.abs(densityAltitude(40000, -56.5) - 40000)).toBeLessThan(1);
  });

  it("gives the ISA temperature at a pressure altitude", () => {
    // 6.5 K/km lapse from 15 °C (ICAO Doc 7488, V): 5,000 ft → 5.094 °C (own arithmetic);
    // rule of thumb 1.98 °C per 1,000 ft gives 5.1 °C (common practice)
    expect(isaTemperatureC(5000)).toBeCloseTo(5.094, 3);
    expect(isaTemperatureC(40000)).toBeCloseTo(-56.5, 6);
  });

  it("matches the ICAO-formula reference within 2 ft", () => {
    // reference: ICAO Doc 7488 troposphere, ideal-gas density, bisection (test helper); tolerance 2 ft
    for (const [pa, oat] of [
      [0, 30], [0, -20], [2000, 40], [3000, 35], [5000, 30], [5000, -10], [8000, 25], [6500, 0],
    ] as const) {
      expect(Math.abs(densityAltitude(pa, oat) - referenceDensityAltitudeFt(pa, oat))).toBeLessThan(2);
    }
    // hot and high example: PA 5,000 ft at 30 °C → about 7,800 ft (own arithmetic with the model)
    expect(densityAltitude(5000, 30)).toBeGreaterThan(7790);
    expect(densityAltitude(5000, 30)).toBeLessThan(7810);
  });

  it("is close to the rule of thumb PA + 120 × (OAT − ISA)", () => {
    // common practice rule of thumb; it overstates in the heat, tolerance 300 ft for |OAT − ISA| ≤ 30 °C
    for (const [pa, oat] of [[0, 30], [0, 35], [3000, 35], [5000, 30], [5000, -10], [8000, 25], [2000, 40]] as const) {
      const thumb = pa + 120 * (oat - isaTemperatureC(pa));
      expect(Math.abs(densityAltitude(pa, oat) - thumb)).toBeLessThan(300);
    }
  });

  it("refuses altitudes beyond the model and temperatures below absolute zero", () => {
    expect(() => densityAltitude(70000, -56.5)).toThrow(RangeError);
    expect(() => densityAltitude(0, -300)).toThrow(RangeError);
  });
});
