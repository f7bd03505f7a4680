// Meter continuity between consecutive flights of one aircraft: the next flight's "out"
// readings should equal the previous flight's "in" readings. A gap is time nobody logged
// (and nobody paid for); an overlap is time logged twice. Either is flagged for maintenance,
// never silently accepted and never silently "fixed".

import { formatHours, roundHours } from "@/lib/airworthiness";

export type MeterName = "hobbs" | "tach";
export type ContinuityKind = "gap" | "overlap";
export type ContinuityStatus = "ok" | ContinuityKind;

export interface ContinuityIssue {
  meter: MeterName;
  kind: ContinuityKind;
  /** Size of the gap or overlap in meter hours, always positive. */
  hours: number;
  text: string;
}

export interface ContinuityResult {
  status: ContinuityStatus;
  issues: ContinuityIssue[];
}

/** Readings where the previous flight ended. */
export interface MetersIn {
  hobbsIn: number;
  tachIn: number;
}

/** Readings where the next flight started. */
export interface MetersOut {
  hobbsOut: number;
  tachOut: number;
}

/** Meters read to tenths: anything under half a tenth is reading noise, not a gap. */
export const CONTINUITY_TOLERANCE_HOURS = 0.05;

const LABEL: Record<MeterName, string> = { hobbs: "Hobbs", tach: "Tach" };

function compare(meter: MeterName, previousIn: number, nextOut: number): ContinuityIssue | null {
  const diff = roundHours(nextOut - previousIn);
  if (Math.abs(diff) < CONTINUITY_TOLERANCE_HOURS) return null;
  const label = LABEL[meter];
  const hours = roundHours(Math.abs(diff));
  if (diff > 0) {
    return {
      meter,
      kind: "gap",
      hours,
      text: `${label} out ${formatHours(nextOut)} is ${formatHours(hours)} h after the previous ${label} in ${formatHours(previousIn)}: ${formatHours(hours)} h not logged`,
    };
  }
  return {
    meter,
    kind: "overlap",
    hours,
    text: `${label} out ${formatHours(nextOut)} is ${formatHours(hours)} h before the previous ${label} in ${formatHours(previousIn)}: ${formatHours(hours)} h logged twice`,
  };
}

/**
 * Compares where the previous flight ended with where the next one started. With no previous
 * flight (the aircraft's first logged flight) there is nothing to compare: "ok".
 * An overlap outranks a gap in the status because it double-counts time already billed.
 */
export function checkMeterContinuity(previous: MetersIn | null, next: MetersOut): ContinuityResult {
  if (!previous) return { status: "ok", issues: [] };
  const issues = [compare("hobbs", previous.hobbsIn, next.hobbsOut), compare("tach", previous.tachIn, next.tachOut)].filter(
    (i): i is ContinuityIssue => i !== null,
  );
  const status: ContinuityStatus = issues.some((i) => i.kind === "overlap") ? "overlap" : issues.length ? "gap" : "ok";
  return { status, issues };
}

/** A flight entered late sits between two others: check both sides and keep the worse. */
export function checkBetween(previous: MetersIn | null, flight: MetersOut & MetersIn, following: MetersOut | null): ContinuityResult {
  const before = checkMeterContinuity(previous, flight);
  const after = following ? checkMeterContinuity(flight, following) : { status: "ok" as const, issues: [] };
  const issues = [...before.issues, ...after.issues.map((i) => ({ ...i, text: `Next flight: ${i.text}` }))];
  const status: ContinuityStatus = issues.some((i) => i.kind === "overlap") ? "overlap" : issues.length ? "gap" : "ok";
  return { status, issues };
}

/** The aircraft's meters after a flight: they only move forward, so a flight entered late
 *  (earlier than the newest one) leaves them where they are. */
export function advanceMeters(
  current: { hobbs: number | null; tach: number | null },
  flight: MetersIn,
): { hobbs: number; tach: number } {
  return {
    hobbs: current.hobbs === null ? flight.hobbsIn : Math.max(current.hobbs, flight.hobbsIn),
    tach: current.tach === null ? flight.tachIn : Math.max(current.tach, flight.tachIn),
  };
}
