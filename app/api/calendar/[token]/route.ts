import { listPersonBookings } from "@/db/queries/bookings";
import { findFeedBySecret, markFeedFetched } from "@/db/queries/bookings-feed";
import { getDb } from "@/db/client";
import { getActiveMembership } from "@/db/queries/clubs";
import { apiError } from "@/lib/server/api";
import { appUrl } from "@/lib/server/urls";
import { buildBookingFeed } from "@/lib/bookings/ical-feed";
import { listAircraft } from "@/db/queries/fleet";

export const dynamic = "force-dynamic";

const PAST_DAYS = 30;

// The calendar feed is public by design: calendar programs cannot sign in. The secret in the
// URL is the key; a wrong or revoked one is a 404, like a page that does not exist. The feed
// holds only this person's bookings in this club (as the member or as the instructor).
export async function GET(_request: Request, { params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const secret = token.replace(/\.ics$/, "");
  const db = getDb();
  const found = findFeedBySecret(db, secret);
  if (!found || found.club.archivedAt) return apiError("not_found", "Not found.");
  // A person who has left the club gets nothing more through an old link.
  if (!getActiveMembership(db, found.club.id, found.token.userId)) return apiError("not_found", "Not found.");
  const now = new Date();
  const { club, token: link } = found;
  const homeFields = new Map(listAircraft(db, club.id).map((a) => [a.id, a.homeField]));
  const rows = listPersonBookings(db, club.id, link.userId, new Date(now.getTime() - PAST_DAYS * 86_400_000));
  const body = buildBookingFeed({
    clubName: club.name,
    personName: found.personName ?? found.personEmail,
    domain: new URL(appUrl("/")).hostname,
    bookings: rows.map((b) => {
      const role = b.userId === link.userId ? ("member" as const) : ("instructor" as const);
      return {
        id: b.id, startsAt: b.startsAt, endsAt: b.endsAt, updatedAt: b.updatedAt, createdAt: b.createdAt, status: b.status,
        registration: b.registration, aircraftName: b.aircraftName, homeField: homeFields.get(b.aircraftId) ?? null,
        role, otherPerson: role === "member" ? b.instructorName : b.memberName ?? b.memberEmail, purpose: b.purpose,
        url: appUrl(`/clubs/${club.slug}/bookings/${b.id}`),
      };
    }),
  });
  markFeedFetched(db, link.id, now);
  return new Response(body, {
    status: 200,
    headers: { "Content-Type": "text/calendar; charset=utf-8", "Cache-Control": "private, max-age=300", "Content-Disposition": 'inline; filename="bookings.ics"' },
  });
}
