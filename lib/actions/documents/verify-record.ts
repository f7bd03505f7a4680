"use server";
import { and, eq } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { medicalCertificates, memberDocuments, outsideFlightEntries } from "@/db/schema";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { writeAudit } from "@/lib/server/audit";
import { verifyRecordSchema } from "@/lib/validation/safety";
import { checkAndStoreFile, discardOnFailure, insertUploadRow } from "./stored-upload";

// Claims are not proof: a flight review, medical or outside flight a member records about
// themselves counts toward a booking guard only once an instructor or the safety officer has
// checked it against the logbook page or certificate. The verifier attaches what they saw,
// unless the member's own upload on the record is it (a document's file). Nobody verifies
// their own record.

type Kind = "flight_review" | "medical" | "outside_flight";
type Found = { userId: string; verifiedAt: Date | null; uploadId: string | null; what: string };

const TABLES = { flight_review: memberDocuments, medical: medicalCertificates, outside_flight: outsideFlightEntries } as const;

function findRecord(tx: Tx, clubId: string, kind: Kind, id: string): Found | null {
  if (kind === "flight_review") {
    const r = tx.select().from(memberDocuments).where(and(eq(memberDocuments.clubId, clubId), eq(memberDocuments.id, id), eq(memberDocuments.kind, "flight_review"))).get();
    return r ? { userId: r.userId, verifiedAt: r.verifiedAt, uploadId: r.uploadId, what: `flight review of ${r.issuedOn}` } : null;
  }
  if (kind === "medical") {
    const r = tx.select().from(medicalCertificates).where(and(eq(medicalCertificates.clubId, clubId), eq(medicalCertificates.id, id))).get();
    return r ? { userId: r.userId, verifiedAt: r.verifiedAt, uploadId: null, what: `medical of ${r.examDate}` } : null;
  }
  const r = tx.select().from(outsideFlightEntries).where(and(eq(outsideFlightEntries.clubId, clubId), eq(outsideFlightEntries.id, id))).get();
  return r ? { userId: r.userId, verifiedAt: r.verifiedAt, uploadId: null, what: `outside flight of ${r.flownOn}` } : null;
}

export const verifyRecord = clubAction({
  schema: verifyRecordSchema,
  permission: ["verify", "Currency"],
  success: "Verified.",
  async prepare(_ctx, input) {
    return checkAndStoreFile(input.file, "file");
  },
  run(tx, ctx, input, stored) {
    return discardOnFailure(stored, () => {
      const { club, user } = ctx;
      const found = findRecord(tx, club.id, input.kind, input.recordId);
      if (!found) throw new ActionError("That record was not found in this club.", {}, "not_found");
      if (found.userId === user.id) {
        throw new ActionError("You cannot verify your own record: ask another instructor or the safety officer.", {}, "forbidden");
      }
      if (found.verifiedAt) throw new ActionError(`This ${found.what} is already verified.`, {}, "conflict");
      let evidence = found.uploadId;
      if (stored) {
        // A medical scan stays as private as the medical itself (the member and admins only).
        const subjectType = input.kind === "medical" ? "Medical" : "MemberDocument";
        evidence = insertUploadRow(tx, stored, { clubId: club.id, subjectType, subjectId: input.recordId, ownerUserId: found.userId, uploadedById: user.id });
      }
      if (!evidence) {
        throw new ActionError("Some fields need attention; nothing was saved.", { file: ["Attach the logbook page or certificate you checked: this record has no file of its own."] });
      }
      const now = new Date();
      const table = TABLES[input.kind];
      tx.update(table).set({ verifiedAt: now, verifiedById: user.id, verificationUploadId: evidence, updatedAt: now }).where(and(eq(table.clubId, club.id), eq(table.id, input.recordId))).run();
      writeAudit(tx, {
        clubId: club.id, actorId: user.id, action: "currency.verify", subjectType: input.kind === "medical" ? "Medical" : input.kind === "flight_review" ? "MemberDocument" : "OutsideFlight",
        subjectId: input.recordId, before: { verified: false }, after: { verified: true, evidenceUploadId: evidence, memberId: found.userId },
      });
      return { message: `Verified: the ${found.what} now counts toward the member's currency.`, refresh: true };
    });
  },
});
