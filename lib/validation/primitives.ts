import { z } from "zod";
import { MAX_CALENDAR_YEAR, MIN_CALENDAR_YEAR, isIsoDate, isIsoDateInRange } from "@/lib/dates";

// Bounded building blocks every schema (actions, route handlers, page queries) shares, so that a
// date, a month or a record id means the same thing and has the same limits everywhere.

export const DATE_YEARS = `${MIN_CALENDAR_YEAR} and ${MAX_CALENDAR_YEAR}`;

/** The message for a real calendar date outside the product's years. */
export function dateOutOfRange(label: string): string {
  return `Enter ${label} between ${DATE_YEARS}.`;
}

/**
 * A calendar date "YYYY-MM-DD" (a real day: no 2026-02-30) within MIN_CALENDAR_YEAR..MAX_CALENDAR_YEAR.
 * `formatMessage` keeps each area's own words for a value that is not a date at all.
 */
export function calendarDate(label: string, formatMessage: string) {
  return z
    .string({ error: `Enter ${label}.` })
    .trim()
    .superRefine((v, ctx) => {
      if (!isIsoDate(v)) ctx.addIssue({ code: "custom", message: formatMessage });
      else if (!isIsoDateInRange(v)) ctx.addIssue({ code: "custom", message: dateOutOfRange(label) });
    });
}

/** "YYYY-MM-DDTHH:MM" as a datetime-local field sends it: a real day and a real time. */
export function isLocalDateTime(v: string): boolean {
  return /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/.test(v) && isIsoDate(v.slice(0, 10)) && Number(v.slice(11, 13)) < 24 && Number(v.slice(14, 16)) < 60;
}

/** A club-local date and time within the product's years; `formatMessage` for anything else. */
export function localDateTimeField(label: string, formatMessage: string) {
  return z
    .string({ error: `Enter ${label}.` })
    .trim()
    .min(1, { error: `Enter ${label}.` })
    .superRefine((v, ctx) => {
      if (!isLocalDateTime(v)) ctx.addIssue({ code: "custom", message: formatMessage });
      else if (!isIsoDateInRange(v.slice(0, 10))) ctx.addIssue({ code: "custom", message: dateOutOfRange(label) });
    });
}

/** A month "YYYY-MM" within the product's years. */
export function isMonthInRange(v: string): boolean {
  return /^\d{4}-(0[1-9]|1[0-2])$/.test(v) && isIsoDateInRange(`${v}-01`);
}

/** A month "YYYY-MM" within the product's years; `formatMessage` for anything that is not a month. */
export function calendarMonth(formatMessage: string) {
  return z
    .string({ error: formatMessage })
    .trim()
    .superRefine((v, ctx) => {
      if (!/^\d{4}-(0[1-9]|1[0-2])$/.test(v)) ctx.addIssue({ code: "custom", message: formatMessage });
      else if (!isMonthInRange(v)) ctx.addIssue({ code: "custom", message: `Choose a month between ${DATE_YEARS}.` });
    });
}

/** Record ids are generated (UUIDs); anything else that reaches a lookup is at least short and plain. */
export const RECORD_ID = /^[A-Za-z0-9][A-Za-z0-9_-]{0,63}$/;

export function isRecordId(v: unknown): v is string {
  return typeof v === "string" && RECORD_ID.test(v);
}

/** A required record id; every problem (missing, too long, odd characters) has the field's one message. */
export function recordId(message: string) {
  return z.string({ error: message }).trim().regex(RECORD_ID, { error: message });
}
