import { z } from "zod";
import { CLUB_LOCALES, isClubLocale } from "@/lib/money/locale";

const guard = z.enum(["refuse", "warn"]);

export const clubSettingsSchema = z.object({
  /** An item due within this many days is flagged "due soon" (a reason, never a status). */
  dueSoonDays: z.number().int().min(0).max(365).default(30),
  dueSoonHours: z.number().min(0).max(200).default(10),
  /** Club's own recency rule: flown the type group within N days, else a check flight. */
  recencyDaysInType: z.number().int().min(1).max(365).default(90),
  /** Extra VFR reserve beyond 14 CFR 91.151 (minutes); 0 keeps the regulation's minimum. */
  extraReserveMinutes: z.number().int().min(0).max(120).default(0),
  documentReminderDays: z.number().int().min(0).max(180).default(30),
  lateFeeAfterDays: z.number().int().min(0).max(180).default(30),
  lateCancellationHours: z.number().int().min(0).max(168).default(24),
  oilChangeHours: z.number().min(1).max(200).default(50),
  oilChangeMonths: z.number().int().min(1).max(24).default(4),
  /**
   * The home field's position (decimal degrees, north and east positive), for sunrise and
   * sunset: night as 14 CFR 61.57(b) counts it. Null until an admin records it; then night
   * cannot be computed and the booking guard says so.
   */
  homeLatitude: z.number().min(-90).max(90).nullable().default(null),
  homeLongitude: z.number().min(-180).max(180).nullable().default(null),
  /** The club's flying day in club time ("HH:MM"): the booking page lists free time inside it. */
  flyingDayOpens: z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/).default("07:00"),
  flyingDayCloses: z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/).default("21:00"),
  bookingGuards: z
    .object({
      grounded: guard.default("refuse"),
      inspectionDue: guard.default("refuse"),
      notCheckedOut: guard.default("refuse"),
      notCurrent: guard.default("warn"),
      /** 14 CFR 61.56(c): no flight review, no acting as pilot in command. */
      flightReview: guard.default("refuse"),
      medicalExpired: guard.default("refuse"),
      inArrears: guard.default("warn"),
    })
    .prefault({}),
});

export type ClubSettings = z.infer<typeof clubSettingsSchema>;

export function defaultClubSettings(overrides: Partial<ClubSettings> = {}): ClubSettings {
  return clubSettingsSchema.parse(overrides);
}

const blank = (v: unknown) => v === undefined || v === null || (typeof v === "string" && v.trim() === "");

function coordinate(label: string, limit: number) {
  return z.preprocess(
    (v) => (blank(v) ? null : typeof v === "string" ? v.trim() : v),
    z
      .union([
        z.null(),
        z
          .string()
          .refine((v) => /^-?\d{1,3}(\.\d{1,7})?$/.test(v), { error: `Enter the ${label} in decimal degrees, like ${limit === 90 ? "41.9732" : "-87.9073"}.` })
          .transform(Number)
          .refine((v) => Math.abs(v) <= limit, { error: `The ${label} must be between −${limit} and ${limit} degrees.` }),
      ])
      .optional(),
  ).transform((v) => v ?? null);
}

/**
 * The home field's position, for sunrise and sunset (night under 14 CFR 61.57(b)). Both or
 * neither: clearing both makes night "cannot be computed" again.
 */
export const homePositionSchema = z
  .object({
    homeLatitude: coordinate("latitude", 90),
    homeLongitude: coordinate("longitude", 180),
  })
  .superRefine((v, ctx) => {
    if ((v.homeLatitude === null) !== (v.homeLongitude === null)) {
      const path = v.homeLatitude === null ? "homeLatitude" : "homeLongitude";
      ctx.addIssue({ code: "custom", path: [path], message: "Enter both the latitude and the longitude, or clear both." });
    }
  });

const clock = (what: string) =>
  z
    .string({ error: `Enter the time the flying day ${what}, as HH:MM (24-hour club time).` })
    .trim()
    .regex(/^([01]\d|2[0-3]):[0-5]\d$/, `Enter the time the flying day ${what} as HH:MM on the 24-hour clock, e.g. 07:30.`);

/** The club's flying day in club time: the booking page's day. Closing at or before opening runs past midnight. */
export const flyingDaySchema = z
  .object({ flyingDayOpens: clock("opens"), flyingDayCloses: clock("closes") })
  .superRefine((v, ctx) => {
    if (v.flyingDayOpens === v.flyingDayCloses) ctx.addIssue({ code: "custom", path: ["flyingDayCloses"], message: "The flying day cannot open and close at the same time." });
  });

/** The club's locale: one of the tags the settings page offers (lib/money/locale.ts). */
export const clubLocaleSchema = z.object({
  locale: z
    .string({ error: "Choose how the club writes money, numbers and dates." })
    .trim()
    .refine(isClubLocale, { error: `Choose one of the listed locales (${CLUB_LOCALES.slice(0, 3).map((l) => l.tag).join(", ")} …).` }),
});
