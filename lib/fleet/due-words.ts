// How one due item reads in our due view: what it does when it comes due (grounds, limits,
// reminds), its state word, how much remains in words ("12.4 hours or 23 days left, whichever
// comes first") and the margin left of its interval for the bar. Pure: no framework.

import { daysBetween } from "@/lib/dates";
import { formatHours } from "@/lib/airworthiness";
import type { DueSummary } from "./types";

/** What an item does to the aircraft when it comes due. */
export type DueEffect = "grounds" | "limits" | "reminds";
/** The item's state, worst first. */
export type DueState = "overdue" | "unknown" | "soon" | "ok";

export const DUE_EFFECT_WORDS: Record<DueEffect, { heading: string; lead: string }> = {
  grounds: { heading: "Grounds the aircraft when due", lead: "Required items: once one is overdue the aircraft is grounded until it is done." },
  limits: { heading: "Stops IFR flight when due", lead: "IFR-only items: once one is overdue the aircraft may fly VFR only." },
  reminds: { heading: "Reminders only", lead: "Club items that do not ground the aircraft when they come due." },
};

export const DUE_STATE_WORDS: Record<DueState, string> = {
  overdue: "Overdue",
  unknown: "Status unknown",
  soon: "Coming up",
  ok: "In hand",
};

export function dueEffect(d: Pick<DueSummary, "required" | "ifrOnly">): DueEffect {
  if (d.required === false) return "reminds";
  return d.ifrOnly ? "limits" : "grounds";
}

export function dueState(d: Pick<DueSummary, "overdue" | "incomplete" | "dueSoon">): DueState {
  if (d.overdue) return "overdue";
  if (d.incomplete) return "unknown";
  if (d.dueSoon) return "soon";
  return "ok";
}

function plural(n: number, unit: string): string {
  return `${n} ${unit}${Math.abs(n) === 1 ? "" : "s"}`;
}

function hoursWords(h: number): string {
  return `${formatHours(h)} hour${formatHours(h) === "1.0" ? "" : "s"}`;
}

/** The hours interval is known only when the last completion was read on the meter counted now. */
function hoursInterval(d: DueSummary): number | null {
  if (d.dueHours === null || d.lastDoneHours === null || d.otherMeter) return null;
  const total = d.dueHours - d.lastDoneHours;
  return total > 0 ? total : null;
}

function daysInterval(d: DueSummary): number | null {
  if (d.dueDate === null || d.lastDoneOn === null) return null;
  const total = daysBetween(d.lastDoneOn, d.dueDate);
  return total > 0 ? total : null;
}

/**
 * The share of the interval still left (0 to 1), by whichever limit is nearer, for the bar:
 * 0 when overdue, null when it cannot be worked out (no completion, no interval).
 */
export function dueMargin(d: DueSummary): number | null {
  if (d.overdue) return 0;
  const shares: number[] = [];
  const hours = hoursInterval(d);
  if (hours !== null && d.hoursLeft !== null) shares.push(d.hoursLeft / hours);
  const days = daysInterval(d);
  if (days !== null && d.daysLeft !== null) shares.push(d.daysLeft / days);
  if (shares.length === 0) return null;
  return Math.min(1, Math.max(0, Math.min(...shares)));
}

/**
 * How much remains, in words: "12.4 hours or 23 days left, whichever comes first",
 * "due today", "overdue by 4 days", "status unknown — missing record: …".
 */
export function remainingWords(d: DueSummary): string {
  if (d.overdue) {
    const over: string[] = [];
    if (d.hoursLeft !== null && d.hoursLeft < 0) over.push(hoursWords(-d.hoursLeft));
    if (d.daysLeft !== null && d.daysLeft < 0) over.push(plural(-d.daysLeft, "day"));
    if (d.useLeftHours !== null && d.useLeftHours < 0) over.push(`${hoursWords(-d.useLeftHours)} of use`);
    return over.length ? `Overdue by ${over.join(" and by ")}` : "Overdue";
  }
  const left: string[] = [];
  if (d.hoursLeft !== null && !d.otherMeter) left.push(hoursWords(d.hoursLeft));
  if (d.daysLeft !== null) left.push(d.daysLeft === 0 ? "" : plural(d.daysLeft, "day"));
  const useLeft = d.useLeftHours !== null ? `${hoursWords(d.useLeftHours)} of use left` : null;
  if (d.daysLeft === 0) {
    return useLeft ? `Due today; ${useLeft}` : "Due today";
  }
  const main = left.length === 2 ? `${left[0]} or ${left[1]} left, whichever comes first` : left.length === 1 ? `${left[0]} left` : null;
  const parts = [main, useLeft].filter((p): p is string => p !== null);
  if (d.incomplete) {
    const missing = d.otherMeter
      ? `missing record: its last completion's reading on the ${d.otherMeter.currentMeter === "hobbs" ? "Hobbs" : "tach"}`
      : d.lastDoneOn
        ? "missing record: a reading it needs"
        : "missing record: its last completion";
    return parts.length ? `${parts.join("; ")}; status unknown — ${missing}` : `Status unknown — ${missing}`;
  }
  return parts.length ? parts.join("; ") : "Nothing left to count";
}

/** Worst state first, then the smallest margin; the due list's own order within a state. */
export function sortForDueView(due: DueSummary[]): DueSummary[] {
  const rank: Record<DueState, number> = { overdue: 0, unknown: 1, soon: 2, ok: 3 };
  return due
    .map((d, i) => ({ d, i, r: rank[dueState(d)], m: dueMargin(d) ?? 2 }))
    .sort((a, b) => a.r - b.r || a.m - b.m || a.i - b.i)
    .map((x) => x.d);
}

/** The due view's groups, in the order shown; empty groups left out. */
export function groupForDueView(due: DueSummary[]): { effect: DueEffect; items: DueSummary[] }[] {
  const order: DueEffect[] = ["grounds", "limits", "reminds"];
  return order
    .map((effect) => ({ effect, items: sortForDueView(due.filter((d) => dueEffect(d) === effect)) }))
    .filter((g) => g.items.length > 0);
}
