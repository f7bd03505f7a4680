"use server";
import { clubAction } from "@/lib/actions/create-action";
import { kickOutbox } from "@/lib/email/runner";
import { sendDuesReminders } from "@/db/queries/money-reminders";
import { clubToday } from "@/lib/money/settings";
import { writeAudit } from "@/lib/server/audit";
import { emptySchema } from "@/lib/validation/money";

export const sendReminders = clubAction({
  schema: emptySchema,
  permission: ["create", "Ledger"],
  success: "Reminders queued.",
  run(tx, ctx) {
    const today = clubToday(ctx.club);
    const sent = sendDuesReminders(tx, ctx.club.id, today);
    writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "money.reminders.send", subjectType: "Club", subjectId: ctx.club.id, after: { sent, on: today } });
    return { message: sent === 0 ? "Nobody to remind today (each member is reminded at most once a day)." : `${sent} reminder${sent === 1 ? "" : "s"} queued for sending.`, refresh: true };
  },
  after: () => kickOutbox(),
});
