// Standard atmosphere: ICAO Doc 7488 / U.S. Standard Atmosphere 1976 (identical below 32 km).
// Sea level 288.15 K and 1013.25 hPa, lapse rate 6.5 K/km up to the tropopause at 11 km,
// then isothermal at 216.65 K to 20 km. Altitudes are geopotential; for light aircraft the
// difference from geometric altitude is negligible.

export const FEET_PER_METRE = 1 / 0.3048; // international foot, exact
export const HPA_PER_INHG = 33.8638866667; // inch of mercury at 0 °C, standard gravity
export const STANDARD_SETTING_INHG = 29.92;

const T0 = 288.15; // K
const LAPSE = 0.0065; // K/m
const G0 = 9.80665; // m/s²
const MOLAR_MASS = 0.0289644; // kg/mol, dry air
const GAS_CONSTANT = 8.31432; // J/(mol·K), the 1976 standard's value
const TROPOPAUSE_M = 11_000;
const T_TROPOPAUSE = 216.65; // K
const MODEL_TOP_M = 20_000;
const EXPONENT = (G0 * MOLAR_MASS) / (GAS_CONSTANT * LAPSE); // ≈ 5.25588
const SCALE_HEIGHT_STRATOSPHERE = (GAS_CONSTANT * T_TROPOPAUSE) / (G0 * MOLAR_MASS); // m
const THETA_TROPOPAUSE = T_TROPOPAUSE / T0;
const SIGMA_TROPOPAUSE = THETA_TROPOPAUSE ** (EXPONENT - 1);

function checkFinite(value: number, what: string): void {
  if (!Number.isFinite(value)) throw new RangeError(`${what} must be a finite number, got ${value}`);
}

/**
 * Pressure altitude (ft) from field elevation (ft) and the altimeter setting (inHg).
 * An altimeter set to S reads the standard-atmosphere height of the static pressure minus the
 * standard height of S, so at the field: PA = elevation + 145,366.45 × (1 − (S / 29.9213)^0.190284).
 * (The constants are the US National Weather Service's fit of the standard atmosphere.)
 */
export function pressureAltitude(fieldElevationFt: number, altimeterInHg: number): number {
  checkFinite(fieldElevationFt, "Field elevation");
  checkFinite(altimeterInHg, "Altimeter setting");
  if (altimeterInHg <= 0) throw new RangeError(`Altimeter setting must be positive, got ${altimeterInHg}`);
  return fieldElevationFt + 145_366.45 * (1 - (altimeterInHg / 29.9213) ** 0.190284);
}

export function inHgFromHpa(hpa: number): number {
  return hpa / HPA_PER_INHG;
}

/** ISA temperature (°C) at a pressure altitude (ft). */
export function isaTemperatureC(pressureAltitudeFt: number): number {
  const h = checkAltitudeM(pressureAltitudeFt);
  return (h <= TROPOPAUSE_M ? T0 - LAPSE * h : T_TROPOPAUSE) - 273.15;
}

function checkAltitudeM(altitudeFt: number): number {
  checkFinite(altitudeFt, "Pressure altitude");
  const h = altitudeFt / FEET_PER_METRE;
  if (h > MODEL_TOP_M) throw new RangeError(`Altitude above the model's ${MODEL_TOP_M} m limit`);
  return h;
}

/** Pressure ratio p/p0 at a standard-atmosphere altitude (m). */
function pressureRatio(h: number): number {
  if (h <= TROPOPAUSE_M) return (1 - (LAPSE * h) / T0) ** EXPONENT;
  return THETA_TROPOPAUSE ** EXPONENT * Math.exp(-(h - TROPOPAUSE_M) / SCALE_HEIGHT_STRATOSPHERE);
}

/** Standard-atmosphere altitude (m) whose density ratio ρ/ρ0 is `sigma`. */
function altitudeForDensityRatio(sigma: number): number {
  if (sigma >= SIGMA_TROPOPAUSE) return (T0 / LAPSE) * (1 - sigma ** (1 / (EXPONENT - 1)));
  return TROPOPAUSE_M - SCALE_HEIGHT_STRATOSPHERE * Math.log(sigma / SIGMA_TROPOPAUSE);
}

/**
 * Density altitude (ft): the standard-atmosphere altitude with the same air density as the
 * actual air — pressure from the pressure altitude, temperature as measured, so
 * ρ/ρ0 = (p/p0) × (T0/T) — then inverted through the ISA density profile.
 */
export function densityAltitude(pressureAltitudeFt: number, oatC: number): number {
  const h = checkAltitudeM(pressureAltitudeFt);
  checkFinite(oatC, "Outside air temperature");
  const kelvin = oatC + 273.15;
  if (kelvin <= 0) throw new RangeError(`Temperature below absolute zero: ${oatC} °C`);
  const sigma = pressureRatio(h) * (T0 / kelvin);
  return altitudeForDensityRatio(sigma) * FEET_PER_METRE;
}
