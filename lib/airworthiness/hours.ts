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

/** How late one hours-based completion was, for the records. */
export interface HoursLateness {
  /** Hours flown past the previous due point before it was done; 0 when done on time. */
  lateHours: number;
  /** Done later than the previous due point plus the overrun: flown past its limit. */
  beyondOverrun: boolean;
}

/** How far past its previous due point an inspection was done (0 when on time or early). */
export function hoursLateness(input: { lastDoneAt: number; previousDueAt?: number; overrunHours?: number }): HoursLateness {
  const { lastDoneAt, previousDueAt } = input;
  const overrunHours = input.overrunHours ?? 0;
  if (previousDueAt === undefined || !Number.isFinite(previousDueAt) || roundHours(lastDoneAt) <= roundHours(previousDueAt)) {
    return { lateHours: 0, beyondOverrun: false };
  }
  return {
    lateHours: roundHours(lastDoneAt - previousDueAt),
    beyondOverrun: roundHours(lastDoneAt) > roundHours(previousDueAt + overrunHours),
  };
}

/**
 * Next due point of an hours-based inspection (14 CFR 91.409(b)).
 *
 * 91.409(b): "The 100-hour limitation may be exceeded by not more than 10 hours while en route
 * to reach a place where the inspection can be done. The excess time used to reach a place
 * where the inspection can be done must be included in computing the next 100 hours of time
 * in service." The interval is a limit on time in service since the aircraft last fell due,
 * not a reward for lateness, so:
 * - Done early or on time, or with no previous due point: due `intervalHours` after it was done.
 * - An item with no overrun allowance (an oil change, an hours-based AD: "within N hours after
 *   the last one") has no "excess" to carry: due `intervalHours` after it was done (common
 *   practice; the carry-forward words belong to the 100-hour's overrun).
 * - Done late (after the previous due point) on an item with an overrun allowance, within the
 *   overrun or not: due `intervalHours` after the point where it fell due. Within the overrun the rule says so in words. Beyond the
 *   overrun the aircraft was flown past its limit; restarting from when it was done would hand
 *   that unlawful time back as a fresh allowance (an aircraft flown 30 h past due would then
 *   get 130 h before the next), so our reading, the one a careful chief instructor takes, is
 *   that the late time counts against the next interval all the same. The late time itself is
 *   a matter for the records: `hoursLateness` says how late, and the inspection history
 *   flags it.
 * - Done a whole interval or more after it fell due: no 100-hour can have been skipped
 *   lawfully, so either a record is missing or the rule did not apply then (the aircraft was
 *   not used for hire or instruction, e.g. between two annuals of a private aircraft). The
 *   history cannot place a due point across that gap; it starts afresh from when it was done,
 *   and the lateness is still flagged for someone to check the records.
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

  const late = previousDueAt !== undefined && Number.isFinite(previousDueAt) ? roundHours(lastDoneAt - previousDueAt) : 0;
  const doneLate = overrunHours > 0 && late > 0 && late < intervalHours;
  const base = doneLate && previousDueAt !== undefined ? previousDueAt : lastDoneAt;
  const dueAt = roundHours(base + intervalHours);
  return { dueAt, overrunLimitAt: roundHours(dueAt + overrunHours) };
}
