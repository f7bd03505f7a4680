// Fuel endurance against the VFR reserve: 14 CFR 91.151 (30 minutes by day, 45 at night, at
// normal cruise) plus the club's own extra minutes when it asks for more (club setting).

import { fuelEndurance, fuelReserveMinutes } from "@/lib/performance";

export function requiredReserveMinutes(night: boolean, extraReserveMinutes: number): number {
  if (!Number.isFinite(extraReserveMinutes) || extraReserveMinutes < 0) throw new RangeError(`extraReserveMinutes must be ≥ 0, got ${extraReserveMinutes}`);
  return fuelReserveMinutes(night) + extraReserveMinutes;
}

export type FuelPlan = ReturnType<typeof fuelEndurance> & { reserveMinutes: number; verdict: string };

export function planFuel(input: { usableFuel: number; burnPerHour: number; plannedHours: number; night: boolean; unit: string }, extraReserveMinutes: number): FuelPlan {
  const reserveMinutes = requiredReserveMinutes(input.night, extraReserveMinutes);
  const result = fuelEndurance({ ...input, reserveMinutes });
  const margin = Math.round(result.marginMinutes);
  const rule = extraReserveMinutes > 0 ? `${reserveMinutes} min (14 CFR 91.151 plus the club's ${extraReserveMinutes} min)` : `${reserveMinutes} min (14 CFR 91.151, ${input.night ? "night" : "day"})`;
  const verdict = result.legal
    ? `Enough fuel: ${margin} min to spare after the leg and a reserve of ${rule}.`
    : `Not enough fuel: ${Math.abs(margin)} min short of the leg plus a reserve of ${rule}.`;
  return { ...result, reserveMinutes, verdict };
}
