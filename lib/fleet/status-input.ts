// Database-shaped records → the airworthiness rules' AircraftStatusInput.

import type {
  AircraftFlags,
  AircraftStatusInput,
  Completion,
  DueSoonThresholds,
  GroundingNotice,
  InspectionItem,
  InspectionRule,
  Squawk,
} from "@/lib/airworthiness";
import type { FleetAircraftRecord, FleetCompletionRecord, FleetItemRecord, FleetMeterConversionRecord, FleetNoticeRecord, FleetSquawkRecord, MeterName } from "./types";

export class RuleConfigError extends Error {}

function need(value: number | null, what: string, item: FleetItemRecord): number {
  if (value === null || !Number.isFinite(value) || value <= 0) {
    throw new RuleConfigError(`${item.name}: the rule has no ${what}; maintenance must complete the item's rule`);
  }
  return value;
}

/** A rule missing its interval cannot be computed: it throws, and the caller says "Status unknown". */
export function toRule(item: FleetItemRecord): InspectionRule {
  const overrun = item.overrunHours ?? undefined;
  switch (item.ruleKind) {
    case "calendar-months":
      return { kind: "calendar-months", months: need(item.months, "number of months", item) };
    case "hours":
      return { kind: "hours", hours: need(item.hours, "number of hours", item), overrunHours: overrun };
    case "months-or-hours":
      return { kind: "months-or-hours", months: need(item.months, "number of months", item), hours: need(item.hours, "number of hours", item), overrunHours: overrun };
    case "days":
      return { kind: "days", days: need(item.days, "number of days", item) };
    case "fixed-date":
      return { kind: "fixed-date" };
  }
}

export function toFlags(a: Pick<FleetAircraftRecord, "usedForHire" | "usedForInstruction" | "ifrEquipped" | "usedForIfr">): AircraftFlags {
  return { usedForHire: a.usedForHire, usedForInstruction: a.usedForInstruction, ifrEquipped: a.ifrEquipped, usedForIfr: a.usedForIfr };
}

/**
 * A completion as the rules see it. When maintenance has recorded where it stands on the meter
 * the aircraft counts by now (a meter conversion of that completion), that reading is used;
 * the completion row itself is never changed (append-only).
 */
export function toCompletion(c: FleetCompletionRecord, meterNow?: MeterName, conversions: FleetMeterConversionRecord[] = []): Completion {
  const own: Completion = { id: c.id, date: c.doneOn, hours: c.hours, expiresOn: c.expiresOn, meter: c.meter ?? null };
  if (!meterNow || !c.id || !c.meter || c.meter === meterNow) return own;
  const converted = conversions.findLast((v) => v.completionId === c.id && v.toMeter === meterNow);
  return converted ? { ...own, hours: converted.toReading, meter: converted.toMeter } : own;
}

export function toInspectionItem(item: FleetItemRecord, completions: FleetCompletionRecord[], meterNow?: MeterName, conversions: FleetMeterConversionRecord[] = []): InspectionItem {
  return {
    key: item.key,
    name: item.name,
    rule: toRule(item),
    required: item.required,
    ifrOnly: item.ifrOnly,
    hireOrInstructionOnly: item.hireOrInstructionOnly || undefined,
    satisfiedBy: item.satisfiedBy ?? undefined,
    usage: item.usageLimitHours !== null ? { limitHours: item.usageLimitHours, usedHours: item.usageUsedHours } : undefined,
    source: item.source ?? undefined,
    completions: completions
      .filter((c) => c.itemId === item.id)
      .map((c) => toCompletion(c, meterNow, conversions)),
  };
}

export function toSquawk(s: FleetSquawkRecord): Squawk {
  return {
    id: s.id,
    description: s.description,
    open: s.status === "open",
    triage: s.triage,
    limitation: s.limitation,
    placarded: s.placarded,
    suspectedGrounding: s.suspectedGrounding,
  };
}

export function toNotice(n: FleetNoticeRecord): GroundingNotice {
  return { id: n.id, reason: n.reason, effectiveAt: n.effectiveAt, liftedAt: n.liftedAt };
}

/** The meter the hours-based items count, or null when it has never been read. */
export function maintenanceHours(a: Pick<FleetAircraftRecord, "maintenanceMeter" | "currentHobbs" | "currentTach">): number | null {
  const value = a.maintenanceMeter === "hobbs" ? a.currentHobbs : a.currentTach;
  return typeof value === "number" && Number.isFinite(value) ? value : null;
}

/** Everything one aircraft's status needs, from its own records only. */
export function buildStatusInput(input: {
  aircraft: FleetAircraftRecord;
  items: FleetItemRecord[];
  completions: FleetCompletionRecord[];
  squawks: FleetSquawkRecord[];
  notices: FleetNoticeRecord[];
  conversions?: FleetMeterConversionRecord[];
  dueSoon: DueSoonThresholds;
  now: string;
  /** The club's time zone, for the words of notice times. */
  timeZone?: string;
}): AircraftStatusInput {
  const id = input.aircraft.id;
  const byItem = new Map<string, FleetCompletionRecord[]>();
  for (const c of input.completions) {
    const list = byItem.get(c.itemId);
    if (list) list.push(c);
    else byItem.set(c.itemId, [c]);
  }
  return {
    flags: toFlags(input.aircraft),
    items: input.items.filter((i) => i.aircraftId === id).map((i) => toInspectionItem(i, byItem.get(i.id) ?? [], input.aircraft.maintenanceMeter, input.conversions)),
    squawks: input.squawks.filter((s) => s.aircraftId === id).map(toSquawk),
    notices: input.notices.filter((n) => n.aircraftId === id).map(toNotice),
    dueSoon: input.dueSoon,
    meter: input.aircraft.maintenanceMeter,
    now: input.now,
    ...(input.timeZone ? { timeZone: input.timeZone } : {}),
  };
}
