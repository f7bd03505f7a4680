// Standard weights from the FAA Pilot's Handbook of Aeronautical Knowledge (FAA-H-8083-25),
// Weight and Balance chapter; unit conversions exact by definition of the US gallon
// (231 in³) and the international pound.
import { formatNumber } from "@/lib/money/format";

export const AVGAS_LB_PER_US_GAL = 6;
export const JET_FUEL_LB_PER_US_GAL = 6.7;
export const OIL_LB_PER_US_GAL = 7.5;
export const LITRES_PER_US_GAL = 3.785411784;
export const KG_PER_LB = 0.45359237;

export type FluidKind = "avgas" | "jet" | "oil";
export type VolumeUnit = "usgal" | "usqt" | "litre";

const LB_PER_US_GAL: Record<FluidKind, number> = {
  avgas: AVGAS_LB_PER_US_GAL,
  jet: JET_FUEL_LB_PER_US_GAL,
  oil: OIL_LB_PER_US_GAL,
};

const US_GAL_PER_UNIT: Record<VolumeUnit, number> = { usgal: 1, usqt: 0.25, litre: 1 / LITRES_PER_US_GAL };

function checkFinite(value: number, what: string): void {
  if (!Number.isFinite(value)) throw new RangeError(`${what} must be a finite number, got ${value}`);
}

export function litresFromUsGallons(gallons: number): number {
  return gallons * LITRES_PER_US_GAL;
}
export function usGallonsFromLitres(litres: number): number {
  return litres / LITRES_PER_US_GAL;
}
export function kgFromLb(lb: number): number {
  return lb * KG_PER_LB;
}
export function lbFromKg(kg: number): number {
  return kg / KG_PER_LB;
}

/** Weight of a volume of fuel or oil at the handbook's standard density, in both lb and kg. */
export function fuelWeight(volume: number, unit: VolumeUnit, kind: FluidKind = "avgas"): { lb: number; kg: number } {
  checkFinite(volume, "Volume");
  const perUnit = US_GAL_PER_UNIT[unit];
  const perGallon = LB_PER_US_GAL[kind];
  if (perUnit === undefined || perGallon === undefined) throw new RangeError(`Unknown unit or fluid: ${unit}, ${kind}`);
  const lb = volume * perUnit * perGallon;
  return { lb, kg: kgFromLb(lb) };
}

/** 14 CFR 91.151(a): VFR reserve at normal cruise — 30 minutes by day, 45 minutes at night. */
export function fuelReserveMinutes(night: boolean): number {
  return night ? 45 : 30;
}

/**
 * Fuel plan against the 91.151 reserve, or the club's reserve when that is larger.
 * Fuel in any one volume or weight unit, burn in the same unit per hour.
 * marginMinutes: cruise time left over after the leg and the reserve (negative when short).
 */
export function fuelEndurance(input: {
  usableFuel: number;
  burnPerHour: number;
  plannedHours: number;
  night: boolean;
  reserveMinutes?: number;
}): { requiredFuel: number; reserveFuel: number; enduranceHours: number; marginMinutes: number; legal: boolean } {
  const { usableFuel, burnPerHour, plannedHours, night } = input;
  checkFinite(usableFuel, "Usable fuel");
  checkFinite(burnPerHour, "Burn per hour");
  checkFinite(plannedHours, "Planned hours");
  if (usableFuel < 0 || plannedHours < 0) throw new RangeError("Fuel and planned time must not be negative");
  if (burnPerHour <= 0) throw new RangeError(`Burn per hour must be positive, got ${burnPerHour}`);
  const clubMinutes = input.reserveMinutes ?? 0;
  checkFinite(clubMinutes, "Reserve minutes");
  if (clubMinutes < 0) throw new RangeError(`Reserve minutes must not be negative, got ${clubMinutes}`);

  const reserveMinutes = Math.max(fuelReserveMinutes(night), clubMinutes);
  const reserveFuel = (burnPerHour * reserveMinutes) / 60;
  const requiredFuel = burnPerHour * plannedHours + reserveFuel;
  const enduranceHours = usableFuel / burnPerHour;
  const marginMinutes = ((usableFuel - requiredFuel) / burnPerHour) * 60;
  // Exactly enough fuel is legal; the tolerance only absorbs floating-point rounding.
  const legal = usableFuel >= requiredFuel - 1e-9 * Math.max(1, requiredFuel);
  return { requiredFuel, reserveFuel, enduranceHours, marginMinutes, legal };
}

/**
 * The standard fuel weight as a note in the club's own units and locale: "6 lb per US gallon"
 * (imperial) or "0.72 kg per litre" (metric, the same density converted), digits per the locale.
 */
export function fuelDensityNote(kind: "avgas" | "jet", unitSystem: "imperial" | "metric", locale: string): string {
  const lbPerGal = LB_PER_US_GAL[kind];
  if (unitSystem === "metric") return `${formatNumber(kgFromLb(lbPerGal) / LITRES_PER_US_GAL, locale, { minimumFractionDigits: 2, maximumFractionDigits: 2 })} kg per litre`;
  return `${formatNumber(lbPerGal, locale)} lb per US gallon`;
}
