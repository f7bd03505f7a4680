import { z } from "zod";
import { calendarDate, isRecordId, localDateTimeField, recordId } from "./primitives";
import { checkbox, hoursField, optionalCountField } from "./fleet";

// Bookings, beginning a flight and its flight sheet. Times are typed in the club's time zone as "YYYY-MM-DDTHH:MM"
// (a datetime-local field) and turned into UTC instants by the action.

const GUARD_KEYS = ["grounded", "inspectionDue", "notCheckedOut", "notCurrent", "flightReview", "medicalExpired", "inArrears", "statusUnknown", "limitations"] as const;

const id = (what: string) => recordId(`Choose ${what}.`);

const blankToUndefined = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);

function optionalText(label: string, max: number) {
  return z.preprocess(blankToUndefined, z.string().trim().max(max, { error: `Keep ${label} to ${max} characters.` }).optional()).transform((v) => v ?? null);
}

const optionalId = z.preprocess(blankToUndefined, z.string().trim().refine(isRecordId, { error: "Choose someone from the list." }).optional()).transform((v) => v ?? null);

export function localDateTime(label: string) {
  return localDateTimeField(label, `Enter ${label} as a date and time.`);
}

const acceptedGuards = z
  .preprocess((v) => (v === undefined ? [] : Array.isArray(v) ? v : [v]), z.array(z.enum(GUARD_KEYS, { error: "Unknown warning." })))
  .transform((v) => [...new Set(v)]);

const windowFields = {
  startsAt: localDateTime("the start"),
  endsAt: localDateTime("the end"),
  instructorId: optionalId,
  acceptedGuards,
};

function endAfterStart(v: { startsAt: string; endsAt: string }, ctx: z.RefinementCtx) {
  // Same-zone local times compare as text; the action checks the instants again.
  if (v.endsAt <= v.startsAt) ctx.addIssue({ code: "custom", path: ["endsAt"], message: "The end must be after the start." });
}

/** How many weeks in a row (1 = this once), the same weekday and club times each week. */
const repeatWeeks = z.preprocess(
  (v) => (v === undefined || v === null || v === "" ? "1" : typeof v === "number" ? String(v) : v),
  z
    .string()
    .trim()
    .refine((v) => /^\d{1,2}$/.test(v), { error: "Choose how many weeks, from 1 to 26." })
    .transform(Number)
    .refine((v) => v >= 1 && v <= 26, { error: "Choose how many weeks, from 1 to 26." }),
);

export const createBookingSchema = z
  .object({
    aircraftId: id("an aircraft"),
    repeatWeeks,
    /** An instructor booking for a student; empty = the person signed in. */
    memberId: optionalId,
    purpose: optionalText("the purpose", 200),
    carryingPassengers: checkbox,
    ...windowFields,
  })
  .superRefine(endAfterStart);

export const changeBookingSchema = z
  .object({
    bookingId: id("a booking"),
    ...windowFields,
  })
  .superRefine(endAfterStart);

export const cancelBookingSchema = z.object({
  bookingId: id("a booking"),
  reason: optionalText("the reason", 300),
});

/** "Cancel this and the later weeks" of a weekly series, from one of its bookings. */
export const cancelSeriesSchema = z.object({
  bookingId: id("a booking"),
  reason: optionalText("the reason", 300),
});

const clockTime = (label: string) =>
  z
    .string({ error: `Enter ${label} as HH:MM on a 24-hour clock, like 09:30.` })
    .trim()
    .regex(/^([01]\d|2[0-3]):[0-5]\d$/, { error: `Enter ${label} as HH:MM on a 24-hour clock, like 09:30.` });

/**
 * "Move this and the later weeks": new club times of day for this week and each later one, each
 * on its own date. The end is on the same day, after the start.
 */
export const moveSeriesSchema = z
  .object({
    bookingId: id("a booking"),
    startTime: clockTime("the new start"),
    endTime: clockTime("the new end"),
    acceptedGuards,
  })
  .superRefine((v, ctx) => {
    if (v.endTime <= v.startTime) ctx.addIssue({ code: "custom", path: ["endTime"], message: "The end must be after the start, on the same day." });
  });

export const beginFlightSchema = z
  .object({
    bookingId: id("a booking"),
    preflightRecordId: id("the preflight record"),
    confirmPreflight: checkbox,
    acceptFindings: checkbox,
    /** The pilot read the aircraft's limitations again and will fly within them (14 CFR 91.213(d)). */
    acceptLimitations: checkbox,
  })
  .superRefine((v, ctx) => {
    if (!v.confirmPreflight) ctx.addIssue({ code: "custom", path: ["confirmPreflight"], message: "Confirm that you did this preflight and that the record is yours." });
  });

const count = (label: string) =>
  z.preprocess(
    (v) => (v === undefined || v === "" ? "0" : v),
    z
      .string()
      .trim()
      .refine((v) => /^\d+$/.test(v), { error: `Enter ${label} as a whole number.` })
      .transform(Number)
      .refine((v) => v <= 99, { error: `${label[0]!.toUpperCase()}${label.slice(1)} must be at most 99.` }),
  );

const quantity = (label: string) =>
  z.preprocess(
    (v) => (v === undefined || v === "" ? "0" : v),
    z
      .string()
      .trim()
      .refine((v) => /^\d+(\.\d{1,2})?$/.test(v), { error: `Enter ${label} as a number, like 12.5 (0 when none).` })
      .transform(Number)
      .refine((v) => v <= 2000, { error: `${label[0]!.toUpperCase()}${label.slice(1)} must be at most 2000.` }),
  );

