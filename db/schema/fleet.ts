import { index, integer, real, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import { users } from "./auth";
import { clubs } from "./clubs";
import { id, timestamps } from "./columns";

// Aircraft records, inspections, squawks, grounding notices and the flight meter log.
// Nothing here is deleted: items are retired, squawks closed, notices lifted, and every squawk
// transition is a row of its own in squawk_events.

export const aircraft = sqliteTable(
  "aircraft",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    registration: text("registration").notNull(),
    make: text("make").notNull(),
    model: text("model").notNull(),
    /** Used by checkouts: a member checked out in the group may fly any aircraft in it. */
    typeGroup: text("type_group").notNull(),
    category: text("category").notNull().default("Airplane"),
    classRating: text("class_rating").notNull().default("Single-engine land"),
    /** A tailwheel (conventional gear) airplane: 14 CFR 61.57(a)(1)(ii) full-stop currency. */
    tailwheel: integer("tailwheel", { mode: "boolean" }).notNull().default(false),
    serialNumber: text("serial_number"),
    year: integer("year"),
    homeField: text("home_field"),
    photoUploadId: text("photo_upload_id"),
    /** Per meter hour, integer minor units of the club's currency. */
    hourlyRateMinor: integer("hourly_rate_minor").notNull().default(0),
    rateMeter: text("rate_meter", { enum: ["hobbs", "tach"] }).notNull().default("hobbs"),
    /** Which meter the hours-based inspections count (time in service). */
    maintenanceMeter: text("maintenance_meter", { enum: ["hobbs", "tach"] }).notNull().default("tach"),
    /** Kept current by the flight log inside the same transaction, so the flight line never reads flights. */
    currentHobbs: real("current_hobbs"),
    currentTach: real("current_tach"),
    usedForHire: integer("used_for_hire", { mode: "boolean" }).notNull().default(false),
    usedForInstruction: integer("used_for_instruction", { mode: "boolean" }).notNull().default(false),
    ifrEquipped: integer("ifr_equipped", { mode: "boolean" }).notNull().default(false),
    usedForIfr: integer("used_for_ifr", { mode: "boolean" }).notNull().default(false),
    engineTboHours: real("engine_tbo_hours"),
    engineTimeSinceOverhaul: real("engine_time_since_overhaul"),
    notes: text("notes"),
    retiredAt: integer("retired_at", { mode: "timestamp_ms" }),
    ...timestamps(),
  },
  (t) => [index("aircraft_club_id").on(t.clubId), uniqueIndex("aircraft_club_registration").on(t.clubId, t.registration)],
);

export const inspectionItems = sqliteTable(
  "inspection_items",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    aircraftId: text("aircraft_id").notNull().references(() => aircraft.id),
    key: text("key").notNull(),
    name: text("name").notNull(),
    /** regulation (the defaults), directive (recurring AD) or club (the club's own item). */
    origin: text("origin", { enum: ["regulation", "directive", "club"] }).notNull().default("regulation"),
    ruleKind: text("rule_kind", { enum: ["calendar-months", "hours", "months-or-hours", "fixed-date", "days"] }).notNull(),
    months: integer("months"),
    hours: real("hours"),
    days: integer("days"),
    overrunHours: real("overrun_hours"),
    required: integer("required", { mode: "boolean" }).notNull().default(true),
    ifrOnly: integer("ifr_only", { mode: "boolean" }).notNull().default(false),
    hireOrInstructionOnly: integer("hire_or_instruction_only", { mode: "boolean" }).notNull().default(false),
    satisfiedBy: text("satisfied_by", { mode: "json" }).$type<string[]>(),
    /** Cumulative-use limit (ELT transmitter time on one battery) and the use recorded since. */
    usageLimitHours: real("usage_limit_hours"),
    usageUsedHours: real("usage_used_hours"),
    source: text("source"),
    retiredAt: integer("retired_at", { mode: "timestamp_ms" }),
    ...timestamps(),
  },
  (t) => [index("inspection_items_club_id").on(t.clubId, t.aircraftId), uniqueIndex("inspection_items_aircraft_key").on(t.aircraftId, t.key)],
);

