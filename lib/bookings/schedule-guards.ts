// What the schedule itself says against a booking, beside the overlap check of bookings
// (lib/bookings/overlap) and the aircraft and member guards (lib/bookings/guards): a maintenance
// block on the aircraft, or an instructor who keeps an availability list and is not available
// for the whole window. Always refused, with the block's or the windows' own times in words. Pure.

import { coveredBy, overlapping, type Span } from "./schedule";

export type ScheduleRefusal = { field: "startsAt" | "instructorId"; reason: string };

export type ScheduleCheckInput = {
  wanted: Span;
  registration: string;
  blocks: readonly (Span & { reason: string })[];
  /** Null when the booking has no instructor. */
  instructor: { name: string; keepsAvailability: boolean; windows: readonly Span[] } | null;
  /** Club-local "2026-05-01 14:00" of an instant. */
  format: (ms: number) => string;
};

export function scheduleRefusals(input: ScheduleCheckInput): ScheduleRefusal[] {
  const { wanted, format } = input;
  const out: ScheduleRefusal[] = [];
  for (const b of overlapping(wanted, input.blocks)) {
    out.push({ field: "startsAt", reason: `${input.registration} is blocked for maintenance from ${format(b.start)} to ${format(b.end)}: ${b.reason}.` });
  }
  const instructor = input.instructor;
  if (instructor?.keepsAvailability && !coveredBy(wanted, instructor.windows)) {
    const near = overlapping(wanted, instructor.windows);
    const listed = near.length ? ` Available then only ${near.map((w) => `${format(w.start)} to ${format(w.end)}`).join(", ")}.` : "";
    out.push({ field: "instructorId", reason: `${instructor.name} is not available for the whole of ${format(wanted.start)} to ${format(wanted.end)}.${listed} Choose a time inside their available times, or another instructor.` });
  }
  return out;
}
