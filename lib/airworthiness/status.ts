// The aircraft's computed status: every reason, then the worst of them decides.
// Precedence grounded > unknown > limited > flyable: missing data must never read as
// "flyable", but a known grounding is stronger than not knowing.

import { parseIsoDate } from "@/lib/dates";
import { DEFAULT_DUE_SOON, usesHundredHour, usesIfr } from "./defaults";
import { itemReasons } from "./item-reasons";
import { nextDue } from "./next-due";
import { EFFECT_RANK, type RankedReason } from "./reason";
import { noticeReasons, squawkReasons } from "./squawk-reasons";
import type { AircraftFlags, AircraftStatus, AircraftStatusInput, AircraftStatusResult, InspectionItem } from "./types";

/** IFR-only items on a VFR aircraft, and the 100-hour on one not used for hire or
 *  instruction, do not apply at all. */
export function itemApplies(item: InspectionItem, flags: AircraftFlags): boolean {
  if (item.ifrOnly && !usesIfr(flags)) return false;
  if (item.hireOrInstructionOnly && !usesHundredHour(flags)) return false;
  return true;
}

function statusOf(reasons: RankedReason[]): AircraftStatus {
  if (reasons.some((r) => r.effect === "grounded")) return "grounded";
  if (reasons.some((r) => r.effect === "unknown")) return "unknown";
  if (reasons.some((r) => r.effect === "limited")) return "limited";
  return "flyable";
}

export function aircraftStatus(
  input: AircraftStatusInput,
  today: string,
  currentHours: number | null,
): AircraftStatusResult {
  parseIsoDate(today); // a bad "today" is a caller's bug: fail loudly, not "flyable"
  const soon = input.dueSoon ?? DEFAULT_DUE_SOON;
  const reasons: RankedReason[] = [
    ...noticeReasons(input.notices ?? [], today, input.now, input.timeZone),
    ...squawkReasons(input.squawks ?? []),
  ];
  for (const item of input.items) {
    if (!itemApplies(item, input.flags)) continue;
    const next = nextDue(item, today, currentHours, input.items, input.meter);
    reasons.push(...itemReasons(item, next, currentHours, soon));
  }
  // Stable sort: the worst first, in input order within each kind.
  const ordered = [...reasons].sort((a, b) => EFFECT_RANK[a.effect] - EFFECT_RANK[b.effect]);
  return {
    status: statusOf(ordered),
    reasons: ordered.map(({ code, text, grounding }) => ({ code, text, grounding })),
  };
}
