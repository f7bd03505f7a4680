"use server";
import { bulletinAcknowledgements } from "@/db/schema";
import { getAcknowledgement, getBulletin, isUserInAudience } from "@/db/queries/safety-bulletins";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { formatLocalTime } from "@/lib/fleet/time";
import { bulletinIdSchema } from "@/lib/validation/safety";

export const acknowledgeBulletin = clubAction({
  schema: bulletinIdSchema,
  permission: ["acknowledge", "Bulletin"],
  success: "Acknowledged. Thank you.",
  run(tx, { club, user, membership }, input) {
    const bulletin = getBulletin(tx, club.id, input.bulletinId);
    if (!bulletin || bulletin.status !== "published") throw new ActionError("That bulletin was not found.", {}, "not_found");
    if (bulletin.supersededAt) throw new ActionError("This version has been replaced; read and acknowledge the newest version.", {}, "conflict");
    if (!isUserInAudience(tx, club.id, bulletin, { userId: user.id, roles: membership.roles })) {
      throw new ActionError("This bulletin is addressed to others; you are not asked to acknowledge it.", {}, "forbidden");
    }
    // The unique (bulletin, member) index makes a second click — or a second tab — a no-op.
    const inserted = tx.insert(bulletinAcknowledgements).values({ clubId: club.id, bulletinId: bulletin.id, userId: user.id }).onConflictDoNothing().run();
    if (inserted.changes === 0) {
      const existing = getAcknowledgement(tx, club.id, bulletin.id, user.id);
      return { message: `You already acknowledged this on ${existing ? formatLocalTime(existing.acknowledgedAt, club.timeZone) : "an earlier day"}.` };
    }
    return { refresh: true };
  },
});
