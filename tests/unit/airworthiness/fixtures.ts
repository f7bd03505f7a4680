// Source: the intervals these records satisfy are cited in the tests that use them (14 CFR 91.409, 91.207,
// 91.411, 91.413); the records themselves are invented, and the oil-change item is common practice.
// Invented records for one invented aircraft, all current on TODAY unless a test changes them.

import { defaultInspectionItems } from "@/lib/airworthiness";
import type { AircraftFlags, AircraftStatusInput, Completion, InspectionItem } from "@/lib/airworthiness";

export const TODAY = "2026-05-15";
export const METER = 1070; // Hobbs now, invented

export const VFR_PRIVATE: AircraftFlags = {};
export const IFR_TRAINER: AircraftFlags = { usedForInstruction: true, ifrEquipped: true, usedForIfr: true };

const CURRENT: Record<string, Completion[]> = {
  annual: [{ date: "2025-06-06", hours: 985 }], // good through 2026-06-30
  "100-hour": [{ date: "2026-03-02", hours: 1020 }], // due at 1120.0
  elt: [{ date: "2025-08-10" }], // good through 2026-08-31
  "elt-battery": [{ date: "2024-09-01", expiresOn: "2028-09-30" }],
  transponder: [{ date: "2025-01-20" }], // good through 2027-01-31
  "altimeter-static": [{ date: "2025-02-01" }], // good through 2027-02-28
  "vor-check": [{ date: "2026-05-10" }], // good through 2026-06-08 (the check day is day 1)
  "oil-change": [{ date: "2026-04-01", hours: 1050 }], // due 2026-08-31 or 1100.0
};

export function currentItems(flags: AircraftFlags): InspectionItem[] {
  return defaultInspectionItems(flags).map((item) => ({ ...item, completions: CURRENT[item.key] ?? [] }));
}

/** The same items with one of them changed. */
export function changeItem(items: InspectionItem[], key: string, change: Partial<InspectionItem>): InspectionItem[] {
  if (!items.some((i) => i.key === key)) throw new Error(`fixture has no item "${key}"`);
  return items.map((i) => (i.key === key ? { ...i, ...change } : i));
}

export function aircraft(flags: AircraftFlags, overrides: Partial<AircraftStatusInput> = {}): AircraftStatusInput {
  return { flags, items: currentItems(flags), dueSoon: { days: 14, hours: 5 }, ...overrides };
}

export function codes(result: { reasons: { code: string }[] }): string[] {
  return result.reasons.map((r) => r.code);
}
