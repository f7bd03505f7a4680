import { assertFiniteNonNegative, assertPositive } from "./checks";
import { roundQuotient } from "./decimal";

/**
 * Engine reserve per hour: overhaul cost ÷ TBO (common practice), rounded half away from
 * zero to the minor unit. $30,000 over a 2,000 h TBO is $15.00 per hour.
 */
export function engineReservePerHour(overhaulCostMinor: number, tboHours: number): number {
  assertFiniteNonNegative(overhaulCostMinor, "overhaulCostMinor");
  assertPositive(tboHours, "tboHours");
  return roundQuotient([overhaulCostMinor], [tboHours]);
}

export type HourlyRateInput = {
  /** Insurance, hangar, annual inspection, loan, subscriptions: everything paid whether or not it flies. */
  fixedAnnualCostsMinor: number;
  expectedHours: number;
  /** Gallons or litres per hour, in the same unit as fuelPriceMinor. */
  fuelBurnPerHour: number;
  fuelPriceMinor: number;
  oilPerHourMinor?: number;
  /** Airframe, propeller and avionics reserve other than the engine overhaul. */
  maintenanceReservePerHourMinor?: number;
  overhaulCostMinor: number;
  tboHours: number;
};

export type HourlyRate = {
  fixedPerHour: number;
  /** Fuel + oil + maintenance reserve per hour (the engine reserve is shown on its own). */
  variablePerHour: number;
  engineReserve: number;
  /** Break-even rate with fuel included: fixed + variable + engine reserve. */
  wetRate: number;
  /** The wet rate without the fuel, for members who buy their own. */
  dryRate: number;
};

/**
 * Break-even hourly rate in minor units. Each component is rounded half away from zero to the
 * minor unit first and the rates are sums of the rounded components, so the table a treasurer
 * shows adds up to the cent.
 */
export function hourlyRate(input: HourlyRateInput): HourlyRate {
  assertFiniteNonNegative(input.fixedAnnualCostsMinor, "fixedAnnualCostsMinor");
  assertPositive(input.expectedHours, "expectedHours");
  assertFiniteNonNegative(input.fuelBurnPerHour, "fuelBurnPerHour");
  assertFiniteNonNegative(input.fuelPriceMinor, "fuelPriceMinor");
  const oil = input.oilPerHourMinor ?? 0;
  const maintenance = input.maintenanceReservePerHourMinor ?? 0;
  assertFiniteNonNegative(oil, "oilPerHourMinor");
  assertFiniteNonNegative(maintenance, "maintenanceReservePerHourMinor");

  const fixedPerHour = roundQuotient([input.fixedAnnualCostsMinor], [input.expectedHours]);
  const fuelPerHour = roundQuotient([input.fuelBurnPerHour, input.fuelPriceMinor]);
  const variablePerHour = fuelPerHour + roundQuotient([oil]) + roundQuotient([maintenance]);
  const engineReserve = engineReservePerHour(input.overhaulCostMinor, input.tboHours);
  const wetRate = fixedPerHour + variablePerHour + engineReserve;
  return { fixedPerHour, variablePerHour, engineReserve, wetRate, dryRate: wetRate - fuelPerHour };
}

export type RateTableRow = HourlyRate & { expectedHours: number };

/** The break-even rates across a range of hours flown per year, for the calculator's chart. */
export function rateTable(input: Omit<HourlyRateInput, "expectedHours">, hoursList: readonly number[]): RateTableRow[] {
  return hoursList.map((expectedHours) => ({ expectedHours, ...hourlyRate({ ...input, expectedHours }) }));
}
