// The inspection items a new aircraft starts with (PRODUCT.md, Maintenance). A club edits
// them afterwards: adds recurring airworthiness directives and its own items.

import type { AircraftFlags, DueSoonThresholds, InspectionItem } from "./types";

/** Used when the club has not set its own thresholds (common practice, our choice). */
export const DEFAULT_DUE_SOON: DueSoonThresholds = { days: 30, hours: 10 };

export function usesHundredHour(flags: AircraftFlags): boolean {
  return Boolean(flags.usedForHire || flags.usedForInstruction);
}

/** Either flag is enough: an IFR-equipped aircraft may be flown IFR by any member. */
export function usesIfr(flags: AircraftFlags): boolean {
  return Boolean(flags.ifrEquipped || flags.usedForIfr);
}

export function defaultInspectionItems(flags: AircraftFlags): InspectionItem[] {
  const items: InspectionItem[] = [
    {
      key: "annual",
      name: "Annual inspection",
      rule: { kind: "calendar-months", months: 12 },
      required: true,
      ifrOnly: false,
      source: "14 CFR 91.409(a)",
      completions: [],
    },
  ];
  if (usesHundredHour(flags)) {
    items.push({
      key: "100-hour",
      name: "100-hour inspection",
      rule: { kind: "hours", hours: 100, overrunHours: 10 },
      required: true,
      ifrOnly: false,
      hireOrInstructionOnly: true,
      satisfiedBy: ["annual"],
      source: "14 CFR 91.409(b)",
      completions: [],
    });
  }
  items.push(
    {
      key: "elt",
      name: "ELT inspection",
      rule: { kind: "calendar-months", months: 12 },
      required: true,
      ifrOnly: false,
      source: "14 CFR 91.207(d)",
      completions: [],
    },
    {
      key: "elt-battery",
      name: "ELT battery",
      // Each replacement records the date at which half the battery's useful life is gone.
      rule: { kind: "fixed-date" },
      required: true,
      ifrOnly: false,
      usage: { limitHours: 1, usedHours: 0 },
      source: "14 CFR 91.207(c)",
      completions: [],
    },
    {
      key: "transponder",
      name: "Transponder test",
      rule: { kind: "calendar-months", months: 24 },
      required: true,
      ifrOnly: false,
      source: "14 CFR 91.413(a)",
      completions: [],
    },
  );
  if (usesIfr(flags)) {
    items.push(
      {
        key: "altimeter-static",
        name: "Altimeter and static system test",
        rule: { kind: "calendar-months", months: 24 },
        required: true,
        ifrOnly: true,
        source: "14 CFR 91.411(a)",
        completions: [],
      },
      {
        key: "vor-check",
        name: "VOR check",
        rule: { kind: "days", days: 30 },
        required: true,
        ifrOnly: true,
        source: "14 CFR 91.171(a)",
        completions: [],
      },
    );
  }
  items.push({
    key: "oil-change",
    name: "Oil change",
    // A club rule (common practice), so overdue grounds like a required item; the months part
    // is counted in calendar months, as the other periodic items are.
    rule: { kind: "months-or-hours", months: 4, hours: 50 },
    required: true,
    ifrOnly: false,
    source: "club rule",
    completions: [],
  });
  return items;
}
