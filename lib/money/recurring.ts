// Recurring bills (insurance, hangar rent): which periods' bills are due by a day, each with its
// period key. The key (one per recurring bill and period) makes producing due bills idempotent:
// a period already billed is never billed again, however often the production runs.
// Pure date arithmetic; dates are the club's calendar days (YYYY-MM-DD).

import { addDays, formatIsoDate, lastDayOfMonth, parseIsoDate, shiftMonth, type IsoDate } from "@/lib/dates";

export type Cadence = "monthly" | "quarterly" | "yearly";

export const CADENCE_MONTHS: Record<Cadence, number> = { monthly: 1, quarterly: 3, yearly: 12 };

export const CADENCE_WORDS: Record<Cadence, string> = { monthly: "Every month", quarterly: "Every three months", yearly: "Every year" };

/** The period a bill dated `date` belongs to: "2026-05" (monthly), "2026-Q2" (quarterly) or "2026" (yearly). */
export function periodKeyFor(date: IsoDate, cadence: Cadence): string {
  const { year, month } = parseIsoDate(date);
  if (cadence === "monthly") return `${year}-${String(month).padStart(2, "0")}`;
  if (cadence === "quarterly") return `${year}-Q${Math.floor((month - 1) / 3) + 1}`;
  return String(year);
}

/**
 * The next bill date after `date`: one cadence later, on `anchorDay` of that month, or on the
 * month's last day when it is shorter (a bill anchored on the 31st falls on 28 or 29 February
 * and comes back on 31 March — it never drifts).
 */
export function nextBillDate(date: IsoDate, cadence: Cadence, anchorDay: number): IsoDate {
  if (!Number.isInteger(anchorDay) || anchorDay < 1 || anchorDay > 31) throw new RangeError(`anchorDay must be 1–31, got ${anchorDay}`);
  const { year, month } = parseIsoDate(date);
  const t = shiftMonth(year, month, CADENCE_MONTHS[cadence]);
  return formatIsoDate(t.year, t.month, Math.min(anchorDay, lastDayOfMonth(t.year, t.month)));
}

export type RecurringBillSchedule = {
  cadence: Cadence;
  anchorDay: number;
  /** The next bill's date. */
  nextOn: IsoDate;
  /** The last day a bill may be dated (inclusive), or null for no end. */
  endsOn: IsoDate | null;
  /** Days from a bill's date to its due date (0: due on its date). */
  dueDays: number;
};

export type DueOccurrence = { billDate: IsoDate; dueOn: IsoDate; periodKey: string };

/**
 * The bills due on or before `today` (oldest first, at most `limit` — a long-forgotten
 * recurrence catches up a year at a time, not unbounded), and the schedule's next date after
 * them. `ended` is true once the next date passes `endsOn`.
 */
export function dueOccurrences(schedule: RecurringBillSchedule, today: IsoDate, limit = 12): { due: DueOccurrence[]; nextOn: IsoDate; ended: boolean } {
  if (!Number.isInteger(schedule.dueDays) || schedule.dueDays < 0) throw new RangeError(`dueDays must be a whole number ≥ 0, got ${schedule.dueDays}`);
  const due: DueOccurrence[] = [];
  let at = schedule.nextOn;
  while (at <= today && (!schedule.endsOn || at <= schedule.endsOn) && due.length < limit) {
    due.push({ billDate: at, dueOn: addDays(at, schedule.dueDays), periodKey: periodKeyFor(at, schedule.cadence) });
    at = nextBillDate(at, schedule.cadence, schedule.anchorDay);
  }
  return { due, nextOn: at, ended: schedule.endsOn !== null && at > schedule.endsOn };
}
