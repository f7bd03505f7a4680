import "server-only";
import { and, desc, eq } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { medicalCertificates, memberDocuments, memberPrivateRecords, uploads, type MedicalCertificate, type MemberDocument } from "@/db/schema";

type Reader = Db | Tx;

export type DocumentRow = MemberDocument & { fileName: string | null };

/** A member's documents, newest first (history kept: a renewal is a new row). */
export function listMemberDocuments(db: Reader, clubId: string, userId: string): DocumentRow[] {
  return db
    .select({ doc: memberDocuments, fileName: uploads.originalName })
    .from(memberDocuments)
    .leftJoin(uploads, and(eq(uploads.id, memberDocuments.uploadId), eq(uploads.clubId, memberDocuments.clubId)))
    .where(and(eq(memberDocuments.clubId, clubId), eq(memberDocuments.userId, userId)))
    .orderBy(desc(memberDocuments.issuedOn), desc(memberDocuments.createdAt))
    .all()
    .map((r) => ({ ...r.doc, fileName: r.fileName }));
}

export function getMemberDocument(db: Reader, clubId: string, documentId: string): DocumentRow | undefined {
  const r = db
    .select({ doc: memberDocuments, fileName: uploads.originalName })
    .from(memberDocuments)
    .leftJoin(uploads, and(eq(uploads.id, memberDocuments.uploadId), eq(uploads.clubId, memberDocuments.clubId)))
    .where(and(eq(memberDocuments.clubId, clubId), eq(memberDocuments.id, documentId)))
    .get();
  return r ? { ...r.doc, fileName: r.fileName } : undefined;
}

export function listClubDocuments(db: Reader, clubId: string): MemberDocument[] {
  return db.select().from(memberDocuments).where(eq(memberDocuments.clubId, clubId)).all();
}

export function listMedicals(db: Reader, clubId: string, userId: string): MedicalCertificate[] {
  return db
    .select()
    .from(medicalCertificates)
    .where(and(eq(medicalCertificates.clubId, clubId), eq(medicalCertificates.userId, userId)))
    .orderBy(desc(medicalCertificates.examDate), desc(medicalCertificates.createdAt))
    .all();
}

/** The medical that counts: the one with the latest exam. */
export function getCurrentMedical(db: Reader, clubId: string, userId: string): MedicalCertificate | undefined {
  return listMedicals(db, clubId, userId)[0];
}

export function listClubMedicals(db: Reader, clubId: string): MedicalCertificate[] {
  return db.select().from(medicalCertificates).where(eq(medicalCertificates.clubId, clubId)).orderBy(desc(medicalCertificates.examDate), desc(medicalCertificates.createdAt)).all();
}

/** Only ever read for the member themselves (their own page, their own medical form). */
export function getOwnBirthDate(db: Reader, clubId: string, userId: string): string | null {
  return db.select({ birthDate: memberPrivateRecords.birthDate }).from(memberPrivateRecords).where(and(eq(memberPrivateRecords.clubId, clubId), eq(memberPrivateRecords.userId, userId))).get()?.birthDate ?? null;
}

export function saveOwnBirthDate(tx: Tx | Db, clubId: string, userId: string, birthDate: string): void {
  tx.insert(memberPrivateRecords)
    .values({ clubId, userId, birthDate })
    .onConflictDoUpdate({ target: [memberPrivateRecords.clubId, memberPrivateRecords.userId], set: { birthDate, updatedAt: new Date() } })
    .run();
}
