// How far ahead an hours-based inspection reaches: each booking before the end of a new one is
// assumed to fly the club's average flight length on the aircraft's maintenance meter.

/** Used when an aircraft has no flights yet: an hour and a half (our own assumption). */
export const DEFAULT_FLIGHT_HOURS = 1.5;

/** Mean of the flights' meter durations (in − out), ignoring impossible ones; null without any. */
export function averageFlightHours(flights: readonly { out: number; in: number }[]): number | null {
  const durations = flights.map((f) => f.in - f.out).filter((d) => Number.isFinite(d) && d > 0);
  if (durations.length === 0) return null;
  return durations.reduce((a, b) => a + b, 0) / durations.length;
}

/** Meter hours expected by the end of a booking: now + one average flight per booking up to and including it. */
export function projectedMeterHours(currentHours: number | null, averageHours: number, bookingsUpToAndIncluding: number): number | null {
  if (currentHours === null || !Number.isFinite(currentHours)) return null;
  if (!Number.isFinite(averageHours) || averageHours < 0) throw new RangeError(`averageHours must be ≥ 0, got ${averageHours}`);
  if (!Number.isInteger(bookingsUpToAndIncluding) || bookingsUpToAndIncluding < 0) {
    throw new RangeError(`bookingsUpToAndIncluding must be a whole number ≥ 0, got ${bookingsUpToAndIncluding}`);
  }
  return Math.round((currentHours + averageHours * bookingsUpToAndIncluding) * 10) / 10;
}
