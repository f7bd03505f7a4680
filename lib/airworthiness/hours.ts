// Meter-hour arithmetic for hours-based inspections.

/** Meters read to tenths (some to hundredths): rounding to hundredths removes binary float
 *  noise (1100.1 + 100 → 1200.1) without ever moving a due point by a readable amount. */
export function roundHours(value: number): number {
  return Math.round(value * 100) / 100;
}

/** "1100.0", or "1100.05" when the reading has hundredths. */
export function formatHours(value: number): string {
  const rounded = roundHours(value);
  return Number.isInteger(Math.round(rounded * 100) / 10) ? rounded.toFixed(1) : rounded.toFixed(2);
}

function assertFinite(name: string, value: number): void {
  if (!Number.isFinite(value)) throw new RangeError(`${name} must be a finite number of hours`);
}

/**
 * Next due point of an hours-based inspection (14 CFR 91.409(b)).
 * - Done late but within the overrun allowance: the excess counts toward the next interval,
 *   so the next one is due `intervalHours` after the previous due point.
 * - Done early or on time, or with no previous due point: due `intervalHours` after it was done.
 * - Done later than the overrun limit: the allowance never covered that flying (the aircraft
 *   was flown past its limit), so there is no lawful "excess" to carry; the interval starts
 *   from when it was done. The illegal time itself is a matter for the records, not this rule.
 * overrunLimitAt is the furthest the aircraft may be flown, only to reach a place where the
 * inspection can be done.
 */
export function hoursDue(input: {
  lastDoneAt: number;
  intervalHours: number;
  overrunHours?: number;
  previousDueAt?: number;
}): { dueAt: number; overrunLimitAt: number } {
  const { lastDoneAt, intervalHours, previousDueAt } = input;
  const overrunHours = input.overrunHours ?? 0;
  assertFinite("lastDoneAt", lastDoneAt);
  assertFinite("intervalHours", intervalHours);
  assertFinite("overrunHours", overrunHours);
  if (intervalHours <= 0) throw new RangeError("intervalHours must be more than zero");
  if (overrunHours < 0) throw new RangeError("overrunHours must not be negative");

  let base = lastDoneAt;
  if (previousDueAt !== undefined && Number.isFinite(previousDueAt)) {
    const previousLimit = roundHours(previousDueAt + overrunHours);
    const doneLate = roundHours(lastDoneAt) > roundHours(previousDueAt);
    if (doneLate && roundHours(lastDoneAt) <= previousLimit) base = previousDueAt;
  }
  const dueAt = roundHours(base + intervalHours);
  return { dueAt, overrunLimitAt: roundHours(dueAt + overrunHours) };
}
