import { z } from "zod";
import { AIRCRAFT_CATEGORIES, AIRCRAFT_CLASSES } from "@/lib/currency/aircraft-class";
import { calendarDate, localDateTimeField, recordId } from "./primitives";

// Shared by the fleet actions, handlers and tests. Every field says what is wrong in words.

const MAX_HOURS = 99_999.9;

const id = (what: string) => recordId(`Choose ${what}.`);

function text(label: string, min: number, max: number) {
  return z
    .string({ error: `Enter ${label}.` })
    .trim()
    .min(min, { error: min <= 1 ? `Enter ${label}.` : `Enter ${label} (at least ${min} characters).` })
    .max(max, { error: `Keep ${label} to ${max} characters.` });
}

/** Empty text → null, so optional columns stay empty rather than holding "". */
function optionalText(label: string, max: number) {
  return z.preprocess(
    (v) => (typeof v === "string" && v.trim() === "" ? undefined : v),
    z.string().trim().max(max, { error: `Keep ${label} to ${max} characters.` }).optional(),
  ).transform((v) => v ?? null);
}

export const checkbox = z.preprocess((v) => v === "on" || v === "true" || v === true || v === "1", z.boolean());

export const isoDateField = (label: string) => calendarDate(label, `Enter ${label} as a date (YYYY-MM-DD).`);

const optionalIsoDate = (label: string) =>
  z.preprocess((v) => (typeof v === "string" && v.trim() === "" ? undefined : v), isoDateField(label).optional()).transform((v) => v ?? null);

/** A meter reading or hours figure typed into a form: required, decimal, not negative. */
export function hoursField(label: string, max = MAX_HOURS) {
  return z
    .string({ error: `Enter ${label}.` })
    .trim()
    .min(1, { error: `Enter ${label}.` })
    .refine((v) => /^\d+(\.\d{1,2})?$/.test(v), { error: `Enter ${label} as hours, like 1234.5.` })
    .transform(Number)
    .refine((v) => v <= max, { error: `${label[0]!.toUpperCase()}${label.slice(1)} must be at most ${max}.` });
}

function optionalHours(label: string, max = MAX_HOURS) {
  return z.preprocess((v) => (typeof v === "string" && v.trim() === "" ? undefined : v), hoursField(label, max).optional()).transform((v) => v ?? null);
}

function wholeNumber(label: string, min: number, max: number) {
  return z
    .string({ error: `Enter ${label}.` })
    .trim()
    .min(1, { error: `Enter ${label}.` })
    .refine((v) => /^\d+$/.test(v), { error: `Enter ${label} as a whole number.` })
    .transform(Number)
    .refine((v) => v >= min && v <= max, { error: `${label[0]!.toUpperCase()}${label.slice(1)} must be between ${min} and ${max}.` });
}

function optionalWhole(label: string, min: number, max: number) {
  return z.preprocess((v) => (typeof v === "string" && v.trim() === "" ? undefined : v), wholeNumber(label, min, max).optional()).transform((v) => v ?? null);
}

const countField = (label: string) => z.preprocess((v) => (v === undefined || v === "" ? "0" : v), wholeNumber(label, 0, 99));
/** A count that may be left empty ("not recorded"): null, never 0. */
export const optionalCountField = (label: string) =>
  z.preprocess((v) => (v === undefined || v === null || (typeof v === "string" && v.trim() === "") ? undefined : v), wholeNumber(label, 0, 99).optional()).transform((v) => v ?? null);
const quantityField = (label: string) =>
  z.preprocess(
    (v) => (v === undefined || v === "" ? "0" : v),
    z
      .string()
      .trim()
      .refine((v) => /^\d+(\.\d{1,2})?$/.test(v), { error: `Enter ${label} as a number, like 12.5 (0 when none).` })
      .transform(Number)
      .refine((v) => v <= 2000, { error: `${label[0]!.toUpperCase()}${label.slice(1)} must be at most 2000.` }),
  );

/** A file input left blank arrives as an empty File (nameless, or named "undefined" once the
 *  framework has re-encoded the form): no bytes means no file was chosen. */
function isChosenFile(v: unknown): v is File {
  return typeof File !== "undefined" && v instanceof File && v.size > 0;
}

export function filesField(label: string, max: number) {
  return z.preprocess(
    (v) => (v === undefined ? [] : Array.isArray(v) ? v : [v]).filter(isChosenFile),
    z.array(z.instanceof(File)).max(max, { error: `Attach at most ${max} ${label}.` }),
  );
}

// ---------------------------------------------------------------- aircraft

export const registrationField = z
  .string({ error: "Enter the registration." })
  .trim()
  .toUpperCase()
  .refine((v) => /^[A-Z0-9][A-Z0-9-]{1,9}$/.test(v), { error: "Enter the registration as letters, digits and dashes, like N0123X." });

