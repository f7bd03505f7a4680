import { sql } from "drizzle-orm";
import { index, integer, sqliteTable, text, uniqueIndex, type AnySQLiteColumn } from "drizzle-orm/sqlite-core";
import { users } from "./auth";
import { clubs } from "./clubs";
import { id, timestamps } from "./columns";
import { aircraft } from "./fleet";
import { uploads } from "./uploads";
import { BULLETIN_AUDIENCES, BULLETIN_URGENCIES, DOCUMENT_KINDS, REPORT_STATUSES } from "@/lib/safety/kinds";

export { BULLETIN_AUDIENCES, BULLETIN_URGENCIES, DOCUMENT_KINDS, REPORT_STATUSES, type BulletinAudience, type BulletinUrgency, type DocumentKind, type ReportStatus } from "@/lib/safety/kinds";

/**
 * One row per version. A published row is never edited: a revision is a new row in the same
 * series (seriesId = the first version's id) that points at the one it supersedes.
 */
export const bulletins = sqliteTable(
  "bulletins",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    seriesId: text("series_id").notNull(),
    version: integer("version").notNull().default(1),
    supersedesId: text("supersedes_id").references((): AnySQLiteColumn => bulletins.id),
    status: text("status", { enum: ["draft", "published"] }).notNull().default("draft"),
    title: text("title").notNull(),
    bodyMarkdown: text("body_markdown").notNull(),
    urgency: text("urgency", { enum: BULLETIN_URGENCIES }).notNull(),
    audience: text("audience", { enum: BULLETIN_AUDIENCES }).notNull(),
    /** Set only when audience = "type_group": the aircraft type group addressed. */
    audienceTypeGroup: text("audience_type_group"),
    attachmentUploadId: text("attachment_upload_id").references(() => uploads.id),
    /** Calendar date in the club's time zone; null when no deadline is set. */
    acknowledgeBy: text("acknowledge_by"),
    sourceReportId: text("source_report_id").references((): AnySQLiteColumn => safetyReports.id),
    createdById: text("created_by_id").notNull().references(() => users.id),
    publishedById: text("published_by_id").references(() => users.id),
    publishedAt: integer("published_at", { mode: "timestamp_ms" }),
    supersededAt: integer("superseded_at", { mode: "timestamp_ms" }),
    supersededById: text("superseded_by_id"),
    lastRemindedAt: integer("last_reminded_at", { mode: "timestamp_ms" }),
    ...timestamps(),
  },
  (t) => [
    index("bulletins_club_id").on(t.clubId, t.status),
    uniqueIndex("bulletins_series_version").on(t.seriesId, t.version),
  ],
);

export const bulletinAcknowledgements = sqliteTable(
  "bulletin_acknowledgements",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    bulletinId: text("bulletin_id").notNull().references(() => bulletins.id),
    userId: text("user_id").notNull().references(() => users.id),
    acknowledgedAt: integer("acknowledged_at", { mode: "timestamp_ms" }).notNull().$defaultFn(() => new Date()),
    ...timestamps(),
  },
  (t) => [uniqueIndex("bulletin_acknowledgements_once").on(t.bulletinId, t.userId), index("bulletin_acknowledgements_club_id").on(t.clubId)],
);

/**
 * Confidential safety reports. For an anonymous report reporter_id is never written (null),
 * and nothing else that could lead back to the person is kept: no IP address, no user agent,
 * no audit actor, no upload, and the filing instant is rounded to the day.
 */
export const safetyReports = sqliteTable(
  "safety_reports",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    reporterId: text("reporter_id").references(() => users.id),
    anonymous: integer("anonymous", { mode: "boolean" }).notNull(),
    occurredOn: text("occurred_on").notNull(),
    /** Local time "HH:MM" in the club's time zone, when the reporter gave one. */
    occurredTime: text("occurred_time"),
    location: text("location").notNull(),
    /** When the report concerns one of the club's aircraft (checked against the club on write). */
    aircraftId: text("aircraft_id").references(() => aircraft.id),
    whatHappened: text("what_happened").notNull(),
    contributingFactors: text("contributing_factors", { mode: "json" }).$type<string[]>().notNull(),
    factorsNote: text("factors_note"),
    status: text("status", { enum: REPORT_STATUSES }).notNull().default("received"),
    ...timestamps(),
  },
  (t) => [index("safety_reports_club_id").on(t.clubId, t.status), index("safety_reports_reporter").on(t.clubId, t.reporterId)],
);

/** What the safety officer did with a report: status changes, notes, bulletins, groundings. */
export const safetyReportEvents = sqliteTable(
  "safety_report_events",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    reportId: text("report_id").notNull().references(() => safetyReports.id),
    actorId: text("actor_id").notNull().references(() => users.id),
    kind: text("kind", { enum: ["status", "note", "bulletin", "grounding"] }).notNull(),
    fromStatus: text("from_status", { enum: REPORT_STATUSES }),
    toStatus: text("to_status", { enum: REPORT_STATUSES }),
    note: text("note"),
    bulletinId: text("bulletin_id").references(() => bulletins.id),
    groundingNoticeId: text("grounding_notice_id"),
    ...timestamps(),
  },
  (t) => [index("safety_report_events_report").on(t.clubId, t.reportId)],
);

/** What only the member sees about themselves (date of birth), kept apart from documents. */
export const memberPrivateRecords = sqliteTable(
  "member_private_records",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    userId: text("user_id").notNull().references(() => users.id),
    birthDate: text("birth_date"),
    ...timestamps(),
  },
  (t) => [uniqueIndex("member_private_records_club_user").on(t.clubId, t.userId)],
);

