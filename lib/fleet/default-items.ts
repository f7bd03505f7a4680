// The default inspection items as plain column values for a new aircraft.

import { defaultInspectionItems } from "@/lib/airworthiness";
import type { RuleKind } from "./types";

export interface ItemColumns {
  key: string;
  name: string;
  origin: "regulation" | "directive" | "club";
  ruleKind: RuleKind;
  months: number | null;
  hours: number | null;
  days: number | null;
  overrunHours: number | null;
  required: boolean;
  ifrOnly: boolean;
  hireOrInstructionOnly: boolean;
  satisfiedBy: string[] | null;
  usageLimitHours: number | null;
  usageUsedHours: number | null;
  source: string | null;
}

/**
 * Every default item, including the 100-hour and the IFR tests: whether one applies follows the
 * aircraft's flags at the time of each check, so changing a flag later needs no new rows.
 * The oil change takes the club's own interval (a club setting, common practice).
 */
export function defaultItemColumns(oil: { months: number; hours: number }): ItemColumns[] {
  return defaultInspectionItems({ usedForHire: true, ifrEquipped: true }).map((item) => {
    const rule = item.key === "oil-change" && item.rule.kind === "months-or-hours" ? { ...item.rule, months: oil.months, hours: oil.hours } : item.rule;
    return {
      key: item.key,
      name: item.name,
      origin: item.source === "club rule" ? "club" : "regulation",
      ruleKind: rule.kind,
      months: "months" in rule ? rule.months : null,
      hours: "hours" in rule ? rule.hours : null,
      days: "days" in rule ? rule.days : null,
      overrunHours: "overrunHours" in rule ? (rule.overrunHours ?? null) : null,
      required: item.required,
      ifrOnly: item.ifrOnly,
      hireOrInstructionOnly: Boolean(item.hireOrInstructionOnly),
      satisfiedBy: item.satisfiedBy ?? null,
      usageLimitHours: item.usage?.limitHours ?? null,
      usageUsedHours: item.usage ? item.usage.usedHours : null,
      source: item.source ?? null,
    };
  });
}
