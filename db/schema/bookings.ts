import { sql } from "drizzle-orm";
import { check, index, integer, real, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import type { EnvelopePoint } from "@/lib/performance";
import { users } from "./auth";
import { clubs } from "./clubs";
import { id, timestamps } from "./columns";
import { aircraft, flights, squawks } from "./fleet";

// Bookings, the member's calendar feed, weight and balance per aircraft and per booking, and
// the preflight record. Times are UTC instants; a booking is never deleted, only cancelled.

export const BOOKING_STATUSES = ["reserved", "dispatched", "checked_in", "cancelled"] as const;
export type BookingStatus = (typeof BOOKING_STATUSES)[number];
/** The longest window one booking may hold; also bounds the overlap look-up (see the triggers). */
export const MAX_BOOKING_MS = 14 * 86_400_000;

export type AcceptedWarning = { guard: string; reason: string };

export const bookings = sqliteTable(
  "bookings",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    aircraftId: text("aircraft_id").notNull().references(() => aircraft.id),
    /** The member flying (pilot in command, or the student of a dual flight). */
    userId: text("user_id").notNull().references(() => users.id),
    instructorId: text("instructor_user_id").references(() => users.id),
    startsAt: integer("starts_at", { mode: "timestamp_ms" }).notNull(),
    endsAt: integer("ends_at", { mode: "timestamp_ms" }).notNull(),
    status: text("status", { enum: BOOKING_STATUSES }).notNull().default("reserved"),
    purpose: text("purpose"),
    carryingPassengers: integer("carrying_passengers", { mode: "boolean" }).notNull().default(false),
    /** Guard warnings shown and accepted when the booking was made or last changed. */
    acceptedWarnings: text("accepted_warnings", { mode: "json" }).$type<AcceptedWarning[]>().notNull().default(sql`'[]'`),
    cancelledAt: integer("cancelled_at", { mode: "timestamp_ms" }),
    cancelledById: text("cancelled_by_id").references(() => users.id),
    cancelReason: text("cancel_reason"),
    /** Cancelled (or shortened) inside the club's late-cancellation window. */
    lateCancel: integer("late_cancel", { mode: "boolean" }).notNull().default(false),
    dispatchedAt: integer("dispatched_at", { mode: "timestamp_ms" }),
    dispatchedById: text("dispatched_by_id").references(() => users.id),
    preflightRecordId: text("preflight_record_id"),
    checkedInAt: integer("checked_in_at", { mode: "timestamp_ms" }),
    flightId: text("flight_id").references(() => flights.id),
    createdById: text("created_by_id").references(() => users.id),
    /** Shared by the weeks of one weekly booking (made together); null for a single booking. */
    seriesId: text("series_id"),
    ...timestamps(),
  },
  (t) => [
    index("bookings_club_id").on(t.clubId),
    index("bookings_series").on(t.clubId, t.seriesId, t.startsAt),
    index("bookings_aircraft_time").on(t.clubId, t.aircraftId, t.startsAt),
    index("bookings_instructor_time").on(t.clubId, t.instructorId, t.startsAt),
    index("bookings_member_time").on(t.clubId, t.userId, t.startsAt),
    index("bookings_club_time").on(t.clubId, t.startsAt),
    uniqueIndex("bookings_flight_once").on(t.flightId),
    check("bookings_window", sql`${t.endsAt} > ${t.startsAt} AND ${t.endsAt} - ${t.startsAt} <= ${sql.raw(String(MAX_BOOKING_MS))}`),
    check("bookings_instructor_not_member", sql`${t.instructorId} IS NULL OR ${t.instructorId} <> ${t.userId}`),
  ],
);

/**
 * A member's calendar link. Found by the SHA-256 of the secret; the secret itself is kept sealed
 * (lib/server/tokens.ts sealSecret) so the page can show it again. Revoking ends the link.
 */
