"use server";
import { z } from "zod";
import { clubAction } from "@/lib/actions/create-action";
import { clubToday } from "@/lib/actions/safety/bulletin-publishing";
import { kickOutbox } from "@/lib/email/runner";
import { writeAudit } from "@/lib/server/audit";
import { queueDocumentReminders } from "./document-reminders";

// Whoever watches the currency board may start the sweep; it is idempotent (one reminder per
// expiry date), so starting it twice never mails anyone twice.
export const sendDocumentReminders = clubAction({
  schema: z.object({}),
  permission: ["read", "CurrencyBoard"],
  success: "Reminders queued.",
  run(tx, ctx) {
    const queued = queueDocumentReminders(tx, ctx.club, clubToday(ctx));
    if (queued > 0) writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "member_document.remind", subjectType: "Club", subjectId: ctx.club.id, after: { queued } });
    return { message: queued === 0 ? "No reminders were due: every document was already reminded or is not close to expiry." : `Queued ${queued} expiry ${queued === 1 ? "reminder" : "reminders"}.` };
  },
  after: () => kickOutbox(),
});
