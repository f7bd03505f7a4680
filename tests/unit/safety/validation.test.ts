import { describe, expect, it } from "vitest";
import { createBulletinSchema, fileReportSchema, outsideFlightSchema, recordCheckoutSchema, recordDocumentSchema, recordMedicalSchema } from "@/lib/validation/safety";

const errorsOf = (r: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) =>
  Object.fromEntries((r.error?.issues ?? []).map((i) => [i.path.join("."), i.message]));

describe("safety form schemas", () => {
  it("a bulletin for a type group needs the group; bad dates and urgencies get their own messages", () => {
    const r = createBulletinSchema.safeParse({ title: "Hi", bodyMarkdown: "short", urgency: "panic", audience: "type_group", acknowledgeBy: "2026-02-30", intent: "publish" });
    const e = errorsOf(r);
    expect(e.title).toMatch(/at least 3/);
    expect(e.bodyMarkdown).toMatch(/10 characters/);
    expect(e.urgency).toMatch(/how urgent/);
    expect(e.acknowledgeBy).toMatch(/YYYY-MM-DD/);
  });

  it("accepts a good bulletin and treats an empty file input as no file", () => {
    const r = createBulletinSchema.safeParse({ title: "Brakes", bodyMarkdown: "Hold each pedal five seconds.", urgency: "priority", audience: "type_group", audienceTypeGroup: "Fernwhistle F160", acknowledgeBy: "", intent: "draft", attachment: new File([], "") });
    expect(r.success).toBe(true);
    expect(r.data?.attachment).toBeUndefined();
    expect(r.data?.acknowledgeBy).toBeUndefined();
    // How an untouched file input arrives through a server action: an empty blob named "undefined".
    const viaAction = createBulletinSchema.safeParse({ title: "Brakes", bodyMarkdown: "Hold each pedal five seconds.", urgency: "routine", audience: "everyone", intent: "draft", attachment: new File([], "undefined") });
    expect(viaAction.data?.attachment).toBeUndefined();
    // A file the person chose that happens to be empty is kept, to be refused by name later.
    const chosenEmpty = createBulletinSchema.safeParse({ title: "Brakes", bodyMarkdown: "Hold each pedal five seconds.", urgency: "routine", audience: "everyone", intent: "draft", attachment: new File([], "notes.pdf") });
    expect(chosenEmpty.data?.attachment?.name).toBe("notes.pdf");
    const missingGroup = createBulletinSchema.safeParse({ title: "Brakes", bodyMarkdown: "Hold each pedal five seconds.", urgency: "priority", audience: "type_group", intent: "draft" });
    expect(errorsOf(missingGroup).audienceTypeGroup).toMatch(/type group/);
  });

  it("a report reads the anonymous checkbox and the factors list", () => {
    const r = fileReportSchema.safeParse({ occurredOn: "2026-01-05", location: "Tie-downs", whatHappened: "Water in the left sump sample twice.", contributingFactors: "weather", anonymous: "on" });
    expect(r.success && r.data).toMatchObject({ anonymous: true, contributingFactors: ["weather"] });
    const bad = fileReportSchema.safeParse({ occurredOn: "yesterday", occurredTime: "25:00", location: "", whatHappened: "short", contributingFactors: ["aliens"] });
    const e = errorsOf(bad);
    expect(Object.keys(e).sort()).toEqual(["contributingFactors.0", "location", "occurredOn", "occurredTime", "whatHappened"]);
    expect(fileReportSchema.safeParse({ occurredOn: "2026-01-05", location: "Ramp", whatHappened: "Something long enough to count." }).data?.anonymous).toBe(false);
  });

  it("documents: insurance needs an end date, and expiry cannot precede issue", () => {
    expect(errorsOf(recordDocumentSchema.safeParse({ kind: "renters_insurance", issuedOn: "2026-01-01" })).expiresOn).toMatch(/policy ends/);
    expect(errorsOf(recordDocumentSchema.safeParse({ kind: "club_agreement", issuedOn: "2026-01-01", expiresOn: "2025-01-01" })).expiresOn).toMatch(/before the issue/);
  });

  it("medicals: a class for a certificate, a course date for BasicMed, birth before the exam", () => {
    expect(errorsOf(recordMedicalSchema.safeParse({ kind: "faa_class", examDate: "2026-01-01" })).medicalClass).toMatch(/class 1, 2 or 3/);
    expect(errorsOf(recordMedicalSchema.safeParse({ kind: "basicmed", examDate: "2026-01-01" })).courseDate).toMatch(/BasicMed course/);
    expect(errorsOf(recordMedicalSchema.safeParse({ kind: "faa_class", medicalClass: "3", examDate: "2026-01-01", birthDate: "2026-02-01" })).birthDate).toMatch(/before the exam/);
    expect(recordMedicalSchema.safeParse({ kind: "faa_class", medicalClass: "2", examDate: "2026-01-01" }).data?.medicalClass).toBe(2);
  });

  it("outside flights and checkouts", () => {
    expect(errorsOf(outsideFlightSchema.safeParse({ flownOn: "2026-01-01", aircraftDescription: "Rental", dayLandings: "-1", nightFullStopLandings: "1.5" }))).toMatchObject({
      dayLandings: expect.stringMatching(/negative/),
      nightFullStopLandings: expect.stringMatching(/whole number/),
    });
    expect(outsideFlightSchema.safeParse({ flownOn: "2026-01-01", aircraftDescription: "Rental", category: "Airplane", classRating: "Single-engine land", dayLandings: "3", nightFullStopLandings: "" }).data).toMatchObject({ dayLandings: 3, nightFullStopLandings: 0, dayFullStopLandings: null, tailwheel: false });
    // 14 CFR 61.57(a)(1)(i): the category and class decide what the landings count toward.
    expect(errorsOf(outsideFlightSchema.safeParse({ flownOn: "2026-01-01", aircraftDescription: "Rental", dayLandings: "3" }))).toMatchObject({ category: expect.stringMatching(/category/), classRating: expect.stringMatching(/class/) });
    expect(errorsOf(outsideFlightSchema.safeParse({ flownOn: "2026-01-01", aircraftDescription: "Rental", category: "Airplane", classRating: "Single-engine land", dayLandings: "2", dayFullStopLandings: "3" }))).toMatchObject({ dayFullStopLandings: expect.stringMatching(/no more than the day landings/) });
    expect(errorsOf(recordCheckoutSchema.safeParse({ userId: "", typeGroup: "", checkedOutOn: "", instructorCertificateNumber: "" }))).toMatchObject({
      userId: expect.stringMatching(/member/),
      typeGroup: expect.stringMatching(/type group/),
      checkedOutOn: expect.stringMatching(/date/),
      instructorCertificateNumber: expect.stringMatching(/certificate number/),
    });
  });
});
