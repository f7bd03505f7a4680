"use server";
import { getLiveFeedToken, insertFeedToken, readFeedSecret, revokeFeedTokens } from "@/db/queries/bookings-feed";
import { clubAction } from "@/lib/actions/create-action";
import { writeAudit } from "@/lib/server/audit";
import { newSecretToken } from "@/lib/server/tokens";
import { appUrl } from "@/lib/server/urls";
import { feedTokenSchema } from "@/lib/validation/bookings";

type LinkData = { url: string | null };

function feedUrl(secret: string): string {
  return appUrl(`/api/calendar/${secret}`);
}

// A member's own calendar link. "create" makes one only when there is none (with a link there, it
// answers that link: asking twice never breaks a subscription). "rotate" replaces it (the old one
// stops at once) and "revoke" turns it off; both are separate, confirmed choices. The secret is
// kept sealed so the page can show it again on any device.
export const manageCalendarLink = clubAction({
  schema: feedTokenSchema,
  permission: ["create", "Booking"],
  success: "Calendar link updated.",
  run(tx, { club, user }, input) {
    const now = new Date();
    const had = getLiveFeedToken(tx, club.id, user.id);
    if (input.intent === "create" && had) {
      const secret = readFeedSecret(had);
      return secret
        ? { message: "You already have a calendar link: it is shown here. Add the same link on every device.", data: { url: feedUrl(secret) } as LinkData }
        : { message: "You already have a calendar link, made before links could be shown again. Replace it to see a link here.", data: { url: null } as LinkData };
    }
    const revoked = revokeFeedTokens(tx, club.id, user.id, now);
    if (input.intent === "revoke") {
      if (revoked) writeAudit(tx, { clubId: club.id, actorId: user.id, action: "calendar.link.revoke", subjectType: "CalendarFeedToken", subjectId: had!.id });
      return { message: revoked ? "Calendar link turned off: calendars using it get nothing more." : "You had no calendar link.", data: { url: null } as LinkData, refresh: true as const };
    }
    const secret = newSecretToken();
    const tokenId = insertFeedToken(tx, club.id, user.id, secret);
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: had ? "calendar.link.rotate" : "calendar.link.create", subjectType: "CalendarFeedToken", subjectId: tokenId, after: { replaced: had?.id ?? null } });
    return {
      message: had ? "New calendar link made; the old one no longer works. Put the new link in each calendar that used the old one." : "Calendar link made. Add it to your calendar program; you can see it here again at any time.",
      data: { url: feedUrl(secret) } as LinkData,
      refresh: true as const,
    };
  },
});
