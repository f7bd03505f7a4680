import { z } from "zod";
import { BULLETIN_AUDIENCES, BULLETIN_URGENCIES, DOCUMENT_KINDS, REPORT_STATUSES } from "@/lib/safety/kinds";
import { isIsoDate } from "@/lib/dates";
import { calendarDate, recordId } from "./primitives";
import { CONTRIBUTING_FACTORS } from "@/lib/safety/labels";
import { AIRCRAFT_CATEGORIES, AIRCRAFT_CLASSES } from "@/lib/currency/aircraft-class";

// Form fields arrive as strings; an empty text box means "not given".
const blankToUndefined = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);

export const isoDateField = (what: string) => calendarDate(what, `Enter ${what} as a date (YYYY-MM-DD).`);

const optionalDate = (what: string) => z.preprocess(blankToUndefined, isoDateField(what).optional());

const optionalText = (max: number, tooLong: string) => z.preprocess(blankToUndefined, z.string().trim().max(max, { error: tooLong }).optional());

const idField = recordId("Missing record id.");

const checkbox = z.preprocess((v) => v === "on" || v === "true" || v === "1" || v === true, z.boolean());

/** A file input: nothing chosen is "no file"; anything else is checked by its size and content later. */
export const optionalFile = z.preprocess(
  // A file input left empty arrives as a nameless (or "undefined"/"blob"-named) empty blob.
  (v) => (v instanceof Blob && !(v.size === 0 && ["", "undefined", "blob"].includes(String((v as File).name ?? ""))) ? v : undefined),
  z.custom<File>((v) => v instanceof Blob, { error: "Choose a file." }).optional(),
);

const typeGroupText = z.string().trim().min(1, { error: "Choose a type group." }).max(60, { error: "Use at most 60 characters for the type group." });

const bulletinFields = {
  title: z.string({ error: "Give the bulletin a title." }).trim().min(3, { error: "Give the bulletin a title of at least 3 characters." }).max(160, { error: "Keep the title to 160 characters." }),
  bodyMarkdown: z.string({ error: "Write the bulletin's text." }).trim().min(10, { error: "Write at least a sentence (10 characters or more)." }).max(20_000, { error: "Keep the text under 20,000 characters." }),
  urgency: z.enum(BULLETIN_URGENCIES, { error: "Choose how urgent the bulletin is." }),
  audience: z.enum(BULLETIN_AUDIENCES, { error: "Choose who the bulletin is for." }),
  audienceTypeGroup: z.preprocess(blankToUndefined, typeGroupText.optional()),
  acknowledgeBy: optionalDate("the acknowledgement deadline"),
  attachment: optionalFile,
};

// Cross-field checks run even when another field already failed, so every message shows at once;
// each check reads only the fields it names and tolerates their being malformed.
const always = { when: (payload: { value: unknown }) => typeof payload.value === "object" && payload.value !== null };
const dateOk = (v: unknown): v is string => typeof v === "string" && isIsoDate(v);

const needsTypeGroup = (v: { audience: string; audienceTypeGroup?: string }) => v.audience !== "type_group" || !!v.audienceTypeGroup;
const typeGroupIssue = { error: "Choose the type group this bulletin is for.", path: ["audienceTypeGroup"], ...always };

export const createBulletinSchema = z
  .object({
    ...bulletinFields,
    intent: z.enum(["draft", "publish"], { error: "Choose to save a draft or publish." }),
    /** Set when this is a revision of a published bulletin. */
    supersedesId: z.preprocess(blankToUndefined, idField.optional()),
    sourceReportId: z.preprocess(blankToUndefined, idField.optional()),
  })
  .refine(needsTypeGroup, typeGroupIssue);

export const updateDraftSchema = z
  .object({ ...bulletinFields, bulletinId: idField, intent: z.enum(["draft", "publish"], { error: "Choose to save a draft or publish." }) })
  .refine(needsTypeGroup, typeGroupIssue);

export const bulletinIdSchema = z.object({ bulletinId: idField });

const factorField = z.enum(CONTRIBUTING_FACTORS, { error: "Choose factors from the list." });

export const fileReportSchema = z.object({
  occurredOn: isoDateField("the date it happened"),
  occurredTime: z.preprocess(
    blankToUndefined,
    z.string().trim().regex(/^([01]\d|2[0-3]):[0-5]\d$/, { error: "Enter the time as HH:MM (24-hour), or leave it empty." }).optional(),
  ),
  location: z.string({ error: "Say where it happened." }).trim().min(2, { error: "Say where it happened (an airfield, an area, on the ground…)." }).max(200, { error: "Keep the place to 200 characters." }),
  aircraftId: z.preprocess(blankToUndefined, idField.optional()),
  whatHappened: z
    .string({ error: "Describe what happened." })
    .trim()
    .min(20, { error: "Describe what happened in a few sentences (20 characters or more)." })
    .max(10_000, { error: "Keep the description under 10,000 characters." }),
  contributingFactors: z
    .preprocess((v) => (v === undefined ? [] : Array.isArray(v) ? v : [v]), z.array(factorField))
    .transform((v) => [...new Set(v)]),
  factorsNote: optionalText(2000, "Keep the note on factors to 2,000 characters."),
  anonymous: checkbox,
});

export const triageReportSchema = z.object({
  reportId: idField,
  toStatus: z.enum(REPORT_STATUSES, { error: "Choose the report's new state." }),
  note: optionalText(4000, "Keep the note to 4,000 characters."),
});

export const reportNoteSchema = z.object({
  reportId: idField,
  note: z.string({ error: "Write the note." }).trim().min(3, { error: "Write the note (3 characters or more)." }).max(4000, { error: "Keep the note to 4,000 characters." }),
});

