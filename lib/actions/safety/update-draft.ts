"use server";
import { and, eq } from "drizzle-orm";
import { bulletins } from "@/db/schema";
import { getBulletin } from "@/db/queries/safety-bulletins";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { checkAndStoreFile, discardOnFailure, insertUploadRow, type StoredFile } from "@/lib/actions/documents/stored-upload";
import { kickOutbox } from "@/lib/email/runner";
import { writeAudit } from "@/lib/server/audit";
import { updateDraftSchema } from "@/lib/validation/safety";
import { assertDeadlineAhead, fleetTypeGroupOrThrow, publishBulletinInTx } from "./bulletin-publishing";
import { can } from "@/permissions";

/** Drafts may change freely; a published bulletin never does (that is a revision: a new version). */
export const updateDraft = clubAction({
  schema: updateDraftSchema,
  permission: (ability, input) => can(ability, "update", "Bulletin") && (input.intent === "draft" || can(ability, "publish", "Bulletin")),
  success: "Draft saved.",
  async prepare(ctx, input): Promise<StoredFile | null> {
    assertDeadlineAhead(ctx, input.acknowledgeBy);
    return checkAndStoreFile(input.attachment, "attachment");
  },
  run(tx, ctx, input, stored) {
    return discardOnFailure(stored, () => {
      const { club, user } = ctx;
      const current = getBulletin(tx, club.id, input.bulletinId);
      if (!current) throw new ActionError("That bulletin was not found.", {}, "not_found");
      if (current.status !== "draft") throw new ActionError("This bulletin is published and cannot be edited; issue a revision instead.", {}, "conflict");
      const typeGroup = input.audience === "type_group" ? fleetTypeGroupOrThrow(tx, club.id, input.audienceTypeGroup, "audienceTypeGroup") : null;
      const attachmentUploadId = stored
        ? insertUploadRow(tx, stored, { clubId: club.id, subjectType: "Bulletin", subjectId: current.id, ownerUserId: null, uploadedById: user.id })
        : current.attachmentUploadId;
      const [row] = tx
        .update(bulletins)
        .set({ title: input.title, bodyMarkdown: input.bodyMarkdown, urgency: input.urgency, audience: input.audience, audienceTypeGroup: typeGroup, acknowledgeBy: input.acknowledgeBy ?? null, attachmentUploadId })
        .where(and(eq(bulletins.clubId, club.id), eq(bulletins.id, current.id), eq(bulletins.status, "draft")))
        .returning()
        .all();
      if (!row) throw new ActionError("This bulletin was published in the meantime.", {}, "conflict");
      writeAudit(tx, { clubId: club.id, actorId: user.id, action: "bulletin.draft.update", subjectType: "Bulletin", subjectId: current.id, before: { title: current.title }, after: { title: input.title } });
      const base = `/clubs/${club.slug}/safety`;
      if (input.intent === "publish") {
        const { recipients } = publishBulletinInTx(tx, ctx, row);
        return { message: `Published and sent to ${recipients} ${recipients === 1 ? "member" : "members"}.`, refresh: true, redirectTo: `${base}/bulletins/${row.id}?published=${recipients}` };
      }
      return { message: "Draft saved. Nothing was sent yet.", refresh: true };
    });
  },
  after: (_ctx, input) => {
    if (input.intent === "publish") kickOutbox();
  },
});
