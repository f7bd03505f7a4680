import "server-only";
import { and, eq, inArray, isNotNull, isNull } from "drizzle-orm";
import type { Db } from "@/db/client";
import { aircraft, groundingNotices, inspectionCompletions, inspectionItems, meterConversions, squawks, type Club } from "@/db/schema";
import { isoDateInTimeZone } from "@/lib/dates";
import { buildFlightLine, type FleetRecords } from "@/lib/fleet/flight-line";
import type { FlightLineEntry } from "@/lib/fleet/types";

// What the flight line needs and nothing more: the aircraft (current meters are kept on them),
// their items with the completions, open squawks and notices not lifted. Flights are never read.

export function loadFleetRecords(db: Db, clubId: string, aircraftId?: string): FleetRecords {
  const one = aircraftId ? [eq(aircraft.id, aircraftId)] : [];
  const fleet = db
    .select({
      id: aircraft.id,
      registration: aircraft.registration,
      make: aircraft.make,
      model: aircraft.model,
      typeGroup: aircraft.typeGroup,
      homeField: aircraft.homeField,
      photoUploadId: aircraft.photoUploadId,
      currentHobbs: aircraft.currentHobbs,
      currentTach: aircraft.currentTach,
      maintenanceMeter: aircraft.maintenanceMeter,
      usedForHire: aircraft.usedForHire,
      usedForInstruction: aircraft.usedForInstruction,
      ifrEquipped: aircraft.ifrEquipped,
      usedForIfr: aircraft.usedForIfr,
    })
    .from(aircraft)
    .where(and(eq(aircraft.clubId, clubId), isNull(aircraft.retiredAt), ...one))
    .orderBy(aircraft.registration)
    .all();
  if (fleet.length === 0) return { aircraft: [], items: [], completions: [], squawks: [], notices: [], conversions: [] };
  const ids = fleet.map((a) => a.id);

  const items = db
    .select({
      id: inspectionItems.id,
      aircraftId: inspectionItems.aircraftId,
      key: inspectionItems.key,
      name: inspectionItems.name,
      ruleKind: inspectionItems.ruleKind,
      months: inspectionItems.months,
      hours: inspectionItems.hours,
      days: inspectionItems.days,
      overrunHours: inspectionItems.overrunHours,
      required: inspectionItems.required,
      ifrOnly: inspectionItems.ifrOnly,
      hireOrInstructionOnly: inspectionItems.hireOrInstructionOnly,
      satisfiedBy: inspectionItems.satisfiedBy,
      usageLimitHours: inspectionItems.usageLimitHours,
      usageUsedHours: inspectionItems.usageUsedHours,
      source: inspectionItems.source,
    })
    .from(inspectionItems)
    .where(and(eq(inspectionItems.clubId, clubId), isNull(inspectionItems.retiredAt), aircraftId ? eq(inspectionItems.aircraftId, aircraftId) : undefined))
    .orderBy(inspectionItems.createdAt)
    .all();

  // The whole completion history of each item is needed: the 100-hour's carried-forward excess
  // (14 CFR 91.409(b)) is a chain through every earlier due point. Five narrow columns only.
  const completions = db
    // i11-meter: `id` and `meter` (the meter `hours` were read on) added for meter provenance.
    .select({ id: inspectionCompletions.id, itemId: inspectionCompletions.itemId, doneOn: inspectionCompletions.doneOn, hours: inspectionCompletions.hours, expiresOn: inspectionCompletions.expiresOn, meter: inspectionCompletions.meter })
    .from(inspectionCompletions)
    .where(and(eq(inspectionCompletions.clubId, clubId), aircraftId ? eq(inspectionCompletions.aircraftId, aircraftId) : undefined))
    .all();

  const openSquawks = db
    .select({
      id: squawks.id,
      aircraftId: squawks.aircraftId,
      description: squawks.description,
      triage: squawks.triage,
      limitation: squawks.limitation,
      placarded: squawks.placarded,
      suspectedGrounding: squawks.suspectedGrounding,
      status: squawks.status,
      createdAt: squawks.createdAt,
    })
    .from(squawks)
    .where(and(eq(squawks.clubId, clubId), eq(squawks.status, "open"), aircraftId ? eq(squawks.aircraftId, aircraftId) : inArray(squawks.aircraftId, ids)))
    .orderBy(squawks.createdAt)
    .all();

  const notices = db
    .select({ id: groundingNotices.id, aircraftId: groundingNotices.aircraftId, category: groundingNotices.category, reason: groundingNotices.reason, effectiveAt: groundingNotices.effectiveAt, liftedAt: groundingNotices.liftedAt })
    .from(groundingNotices)
    .where(and(eq(groundingNotices.clubId, clubId), isNull(groundingNotices.liftedAt), aircraftId ? eq(groundingNotices.aircraftId, aircraftId) : undefined))
    .orderBy(groundingNotices.effectiveAt)
    .all();

  // i11-meter: maintenance's readings of completions on another meter (meter provenance);
  // a handful of rows at most, only after an aircraft switched meters.
  const conversions = db
    .select({ completionId: meterConversions.completionId, toMeter: meterConversions.toMeter, toReading: meterConversions.toReading })
    .from(meterConversions)
    .where(and(eq(meterConversions.clubId, clubId), isNotNull(meterConversions.completionId), aircraftId ? eq(meterConversions.aircraftId, aircraftId) : undefined))
    .orderBy(meterConversions.createdAt)
    .all()
    .flatMap((v) => (v.completionId ? [{ ...v, completionId: v.completionId }] : []));

  return {
    aircraft: fleet,
    items,
    completions,
    conversions,
    squawks: openSquawks.map(({ createdAt, ...s }) => ({ ...s, reportedAt: createdAt.toISOString() })),
    notices: notices.map((n) => ({ ...n, effectiveAt: n.effectiveAt.toISOString(), liftedAt: n.liftedAt?.toISOString() ?? null })),
  };
}

export type FlightLine = { today: string; generatedAt: string; timeZone: string; entries: FlightLineEntry[] };

function thresholds(club: Club) {
  return { days: club.settings.dueSoonDays, hours: club.settings.dueSoonHours };
}

export function getFlightLine(db: Db, club: Club, now: Date = new Date()): FlightLine {
  const today = isoDateInTimeZone(now, club.timeZone);
  const entries = buildFlightLine(loadFleetRecords(db, club.id), today, now.toISOString(), thresholds(club));
  return { today, generatedAt: now.toISOString(), timeZone: club.timeZone, entries };
}

/** One aircraft's entry, or undefined when it is not this club's (404). */
export function getAircraftStatusEntry(db: Db, club: Club, aircraftId: string, now: Date = new Date()): (FlightLineEntry & { today: string }) | undefined {
  const records = loadFleetRecords(db, club.id, aircraftId);
  if (records.aircraft.length === 0) return undefined;
  const today = isoDateInTimeZone(now, club.timeZone);
  const [entry] = buildFlightLine(records, today, now.toISOString(), thresholds(club));
  return entry ? { ...entry, today } : undefined;
}