export const calendarFeedTokens = sqliteTable(
  "calendar_feed_tokens",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    userId: text("user_id").notNull().references(() => users.id),
    tokenHash: text("token_hash").notNull().unique(),
    /** The secret sealed with a key derived from AUTH_SECRET; null for links made before 0023. */
    secretSealed: text("secret_sealed"),
    revokedAt: integer("revoked_at", { mode: "timestamp_ms" }),
    lastFetchedAt: integer("last_fetched_at", { mode: "timestamp_ms" }),
    ...timestamps(),
  },
  (t) => [index("calendar_feed_tokens_club_user").on(t.clubId, t.userId)],
);

export type WbStation = { key: string; name: string; arm: number; maxWeight: number | null };
export type WbTank = { key: string; name: string; arm: number; usableCapacity: number };

/**
 * One aircraft's weight and balance data, in the club's unit system: lb, in and US gallons
 * (imperial) or kg, mm and litres (metric). Moments are weight × arm in the same units.
 */
export const weightBalanceProfiles = sqliteTable(
  "weight_balance_profiles",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    aircraftId: text("aircraft_id").notNull().references(() => aircraft.id),
    unitSystem: text("unit_system", { enum: ["imperial", "metric"] }).notNull(),
    emptyWeight: real("empty_weight").notNull(),
    emptyArm: real("empty_arm").notNull(),
    maxTakeoffWeight: real("max_takeoff_weight").notNull(),
    maxLandingWeight: real("max_landing_weight"),
    stations: text("stations", { mode: "json" }).$type<WbStation[]>().notNull(),
    tanks: text("tanks", { mode: "json" }).$type<WbTank[]>().notNull(),
    fuelKind: text("fuel_kind", { enum: ["avgas", "jet"] }).notNull().default("avgas"),
    /** Normal-cruise burn, volume per hour; the fuel tool's default. */
    burnPerHour: real("burn_per_hour"),
    envelopeNormal: text("envelope_normal", { mode: "json" }).$type<EnvelopePoint[]>().notNull(),
    envelopeUtility: text("envelope_utility", { mode: "json" }).$type<EnvelopePoint[] | null>(),
    /** Where the figures come from, e.g. the weighing report and its date. */
    source: text("source"),
    updatedById: text("updated_by_id").references(() => users.id),
    ...timestamps(),
  },
  (t) => [index("weight_balance_profiles_club_id").on(t.clubId), uniqueIndex("weight_balance_profiles_aircraft").on(t.aircraftId)],
);

export type LoadingPoint = { weight: number; moment: number; cg: number; withinEnvelope: boolean; overweight: boolean };

/** The weight and balance a member saved with a booking (the latest one counts). */
export const bookingLoadings = sqliteTable(
  "booking_loadings",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    bookingId: text("booking_id").notNull().references(() => bookings.id),
    profileId: text("profile_id").notNull().references(() => weightBalanceProfiles.id),
    category: text("category", { enum: ["normal", "utility"] }).notNull().default("normal"),
    stationWeights: text("station_weights", { mode: "json" }).$type<Record<string, number>>().notNull(),
    fuelVolumes: text("fuel_volumes", { mode: "json" }).$type<Record<string, number>>().notNull(),
    burnVolume: real("burn_volume").notNull(),
    takeoff: text("takeoff", { mode: "json" }).$type<LoadingPoint>().notNull(),
    landing: text("landing", { mode: "json" }).$type<LoadingPoint>().notNull(),
    problems: text("problems", { mode: "json" }).$type<string[]>().notNull(),
    savedById: text("saved_by_id").references(() => users.id),
    ...timestamps(),
  },
  (t) => [index("booking_loadings_club_id").on(t.clubId), uniqueIndex("booking_loadings_booking").on(t.bookingId)],
);

