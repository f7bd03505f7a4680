import { formatHours } from "@/lib/airworthiness";

export function meterWord(meter: "hobbs" | "tach"): string {
  return meter === "hobbs" ? "Hobbs" : "tach";
}

/** "done 12.0 h after it fell due at 1100.0 h, beyond the overrun" — the records keep the late time. */
export function lateText(late: { lateHours: number; beyondOverrun: boolean; fellDueAt: number; countsFromDuePoint: boolean }): string {
  const next = late.countsFromDuePoint ? "the next counts from when it fell due" : "a whole interval late: check the records; the next counts from when it was done";
  return `done ${formatHours(late.lateHours)} h after it fell due at ${formatHours(late.fellDueAt)} h${late.beyondOverrun ? ", beyond the overrun allowance" : ", within the ferry overrun"}; ${next}`;
}