const optionalFuel = (label: string) =>
  z.preprocess(
    blankToUndefined,
    z
      .string()
      .trim()
      .refine((v) => /^\d+(\.\d{1,2})?$/.test(v), { error: `Enter ${label} as a number, like 18.5, or leave it empty.` })
      .transform(Number)
      .refine((v) => v <= 2000, { error: `${label[0]!.toUpperCase()}${label.slice(1)} must be at most 2000.` })
      .optional(),
  ).transform((v) => v ?? null);

const optionalClock = (label: string) =>
  z.preprocess(
    blankToUndefined,
    z.string().trim().regex(/^([01]\d|2[0-3]):[0-5]\d$/, { error: `Enter ${label} as HH:MM on a 24-hour clock, like 14:05, or leave it empty.` }).optional(),
  ).transform((v) => v ?? null);

/** The flight sheet: two columns, Out | In (Hobbs, tach, fuel on board, time), then landings and the rest. */
export const flightSheetSchema = z
  .object({
    bookingId: id("a booking"),
    hobbsOut: hoursField("Hobbs out"),
    hobbsIn: hoursField("Hobbs in"),
    tachOut: hoursField("tach out"),
    tachIn: hoursField("tach in"),
    dayLandings: count("the day landings"),
    /** 14 CFR 61.57(a)(1)(ii): full stops count for a tailwheel airplane; empty = not recorded. */
    dayFullStopLandings: optionalCountField("the day full-stop landings"),
    nightFullStopLandings: count("the night full-stop landings"),
    fuelAdded: quantity("the fuel added"),
    oilAdded: quantity("the oil added"),
    squawk: optionalText("the squawk", 2000),
    notes: optionalText("the notes", 1000),
    meterExplanation: optionalText("the explanation of the meter readings", 1000),
    fuelOut: optionalFuel("the fuel on board out"),
    fuelIn: optionalFuel("the fuel on board in"),
    timeOut: optionalClock("the time out"),
    timeIn: optionalClock("the time in"),
  })
  .superRefine((v, ctx) => {
    if (v.hobbsIn < v.hobbsOut) ctx.addIssue({ code: "custom", path: ["hobbsIn"], message: "Hobbs in cannot be less than Hobbs out." });
    if (v.tachIn < v.tachOut) ctx.addIssue({ code: "custom", path: ["tachIn"], message: "Tach in cannot be less than tach out." });
    if (v.hobbsIn - v.hobbsOut > 24) ctx.addIssue({ code: "custom", path: ["hobbsIn"], message: "More than 24 h on one flight: check the Hobbs readings." });
    if (v.tachIn - v.tachOut > 24) ctx.addIssue({ code: "custom", path: ["tachIn"], message: "More than 24 h on one flight: check the tach readings." });
    if (v.dayLandings + v.nightFullStopLandings === 0) ctx.addIssue({ code: "custom", path: ["dayLandings"], message: "Enter the landings: at least one, day or night." });
    if (v.dayFullStopLandings !== null && v.dayFullStopLandings > v.dayLandings) ctx.addIssue({ code: "custom", path: ["dayFullStopLandings"], message: "Full-stop day landings are part of the day landings: enter no more than the day landings." });
    if (v.squawk !== null && v.squawk.length < 5) ctx.addIssue({ code: "custom", path: ["squawk"], message: "Describe the squawk in a few words (at least 5 characters), or leave it empty." });
  });

/**
 * The calendar link: make one (or see the one there is), replace it, or turn it off. Replacing and
 * turning off stop every calendar using the current link, so both need the confirmation box ticked.
 */
export const feedTokenSchema = z
  .object({
    intent: z.enum(["create", "rotate", "revoke"], { error: "Choose what to do with the calendar link." }),
    confirm: z.literal("yes", { error: "Tick the box to confirm." }).optional(),
  })
  .refine((v) => v.intent === "create" || v.confirm === "yes", {
    path: ["confirm"],
    message: "Tick the box to confirm that calendars using the current link will stop updating.",
  });

/** Query of the fleet views and the JSON list: a day or a week around a date. */
export const bookingRangeSchema = z.object({
  view: z.enum(["day", "week"]).default("week"),
  date: calendarDate("the date", "Give the date as YYYY-MM-DD.").optional(),
});

/** A maintenance block on an aircraft: a span in club time and the reason, shown to members. */
export const createBlockSchema = z
  .object({
    aircraftId: id("an aircraft"),
    startsAt: localDateTime("the start"),
    endsAt: localDateTime("the end"),
    reason: z
      .string({ error: "Say why the aircraft is blocked." })
      .trim()
      .min(3, { error: "Say why the aircraft is blocked (at least 3 characters)." })
      .max(200, { error: "Keep the reason to 200 characters." }),
  })
  .superRefine(endAfterStart);

export const removeBlockSchema = z.object({ blockId: id("a maintenance block") });

/** A window in which the instructor signed in is available to fly with members. */
export const createAvailabilitySchema = z
  .object({
    startsAt: localDateTime("the start"),
    endsAt: localDateTime("the end"),
    repeatWeeks,
  })
  .superRefine(endAfterStart);

export const removeAvailabilitySchema = z.object({ availabilityId: id("an available time") });

/** The booking page's days: from a date (default today), a few days at a time. */
export const bookingDaysSchema = z.object({
  from: calendarDate("the first day", "Give the date as YYYY-MM-DD.").optional(),
  days: z.enum(["3", "7", "14"]).default("3").transform(Number),
});

export type CreateBookingInput = z.output<typeof createBookingSchema>;
export type ChangeBookingInput = z.output<typeof changeBookingSchema>;
export type MoveSeriesInput = z.output<typeof moveSeriesSchema>;
export type FlightSheetInput = z.output<typeof flightSheetSchema>;
