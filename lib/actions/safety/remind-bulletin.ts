"use server";
import { and, eq } from "drizzle-orm";
import { bulletins } from "@/db/schema";
import { bulletinAckStats, getBulletin } from "@/db/queries/safety-bulletins";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { enqueueEmails } from "@/lib/email/outbox";
import { kickOutbox } from "@/lib/email/runner";
import { isoDateInTimeZone } from "@/lib/dates";
import { formatLocalTime } from "@/lib/fleet/time";
import { URGENCY_LABELS } from "@/lib/safety/labels";
import { writeAudit } from "@/lib/server/audit";
import { appUrl } from "@/lib/server/urls";
import { bulletinIdSchema } from "@/lib/validation/safety";

/** At most one reminder round an hour, so a double click does not mail everyone twice. */
const REMINDER_GAP_MS = 60 * 60_000;

export const remindBulletin = clubAction({
  schema: bulletinIdSchema,
  permission: ["publish", "Bulletin"],
  success: "Reminders queued.",
  run(tx, { club, user }, input) {
    const bulletin = getBulletin(tx, club.id, input.bulletinId);
    if (!bulletin || bulletin.status !== "published") throw new ActionError("That bulletin was not found.", {}, "not_found");
    if (bulletin.supersededAt) throw new ActionError("This version has been replaced; remind members about the newest version.", {}, "conflict");
    const now = new Date();
    if (bulletin.lastRemindedAt && now.getTime() - bulletin.lastRemindedAt.getTime() < REMINDER_GAP_MS) {
      throw new ActionError(`A reminder went out at ${formatLocalTime(bulletin.lastRemindedAt, club.timeZone)}; wait an hour before sending another.`, {}, "conflict");
    }
    const outstanding = bulletinAckStats(tx, club.id, bulletin).rows.filter((r) => r.acknowledgedAt === null);
    if (outstanding.length === 0) return { message: "Everyone in the audience has acknowledged; no reminder needed." };
    const url = appUrl(`/clubs/${club.slug}/safety/bulletins/${bulletin.id}`);
    enqueueEmails(
      tx,
      outstanding.map((p) => ({
        clubId: club.id,
        to: p.email,
        subject: `Reminder: please acknowledge "${bulletin.title}"`,
        template: "bulletin-reminder" as const,
        payload: { clubName: club.name, title: bulletin.title, urgency: URGENCY_LABELS[bulletin.urgency], acknowledgeBy: bulletin.acknowledgeBy, publishedOn: isoDateInTimeZone(bulletin.publishedAt!, club.timeZone), url },
      })),
    );
    tx.update(bulletins).set({ lastRemindedAt: now }).where(and(eq(bulletins.clubId, club.id), eq(bulletins.id, bulletin.id))).run();
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "bulletin.remind", subjectType: "Bulletin", subjectId: bulletin.id, after: { recipients: outstanding.length } });
    return { message: `Reminder queued for ${outstanding.length} ${outstanding.length === 1 ? "member" : "members"}.`, refresh: true };
  },
  after: () => kickOutbox(),
});