/**
 * Medical certificates. expiresOn is computed when recorded (it needs the birth date, which
 * stays on the private record) so that others can be shown the expiry date and nothing else.
 */
export const medicalCertificates = sqliteTable(
  "medical_certificates",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    userId: text("user_id").notNull().references(() => users.id),
    kind: text("kind", { enum: ["faa_class", "basicmed"] }).notNull(),
    medicalClass: integer("medical_class"),
    examDate: text("exam_date").notNull(),
    /** BasicMed only: the medical education course date. */
    courseDate: text("course_date"),
    limitations: text("limitations"),
    expiresOn: text("expires_on").notNull(),
    /** The expiry date a reminder was last queued for, so each expiry is reminded once. */
    reminderSentFor: text("reminder_sent_for"),
    recordedById: text("recorded_by_id").notNull().references(() => users.id),
    /**
     * Who verified the record against the logbook page or certificate, and when. Null: the
     * member's own claim, which is shown but never clears a booking guard.
     */
    verifiedAt: integer("verified_at", { mode: "timestamp_ms" }),
    verifiedById: text("verified_by_id").references(() => users.id),
    /** The logbook page or certificate seen when verifying (an upload of the member's). */
    verificationUploadId: text("verification_upload_id").references(() => uploads.id),
    ...timestamps(),
  },
  (t) => [index("medical_certificates_club_user").on(t.clubId, t.userId)],
);

export const memberDocuments = sqliteTable(
  "member_documents",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    userId: text("user_id").notNull().references(() => users.id),
    kind: text("kind", { enum: DOCUMENT_KINDS }).notNull(),
    /** Certificate or policy number. */
    reference: text("reference"),
    /** Ratings, insurer, or the instructor who gave the review. */
    details: text("details"),
    issuedOn: text("issued_on").notNull(),
    expiresOn: text("expires_on"),
    uploadId: text("upload_id").references(() => uploads.id),
    reminderSentFor: text("reminder_sent_for"),
    recordedById: text("recorded_by_id").notNull().references(() => users.id),
    /**
     * Who verified the record against the logbook page or certificate, and when. Null: the
     * member's own claim, which is shown but never clears a booking guard.
     */
    verifiedAt: integer("verified_at", { mode: "timestamp_ms" }),
    verifiedById: text("verified_by_id").references(() => users.id),
    /** The logbook page or certificate seen when verifying (an upload of the member's). */
    verificationUploadId: text("verification_upload_id").references(() => uploads.id),
    ...timestamps(),
  },
  (t) => [index("member_documents_club_user").on(t.clubId, t.userId, t.kind)],
);

/** Landings a member flew outside the club's flight log (another club, a rental), for currency. */
export const outsideFlightEntries = sqliteTable(
  "outside_flight_entries",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    userId: text("user_id").notNull().references(() => users.id),
    flownOn: text("flown_on").notNull(),
    typeGroup: text("type_group"),
    aircraftDescription: text("aircraft_description").notNull(),
    dayLandings: integer("day_landings").notNull(),
    nightFullStopLandings: integer("night_full_stop_landings").notNull(),
    /** Category, class and gear of the aircraft flown (14 CFR 61.57(a)(1)); null on older entries. */
    category: text("category"),
    classRating: text("class_rating"),
    tailwheel: integer("tailwheel", { mode: "boolean" }),
    /** How many of the day landings were to a full stop; null when not recorded. */
    dayFullStopLandings: integer("day_full_stop_landings"),
    note: text("note"),
    /**
     * Who verified the record against the logbook page or certificate, and when. Null: the
     * member's own claim, which is shown but never clears a booking guard.
     */
    verifiedAt: integer("verified_at", { mode: "timestamp_ms" }),
    verifiedById: text("verified_by_id").references(() => users.id),
    /** The logbook page or certificate seen when verifying (an upload of the member's). */
    verificationUploadId: text("verification_upload_id").references(() => uploads.id),
    ...timestamps(),
  },
  (t) => [index("outside_flight_entries_club_user").on(t.clubId, t.userId)],
);

export const checkouts = sqliteTable(
  "checkouts",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    userId: text("user_id").notNull().references(() => users.id),
    typeGroup: text("type_group").notNull(),
    checkedOutOn: text("checked_out_on").notNull(),
    instructorId: text("instructor_id").notNull().references(() => users.id),
    instructorCertificateNumber: text("instructor_certificate_number").notNull(),
    /** Limits the instructor set, e.g. "day VFR only". */
    conditions: text("conditions"),
    revokedAt: integer("revoked_at", { mode: "timestamp_ms" }),
    revokedById: text("revoked_by_id").references(() => users.id),
    revokeReason: text("revoke_reason"),
    ...timestamps(),
  },
  (t) => [
    index("checkouts_club_user").on(t.clubId, t.userId),
    // One standing checkout per member and type group; revoked ones stay as history.
    uniqueIndex("checkouts_active_once").on(t.clubId, t.userId, t.typeGroup).where(sql`revoked_at is null`),
  ],
);

export type Bulletin = typeof bulletins.$inferSelect;
export type BulletinAcknowledgement = typeof bulletinAcknowledgements.$inferSelect;
export type SafetyReport = typeof safetyReports.$inferSelect;
export type SafetyReportEvent = typeof safetyReportEvents.$inferSelect;
export type MedicalCertificate = typeof medicalCertificates.$inferSelect;
export type MemberDocument = typeof memberDocuments.$inferSelect;
export type OutsideFlightEntry = typeof outsideFlightEntries.$inferSelect;
export type Checkout = typeof checkouts.$inferSelect;
