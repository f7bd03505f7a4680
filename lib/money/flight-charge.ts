import { assertNonNegativeMinor } from "./checks";
import { roundScaledQuotient, subtractScaled, toScaled, type Scaled } from "./decimal";

export type FlightChargeInput = {
  /** Hobbs or tach reading when the flight started, in hours (e.g. 1233.5). */
  meterOut: number;
  /** Reading when it ended; never below meterOut. */
  meterIn: number;
  ratePerHourMinor: number;
  /** Fuel the member bought away from home, already capped at the club's price. */
  fuelCreditMinor?: number;
};

function readMeter(value: number, name: string): Scaled {
  if (!Number.isFinite(value)) throw new RangeError(`${name} must be a finite number, got ${value}`);
  if (value < 0) throw new RangeError(`${name} must not be negative, got ${value}`);
  return toScaled(value);
}

function meterDifference(meterOut: number, meterIn: number): Scaled {
  const out = readMeter(meterOut, "meterOut");
  const inn = readMeter(meterIn, "meterIn");
  if (meterIn < meterOut) {
    throw new RangeError(`meterIn (${meterIn}) is below meterOut (${meterOut}); a meter never runs backwards`);
  }
  return subtractScaled(inn, out);
}

/** Time charged for a flight, in minor units: meter hours × rate, half away from zero. */
export function meterTimeCharge(meterOut: number, meterIn: number, ratePerHourMinor: number): number {
  const hours = meterDifference(meterOut, meterIn);
  if (!Number.isFinite(ratePerHourMinor) || ratePerHourMinor < 0) {
    throw new RangeError(`ratePerHourMinor must be a finite number ≥ 0, got ${ratePerHourMinor}`);
  }
  // Exact on the meters' decimal values, so 1.2 h × 14500 is 17400, not 17399.99….
  return roundScaledQuotient([hours, toScaled(ratePerHourMinor)], []);
}

/**
 * Net charge for a flight in minor units: (meterIn − meterOut) hours × rate, rounded half
 * away from zero to the minor unit, minus the fuel credit.
 *
 * The result is the net and is NOT clamped: when the fuel credit exceeds the time charge it is
 * negative, meaning the club owes the member that much (the ledger posts it as a credit).
 * Clamping would silently lose money the member paid for the club's fuel.
 */
export function flightCharge(input: FlightChargeInput): number {
  const credit = input.fuelCreditMinor ?? 0;
  if (!Number.isFinite(credit)) throw new RangeError(`fuelCreditMinor must be a finite number, got ${credit}`);
  assertNonNegativeMinor(credit, "fuelCreditMinor");
  return meterTimeCharge(input.meterOut, input.meterIn, input.ratePerHourMinor) - credit;
}

export type FlightChargePreview =
  | { ok: true; hours: number; chargeMinor: number }
  | { ok: false; reason: string };

/**
 * The flight sheet's live figure, worked out while the pilot types: the same rule as the
 * charge the server posts (meterTimeCharge), but never throwing — half-typed or backwards
 * readings say what is missing instead. The server stays the authority on the charge.
 */
export function previewFlightCharge(meterOut: string, meterIn: string, ratePerHourMinor: number, meterName: string): FlightChargePreview {
  const pattern = /^\d+(\.\d{1,2})?$/;
  const out = meterOut.trim();
  const inn = meterIn.trim();
  if (!pattern.test(out)) return { ok: false, reason: `Enter ${meterName} out to see the charge.` };
  if (!pattern.test(inn)) return { ok: false, reason: `Enter ${meterName} in to see the charge.` };
  const a = Number(out);
  const b = Number(inn);
  if (b < a) return { ok: false, reason: `${meterName} in is below ${meterName} out.` };
  if (!Number.isFinite(ratePerHourMinor) || ratePerHourMinor < 0) return { ok: false, reason: "This aircraft has no hourly rate." };
  const chargeMinor = meterTimeCharge(a, b, ratePerHourMinor);
  return { ok: true, hours: Math.round((b - a) * 100) / 100, chargeMinor };
}
