"use server";
import { bulletins, safetyReportEvents } from "@/db/schema";
import { newId } from "@/db/schema/columns";
import { getBulletin } from "@/db/queries/safety-bulletins";
import { getReport } from "@/db/queries/safety-reports";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { checkAndStoreFile, discardOnFailure, insertUploadRow, type StoredFile } from "@/lib/actions/documents/stored-upload";
import { kickOutbox } from "@/lib/email/runner";
import { writeAudit } from "@/lib/server/audit";
import { createBulletinSchema } from "@/lib/validation/safety";
import { assertDeadlineAhead, fleetTypeGroupOrThrow, publishBulletinInTx } from "./bulletin-publishing";
import { can } from "@/permissions";

export const createBulletin = clubAction({
  schema: createBulletinSchema,
  permission: (ability, input) => can(ability, "create", "Bulletin") && (input.intent === "draft" || can(ability, "publish", "Bulletin")),
  success: "Bulletin saved.",
  async prepare(ctx, input): Promise<StoredFile | null> {
    assertDeadlineAhead(ctx, input.acknowledgeBy);
    return checkAndStoreFile(input.attachment, "attachment");
  },
  run(tx, ctx, input, stored) {
    return discardOnFailure(stored, () => {
      const { club, user } = ctx;
      let seriesId: string | null = null;
      let version = 1;
      if (input.supersedesId) {
        const previous = getBulletin(tx, club.id, input.supersedesId);
        if (!previous || previous.status !== "published") throw new ActionError("The bulletin to revise was not found.", {}, "not_found");
        if (previous.supersededAt) throw new ActionError(`Version ${previous.version} has already been replaced; revise the newest version instead.`, {}, "conflict");
        seriesId = previous.seriesId;
        version = previous.version + 1;
      }
      if (input.sourceReportId && (!can(ctx.ability, "triage", "SafetyReport") || !getReport(tx, club.id, input.sourceReportId))) {
        throw new ActionError("The safety report this bulletin draws on was not found.", {}, "not_found");
      }
      const typeGroup = input.audience === "type_group" ? fleetTypeGroupOrThrow(tx, club.id, input.audienceTypeGroup, "audienceTypeGroup") : null;
      const id = newId();
      const attachmentUploadId = stored ? insertUploadRow(tx, stored, { clubId: club.id, subjectType: "Bulletin", subjectId: id, ownerUserId: null, uploadedById: user.id }) : null;
      const [row] = tx
        .insert(bulletins)
        .values({
          id,
          clubId: club.id,
          seriesId: seriesId ?? id,
          version,
          supersedesId: input.supersedesId ?? null,
          title: input.title,
          bodyMarkdown: input.bodyMarkdown,
          urgency: input.urgency,
          audience: input.audience,
          audienceTypeGroup: typeGroup,
          acknowledgeBy: input.acknowledgeBy ?? null,
          attachmentUploadId,
          sourceReportId: input.sourceReportId ?? null,
          createdById: user.id,
        })
        .returning()
        .all();
      if (input.sourceReportId) {
        tx.insert(safetyReportEvents).values({ clubId: club.id, reportId: input.sourceReportId, actorId: user.id, kind: "bulletin", bulletinId: id, note: `Bulletin drafted: ${input.title}` }).run();
      }
      writeAudit(tx, { clubId: club.id, actorId: user.id, action: "bulletin.create", subjectType: "Bulletin", subjectId: id, after: { title: input.title, version, supersedes: input.supersedesId ?? null } });
      const base = `/clubs/${club.slug}/safety`;
      if (input.intent === "publish") {
        const { recipients } = publishBulletinInTx(tx, ctx, row!);
        return { message: `Published and sent to ${recipients} ${recipients === 1 ? "member" : "members"}.`, data: { bulletinId: id }, refresh: true, redirectTo: `${base}/bulletins/${id}?published=${recipients}` };
      }
      return { message: "Draft saved. Nothing was sent yet.", data: { bulletinId: id }, refresh: true, redirectTo: `${base}/bulletins/${id}?saved=draft` };
    });
  },
  after: (_ctx, input) => {
    if (input.intent === "publish") kickOutbox();
  },
});