export const inspectionCompletions = sqliteTable(
  "inspection_completions",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    aircraftId: text("aircraft_id").notNull().references(() => aircraft.id),
    itemId: text("item_id").notNull().references(() => inspectionItems.id),
    /** ISO calendar date in the club's time zone. */
    doneOn: text("done_on").notNull(),
    hours: real("hours"),
    /** The meter `hours` were read on: the aircraft's maintenance meter when it was recorded. */
    meter: text("meter", { enum: ["hobbs", "tach"] }),
    expiresOn: text("expires_on"),
    mechanicName: text("mechanic_name").notNull(),
    mechanicCertificate: text("mechanic_certificate").notNull(),
    notes: text("notes"),
    recordedById: text("recorded_by_id").references(() => users.id),
    ...timestamps(),
  },
  (t) => [index("inspection_completions_club_id").on(t.clubId), index("inspection_completions_item").on(t.clubId, t.itemId, t.doneOn)],
);

/**
 * Meter readings that tie one meter to the other (never a completion). Two kinds:
 * - completionId null: the aircraft switched the meter its inspections count by; the readings
 *   of both meters at the switch (from = the old meter, to = the new one).
 * - completionId set: maintenance recorded where that completion stands on `toMeter`, so the
 *   hours-based items it governs can be computed on the new meter again.
 * Append-only (migration 0016).
 */
export const meterConversions = sqliteTable(
  "meter_conversions",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    aircraftId: text("aircraft_id").notNull().references(() => aircraft.id),
    completionId: text("completion_id").references(() => inspectionCompletions.id),
    fromMeter: text("from_meter", { enum: ["hobbs", "tach"] }).notNull(),
    fromReading: real("from_reading"),
    toMeter: text("to_meter", { enum: ["hobbs", "tach"] }).notNull(),
    toReading: real("to_reading").notNull(),
    note: text("note"),
    recordedById: text("recorded_by_id").references(() => users.id),
    ...timestamps(),
  },
  (t) => [index("meter_conversions_club_id").on(t.clubId, t.aircraftId)],
);

export const squawks = sqliteTable(
  "squawks",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    aircraftId: text("aircraft_id").notNull().references(() => aircraft.id),
    flightId: text("flight_id"),
    reportedById: text("reported_by_id").references(() => users.id),
    description: text("description").notNull(),
    foundDuring: text("found_during", { enum: ["preflight", "flight", "postflight", "maintenance"] }).notNull(),
    /** The reporter's own "this may affect airworthiness": counts until maintenance triages. */
    suspectedGrounding: integer("suspected_grounding", { mode: "boolean" }).notNull().default(false),
    triage: text("triage", { enum: ["untriaged", "grounding", "deferred", "note"] }).notNull().default("untriaged"),
    limitation: text("limitation"),
    placarded: integer("placarded", { mode: "boolean" }).notNull().default(false),
    /** 14 CFR 91.213(d)(3)(ii): who determined the item is not required and not a hazard. */
    deferralDeterminedBy: text("deferral_determined_by"),
    status: text("status", { enum: ["open", "closed"] }).notNull().default("open"),
    repairNotes: text("repair_notes"),
    rtsMechanicName: text("rts_mechanic_name"),
    rtsCertificate: text("rts_certificate"),
    rtsOn: text("rts_on"),
    closedAt: integer("closed_at", { mode: "timestamp_ms" }),
    closedById: text("closed_by_id").references(() => users.id),
    ...timestamps(),
  },
  (t) => [index("squawks_club_id").on(t.clubId), index("squawks_open").on(t.clubId, t.status, t.aircraftId)],
);

export const squawkEvents = sqliteTable(
  "squawk_events",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    squawkId: text("squawk_id").notNull().references(() => squawks.id),
    kind: text("kind", { enum: ["reported", "triaged", "closed"] }).notNull(),
    fromTriage: text("from_triage"),
    toTriage: text("to_triage"),
    note: text("note"),
    actorId: text("actor_id").references(() => users.id),
    ...timestamps(),
  },
  (t) => [index("squawk_events_club_id").on(t.clubId, t.squawkId)],
);

