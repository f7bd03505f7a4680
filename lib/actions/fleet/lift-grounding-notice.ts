"use server";
import { and, eq, isNull } from "drizzle-orm";
import { groundingNotices } from "@/db/schema";
import { getNotice } from "@/db/queries/fleet-notices";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { writeAudit } from "@/lib/server/audit";
import { liftNoticeSchema } from "@/lib/validation/fleet";

// Lifting needs a note; a maintenance notice also needs the return-to-service entry.
export const liftGroundingNotice = clubAction({
  schema: liftNoticeSchema,
  permission: ["lift", "GroundingNotice"],
  success: "Grounding notice lifted.",
  run(tx, { club, user }, input) {
    const notice = getNotice(tx, club.id, input.noticeId);
    if (!notice) throw new ActionError("That grounding notice was not found in this club.", {}, "not_found");
    if (notice.liftedAt) throw new ActionError("That notice was already lifted.", {}, "conflict");
    if (notice.category === "maintenance") {
      const errors: Record<string, string[]> = {};
      if (!input.liftMechanicName) errors.liftMechanicName = ["Enter the mechanic who returned the aircraft to service."];
      if (!input.liftCertificate) errors.liftCertificate = ["Enter the mechanic's certificate number."];
      if (Object.keys(errors).length) throw new ActionError("A maintenance grounding is lifted with the return-to-service entry.", errors);
    }
    const change = { liftedAt: new Date(), liftedById: user.id, liftNote: input.liftNote, liftMechanicName: input.liftMechanicName, liftCertificate: input.liftCertificate };
    const result = tx.update(groundingNotices).set(change).where(and(eq(groundingNotices.clubId, club.id), eq(groundingNotices.id, notice.id), isNull(groundingNotices.liftedAt))).run();
    if (result.changes === 0) throw new ActionError("That notice was already lifted.", {}, "conflict");
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "grounding.lift", subjectType: "GroundingNotice", subjectId: notice.id, before: { liftedAt: null }, after: { ...change, liftedAt: change.liftedAt.toISOString() } });
    return { refresh: true };
  },
});
