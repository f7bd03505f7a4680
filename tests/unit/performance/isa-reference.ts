// Test-only reference for the standard atmosphere, written independently of lib/performance:
// ICAO Doc 7488 / U.S. Standard Atmosphere 1976 troposphere (0–11 km) with the constants as
// published there — T0 288.15 K, p0 1013.25 hPa, lapse 0.0065 K/m, exponent 5.25588 — density
// from the ideal-gas law, and the density altitude found by bisection rather than by a closed
// form, so that a slip in the library's algebra cannot hide in the reference.

const T0 = 288.15;
const P0_HPA = 1013.25;
const LAPSE = 0.0065;
const EXPONENT = 5.25588;
const SPECIFIC_GAS_CONSTANT = 287.05287; // J/(kg·K), dry air, ICAO Doc 7488
const FT = 0.3048;
export const HPA_PER_INHG_REF = 33.8639; // common practice, rounded

export function isaTemperatureK(hM: number): number {
  return T0 - LAPSE * hM;
}

export function isaPressureHpa(hM: number): number {
  return P0_HPA * (isaTemperatureK(hM) / T0) ** EXPONENT;
}

/** kg/m³ from hPa and K by the ideal-gas law. */
export function airDensity(pressureHpa: number, kelvin: number): number {
  return (pressureHpa * 100) / (SPECIFIC_GAS_CONSTANT * kelvin);
}

export function isaDensity(hM: number): number {
  return airDensity(isaPressureHpa(hM), isaTemperatureK(hM));
}

/** Height (ft) in the standard atmosphere at which the pressure is `pressureHpa`. */
export function standardHeightFt(pressureHpa: number): number {
  return ((T0 / LAPSE) * (1 - (pressureHpa / P0_HPA) ** (1 / EXPONENT))) / FT;
}

/** Reference pressure altitude: field elevation plus the standard height of the setting. */
export function referencePressureAltitudeFt(elevationFt: number, settingInHg: number): number {
  return elevationFt + standardHeightFt(settingInHg * HPA_PER_INHG_REF);
}

/** Reference density altitude by bisection on the ISA density profile (troposphere only). */
export function referenceDensityAltitudeFt(pressureAltitudeFt: number, oatC: number): number {
  const actual = airDensity(isaPressureHpa(pressureAltitudeFt * FT), oatC + 273.15);
  let low = -3000;
  let high = 11000;
  for (let i = 0; i < 200; i++) {
    const mid = (low + high) / 2;
    if (isaDensity(mid) > actual) low = mid;
    else high = mid;
  }
  return (low + high) / 2 / FT;
}
