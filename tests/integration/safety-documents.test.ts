import { beforeAll, describe, expect, it } from "vitest";
import fs from "node:fs";
import { eq } from "drizzle-orm";
import { GET as documentRoute } from "@/app/api/clubs/[club]/documents/[documentId]/route";
import { GET as medicalRoute } from "@/app/api/clubs/[club]/documents/medical/[userId]/route";
import { POST as remindersRoute } from "@/app/api/clubs/[club]/documents/reminders/route";
import { GET as documentsRoute } from "@/app/api/clubs/[club]/documents/route";
import { GET as uploadRoute } from "@/app/api/clubs/[club]/uploads/[uploadId]/route";
import { auditLog, emailOutbox, medicalCertificates, memberDocuments, memberPrivateRecords, uploads, users } from "@/db/schema";
import { recordDocument } from "@/lib/actions/documents/record-document";
import { recordMedical } from "@/lib/actions/documents/record-medical";
import { isoDateInTimeZone, addDays } from "@/lib/dates";
import { uploadDir } from "@/lib/storage";
import { EMPTY, db, form, seedOnce, signInAs } from "./helpers";
import { callRoute, fakePngFile, oversizeJpegFile, pngFile } from "./fleet-helpers";

const CLUB = "reedwater";
const userId = (email: string) => db().select().from(users).where(eq(users.email, email)).get()!.id;
const storedFiles = () => (fs.existsSync(uploadDir()) ? fs.readdirSync(uploadDir()).length : 0);
const pdfFile = () => new File([Buffer.from("%PDF-1.4\n1 0 obj << >> endobj\ntrailer << >>\n%%EOF\n")], "certificate.pdf", { type: "application/pdf" });
const today = () => isoDateInTimeZone(new Date(), "America/Chicago");

