import { z } from "zod";

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
