import "server-only";
import { and, asc, desc, eq, inArray, isNotNull, isNull } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { aircraft, inspectionCompletions, inspectionItems, meterConversions, uploads, users, type Aircraft, type InspectionItemRow } from "@/db/schema";
import type { FleetCompletionRecord, FleetMeterConversionRecord } from "@/lib/fleet/types";

// Aircraft records and inspection items. Every query is scoped by club_id: another club's
// record is not found, exactly like a missing one.

type Handle = Db | Tx;

export function listAircraft(db: Handle, clubId: string): Aircraft[] {
  return db.select().from(aircraft).where(and(eq(aircraft.clubId, clubId), isNull(aircraft.retiredAt))).orderBy(asc(aircraft.registration)).all();
}

export function getAircraft(db: Handle, clubId: string, aircraftId: string): Aircraft | undefined {
  return db.select().from(aircraft).where(and(eq(aircraft.clubId, clubId), eq(aircraft.id, aircraftId))).get();
}

export function findAircraftByRegistration(db: Handle, clubId: string, registration: string): Aircraft | undefined {
  return db.select().from(aircraft).where(and(eq(aircraft.clubId, clubId), eq(aircraft.registration, registration))).get();
}

export function listItems(db: Handle, clubId: string, aircraftId: string): InspectionItemRow[] {
  return db
    .select()
    .from(inspectionItems)
    .where(and(eq(inspectionItems.clubId, clubId), eq(inspectionItems.aircraftId, aircraftId), isNull(inspectionItems.retiredAt)))
    .orderBy(asc(inspectionItems.createdAt))
    .all();
}

export function getItem(db: Handle, clubId: string, itemId: string): InspectionItemRow | undefined {
  return db.select().from(inspectionItems).where(and(eq(inspectionItems.clubId, clubId), eq(inspectionItems.id, itemId))).get();
}

export type CompletionHistoryRow = {
  id: string;
  itemId: string;
  itemName: string;
  doneOn: string;
  hours: number | null;
  /** The meter `hours` were read on. */
  meter: "hobbs" | "tach" | null;
  expiresOn: string | null;
  mechanicName: string;
  mechanicCertificate: string;
  notes: string | null;
  recordedBy: string | null;
};

export function listCompletionHistory(db: Handle, clubId: string, aircraftId: string, limit = 100): CompletionHistoryRow[] {
  return db
    .select({
      id: inspectionCompletions.id,
      itemId: inspectionCompletions.itemId,
      itemName: inspectionItems.name,
      doneOn: inspectionCompletions.doneOn,
      hours: inspectionCompletions.hours,
      meter: inspectionCompletions.meter,
      expiresOn: inspectionCompletions.expiresOn,
      mechanicName: inspectionCompletions.mechanicName,
      mechanicCertificate: inspectionCompletions.mechanicCertificate,
      notes: inspectionCompletions.notes,
      recordedBy: users.name,
    })
    .from(inspectionCompletions)
    .innerJoin(inspectionItems, eq(inspectionItems.id, inspectionCompletions.itemId))
    .leftJoin(users, eq(users.id, inspectionCompletions.recordedById))
    .where(and(eq(inspectionCompletions.clubId, clubId), eq(inspectionCompletions.aircraftId, aircraftId)))
    .orderBy(desc(inspectionCompletions.doneOn), desc(inspectionCompletions.createdAt))
    .limit(limit)
    .all();
}

export type UploadLink = { id: string; subjectId: string | null; mimeType: string; originalName: string };

/** Files attached to some records of one kind ("Squawk", "InspectionCompletion", "Aircraft"). */
export function listUploadsFor(db: Handle, clubId: string, subjectType: string, subjectIds: string[]): UploadLink[] {
  if (subjectIds.length === 0) return [];
  return db
    .select({ id: uploads.id, subjectId: uploads.subjectId, mimeType: uploads.mimeType, originalName: uploads.originalName })
    .from(uploads)
    .where(and(eq(uploads.clubId, clubId), eq(uploads.subjectType, subjectType), inArray(uploads.subjectId, subjectIds)))
    .orderBy(asc(uploads.createdAt))
    .all();
}

/** Every completion of one aircraft as the fleet rules read them (meter provenance included). */
export function listCompletionRecords(db: Handle, clubId: string, aircraftId: string): FleetCompletionRecord[] {
  return db
    .select({ id: inspectionCompletions.id, itemId: inspectionCompletions.itemId, doneOn: inspectionCompletions.doneOn, hours: inspectionCompletions.hours, expiresOn: inspectionCompletions.expiresOn, meter: inspectionCompletions.meter })
    .from(inspectionCompletions)
    .where(and(eq(inspectionCompletions.clubId, clubId), eq(inspectionCompletions.aircraftId, aircraftId)))
    .all();
}

/** Maintenance's readings of this aircraft's completions on another meter, oldest first. */
export function listCompletionConversions(db: Handle, clubId: string, aircraftId: string): FleetMeterConversionRecord[] {
  return db
    .select({ completionId: meterConversions.completionId, toMeter: meterConversions.toMeter, toReading: meterConversions.toReading })
    .from(meterConversions)
    .where(and(eq(meterConversions.clubId, clubId), eq(meterConversions.aircraftId, aircraftId), isNotNull(meterConversions.completionId)))
    .orderBy(asc(meterConversions.createdAt))
    .all()
    .flatMap((v) => (v.completionId ? [{ ...v, completionId: v.completionId }] : []));
}
