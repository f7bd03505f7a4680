// Invented flight history for the demo fleet: continuous meters that end at the aircraft's
// current readings, so the flight line and the continuity check have something real to show.

import { addDays } from "@/lib/dates";
import { roundHours } from "@/lib/airworthiness";

/** A small deterministic generator, so every seed run tells the same story. */
export function seededRandom(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s * 1664525 + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

export type SeedFlight = {
  flownOn: string;
  hobbsOut: number;
  hobbsIn: number;
  tachOut: number;
  tachIn: number;
  dayLandings: number;
  nightFullStopLandings: number;
  /** Every seeded day landing is to a full stop (the demo club does not log touch-and-goes). */
  dayFullStopLandings: number;
  fuelAdded: number;
  oilAdded: number;
  pilotIndex: number;
};

/**
 * `count` flights over roughly the last `days` days, oldest first, whose last "in" readings are
 * the given current meters. Tach runs at about 85 % of Hobbs (common practice for trainers).
 */
export function flightHistory(opts: { count: number; days: number; today: string; hobbs: number; tach: number; pilots: number; seed: number; metric: boolean }): SeedFlight[] {
  const rand = seededRandom(opts.seed);
  const durations = Array.from({ length: opts.count }, () => roundHours(0.6 + Math.round(rand() * 14) / 10));
  const flights: SeedFlight[] = [];
  let hobbsIn = opts.hobbs;
  let tachIn = opts.tach;
  for (let i = opts.count - 1; i >= 0; i--) {
    const hobbsTime = durations[i]!;
    const tachTime = roundHours(Math.round(hobbsTime * 8.5) / 10);
    const daysAgo = Math.max(1, Math.round(((opts.count - i) * opts.days) / opts.count));
    const landings = 1 + Math.floor(rand() * 4);
    flights.unshift({
      flownOn: addDays(opts.today, -daysAgo),
      hobbsOut: roundHours(hobbsIn - hobbsTime),
      hobbsIn,
      tachOut: roundHours(tachIn - tachTime),
      tachIn,
      dayLandings: landings,
      dayFullStopLandings: landings,
      nightFullStopLandings: rand() < 0.15 ? 3 : 0,
      fuelAdded: rand() < 0.5 ? roundHours((opts.metric ? 40 : 10) + Math.round(rand() * 200) / 10) : 0,
      oilAdded: rand() < 0.1 ? 1 : 0,
      pilotIndex: Math.floor(rand() * opts.pilots),
    });
    hobbsIn = roundHours(hobbsIn - hobbsTime);
    tachIn = roundHours(tachIn - tachTime);
  }
  return flights;
}
