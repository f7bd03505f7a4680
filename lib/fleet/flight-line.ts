// The flight line: every aircraft's computed status with its reasons, what comes due next and
// what is open against it. Pure: the records come in, the entries go out.

import {
  aircraftStatus,
  itemApplies,
  nextDue,
  type AircraftStatusResult,
  type DueSoonThresholds,
  type InspectionItem,
} from "@/lib/airworthiness";
import { buildStatusInput, maintenanceHours, toFlags } from "./status-input";
import type {
  DueSummary,
  FleetAircraftRecord,
  FleetCompletionRecord,
  FleetItemRecord,
  FleetMeterConversionRecord,
  FleetNoticeRecord,
  FleetSquawkRecord,
  FlightLineEntry,
  MeterName,
} from "./types";

export interface FleetRecords {
  aircraft: FleetAircraftRecord[];
  items: FleetItemRecord[];
  completions: FleetCompletionRecord[];
  /** Open squawks only; closed ones do not weigh on the status. */
  squawks: FleetSquawkRecord[];
  /** Notices not lifted. */
  notices: FleetNoticeRecord[];
  /** Completion readings on another meter (meter provenance); absent means none. */
  conversions?: FleetMeterConversionRecord[];
}

function groupBy<T>(rows: T[], key: (row: T) => string): Map<string, T[]> {
  const out = new Map<string, T[]>();
  for (const row of rows) {
    const k = key(row);
    const list = out.get(k);
    if (list) list.push(row);
    else out.set(k, [row]);
  }
  return out;
}

function urgency(d: DueSummary): number {
  if (d.overdue) return 0;
  if (d.incomplete) return 1;
  if (d.dueSoon) return 2;
  return 3;
}

/** Overdue first, then unknown, then due soon; within each, the nearest date, then hours. */
export function sortDue(list: DueSummary[]): DueSummary[] {
  const far = Number.POSITIVE_INFINITY;
  return [...list].sort(
    (a, b) => urgency(a) - urgency(b) || (a.daysLeft ?? far) - (b.daysLeft ?? far) || (a.hoursLeft ?? far) - (b.hoursLeft ?? far),
  );
}

/**
 * What the flight line shows as "next due": everything overdue, unknown or due soon, then the
 * nearest items by date and by hours taken in turn (a date and an hour count are not
 * comparable, so neither kind crowds out the other), at least `min` rows when there are that
 * many, in due-list order.
 */
export function pickNextDue(due: DueSummary[], min = 3): DueSummary[] {
  const picked = new Set(due.filter((d) => d.overdue || d.incomplete || d.dueSoon));
  const far = Number.POSITIVE_INFINITY;
  const byDate = due.filter((d) => !picked.has(d) && d.daysLeft !== null);
  const byHours = due.filter((d) => !picked.has(d) && d.hoursLeft !== null).sort((a, b) => (a.hoursLeft ?? far) - (b.hoursLeft ?? far));
  for (let i = 0; picked.size < min && (i < byDate.length || i < byHours.length); i++) {
    for (const d of [byDate[i], byHours[i]]) if (d && picked.size < min) picked.add(d);
  }
  return due.filter((d) => picked.has(d));
}

/** The due list of one aircraft's applicable items. */
export function summarizeDue(items: InspectionItem[], flags: ReturnType<typeof toFlags>, today: string, hours: number | null, soon: DueSoonThresholds, meter?: MeterName): DueSummary[] {
  const list: DueSummary[] = [];
  for (const item of items) {
    if (!itemApplies(item, flags)) continue;
    const next = nextDue(item, today, hours, items, meter);
    const daysSoon = next.daysLeft !== null && next.daysLeft >= 0 && next.daysLeft <= soon.days;
    const hoursSoon = next.hoursLeft !== null && next.hoursLeft >= 0 && next.hoursLeft <= soon.hours;
    list.push({
      key: item.key,
      name: item.name,
      source: item.source ?? null,
      lastDoneOn: next.lastDone?.date ?? null,
      lastDoneHours: next.lastDone?.hours ?? null,
      lastDoneMeter: next.lastDone?.meter ?? null,
      otherMeter: next.meterMismatch ?? null,
      late: next.late ?? null,
      dueDate: next.dueDate,
      daysLeft: next.daysLeft,
      dueHours: next.dueHours,
      hoursLeft: next.hoursLeft,
      overrunLimitHours: next.overrunLimitHours,
      useLeftHours: next.useLeftHours,
      overdue: next.overdue,
      incomplete: next.missing.length > 0,
      required: item.required,
      dueSoon: !next.overdue && (daysSoon || hoursSoon),
      ifrOnly: item.ifrOnly,
    });
  }
  return sortDue(list);
}