export const groundFromReportSchema = z.object({
  reportId: idField,
  aircraftId: recordId("Choose the aircraft to ground."),
  reason: z.string({ error: "Say why the aircraft is grounded." }).trim().min(10, { error: "Say why the aircraft is grounded (10 characters or more)." }).max(1000, { error: "Keep the reason to 1,000 characters." }),
});

export const recordDocumentSchema = z
  .object({
    kind: z.enum(DOCUMENT_KINDS, { error: "Choose the kind of document." }),
    reference: optionalText(80, "Keep the number to 80 characters."),
    details: optionalText(500, "Keep the details to 500 characters."),
    issuedOn: isoDateField("the date it was issued or done"),
    expiresOn: optionalDate("the expiry date"),
    file: optionalFile,
  })
  .refine((v) => v.kind !== "renters_insurance" || !!v.expiresOn, { error: "Enter the date the policy ends.", path: ["expiresOn"], ...always })
  .refine((v) => !dateOk(v.expiresOn) || !dateOk(v.issuedOn) || v.expiresOn >= v.issuedOn, { error: "The expiry date cannot be before the issue date.", path: ["expiresOn"], ...always });

export const recordMedicalSchema = z
  .object({
    kind: z.enum(["faa_class", "basicmed"], { error: "Choose a medical certificate or BasicMed." }),
    medicalClass: z.preprocess(blankToUndefined, z.coerce.number({ error: "Choose the class." }).int().min(1, { error: "Choose class 1, 2 or 3." }).max(3, { error: "Choose class 1, 2 or 3." }).optional()),
    examDate: isoDateField("the exam date"),
    courseDate: optionalDate("the BasicMed course date"),
    birthDate: optionalDate("your date of birth"),
    limitations: optionalText(500, "Keep the limitations to 500 characters."),
  })
  .refine((v) => v.kind !== "faa_class" || v.medicalClass !== undefined, { error: "Choose class 1, 2 or 3.", path: ["medicalClass"], ...always })
  .refine((v) => v.kind !== "basicmed" || !!v.courseDate, { error: "Enter the date you completed the BasicMed course.", path: ["courseDate"], ...always })
  .refine((v) => !dateOk(v.birthDate) || !dateOk(v.examDate) || v.birthDate < v.examDate, { error: "The date of birth must be before the exam date.", path: ["birthDate"], ...always });

export const birthDateSchema = z.object({ birthDate: isoDateField("your date of birth") });

const landingCount = (what: string) =>
  z.preprocess(
    (v) => (typeof v === "string" && v.trim() === "" ? 0 : v),
    z.coerce.number({ error: `Enter the number of ${what}.` }).int({ error: `Enter a whole number of ${what}.` }).min(0, { error: `The number of ${what} cannot be negative.` }).max(99, { error: `Enter at most 99 ${what}.` }),
  );

export const outsideFlightSchema = z
  .object({
    flownOn: isoDateField("the date of the flight"),
    aircraftDescription: z.string({ error: "Describe the aircraft." }).trim().min(2, { error: "Describe the aircraft (type and where you flew it)." }).max(120, { error: "Keep the aircraft to 120 characters." }),
    typeGroup: z.preprocess(blankToUndefined, typeGroupText.optional()),
    // 14 CFR 61.57(a)(1): landings count toward currency in the same category and class only.
    category: z.enum(AIRCRAFT_CATEGORIES, { error: "Choose the category of the aircraft you flew." }),
    classRating: z.enum(AIRCRAFT_CLASSES, { error: "Choose the class of the aircraft you flew." }),
    tailwheel: checkbox,
    dayLandings: landingCount("day landings"),
    // Empty: not recorded (counts no day landings toward tailwheel currency).
    dayFullStopLandings: z.preprocess((v) => (v === undefined || v === null || (typeof v === "string" && v.trim() === "") ? undefined : v), landingCount("day full-stop landings").optional()).transform((v) => v ?? null),
    nightFullStopLandings: landingCount("night full-stop landings"),
    note: optionalText(500, "Keep the note to 500 characters."),
  })
  .refine((v) => typeof v.dayFullStopLandings !== "number" || typeof v.dayLandings !== "number" || v.dayFullStopLandings <= v.dayLandings, {
    error: "Full-stop day landings are part of the day landings: enter no more than the day landings.",
    path: ["dayFullStopLandings"],
    ...always,
  });

/** Verifying a member's claim: which record, and the logbook page or certificate seen. */
export const verifyRecordSchema = z.object({
  kind: z.enum(["flight_review", "medical", "outside_flight"], { error: "Choose what is verified." }),
  recordId: idField,
  file: optionalFile,
  evidenceSeen: checkbox.refine((v) => v, { error: "Tick that you checked the record against the logbook page or certificate." }),
});

export const recordCheckoutSchema = z.object({
  userId: recordId("Choose the member."),
  typeGroup: typeGroupText,
  checkedOutOn: isoDateField("the checkout date"),
  instructorCertificateNumber: z
    .string({ error: "Enter your instructor certificate number." })
    .trim()
    .min(3, { error: "Enter your instructor certificate number." })
    .max(40, { error: "Keep the certificate number to 40 characters." }),
  conditions: optionalText(300, "Keep the conditions to 300 characters."),
});

export const revokeCheckoutSchema = z.object({
  checkoutId: idField,
  reason: z.string({ error: "Say why the checkout is revoked." }).trim().min(5, { error: "Say why the checkout is revoked (5 characters or more)." }).max(500, { error: "Keep the reason to 500 characters." }),
});

export type FileReportInput = z.infer<typeof fileReportSchema>;
