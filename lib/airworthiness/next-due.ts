// When each inspection item comes due next, by date, by meter hours and by use.

import { compareIsoDates, daysBetween, type IsoDate } from "@/lib/dates";
import { calendarDue, daysDue } from "./calendar";
import { hoursDue, hoursLateness, roundHours } from "./hours";
import type { Completion, InspectionItem, LateCompletion, MeterName, MissingData, NextDue } from "./types";

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

/** Two readings are comparable unless both meters are known and differ. */
function sameMeter(a: MeterName | null | undefined, b: MeterName | null | undefined): boolean {
  return !a || !b || a === b;
}

type ChainPoint = { dueAt: number; overrunLimitAt: number; late: LateCompletion | null };

/** One step per completion with hours, oldest first: the due point it set and how late it
 *  was against the one before. A completion without a meter reading, or read on another meter
 *  than the one before, breaks the chain: the next one starts afresh. */
export function hoursChain(completions: Completion[], intervalHours: number, overrunHours: number | undefined): { completion: Completion; point: ChainPoint | null }[] {
  let previous: ChainPoint | null = null;
  let previousMeter: MeterName | null | undefined;
  const out: { completion: Completion; point: ChainPoint | null }[] = [];
  for (const c of completions) {
    if (!hasHours(c)) {
      previous = null;
      out.push({ completion: c, point: null });
      continue;
    }
    if (previous && !sameMeter(previousMeter, c.meter)) previous = null;
    const due = hoursDue({ lastDoneAt: c.hours, intervalHours, overrunHours, previousDueAt: previous?.dueAt });
    const lateness = hoursLateness({ lastDoneAt: c.hours, previousDueAt: previous?.dueAt, overrunHours });
    const late: LateCompletion | null = previous && lateness.lateHours > 0 ? { ...lateness, fellDueAt: previous.dueAt, countsFromDuePoint: due.dueAt === roundHours(previous.dueAt + intervalHours) } : null;
    previous = { ...due, late };
    previousMeter = c.meter ?? previousMeter;
    out.push({ completion: c, point: previous });
  }
  return out;
}

/** The due point after the latest completion, carrying 91.409(b) excess through the history. */
function chainHoursDue(completions: Completion[], intervalHours: number, overrunHours: number | undefined): ChainPoint | null {
  return hoursChain(completions, intervalHours, overrunHours).at(-1)?.point ?? null;
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
 * currentHours may be null or NaN when the meter reading is not known; `meter` is the meter it
 * is read on.
 *
 * Meter provenance: when the governing completion was read on another meter than `meter`
 * (the aircraft switched from Hobbs to tach, or back), its due point cannot be placed on the
 * meter now read: the two run at different rates and nothing in the completion says where it
 * stands on the other. The hours part is then "other-meter" (Status unknown) until maintenance
 * records a reading on the new meter. When either meter is absent or null (records from
 * before meters were stored, callers that do not say), the completion is taken as read on
 * the meter now: the behaviour before this rule, kept so that old callers see no change; the
 * app itself stores a meter on every completion, so it always has both.
 */
export function nextDue(
  item: InspectionItem,
  today: IsoDate,
  currentHours: number | null,
  siblings: InspectionItem[] = [],
  meter?: MeterName,
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
    meterMismatch: null,
    late: null,
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
    else if (!sameMeter(last.meter, meter)) {
      missing.push("other-meter");
      result.meterMismatch = { completionMeter: last.meter as MeterName, currentMeter: meter as MeterName };
    } else {
      const due = chainHoursDue(completions, rule.hours, rule.overrunHours);
      if (due) {
        result.dueHours = due.dueAt;
        result.overrunLimitHours = due.overrunLimitAt;
        result.late = due.late;
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
