import { NextResponse } from "next/server";
import { queueDocumentReminders } from "@/lib/actions/documents/document-reminders";
import { isoDateInTimeZone } from "@/lib/dates";
import { kickOutbox } from "@/lib/email/runner";
import { writeAudit } from "@/lib/server/audit";
import { withClub } from "@/lib/server/api";

export const dynamic = "force-dynamic";

/**
 * Queues expiry reminders that are due (idempotent), for a scheduler or the board's button.
 * Each expiry date is reminded once, through the outbox.
 */
export async function POST(_req: Request, { params }: { params: Promise<{ club: string }> }) {
  const { club } = await params;
  return withClub(club, ["read", "CurrencyBoard"], (ctx) => {
    const today = isoDateInTimeZone(new Date(), ctx.club.timeZone);
    const queued = ctx.db.transaction((tx) => {
      const n = queueDocumentReminders(tx, ctx.club, today);
      if (n > 0) writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "member_document.remind", subjectType: "Club", subjectId: ctx.club.id, after: { queued: n } });
      return n;
    });
    if (queued > 0) kickOutbox();
    return NextResponse.json({ queued });
  });
}
