// A maintenance block in the words the flight line shows beside an aircraft: its span on the
// club's clock and its reason. A block within one club day gives that day and two clock times;
// a longer one gives both ends in full.

import { isoDateInTimeZone } from "@/lib/dates";
import { formatDateWords, formatInstantWords } from "@/lib/dates/words";

export type BlockSpan = { startsAt: Date | string; endsAt: Date | string; reason: string };

function clockOf(instant: Date, timeZone: string): string {
  return formatInstantWords(instant, timeZone).split(", ").pop() ?? "";
}

/** "Maintenance block Wed 2 Dec 2026, 13:00–17:00: 100-hour inspection" (club clock). */
export function blockWords(block: BlockSpan, timeZone: string): string {
  const start = new Date(block.startsAt);
  const end = new Date(block.endsAt);
  const reason = block.reason.trim();
  const tail = reason ? `: ${reason}` : "";
  if (Number.isNaN(start.getTime()) || Number.isNaN(end.getTime())) return `Maintenance block (times not readable)${tail}`;
  const startDay = isoDateInTimeZone(start, timeZone);
  // A block ending at midnight belongs to the day it started.
  const lastMoment = new Date(end.getTime() - 1);
  if (isoDateInTimeZone(lastMoment, timeZone) === startDay) {
    const endClock = clockOf(end, timeZone);
    return `Maintenance block ${formatDateWords(startDay)}, ${clockOf(start, timeZone)}–${endClock === "00:00" ? "24:00" : endClock}${tail}`;
  }
  return `Maintenance block from ${formatInstantWords(start, timeZone)} to ${formatInstantWords(end, timeZone)}${tail}`;
}
