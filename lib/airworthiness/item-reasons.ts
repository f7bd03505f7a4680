// Reasons that come from one inspection item's next-due point.

import { formatHours } from "./hours";
import { makeReason, type RankedReason, type ReasonEffect } from "./reason";
import type { DueSoonThresholds, InspectionItem, MeterName, MissingData, NextDue } from "./types";

function cite(item: InspectionItem): string {
  return item.source ? ` (${item.source})` : "";
}

const MISSING_TEXT: Record<MissingData, { code: string; text: string }> = {
  "no-completion": { code: "no-completion", text: "missing record: its last completion" },
  "no-completion-hours": { code: "hours-unknown", text: "missing record: the meter reading at its last completion" },
  "no-current-hours": { code: "hours-unknown", text: "missing record: the aircraft's current meter reading" },
  "no-expiry-date": { code: "expiry-unknown", text: "missing record: the expiry date of its last completion" },
  "no-use-record": { code: "use-unknown", text: "missing record: its cumulative use" },
  "other-meter": { code: "other-meter", text: "missing record: its last completion's reading on the meter inspections now count by" },
};

const METER_WORD: Record<MeterName, string> = { hobbs: "Hobbs", tach: "tach" };

/** Both meters named: the pilot sees why, maintenance sees what to record. */
function otherMeterText(next: NextDue): string | null {
  const m = next.meterMismatch;
  if (!m) return null;
  const at = next.lastDone?.hours;
  const reading = typeof at === "number" ? ` at ${formatHours(at)} h` : "";
  return `last done${reading} on the ${METER_WORD[m.completionMeter]}, but inspections now count by the ${METER_WORD[m.currentMeter]}; ` +
    `missing record: its due point on the ${METER_WORD[m.currentMeter]}, until maintenance records that completion's reading on the ${METER_WORD[m.currentMeter]}`;
}

function missingReasons(item: InspectionItem, next: NextDue): RankedReason[] {
  const effect: ReasonEffect = item.required ? "unknown" : "advisory";
  // Without any completion the other gaps say nothing new.
  const gaps: MissingData[] = next.missing.includes("no-completion") ? ["no-completion"] : next.missing;
  return gaps.map((gap) => {
    const { code, text } = MISSING_TEXT[gap];
    const detail = gap === "other-meter" ? (otherMeterText(next) ?? text) : text;
    return makeReason(effect, code, `${item.name}: ${detail}${cite(item)}`);
  });
}

function hoursOverdueText(next: NextDue, currentHours: number): string {
  const due = next.dueHours ?? 0;
  const limit = next.overrunLimitHours ?? due;
  const base = `due at ${formatHours(due)} h, meter now ${formatHours(currentHours)} h`;
  if (limit <= due) return base;
  // The overrun is a limitation of a grounded aircraft (14 CFR 91.409(b)), never a permission
  // to fly: the words say "grounded" first and what alone remains allowed.
  if (currentHours <= limit) {
    return `${base}; grounded — only a ferry flight of up to ${formatHours(limit - currentHours)} h (to ${formatHours(limit)} h) to reach the inspection`;
  }
  return `${base}, beyond the overrun allowance of ${formatHours(limit)} h`;
}

function overdueParts(next: NextDue, currentHours: number): string[] {
  const parts: string[] = [];
  if (next.daysLeft !== null && next.daysLeft < 0) parts.push(`overdue since ${next.dueDate}`);
  if (next.hoursLeft !== null && next.hoursLeft < 0) parts.push(`overdue: ${hoursOverdueText(next, currentHours)}`);
  if (next.useLeftHours !== null && next.useLeftHours < 0 && next.useLimitHours !== null) {
    const used = next.useLimitHours - next.useLeftHours;
    parts.push(`overdue: ${formatHours(used)} h of cumulative use, more than ${formatHours(next.useLimitHours)} h`);
  }
  return parts;
}

function overdueReason(item: InspectionItem, next: NextDue, currentHours: number): RankedReason | null {
  const parts = overdueParts(next, currentHours);
  if (parts.length === 0) return null;
  const text = `${item.name} ${parts.join("; ")}${cite(item)}`;
  if (item.ifrOnly) return makeReason("limited", "ifr-test-overdue", `${text}: no IFR flight until it is done`);
  if (item.required) return makeReason("grounded", "inspection-overdue", text);
  return makeReason("advisory", "item-overdue", text);
}

function plural(n: number, unit: string): string {
  return `${n} ${unit}${n === 1 ? "" : "s"}`;
}

function dueSoonReason(item: InspectionItem, next: NextDue, soon: DueSoonThresholds): RankedReason | null {
  const parts: string[] = [];
  if (next.daysLeft !== null && next.daysLeft >= 0 && next.daysLeft <= soon.days) {
    parts.push(`due by ${next.dueDate} (${plural(next.daysLeft, "day")} left)`);
  }
  if (next.hoursLeft !== null && next.dueHours !== null && next.hoursLeft >= 0 && next.hoursLeft <= soon.hours) {
    parts.push(`due at ${formatHours(next.dueHours)} h (${formatHours(next.hoursLeft)} h left)`);
  }
  if (parts.length === 0) return null;
  return makeReason("advisory", "due-soon", `${item.name} ${parts.join("; ")}${cite(item)}`);
}

/** Every reason one applicable item gives: missing data, overdue, or due soon. */
export function itemReasons(
  item: InspectionItem,
  next: NextDue,
  currentHours: number | null,
  soon: DueSoonThresholds,
): RankedReason[] {
  const reasons = missingReasons(item, next);
  const overdue = overdueReason(item, next, currentHours ?? Number.NaN);
  if (overdue) reasons.push(overdue);
  else {
    const dueSoon = dueSoonReason(item, next, soon);
    if (dueSoon) reasons.push(dueSoon);
  }
  return reasons;
}
