import { formatHours } from "@/lib/airworthiness";
import type { DueSummary } from "@/lib/fleet/types";

export function meterWord(meter: "hobbs" | "tach"): string {
  return meter === "hobbs" ? "Hobbs" : "tach";
}

/** "done 12.0 h after it fell due at 1100.0 h, beyond the overrun" — the records keep the late time. */
export function lateText(late: { lateHours: number; beyondOverrun: boolean; fellDueAt: number; countsFromDuePoint: boolean }): string {
  const next = late.countsFromDuePoint ? "the next counts from when it fell due" : "a whole interval late: check the records; the next counts from when it was done";
  return `done ${formatHours(late.lateHours)} h after it fell due at ${formatHours(late.fellDueAt)} h${late.beyondOverrun ? ", beyond the overrun allowance" : ", within the ferry overrun"}; ${next}`;
}

function plural(n: number, unit: string): string {
  return `${n} ${unit}${Math.abs(n) === 1 ? "" : "s"}`;
}

/** "by 2026-12-31 (30 days left)", "at 3534.4 h (46.3 h left)", or both; plain words for the flight line. */
export function dueText(d: DueSummary): string {
  const parts: string[] = [];
  if (d.dueDate !== null && d.daysLeft !== null) {
    parts.push(d.daysLeft < 0 ? `was due ${d.dueDate} (${plural(-d.daysLeft, "day")} ago)` : `by ${d.dueDate} (${plural(d.daysLeft, "day")} left)`);
  }
  if (d.dueHours !== null) {
    parts.push(d.hoursLeft === null ? `at ${formatHours(d.dueHours)} h` : d.hoursLeft < 0 ? `was due at ${formatHours(d.dueHours)} h (${formatHours(-d.hoursLeft)} h over)` : `at ${formatHours(d.dueHours)} h (${formatHours(d.hoursLeft)} h left)`);
  }
  if (d.useLeftHours !== null) parts.push(d.useLeftHours < 0 ? "use limit exceeded" : `${formatHours(d.useLeftHours)} h of use left`);
  if (d.otherMeter) {
    const note = `missing record: the reading on the ${meterWord(d.otherMeter.currentMeter)} (last done on the ${meterWord(d.otherMeter.completionMeter)}, inspections now count by the ${meterWord(d.otherMeter.currentMeter)})`;
    return parts.length ? `${parts.join(" or ")}; ${note}` : note;
  }
  if (d.incomplete && parts.length === 0) return d.lastDoneOn ? "missing record: a reading it needs" : "missing record: its last completion";
  return parts.join(" or ");
}

export function dueTone(d: DueSummary): string {
  if (d.overdue) return "text-stop-800 font-bold";
  if (d.incomplete) return "text-ask-800 font-bold";
  if (d.dueSoon) return "text-sock-700 font-bold";
  return "text-ink-700";
}

export function dueLabel(d: DueSummary): string | null {
  if (d.overdue) return "Overdue";
  if (d.incomplete) return "Status unknown";
  if (d.dueSoon) return "Due soon";
  return null;
}