describe("member documents and medicals", () => {
  let lakeDocId = "";
  let cottonwoodDocId = "";
  let cottonwoodUploadId = "";

  beforeAll(async () => {
    await seedOnce();
  });

  it("a member records a document with a scan; the file belongs to them", async () => {
    signInAs("member@hangarline.test");
    const state = await recordDocument(EMPTY, form({ club: CLUB, kind: "pilot_certificate", issuedOn: "2021-05-14", reference: "PP-0041187", details: "Private pilot ASEL", file: pdfFile() }));
    expect(state.ok).toBe(true);
    lakeDocId = (state.data as { documentId: string }).documentId;
    const doc = db().select().from(memberDocuments).where(eq(memberDocuments.id, lakeDocId)).get()!;
    expect(doc).toMatchObject({ userId: userId("member@hangarline.test"), kind: "pilot_certificate", expiresOn: null });
    expect(db().select().from(uploads).where(eq(uploads.id, doc.uploadId!)).get()).toMatchObject({ subjectType: "MemberDocument", subjectId: lakeDocId, ownerUserId: userId("member@hangarline.test"), mimeType: "application/pdf" });
    // 14 CFR 61.56(c): a review on 2025-03-15 is good through 2027-03-31, computed, not typed.
    const review = await recordDocument(EMPTY, form({ club: CLUB, kind: "flight_review", issuedOn: "2025-03-15", details: "Imani Ostrowski" }));
    const reviewRow = db().select().from(memberDocuments).where(eq(memberDocuments.id, (review.data as { documentId: string }).documentId)).get()!;
    expect(reviewRow.expiresOn).toBe("2027-03-31");
  });

  it("a bad upload is refused with a field message and nothing is stored — no row, no bytes", async () => {
    signInAs("member@hangarline.test");
    const before = { docs: db().select().from(memberDocuments).all().length, rows: db().select().from(uploads).all().length, files: storedFiles() };
    const fake = await recordDocument(EMPTY, form({ club: CLUB, kind: "pilot_certificate", issuedOn: "2021-05-14", file: fakePngFile() }));
    expect(fake.ok).toBe(false);
    expect(fake.fieldErrors.file?.[0]).toMatch(/"photo.png" is not a .*checked by its content/);
    const huge = await recordDocument(EMPTY, form({ club: CLUB, kind: "pilot_certificate", issuedOn: "2021-05-14", file: oversizeJpegFile() }));
    expect(huge.fieldErrors.file?.[0]).toMatch(/the limit is 10 MB/);
    // A good file with a bad date: refused before any byte is written.
    const badDate = await recordDocument(EMPTY, form({ club: CLUB, kind: "pilot_certificate", issuedOn: "2199-01-01", file: pngFile() }));
    expect(badDate.fieldErrors.issuedOn).toEqual(["The date cannot be in the future."]);
    expect({ docs: db().select().from(memberDocuments).all().length, rows: db().select().from(uploads).all().length, files: storedFiles() }).toEqual(before);
  });

  it("documents from another club are a 404, exactly like missing ones", async () => {
    signInAs("cottonwood.pilot@hangarline.test");
    const state = await recordDocument(EMPTY, form({ club: "cottonwood-flyers", kind: "club_agreement", issuedOn: "2024-03-01", file: pngFile("agreement.png") }));
    cottonwoodDocId = (state.data as { documentId: string }).documentId;
    cottonwoodUploadId = db().select().from(memberDocuments).where(eq(memberDocuments.id, cottonwoodDocId)).get()!.uploadId!;
    expect((await callRoute(documentRoute, "/x", { club: "cottonwood-flyers", documentId: cottonwoodDocId })).status).toBe(200);

    signInAs("admin@hangarline.test"); // reads every Reedwater document, no role at Cottonwood
    expect((await callRoute(documentRoute, "/x", { club: CLUB, documentId: cottonwoodDocId })).status).toBe(404);
    expect((await callRoute(documentRoute, "/x", { club: "cottonwood-flyers", documentId: cottonwoodDocId })).status).toBe(404);
    expect((await callRoute(uploadRoute, "/x", { club: CLUB, uploadId: cottonwoodUploadId })).status).toBe(404);
    expect((await callRoute(documentRoute, "/x", { club: CLUB, documentId: "no-such-document" })).status).toBe(404);
    expect((await callRoute(documentRoute, "/x", { club: CLUB, documentId: lakeDocId })).status).toBe(200);
  });

  it("members read only their own documents; instructors read everyone's", async () => {
    signInAs("pilot2@hangarline.test");
    expect((await callRoute(documentRoute, "/x", { club: CLUB, documentId: lakeDocId })).status).toBe(404);
    expect((await callRoute(documentsRoute, `/api/clubs/${CLUB}/documents?userId=${userId("member@hangarline.test")}`, { club: CLUB })).status).toBe(404);
    const doc = db().select().from(memberDocuments).where(eq(memberDocuments.id, lakeDocId)).get()!;
    expect((await callRoute(uploadRoute, "/x", { club: CLUB, uploadId: doc.uploadId! })).status).toBe(404);
    signInAs("instructor@hangarline.test");
    const list = await callRoute(documentsRoute, `/api/clubs/${CLUB}/documents?userId=${userId("member@hangarline.test")}`, { club: CLUB });
    expect(list.status).toBe(200);
    expect((list.body as { documents: { id: string }[] }).documents.map((d) => d.id)).toContain(lakeDocId);
  });

  it("a medical needs a birth date, which stays on the member's private record and out of the audit log", async () => {
    signInAs("member@hangarline.test");
    const missing = await recordMedical(EMPTY, form({ club: CLUB, kind: "faa_class", medicalClass: "3", examDate: "2025-05-10" }));
    expect(missing.fieldErrors.birthDate?.[0]).toMatch(/date of birth/);
    // 14 CFR 61.23(d): under 40 on the exam date (born 1991) → 60 calendar months → 2030-05-31.
    const ok = await recordMedical(EMPTY, form({ club: CLUB, kind: "faa_class", medicalClass: "3", examDate: "2025-05-10", birthDate: "1991-08-17", limitations: "Corrective lenses" }));
    expect(ok).toMatchObject({ ok: true, message: "Medical recorded: valid for private-pilot privileges through 2030-05-31." });
    expect(db().select().from(memberPrivateRecords).where(eq(memberPrivateRecords.userId, userId("member@hangarline.test"))).get()?.birthDate).toBe("1991-08-17");
    const cols = (db().$client.prepare("pragma table_info(medical_certificates)").all() as { name: string }[]).map((c) => c.name);
    expect(cols).not.toContain("birth_date");
    expect(JSON.stringify(db().select().from(auditLog).where(eq(auditLog.action, "medical.record")).all())).not.toContain("1991-08-17");
  });

  it("a member cannot read another's medical; the safety officer sees the expiry only; admins the details, never the birth date", async () => {
    const memberId = userId("member@hangarline.test");
    const get = () => callRoute(medicalRoute, `/api/clubs/${CLUB}/documents/medical/${memberId}`, { club: CLUB, userId: memberId });
    signInAs("pilot2@hangarline.test");
    expect((await get()).status).toBe(404);
    signInAs("safety@hangarline.test");
    expect(await get()).toEqual({ status: 200, body: { medical: { level: "expiry", expiresOn: "2030-05-31" } } });
    signInAs("admin@hangarline.test");
    const admin = await get();
    expect(admin.body).toMatchObject({ medical: { level: "full", medicalClass: 3, examDate: "2025-05-10", limitations: "Corrective lenses" } });
    expect(JSON.stringify(admin.body)).not.toContain("1991-08-17");
    signInAs("member@hangarline.test");
    expect((await get()).body).toMatchObject({ medical: { level: "full", birthDate: "1991-08-17" } });
    signInAs("cottonwood.admin@hangarline.test");
    expect((await callRoute(medicalRoute, "/x", { club: "cottonwood-flyers", userId: memberId })).status).toBe(404);
  });

  it("expiry reminders go through the outbox once per expiry date, within the club's window", async () => {
    signInAs("pilot2@hangarline.test");
    const ends = addDays(today(), 20); // inside the default 30-day documentReminderDays
    await recordDocument(EMPTY, form({ club: CLUB, kind: "renters_insurance", issuedOn: addDays(today(), -300), expiresOn: ends, reference: "RI-1" }));
    await recordMedical(EMPTY, form({ club: CLUB, kind: "faa_class", medicalClass: "3", examDate: "2023-01-10", birthDate: "1966-11-21" })); // 24 months → lapsed 2025-01-31
    signInAs("member@hangarline.test");
    expect((await remindersRoute(new Request("http://app.test/x", { method: "POST" }), { params: Promise.resolve({ club: CLUB }) })).status).toBe(403);
    signInAs("safety@hangarline.test");
    const first = await remindersRoute(new Request("http://app.test/x", { method: "POST" }), { params: Promise.resolve({ club: CLUB }) });
    expect(await first.json()).toEqual({ queued: 2 });
    const mail = db().select().from(emailOutbox).where(eq(emailOutbox.template, "document-expiry")).all();
    expect(mail.map((m) => [m.toAddress, m.subject]).sort()).toEqual([
      ["pilot2@hangarline.test", "Medical expired on 2025-01-31"],
      ["pilot2@hangarline.test", `Renter's insurance expires on ${ends}`],
    ]);
    const again = await remindersRoute(new Request("http://app.test/x", { method: "POST" }), { params: Promise.resolve({ club: CLUB }) });
    expect(await again.json()).toEqual({ queued: 0 });
    expect(db().select().from(medicalCertificates).where(eq(medicalCertificates.userId, userId("pilot2@hangarline.test"))).get()?.reminderSentFor).toBe("2025-01-31");
  });
});
