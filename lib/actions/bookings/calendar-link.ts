"use server";
import { getLiveFeedToken, insertFeedToken, revokeFeedTokens } from "@/db/queries/bookings-feed";
import { clubAction } from "@/lib/actions/create-action";
import { writeAudit } from "@/lib/server/audit";
import { newSecretToken } from "@/lib/server/tokens";
import { appUrl } from "@/lib/server/urls";
import { feedTokenSchema } from "@/lib/validation/bookings";

// A member's own calendar link. A new link replaces the old one (which stops working at once);
// the secret is shown once, right after it is made, and kept only as its hash.
export const manageCalendarLink = clubAction({
  schema: feedTokenSchema,
  permission: ["create", "Booking"],
  success: "Calendar link updated.",
  run(tx, { club, user }, input) {
    const now = new Date();
    const had = getLiveFeedToken(tx, club.id, user.id);
    const revoked = revokeFeedTokens(tx, club.id, user.id, now);
    if (input.intent === "revoke") {
      if (revoked) writeAudit(tx, { clubId: club.id, actorId: user.id, action: "calendar.link.revoke", subjectType: "CalendarFeedToken", subjectId: had!.id });
      return { message: revoked ? "Calendar link turned off: calendars using it get nothing more." : "You had no calendar link.", refresh: true };
    }
    const secret = newSecretToken();
    const tokenId = insertFeedToken(tx, club.id, user.id, secret);
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "calendar.link.create", subjectType: "CalendarFeedToken", subjectId: tokenId, after: { replaced: had?.id ?? null } });
    return {
      message: had ? "New calendar link made; the old one no longer works." : "Calendar link made.",
      data: { url: appUrl(`/api/calendar/${secret}`) },
      refresh: true,
    };
  },
});
