"use server";
import { getBulletin } from "@/db/queries/safety-bulletins";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { kickOutbox } from "@/lib/email/runner";
import { bulletinIdSchema } from "@/lib/validation/safety";
import { publishBulletinInTx } from "./bulletin-publishing";

export const publishBulletin = clubAction({
  schema: bulletinIdSchema,
  permission: ["publish", "Bulletin"],
  success: "Published.",
  run(tx, ctx, input) {
    const draft = getBulletin(tx, ctx.club.id, input.bulletinId);
    if (!draft) throw new ActionError("That bulletin was not found.", {}, "not_found");
    const { recipients } = publishBulletinInTx(tx, ctx, draft);
    return { message: `Published and sent to ${recipients} ${recipients === 1 ? "member" : "members"}.`, refresh: true };
  },
  after: () => kickOutbox(),
});
