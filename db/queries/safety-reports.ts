import "server-only";
import { and, asc, desc, eq, isNull } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { aircraft, bulletins, safetyReportEvents, safetyReports, users, type SafetyReport } from "@/db/schema";

type Reader = Db | Tx;

// Reports never join the users table on reporter_id for display: the officer's view names a
// reporter only for named reports, and an anonymous row has nothing to join.

export function getReport(db: Reader, clubId: string, reportId: string): SafetyReport | undefined {
  return db.select().from(safetyReports).where(and(eq(safetyReports.clubId, clubId), eq(safetyReports.id, reportId))).get();
}

export type ReportListRow = Pick<SafetyReport, "id" | "occurredOn" | "location" | "status" | "anonymous" | "createdAt" | "whatHappened"> & { aircraftRegistration: string | null };

function listWhere(db: Reader, where: ReturnType<typeof and>): ReportListRow[] {
  return db
    .select({
      id: safetyReports.id, occurredOn: safetyReports.occurredOn, location: safetyReports.location, status: safetyReports.status,
      anonymous: safetyReports.anonymous, createdAt: safetyReports.createdAt, whatHappened: safetyReports.whatHappened, aircraftRegistration: aircraft.registration,
    })
    .from(safetyReports)
    .leftJoin(aircraft, and(eq(aircraft.id, safetyReports.aircraftId), eq(aircraft.clubId, safetyReports.clubId)))
    .where(where)
    .orderBy(desc(safetyReports.createdAt))
    .all();
}

/** The safety officer's queue: every report of the club. */
export function listReportsForOfficer(db: Reader, clubId: string): ReportListRow[] {
  return listWhere(db, and(eq(safetyReports.clubId, clubId)));
}

/** A member's own named reports. Anonymous ones carry no link and cannot be listed for anyone. */
export function listOwnNamedReports(db: Reader, clubId: string, userId: string): ReportListRow[] {
  return listWhere(db, and(eq(safetyReports.clubId, clubId), eq(safetyReports.reporterId, userId), eq(safetyReports.anonymous, false)));
}

export function getReporterName(db: Reader, clubId: string, report: SafetyReport): string | null {
  if (report.anonymous || !report.reporterId) return null;
  const u = db.select({ name: users.name, email: users.email }).from(users).where(eq(users.id, report.reporterId)).get();
  return u ? (u.name ?? u.email) : null;
}

export type ReportEventRow = {
  id: string; kind: "status" | "note" | "bulletin" | "grounding"; fromStatus: SafetyReport["status"] | null; toStatus: SafetyReport["status"] | null;
  note: string | null; bulletinId: string | null; bulletinTitle: string | null; groundingNoticeId: string | null; createdAt: Date; actorName: string | null;
};

export function listReportEvents(db: Reader, clubId: string, reportId: string): ReportEventRow[] {
  return db
    .select({
      id: safetyReportEvents.id, kind: safetyReportEvents.kind, fromStatus: safetyReportEvents.fromStatus, toStatus: safetyReportEvents.toStatus, note: safetyReportEvents.note,
      bulletinId: safetyReportEvents.bulletinId, bulletinTitle: bulletins.title, groundingNoticeId: safetyReportEvents.groundingNoticeId, createdAt: safetyReportEvents.createdAt, actorName: users.name,
    })
    .from(safetyReportEvents)
    .innerJoin(users, eq(users.id, safetyReportEvents.actorId))
    .leftJoin(bulletins, eq(bulletins.id, safetyReportEvents.bulletinId))
    .where(and(eq(safetyReportEvents.clubId, clubId), eq(safetyReportEvents.reportId, reportId)))
    .orderBy(asc(safetyReportEvents.createdAt))
    .all();
}

export function listClubAircraftChoices(db: Reader, clubId: string): { id: string; registration: string; typeGroup: string; label: string }[] {
  return db
    .select({ id: aircraft.id, registration: aircraft.registration, typeGroup: aircraft.typeGroup, make: aircraft.make, model: aircraft.model })
    .from(aircraft)
    .where(and(eq(aircraft.clubId, clubId), isNull(aircraft.retiredAt)))
    .orderBy(asc(aircraft.registration))
    .all()
    .map((a) => ({ id: a.id, registration: a.registration, typeGroup: a.typeGroup, label: `${a.registration} · ${a.make} ${a.model}` }));
}

export function getClubAircraft(db: Reader, clubId: string, aircraftId: string) {
  return db.select({ id: aircraft.id, registration: aircraft.registration }).from(aircraft).where(and(eq(aircraft.clubId, clubId), eq(aircraft.id, aircraftId))).get();
}
