// Plain record shapes the fleet rules work on. The database layer maps its rows to these, so
// lib/fleet stays free of the framework and the database.

import type { AircraftStatus, LateCompletion, StatusReason } from "@/lib/airworthiness";

export type RuleKind = "calendar-months" | "hours" | "months-or-hours" | "fixed-date" | "days";
export type MeterName = "hobbs" | "tach";
export type SquawkTriage = "untriaged" | "grounding" | "deferred" | "note";

export interface FleetAircraftRecord {
  id: string;
  registration: string;
  make: string;
  model: string;
  typeGroup: string;
  homeField: string | null;
  photoUploadId: string | null;
  currentHobbs: number | null;
  currentTach: number | null;
  maintenanceMeter: MeterName;
  usedForHire: boolean;
  usedForInstruction: boolean;
  ifrEquipped: boolean;
  usedForIfr: boolean;
}

export interface FleetItemRecord {
  id: string;
  aircraftId: string;
  key: string;
  name: string;
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

export interface FleetCompletionRecord {
  id?: string;
  itemId: string;
  doneOn: string;
  hours: number | null;
  expiresOn: string | null;
  /** The meter `hours` were read on (stored with every completion since migration 0016). */
  meter?: MeterName | null;
}

/** Maintenance's reading of one completion on another meter (meter_conversions with a completion). */
export interface FleetMeterConversionRecord {
  completionId: string;
  toMeter: MeterName;
  toReading: number;
}

export interface FleetSquawkRecord {
  id: string;
  aircraftId: string;
  description: string;
  triage: SquawkTriage;
  limitation: string | null;
  placarded: boolean;
  suspectedGrounding: boolean;
  status: "open" | "closed";
  /** ISO instant */
  reportedAt: string;
}

export interface FleetNoticeRecord {
  id: string;
  aircraftId: string;
  category: "safety" | "maintenance";
  reason: string;
  /** ISO instants */
  effectiveAt: string;
  liftedAt: string | null;
}

/** One row of an aircraft's due list. */
export interface DueSummary {
  key: string;
  name: string;
  source: string | null;
  lastDoneOn: string | null;
  lastDoneHours: number | null;
  /** The meter lastDoneHours were read on, when recorded. */
  lastDoneMeter?: MeterName | null;
  /** The last completion was read on another meter than the one inspections count by now. */
  otherMeter?: { completionMeter: MeterName; currentMeter: MeterName } | null;
  /** The last completion was done after the item fell due (hours-based, 14 CFR 91.409(b)). */
  late?: LateCompletion | null;
  dueDate: string | null;
  daysLeft: number | null;
  dueHours: number | null;
  hoursLeft: number | null;
  overrunLimitHours: number | null;
  useLeftHours: number | null;
  overdue: boolean;
  /** Data needed to compute it is missing (no completion, no meter reading …). */
  incomplete: boolean;
  dueSoon: boolean;
  ifrOnly: boolean;
  /** A required item grounds the aircraft when it comes due (an IFR-only one stops IFR flight).
   *  Absent: taken as required, so an item is never shown as harmless by default. */
  required?: boolean;
}

export interface FlightLineEntry {
  aircraft: {
    id: string;
    registration: string;
    make: string;
    model: string;
    typeGroup: string;
    homeField: string | null;
    photoUploadId: string | null;
    hobbs: number | null;
    tach: number | null;
    maintenanceMeter: MeterName;
  };
  status: AircraftStatus;
  reasons: StatusReason[];
  due: DueSummary[];
  openSquawks: { id: string; description: string; triage: SquawkTriage; limitation: string | null; reportedAt: string }[];
  notices: { id: string; category: "safety" | "maintenance"; reason: string; effectiveAt: string }[];
}