const moneyText = z
  .string({ error: "Enter the hourly rate." })
  .trim()
  .refine((v) => /^\d{1,6}(\.\d{1,2})?$/.test(v), { error: "Enter the hourly rate as an amount, like 145.00." });

export const aircraftFields = {
  registration: registrationField,
  make: text("the make", 1, 60),
  model: text("the model", 1, 60),
  typeGroup: text("the type group (used for checkouts)", 1, 60),
  // 14 CFR 61.5 categories and classes: passenger currency counts landings by them (61.57(a)).
  category: z.enum(AIRCRAFT_CATEGORIES, { error: "Choose the category from the list." }),
  classRating: z.enum(AIRCRAFT_CLASSES, { error: "Choose the class from the list." }),
  tailwheel: checkbox,
  serialNumber: optionalText("the serial number", 40),
  year: optionalWhole("the year", 1903, 2100),
  homeField: optionalText("the home field", 60),
  hourlyRate: moneyText,
  rateMeter: z.enum(["hobbs", "tach"], { error: "Choose the meter the rate is charged by." }),
  maintenanceMeter: z.enum(["hobbs", "tach"], { error: "Choose the meter inspections count by." }),
  usedForHire: checkbox,
  usedForInstruction: checkbox,
  ifrEquipped: checkbox,
  usedForIfr: checkbox,
  engineTboHours: optionalHours("the engine TBO", 10_000),
  engineTimeSinceOverhaul: optionalHours("the engine time since overhaul"),
  notes: optionalText("the notes", 2000),
};

export const createAircraftSchema = z.object({
  ...aircraftFields,
  currentHobbs: hoursField("the current Hobbs"),
  currentTach: hoursField("the current tach"),
});

export const updateAircraftSchema = z.object({
  aircraftId: id("an aircraft"),
  ...aircraftFields,
  currentHobbs: hoursField("the current Hobbs"),
  currentTach: hoursField("the current tach"),
  /** Required when "Inspections count by" changes: the reading on the new meter at the switch. */
  conversionReading: optionalHours("the reading on the new meter"),
  /** Required when a current reading is lowered (maintenance only). */
  readingChangeReason: optionalText("the reason", 500),
  photo: filesField("photo", 1),
});

/** Maintenance records where one completion stands on the meter the aircraft counts by now. */
export const recordMeterConversionSchema = z.object({
  itemId: id("an inspection item"),
  reading: hoursField("the reading on the new meter"),
  note: optionalText("the note", 500),
});

// ---------------------------------------------------------------- inspection items

const ruleKind = z.enum(["calendar-months", "hours", "months-or-hours", "fixed-date", "days"], { error: "Choose how the item comes due." });

export const createInspectionItemSchema = z
  .object({
    aircraftId: id("an aircraft"),
    name: text("the item's name", 3, 120),
    origin: z.enum(["directive", "club"], { error: "Choose whether this is an airworthiness directive or a club item." }),
    ruleKind,
    months: optionalWhole("the number of calendar months", 1, 120),
    hours: optionalHours("the number of hours", 10_000),
    days: optionalWhole("the number of days", 1, 3650),
    overrunHours: optionalHours("the overrun allowance", 100),
    required: checkbox,
    ifrOnly: checkbox,
    source: optionalText("the source", 120),
  })
  .superRefine((v, ctx) => {
    const needs = (field: "months" | "hours" | "days", message: string) => {
      if (v[field] === null) ctx.addIssue({ code: "custom", path: [field], message });
    };
    if (v.ruleKind === "calendar-months" || v.ruleKind === "months-or-hours") needs("months", "Enter the number of calendar months for this rule.");
    if (v.ruleKind === "hours" || v.ruleKind === "months-or-hours") needs("hours", "Enter the number of hours for this rule.");
    if (v.ruleKind === "days") needs("days", "Enter the number of days for this rule.");
  });

export const updateInspectionItemSchema = z.object({
  itemId: id("an inspection item"),
  usageUsedHours: optionalHours("the cumulative use", 10_000),
  retire: checkbox,
  note: optionalText("the note", 500),
});

export const recordCompletionSchema = z.object({
  itemId: id("an inspection item"),
  doneOn: isoDateField("the date it was done"),
  hours: optionalHours("the meter hours when it was done"),
  expiresOn: optionalIsoDate("the expiry date"),
  mechanicName: text("the mechanic's name", 2, 120),
  mechanicCertificate: text("the mechanic's certificate number", 3, 40),
  notes: optionalText("the notes", 2000),
  document: filesField("document", 1),
});

// ---------------------------------------------------------------- squawks

export const reportSquawkSchema = z.object({
  aircraftId: id("an aircraft"),
  description: text("what you found", 5, 2000),
  foundDuring: z.enum(["preflight", "flight", "postflight", "maintenance"], { error: "Choose when you found it." }),
  suspectedGrounding: checkbox,
  photos: filesField("photos", 6),
});

