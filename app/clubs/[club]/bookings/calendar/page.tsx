import type { Metadata } from "next";
import { CalendarLinkPanel } from "@/components/bookings/calendar-link-panel";
import { PageHeader } from "@/components/ui/page-header";
import { getLiveFeedToken, readFeedSecret } from "@/db/queries/bookings-feed";
import { formatLocalTime } from "@/lib/fleet/time";
import { authorizePage } from "@/lib/server/authorize";
import { appUrl } from "@/lib/server/urls";

export const metadata: Metadata = { title: "Calendar link" };
export const dynamic = "force-dynamic";

export default async function CalendarPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club, user } = await authorizePage(slug, ["create", "Booking"]);
  const live = getLiveFeedToken(db, club.id, user.id);
  // Only the owner's own link, on their own page (the feed route finds it by its hash).
  const secret = live ? readFeedSecret(live) : null;
  return (
    <div className="max-w-2xl">
      <PageHeader title="Calendar link" lead="Your bookings in your own calendar program, as an iCalendar (RFC 5545) subscription." />
      <section className="card">
        <p className="mb-3 text-sm text-ink-700">
          The link holds a secret: anyone with it sees your bookings in {club.name} (times, aircraft and who flies with you). Keep it to yourself.
          {live?.lastFetchedAt ? ` Last read by a calendar ${formatLocalTime(live.lastFetchedAt, club.timeZone)}.` : ""}
        </p>
        <CalendarLinkPanel slug={club.slug} hasLink={Boolean(live)} url={secret ? appUrl(`/api/calendar/${secret}`) : null} />
      </section>
    </div>
  );
}
