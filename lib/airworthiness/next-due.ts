// When each inspection item comes due next, by date, by meter hours and by use.

import { compareIsoDates, daysBetween, type IsoDate } from "@/lib/dates";
import { calendarDue, daysDue } from "./calendar";
import { hoursDue, roundHours } from "./hours";
import type { Completion, InspectionItem, MissingData, NextDue } from "./types";

function hasHours(c: Completion): c is Completion & { hours: number } {
  return typeof c.hours === "number" && Number.isFinite(c.hours);
}

/** Own completions plus those of the items listed in `satisfiedBy`, oldest first. */
export function collectCompletions(item: InspectionItem, siblings: InspectionItem[]): Completion[] {
  const keys = new Set(item.satisfiedBy ?? []);
  const borrowed = siblings.filter((s) => s.key !== item.key && keys.has(s.key)).flatMap((s) => s.completions);
  return [...item.completions, ...borrowed].sort((a, b) => {
    const byDate = compareIsoDates(a.date, b.date);
    if (byDate !== 0) return byDate;
    const ha = hasHours(a) ? a.hours : -1;
    const hb = hasHours(b) ? b.hours : -1;
    return ha - hb;
  });
}

/** The due point after the latest completion, carrying 91.409(b) excess through the history.
 *  A completion without a meter reading breaks the chain: the next one starts afresh. */
function chainHoursDue(
  completions: Completion[],
  intervalHours: number,
  overrunHours: number | undefined,
): { dueAt: number; overrunLimitAt: number } | null {
  let previous: { dueAt: number; overrunLimitAt: number } | null = null;
  for (const c of completions) {
    if (!hasHours(c)) {
      previous = null;
      continue;
    }
    previous = hoursDue({ lastDoneAt: c.hours, intervalHours, overrunHours, previousDueAt: previous?.dueAt });
  }
  return previous;
}

function dueDateOf(item: InspectionItem, last: Completion, missing: MissingData[]): IsoDate | null {
  const rule = item.rule;
  switch (rule.kind) {
    case "calendar-months":
    case "months-or-hours":
      return calendarDue(last.date, rule.months);
    case "days":
      return daysDue(last.date, rule.days);
    case "fixed-date":
      if (!last.expiresOn) missing.push("no-expiry-date");
      return last.expiresOn ?? null;
    case "hours":
      return null;
  }
}

export function isHoursBased(item: InspectionItem): boolean {
  return item.rule.kind === "hours" || item.rule.kind === "months-or-hours";
}

/**
 * Next due date and/or hours for one item. `siblings` are the aircraft's other items, needed
 * only when this item is satisfied by another (an annual counts as a 100-hour, 91.409(b)).
 * currentHours may be null or NaN when the meter reading is not known.
 */
export function nextDue(
  item: InspectionItem,
  today: IsoDate,
  currentHours: number | null,
  siblings: InspectionItem[] = [],
): NextDue {
  const completions = collectCompletions(item, siblings);
  const last = completions.at(-1) ?? null;
  const missing: MissingData[] = [];
  const result: NextDue = {
    key: item.key,
    name: item.name,
    lastDone: last,
    dueDate: null,
    daysLeft: null,
    dueHours: null,
    overrunLimitHours: null,
    hoursLeft: null,
    useLimitHours: item.usage?.limitHours ?? null,
    useLeftHours: null,
    overdue: false,
    missing,
  };

  if (item.usage) {
    const used = item.usage.usedHours;
    if (typeof used === "number" && Number.isFinite(used)) {
      result.useLeftHours = roundHours(item.usage.limitHours - used);
    } else missing.push("no-use-record");
  }

  if (!last) {
    missing.unshift("no-completion");
    return result;
  }

  result.dueDate = dueDateOf(item, last, missing);
  if (result.dueDate) result.daysLeft = daysBetween(today, result.dueDate);

  const rule = item.rule;
  if (rule.kind === "hours" || rule.kind === "months-or-hours") {
    if (!hasHours(last)) missing.push("no-completion-hours");
    else {
      const due = chainHoursDue(completions, rule.hours, rule.overrunHours);
      if (due) {
        result.dueHours = due.dueAt;
        result.overrunLimitHours = due.overrunLimitAt;
      }
    }
    const meterKnown = typeof currentHours === "number" && Number.isFinite(currentHours);
    if (!meterKnown) missing.push("no-current-hours");
    else if (result.dueHours !== null) result.hoursLeft = roundHours(result.dueHours - currentHours);
  }

  result.overdue =
    (result.daysLeft !== null && result.daysLeft < 0) ||
    (result.hoursLeft !== null && result.hoursLeft < 0) ||
    (result.useLeftHours !== null && result.useLeftHours < 0);
  return result;
}
