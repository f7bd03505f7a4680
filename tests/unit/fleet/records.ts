// Invented records for the fleet unit tests, in the shapes the database layer produces.
import { defaultItemColumns } from "@/lib/fleet/default-items";
import type { FleetAircraftRecord, FleetCompletionRecord, FleetItemRecord } from "@/lib/fleet/types";

export const TODAY = "2026-05-15";
export const NOW = "2026-05-15T15:00:00.000Z";
export const SOON = { days: 14, hours: 5 };

export function plane(id: string, over: Partial<FleetAircraftRecord> = {}): FleetAircraftRecord {
  return {
    id, registration: `N0${id.toUpperCase()}`, make: "Larkspur", model: "L-2 Trainer", typeGroup: "Larkspur L-2", homeField: null, photoUploadId: null,
    currentHobbs: 1200, currentTach: 1070, maintenanceMeter: "tach", usedForHire: false, usedForInstruction: false, ifrEquipped: false, usedForIfr: false, ...over,
  };
}

export function items(aircraftId: string): FleetItemRecord[] {
  return defaultItemColumns({ months: 4, hours: 50 }).map((c) => ({ ...c, id: `${aircraftId}-${c.key}`, aircraftId }));
}

/** Completions that keep every default item current on TODAY. */
export function currentCompletions(aircraftId: string): FleetCompletionRecord[] {
  const at = (key: string, doneOn: string, hours: number | null = null, expiresOn: string | null = null) => ({ itemId: `${aircraftId}-${key}`, doneOn, hours, expiresOn });
  return [
    at("annual", "2025-06-06", 985), // good through 2026-06-30, 14 CFR 91.409(a)
    at("100-hour", "2026-03-02", 1020), // due at 1120.0, 14 CFR 91.409(b)
    at("elt", "2025-08-10"),
    at("elt-battery", "2024-09-01", null, "2028-09-30"),
    at("transponder", "2025-01-20"),
    at("altimeter-static", "2025-02-01"),
    at("vor-check", "2026-05-10"),
    at("oil-change", "2026-04-01", 1050), // due 2026-08-31 or 1100.0 (club rule)
  ];
}