export const groundingNotices = sqliteTable(
  "grounding_notices",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    aircraftId: text("aircraft_id").notNull().references(() => aircraft.id),
    /** maintenance: lifting needs the return-to-service entry; safety: a note is enough. */
    category: text("category", { enum: ["safety", "maintenance"] }).notNull(),
    reason: text("reason").notNull(),
    effectiveAt: integer("effective_at", { mode: "timestamp_ms" }).notNull(),
    issuedById: text("issued_by_id").references(() => users.id),
    liftedAt: integer("lifted_at", { mode: "timestamp_ms" }),
    liftedById: text("lifted_by_id").references(() => users.id),
    liftNote: text("lift_note"),
    liftMechanicName: text("lift_mechanic_name"),
    liftCertificate: text("lift_certificate"),
    ...timestamps(),
  },
  (t) => [index("grounding_notices_club_id").on(t.clubId, t.aircraftId, t.liftedAt)],
);

export const flights = sqliteTable(
  "flights",
  {
    id: id(),
    clubId: text("club_id").notNull().references(() => clubs.id),
    aircraftId: text("aircraft_id").notNull().references(() => aircraft.id),
    pilotId: text("pilot_id").notNull().references(() => users.id),
    flownOn: text("flown_on").notNull(),
    hobbsOut: real("hobbs_out").notNull(),
    hobbsIn: real("hobbs_in").notNull(),
    tachOut: real("tach_out").notNull(),
    tachIn: real("tach_in").notNull(),
    dayLandings: integer("day_landings").notNull().default(0),
    nightFullStopLandings: integer("night_full_stop_landings").notNull().default(0),
    /** How many of the day landings were to a full stop; null when not recorded (14 CFR 61.57(a)(1)(ii)). */
    dayFullStopLandings: integer("day_full_stop_landings"),
    /** In the club's unit: US gallons / quarts (imperial) or litres (metric), see fuelUnit. */
    fuelAdded: real("fuel_added").notNull().default(0),
    oilAdded: real("oil_added").notNull().default(0),
    fuelUnit: text("fuel_unit", { enum: ["gal", "l"] }).notNull(),
    oilUnit: text("oil_unit", { enum: ["qt", "l"] }).notNull(),
    /** Flight sheet, Out | In: fuel on board at each end (fuelUnit) and the club's clock time "HH:MM"; optional. */
    fuelOut: real("fuel_out"),
    fuelIn: real("fuel_in"),
    timeOut: text("time_out"),
    timeIn: text("time_in"),
    notes: text("notes"),
    /** Meter continuity with the neighbouring flights, checked when the flight was logged. */
    continuity: text("continuity", { enum: ["ok", "gap", "overlap"] }).notNull().default("ok"),
    continuityText: text("continuity_text"),
    continuityReviewedAt: integer("continuity_reviewed_at", { mode: "timestamp_ms" }),
    continuityReviewedById: text("continuity_reviewed_by_id").references(() => users.id),
    continuityReviewNote: text("continuity_review_note"),
    /** The pilot's explanation of a meter mismatch, required before the flight is recorded. */
    meterExplanation: text("meter_explanation"),
    /** The treasurer's settlement of a meter mismatch (time charged, or accepted as explained). */
    gapSettledAt: integer("gap_settled_at", { mode: "timestamp_ms" }),
    gapSettledById: text("gap_settled_by_id").references(() => users.id),
    gapSettledNote: text("gap_settled_note"),
    /** The booking the flight was flown on; null for a flight entered in the flight log. */
    bookingId: text("booking_id"),
    recordedById: text("recorded_by_id").references(() => users.id),
    ...timestamps(),
  },
  (t) => [
    index("flights_club_id").on(t.clubId),
    index("flights_continuity").on(t.clubId, t.aircraftId, t.hobbsOut),
    index("flights_flagged").on(t.clubId, t.continuity),
    uniqueIndex("flights_booking").on(t.clubId, t.bookingId),
  ],
);

export type Aircraft = typeof aircraft.$inferSelect;
export type NewAircraft = typeof aircraft.$inferInsert;
export type InspectionItemRow = typeof inspectionItems.$inferSelect;
export type NewInspectionItemRow = typeof inspectionItems.$inferInsert;
export type InspectionCompletionRow = typeof inspectionCompletions.$inferSelect;
export type MeterConversionRow = typeof meterConversions.$inferSelect;
export type SquawkRow = typeof squawks.$inferSelect;
export type SquawkEventRow = typeof squawkEvents.$inferSelect;
export type GroundingNoticeRow = typeof groundingNotices.$inferSelect;
export type FlightRow = typeof flights.$inferSelect;
