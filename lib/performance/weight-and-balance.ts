import { isWithinEnvelope, type EnvelopePoint } from "./envelope";

// Weight × arm = moment; CG = total moment ÷ total weight (FAA-H-8083-25, Weight and Balance).
// All weights, arms and envelope corners in one unit system (lb/in or kg/mm); the UI converts.

export type WbAircraft = { emptyWeight: number; emptyArm: number; maxTakeoffWeight: number; envelope: EnvelopePoint[] };
export type WbLoad = { weight: number; arm: number };
export type WbResult = { weight: number; moment: number; cg: number; withinEnvelope: boolean; overweight: boolean };

function checkFinite(value: number, what: string): void {
  if (!Number.isFinite(value)) throw new RangeError(`${what} must be a finite number, got ${value}`);
}

function totalOf(aircraft: WbAircraft, loads: readonly WbLoad[]): { weight: number; moment: number } {
  checkFinite(aircraft.emptyWeight, "Empty weight");
  checkFinite(aircraft.emptyArm, "Empty arm");
  let weight = aircraft.emptyWeight;
  let moment = aircraft.emptyWeight * aircraft.emptyArm;
  for (const load of loads) {
    checkFinite(load.weight, "Load weight");
    checkFinite(load.arm, "Load arm");
    weight += load.weight;
    moment += load.weight * load.arm;
  }
  if (weight <= 0) throw new RangeError(`Total weight must be positive, got ${weight}`);
  return { weight, moment };
}

function resultFor(total: { weight: number; moment: number }, maxWeight: number, envelope: EnvelopePoint[]): WbResult {
  checkFinite(maxWeight, "Maximum weight");
  const cg = total.moment / total.weight;
  return {
    weight: total.weight,
    moment: total.moment,
    cg,
    withinEnvelope: isWithinEnvelope(cg, total.weight, envelope),
    overweight: total.weight > maxWeight,
  };
}

/** Loaded weight, moment and CG, checked against the CG envelope and the maximum takeoff weight. */
export function weightAndBalance(aircraft: WbAircraft, loads: WbLoad[]): WbResult {
  return resultFor(totalOf(aircraft, loads), aircraft.maxTakeoffWeight, aircraft.envelope);
}

/**
 * Both points a pilot must check: at takeoff, and at landing after the planned fuel burn
 * (each burn is a positive weight taken off at its tank's arm). Landing weight is checked
 * against the maximum landing weight when the aircraft has one, else the maximum takeoff weight.
 */
export function takeoffAndLandingWeightAndBalance(
  aircraft: WbAircraft & { maxLandingWeight?: number },
  loads: WbLoad[],
  fuelBurn: WbLoad[],
): { takeoff: WbResult; landing: WbResult } {
  for (const burn of fuelBurn) {
    checkFinite(burn.weight, "Fuel burn weight");
    if (burn.weight < 0) throw new RangeError(`Fuel burn must not be negative, got ${burn.weight}`);
  }
  const takeoff = weightAndBalance(aircraft, loads);
  const afterBurn = [...loads, ...fuelBurn.map((b) => ({ weight: -b.weight, arm: b.arm }))];
  const landing = resultFor(totalOf(aircraft, afterBurn), aircraft.maxLandingWeight ?? aircraft.maxTakeoffWeight, aircraft.envelope);
  return { takeoff, landing };
}