/** When the records cannot be turned into a status, say so: never fall back to flyable. */
function cannotCompute(error: unknown): AircraftStatusResult {
  const detail = error instanceof Error ? error.message : String(error);
  return {
    status: "unknown",
    reasons: [{ code: "status-error", text: `Status unknown: ${detail}`, grounding: false }],
  };
}

export function buildFlightLineEntry(
  records: { aircraft: FleetAircraftRecord; items: FleetItemRecord[]; completions: FleetCompletionRecord[]; squawks: FleetSquawkRecord[]; notices: FleetNoticeRecord[]; conversions?: FleetMeterConversionRecord[] },
  today: string,
  now: string,
  dueSoon: DueSoonThresholds,
  /** The club's time zone: notice times in the reasons are written on its clock. */
  timeZone?: string,
): FlightLineEntry {
  const a = records.aircraft;
  const hours = maintenanceHours(a);
  let result: AircraftStatusResult;
  let due: DueSummary[] = [];
  try {
    const input = buildStatusInput({ ...records, dueSoon, now, timeZone });
    result = aircraftStatus(input, today, hours);
    due = summarizeDue(input.items, input.flags, today, hours, dueSoon, input.meter);
  } catch (error) {
    result = cannotCompute(error);
  }
  const open = records.squawks.filter((s) => s.aircraftId === a.id && s.status === "open");
  return {
    aircraft: {
      id: a.id,
      registration: a.registration,
      make: a.make,
      model: a.model,
      typeGroup: a.typeGroup,
      homeField: a.homeField,
      photoUploadId: a.photoUploadId,
      hobbs: a.currentHobbs,
      tach: a.currentTach,
      maintenanceMeter: a.maintenanceMeter,
    },
    status: result.status,
    reasons: result.reasons,
    due,
    openSquawks: open.map((s) => ({ id: s.id, description: s.description, triage: s.triage, limitation: s.limitation, reportedAt: s.reportedAt })),
    notices: records.notices
      .filter((n) => n.aircraftId === a.id && !n.liftedAt)
      .map((n) => ({ id: n.id, category: n.category, reason: n.reason, effectiveAt: n.effectiveAt })),
  };
}

/** Every aircraft of the fleet, in the order given. Records are grouped once, not per aircraft. */
export function buildFlightLine(records: FleetRecords, today: string, now: string, dueSoon: DueSoonThresholds, timeZone?: string): FlightLineEntry[] {
  const items = groupBy(records.items, (i) => i.aircraftId);
  const itemAircraft = new Map(records.items.map((i) => [i.id, i.aircraftId]));
  const completions = groupBy(records.completions, (c) => itemAircraft.get(c.itemId) ?? "");
  const squawks = groupBy(records.squawks, (s) => s.aircraftId);
  const notices = groupBy(records.notices, (n) => n.aircraftId);
  return records.aircraft.map((a) =>
    buildFlightLineEntry(
      { aircraft: a, items: items.get(a.id) ?? [], completions: completions.get(a.id) ?? [], squawks: squawks.get(a.id) ?? [], notices: notices.get(a.id) ?? [], conversions: records.conversions },
      today,
      now,
      dueSoon,
      timeZone,
    ),
  );
}
