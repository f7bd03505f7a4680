import "server-only";
import { and, asc, desc, eq, gte, isNull, lt, sql } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { aircraft, bulletins, clubs, emailOutbox, safetyReportEvents, safetyReports, users, type SafetyReport } from "@/db/schema";

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
    // The random id breaks ties: rows of one day never line up in the order they were filed.
    .orderBy(desc(safetyReports.createdAt), asc(safetyReports.id))
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

/** The outbox template of the officers' daily digest; its rows are how the digest remembers what it covered. */
export const SAFETY_DIGEST_TEMPLATE = "safety-digest" as const;

/** The last club day a digest covered (from the digest rows in the outbox), or null before the first. */
export function lastDigestCoveredDay(db: Reader, clubId: string): string | null {
  const row = db
    .select({ day: sql<string | null>`max(json_extract(${emailOutbox.payload}, '$.toDay'))` })
    .from(emailOutbox)
    .where(and(eq(emailOutbox.clubId, clubId), eq(emailOutbox.template, SAFETY_DIGEST_TEMPLATE)))
    .get();
  return row?.day ?? null;
}

/**
 * Reports received in [from, until): ids and kinds only, ordered by the random id so that a
 * list of them says nothing about the order in which they arrived.
 */
export function listReportsReceivedBetween(db: Reader, clubId: string, from: Date, until: Date): { id: string; anonymous: boolean; occurredOn: string }[] {
  return db
    .select({ id: safetyReports.id, anonymous: safetyReports.anonymous, occurredOn: safetyReports.occurredOn })
    .from(safetyReports)
    .where(and(eq(safetyReports.clubId, clubId), gte(safetyReports.createdAt, from), lt(safetyReports.createdAt, until)))
    .orderBy(asc(safetyReports.id))
    .all();
}

/** Clubs the digest runs for. */
export function listDigestClubs(db: Reader): { id: string; slug: string; name: string; timeZone: string }[] {
  return db.select({ id: clubs.id, slug: clubs.slug, name: clubs.name, timeZone: clubs.timeZone }).from(clubs).where(isNull(clubs.archivedAt)).orderBy(asc(clubs.slug)).all();
}