export const triageSquawkSchema = z
  .object({
    squawkId: id("a squawk"),
    triage: z.enum(["grounding", "deferred", "note"], { error: "Choose grounding, deferred or note." }),
    limitation: optionalText("the limitation", 500),
    placarded: checkbox,
    deferralDeterminedBy: optionalText("who made the determination", 160),
    note: optionalText("the note", 1000),
  })
  .superRefine((v, ctx) => {
    if (v.triage !== "deferred") return;
    // 14 CFR 91.213(d): deactivated and placarded, with a determination by a pilot or mechanic.
    if (!v.limitation) ctx.addIssue({ code: "custom", path: ["limitation"], message: "Say what the pilot may not do while this is deferred (e.g. no night flight)." });
    if (!v.placarded) ctx.addIssue({ code: "custom", path: ["placarded"], message: "Confirm the item is deactivated or removed and placarded inoperative (14 CFR 91.213(d))." });
    if (!v.deferralDeterminedBy) ctx.addIssue({ code: "custom", path: ["deferralDeterminedBy"], message: "Enter the pilot or mechanic who determined it is not required and not a hazard." });
  });

export const closeSquawkSchema = z.object({
  squawkId: id("a squawk"),
  repairNotes: text("what was done", 3, 2000),
  rtsMechanicName: optionalText("the mechanic's name", 120),
  rtsCertificate: optionalText("the certificate number", 40),
  rtsOn: isoDateField("the return-to-service date"),
  document: filesField("document", 1),
});

// ---------------------------------------------------------------- grounding notices

export const issueNoticeSchema = z.object({
  aircraftId: id("an aircraft"),
  category: z.enum(["safety", "maintenance"], { error: "Choose a safety or maintenance notice." }),
  reason: text("the reason", 5, 1000),
  /** Local date and time in the club's time zone ("2026-05-01T14:00"); empty = now. */
  effectiveAt: z.preprocess(
    (v) => (typeof v === "string" && v.trim() === "" ? undefined : v),
    localDateTimeField("the effective time", "Enter the effective time as a date and time.").optional(),
  ),
});

export const liftNoticeSchema = z.object({
  noticeId: id("a grounding notice"),
  liftNote: text("why it is lifted", 5, 1000),
  liftMechanicName: optionalText("the mechanic's name", 120),
  liftCertificate: optionalText("the certificate number", 40),
});

// ---------------------------------------------------------------- flights

export const logFlightSchema = z
  .object({
    aircraftId: id("an aircraft"),
    pilotId: z.preprocess((v) => (typeof v === "string" && v.trim() === "" ? undefined : v), id("the pilot").optional()).transform((v) => v ?? null),
    flownOn: isoDateField("the date flown"),
    hobbsOut: hoursField("Hobbs out"),
    hobbsIn: hoursField("Hobbs in"),
    tachOut: hoursField("tach out"),
    tachIn: hoursField("tach in"),
    dayLandings: countField("the day landings"),
    /** 14 CFR 61.57(a)(1)(ii): full stops count for a tailwheel airplane; empty = not recorded. */
    dayFullStopLandings: optionalCountField("the day full-stop landings"),
    nightFullStopLandings: countField("the night full-stop landings"),
    fuelAdded: quantityField("the fuel added"),
    oilAdded: quantityField("the oil added"),
    notes: optionalText("the notes", 1000),
    squawk: optionalText("the squawk", 2000),
    meterExplanation: optionalText("the explanation of the meter readings", 1000),
  })
  .superRefine((v, ctx) => {
    if (v.hobbsIn < v.hobbsOut) ctx.addIssue({ code: "custom", path: ["hobbsIn"], message: "Hobbs in cannot be less than Hobbs out." });
    if (v.tachIn < v.tachOut) ctx.addIssue({ code: "custom", path: ["tachIn"], message: "Tach in cannot be less than tach out." });
    if (v.hobbsIn - v.hobbsOut > 24) ctx.addIssue({ code: "custom", path: ["hobbsIn"], message: "More than 24 h on one flight: check the Hobbs readings." });
    if (v.tachIn - v.tachOut > 24) ctx.addIssue({ code: "custom", path: ["tachIn"], message: "More than 24 h on one flight: check the tach readings." });
    if (v.squawk !== null && v.squawk.length < 5) ctx.addIssue({ code: "custom", path: ["squawk"], message: "Describe the squawk in a few words (at least 5 characters), or leave it empty." });
    if (v.dayFullStopLandings !== null && v.dayFullStopLandings > v.dayLandings) ctx.addIssue({ code: "custom", path: ["dayFullStopLandings"], message: "Full-stop day landings are part of the day landings: enter no more than the day landings." });
  });

export const reviewMeterFlagSchema = z.object({
  flightId: id("a flight"),
  note: text("what was found", 3, 1000),
});

export type LogFlightInput = z.output<typeof logFlightSchema>;
