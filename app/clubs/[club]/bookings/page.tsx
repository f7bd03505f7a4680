import type { Metadata } from "next";
import Link from "next/link";
import { Suspense } from "react";
import { FleetDays } from "@/components/bookings/fleet-days";
import { FleetStatusPanel } from "@/components/bookings/fleet-status-panel";
import { BOOKING_STATUS_WORDS, clockTime, dayHeading } from "@/components/bookings/booking-words";
import { buttonClass } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { SafetyCaution } from "@/components/ui/safety-caution";
import { listPersonBookings, listSheetBookings } from "@/db/queries/bookings";
import { listAircraft } from "@/db/queries/fleet";
import { viewRange } from "@/lib/actions/bookings/range";
import { addDays, isoDateInTimeZone } from "@/lib/dates";
import { bookingRangeSchema } from "@/lib/validation/bookings";
import { can } from "@/permissions";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Bookings" };
export const dynamic = "force-dynamic";

export default async function BookingsPage({ params, searchParams }: { params: Promise<{ club: string }>; searchParams: Promise<Record<string, string | undefined>> }) {
  const { club: slug } = await params;
  const { db, club, user, ability } = await authorizePage(slug, ["read", "Booking"]);
  const parsed = bookingRangeSchema.safeParse(await searchParams);
  const query = parsed.success ? parsed.data : { view: "week" as const, date: undefined };
  const range = viewRange(club, query.view, query.date);
  const rows = listSheetBookings(db, club.id, range.from, range.to);
  const aircraft = listAircraft(db, club.id).map((a) => ({ id: a.id, registration: a.registration }));
  const base = `/clubs/${club.slug}/bookings`;
  const step = query.view === "day" ? 1 : 7;
  const link = (view: string, date: string) => `${base}?view=${view}&date=${date}`;
  const today = isoDateInTimeZone(new Date(), club.timeZone);
  const mine = listPersonBookings(db, club.id, user.id, new Date(), 5);
  const title = query.view === "day" ? dayHeading(range.anchor) : `Week of ${dayHeading(range.days[0]!.date)}`;
  return (
    <div className="max-w-6xl">
      <PageHeader
        title="Bookings"
        lead={`${title} · club time ${club.timeZone}`}
        actions={
          <>
            {can(ability, "create", "Booking") ? <Link href={`${base}/new`} className={buttonClass("primary")}>New booking</Link> : null}
            <Link href={`${base}/calendar`} className={buttonClass("secondary")}>Calendar link</Link>
          </>
        }
      />
      <nav aria-label="Choose the days shown" className="mb-4 flex flex-wrap items-center gap-2">
        <Link className={buttonClass("quiet")} href={link(query.view, addDays(range.anchor, -step))}>← Earlier</Link>
        <Link className={buttonClass("quiet")} href={link(query.view, today)}>Today</Link>
        <Link className={buttonClass("quiet")} href={link(query.view, addDays(range.anchor, step))}>Later →</Link>
        <span className="mx-1 text-ink-500" aria-hidden="true">|</span>
        <Link className={buttonClass(query.view === "day" ? "primary" : "secondary")} aria-current={query.view === "day" ? "page" : undefined} href={link("day", range.anchor)}>Day</Link>
        <Link className={buttonClass(query.view === "week" ? "primary" : "secondary")} aria-current={query.view === "week" ? "page" : undefined} href={link("week", range.anchor)}>Week</Link>
      </nav>
      <div className="mb-4 space-y-3">
        <SafetyCaution compact />
        <Suspense fallback={<p className="text-sm text-ink-500" aria-busy="true">Working out each aircraft&apos;s status…</p>}>
          <FleetStatusPanel db={db} club={club} />
        </Suspense>
      </div>
      {mine.length ? (
        <section className="card mb-4" aria-labelledby="mine-h">
          <h2 id="mine-h" className="mb-2 text-lg font-bold">Your next bookings</h2>
          <ul className="divide-y divide-sand-200 text-sm">
            {mine.map((b) => (
              <li key={b.id} className="flex flex-wrap gap-x-2 py-1.5">
                <Link href={`${base}/${b.id}`} className="font-bold">{b.registration}</Link>
                <span>{dayHeading(isoDateInTimeZone(b.startsAt, club.timeZone))} {clockTime(b.startsAt, club.timeZone)}–{clockTime(b.endsAt, club.timeZone)}</span>
                <span className="text-ink-500">{b.userId === user.id ? BOOKING_STATUS_WORDS[b.status] : `instructing ${b.memberName ?? b.memberEmail}`}</span>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      <FleetDays
        days={range.days}
        aircraft={aircraft}
        slug={club.slug}
        timeZone={club.timeZone}
        bookings={rows.map((b) => ({
          id: b.id, aircraftId: b.aircraftId, startsAt: b.startsAt.getTime(), endsAt: b.endsAt.getTime(), status: b.status, registration: b.registration,
          who: `${b.memberName ?? b.memberEmail}${b.instructorName ? ` + ${b.instructorName}` : ""}`, mine: b.userId === user.id || b.instructorId === user.id,
        }))}
      />
    </div>
  );
}