/** The club's preflight checklist for one aircraft. */
export const preflightTemplates = sqliteTable(
  "preflight_templates",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    aircraftId: text("aircraft_id").notNull().references(() => aircraft.id),
    /** Oil quantity the member must see before flight, quarts (imperial) or litres (metric). */
    oilMinimum: real("oil_minimum").notNull(),
    oilMaximum: real("oil_maximum"),
    /** Drain points sampled before flight, e.g. "Left wing sump", "Gascolator". */
    sumpPoints: text("sump_points", { mode: "json" }).$type<string[]>().notNull(),
    /** The tanks checked before flight: name and usable capacity in the club's fuel unit. Empty: the weight-and-balance tanks. */
    fuelTanks: text("fuel_tanks", { mode: "json" }).$type<PreflightTank[]>().notNull().default(sql`'[]'`),
    updatedById: text("updated_by_id").references(() => users.id),
    ...timestamps(),
  },
  (t) => [index("preflight_templates_club_id").on(t.clubId), uniqueIndex("preflight_templates_aircraft").on(t.aircraftId)],
);

export const preflightTemplateItems = sqliteTable(
  "preflight_template_items",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    templateId: text("template_id").notNull().references(() => preflightTemplates.id),
    section: text("section").notNull(),
    label: text("label").notNull(),
    /** "document": a paper that must be aboard; "check": an item looked at. */
    kind: text("kind", { enum: ["check", "document"] }).notNull().default("check"),
    position: integer("position").notNull(),
    /** Edited lists retire old items instead of deleting them: records keep their history. */
    retiredAt: integer("retired_at", { mode: "timestamp_ms" }),
    ...timestamps(),
  },
  (t) => [index("preflight_template_items_club_id").on(t.clubId, t.templateId)],
);

export type PreflightTank = { name: string; capacity: number };
export type FuelReading = { tank: string; quantity: number };
export type SumpReading = { point: string; result: "clear" | "contaminated" };

export const preflightRecords = sqliteTable(
  "preflight_records",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    bookingId: text("booking_id").notNull().references(() => bookings.id),
    aircraftId: text("aircraft_id").notNull().references(() => aircraft.id),
    userId: text("user_id").notNull().references(() => users.id),
    templateId: text("template_id").references(() => preflightTemplates.id),
    fuel: text("fuel", { mode: "json" }).$type<FuelReading[]>().notNull(),
    fuelUnit: text("fuel_unit", { enum: ["gal", "l"] }).notNull(),
    sumps: text("sumps", { mode: "json" }).$type<SumpReading[]>().notNull(),
    oilQuantity: real("oil_quantity").notNull(),
    oilMinimum: real("oil_minimum").notNull(),
    oilUnit: text("oil_unit", { enum: ["qt", "l"] }).notNull(),
    outcome: text("outcome", { enum: ["ok", "findings"] }).notNull(),
    findingCount: integer("finding_count").notNull().default(0),
    notes: text("notes"),
    ...timestamps(),
  },
  (t) => [index("preflight_records_club_id").on(t.clubId), index("preflight_records_booking").on(t.clubId, t.bookingId)],
);

export const preflightRecordItems = sqliteTable(
  "preflight_record_items",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    recordId: text("record_id").notNull().references(() => preflightRecords.id),
    templateItemId: text("template_item_id").references(() => preflightTemplateItems.id),
    section: text("section").notNull(),
    label: text("label").notNull(),
    kind: text("kind", { enum: ["check", "document"] }).notNull(),
    result: text("result", { enum: ["ok", "finding"] }).notNull(),
    note: text("note"),
    squawkId: text("squawk_id").references(() => squawks.id),
    ...timestamps(),
  },
  (t) => [index("preflight_record_items_club_id").on(t.clubId, t.recordId)],
);

export type BookingRow = typeof bookings.$inferSelect;
export type CalendarFeedToken = typeof calendarFeedTokens.$inferSelect;
export type WeightBalanceProfile = typeof weightBalanceProfiles.$inferSelect;
export type BookingLoading = typeof bookingLoadings.$inferSelect;
export type PreflightTemplate = typeof preflightTemplates.$inferSelect;
export type PreflightTemplateItem = typeof preflightTemplateItems.$inferSelect;
export type PreflightRecord = typeof preflightRecords.$inferSelect;
export type PreflightRecordItem = typeof preflightRecordItems.$inferSelect;
