"use server";
import { memberDocuments } from "@/db/schema";
import { newId } from "@/db/schema/columns";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { clubToday } from "@/lib/actions/safety/bulletin-publishing";
import { flightReviewDue } from "@/lib/currency";
import { compareIsoDates } from "@/lib/dates";
import { writeAudit } from "@/lib/server/audit";
import { canOn } from "@/permissions";
import { recordDocumentSchema } from "@/lib/validation/safety";
import { checkAndStoreFile, discardOnFailure, insertUploadRow, type StoredFile } from "./stored-upload";

/** A member records one of their own documents; a renewal is a new row and the old one stays. */
export const recordDocument = clubAction({
  schema: recordDocumentSchema,
  permission: (ability, _input, ctx) => canOn(ability, "create", "MemberDocument", { userId: ctx.user.id }),
  success: "Document recorded.",
  async prepare(ctx, input): Promise<StoredFile | null> {
    // Refuse bad dates before any bytes are written.
    if (compareIsoDates(input.issuedOn, clubToday(ctx)) > 0) throw new ActionError("Some fields need attention; nothing was saved.", { issuedOn: ["The date cannot be in the future."] });
    return checkAndStoreFile(input.file, "file");
  },
  run(tx, { club, user }, input, stored) {
    return discardOnFailure(stored, () => {
      const id = newId();
      // 14 CFR 61.56(c): the review's validity is computed, never typed in.
      const expiresOn = input.kind === "flight_review" ? flightReviewDue(input.issuedOn) : input.kind === "pilot_certificate" ? null : (input.expiresOn ?? null);
      const uploadId = stored ? insertUploadRow(tx, stored, { clubId: club.id, subjectType: "MemberDocument", subjectId: id, ownerUserId: user.id, uploadedById: user.id }) : null;
      tx.insert(memberDocuments)
        .values({ id, clubId: club.id, userId: user.id, kind: input.kind, reference: input.reference ?? null, details: input.details ?? null, issuedOn: input.issuedOn, expiresOn, uploadId, recordedById: user.id })
        .run();
      writeAudit(tx, { clubId: club.id, actorId: user.id, action: "member_document.record", subjectType: "MemberDocument", subjectId: id, after: { kind: input.kind, expiresOn, file: stored ? stored.file.originalName : null } });
      return { data: { documentId: id }, refresh: true };
    });
  },
});
