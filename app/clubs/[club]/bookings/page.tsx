import type { Metadata } from "next";
import Link from "next/link";
import { AircraftSchedule } from "@/components/bookings/aircraft-schedule";
import { BOOKING_STATUS_MARK, BOOKING_STATUS_WORDS, clockTime, dayHeading } from "@/components/bookings/booking-words";
import { InstructorTimesList } from "@/components/bookings/instructor-times";
import { buttonClass } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { SafetyCaution } from "@/components/ui/safety-caution";
import { StatusBadge } from "@/components/ui/status-badge";
import { listPersonBookings, listSheetBookings } from "@/db/queries/bookings";
import { listAvailability, listBlocksInRange, listInstructorsKeepingAvailability } from "@/db/queries/bookings-schedule";
import type { BookingStatus } from "@/db/schema";
import { getFlightLine } from "@/db/queries/fleet-status";
import { listMembers } from "@/db/queries/members";
import { addDays, isoDateInTimeZone } from "@/lib/dates";
import { dayBounds } from "@/lib/bookings/grid";
import { isFieldPosition, nightIntervals } from "@/lib/bookings/night";
import { flyingWindow, type Span } from "@/lib/bookings/schedule";
import { scheduleStatusNote } from "@/lib/bookings/status-note";
import { bookingDaysSchema } from "@/lib/validation/bookings";
import { can } from "@/permissions";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Bookings" };
export const dynamic = "force-dynamic";

export default async function BookingsPage({ params, searchParams }: { params: Promise<{ club: string }>; searchParams: Promise<Record<string, string | undefined>> }) {
  const { club: slug } = await params;
  const { db, club, user, ability } = await authorizePage(slug, ["read", "Booking"]);
  const parsed = bookingDaysSchema.safeParse(await searchParams);
  const now = new Date();
  const today = isoDateInTimeZone(now, club.timeZone);
  const count = parsed.success ? parsed.data.days : 3;
  const first = parsed.success && parsed.data.from ? parsed.data.from : today;
  const dates = Array.from({ length: count }, (_, i) => addDays(first, i));
  const bounds = dates.map((d) => dayBounds(d, club.timeZone));
  const from = new Date(bounds[0]!.start);
  const to = new Date(bounds.at(-1)!.end + 86_400_000); // a flying day may close after midnight
  const tz = club.timeZone;

  const position = { latitude: club.settings.homeLatitude, longitude: club.settings.homeLongitude };
  const nights: Span[] = isFieldPosition(position) ? nightIntervals(from, to, position).map((n) => ({ start: n.startsAt.getTime(), end: n.endsAt.getTime() })) : [];
  const hours = { opens: club.settings.flyingDayOpens, closes: club.settings.flyingDayCloses };
  const days = bounds.map((b) => {
    const window = flyingWindow(b.date, hours, tz);
    const night = nights.find((n) => n.start < window.end && n.end > window.start);
    const nightWords = !isFieldPosition(position)
      ? "night cannot be computed (the club's home position is not recorded)"
      : !night
        ? "no night inside it"
        : night.start > window.start
          ? `night from ${clockTime(night.start, tz)}`
          : `night until ${clockTime(night.end, tz)}`;
    return { date: b.date, day: { start: b.start, end: b.end }, window, note: `Flying day ${clockTime(window.start, tz)}–${clockTime(window.end, tz)} · ${nightWords}` };
  });

  const line = getFlightLine(db, club);
  const aircraft = line.entries.map((e) => ({ id: e.aircraft.id, registration: e.aircraft.registration, name: `${e.aircraft.make} ${e.aircraft.model}`, status: e.status, note: scheduleStatusNote(e.status, e.reasons) }));
  const rows = listSheetBookings(db, club.id, from, to);
  const blocks = listBlocksInRange(db, club.id, from, to);
  const availability = listAvailability(db, club.id, from, to);
  const instructors = listMembers(db, club.id).filter((m) => m.status === "active" && m.roles.includes("instructor"));
  const keeps = listInstructorsKeepingAvailability(db, club.id);
  const mine = listPersonBookings(db, club.id, user.id, now, 5);
  const base = `/clubs/${club.slug}/bookings`;
  const link = (date: string, n = count) => `${base}?from=${date}&days=${n}`;
  const canBook = can(ability, "create", "Booking");

  return (
    <div className="max-w-4xl">
      <PageHeader
        title="Bookings"
        lead={`Each aircraft's coming days, in club time (${tz}): who has it, when maintenance has it, and the free time left.`}
        actions={
          <>
            {canBook ? <Link href={`${base}/new`} className={buttonClass("primary")}>New booking</Link> : null}
            {can(ability, "create", "Availability") ? <Link href={`${base}/availability`} className={buttonClass("secondary")}>My available times</Link> : null}
            {can(ability, "create", "MaintenanceBlock") ? <Link href={`${base}/blocks`} className={buttonClass("secondary")}>Maintenance blocks</Link> : null}
            <Link href={`${base}/calendar`} className={buttonClass("secondary")}>Calendar link</Link>
          </>
        }
      />
      <div className="mb-4"><SafetyCaution compact /></div>
      {mine.length ? (
        <section className="card mb-4" aria-labelledby="mine-h">
          <h2 id="mine-h" className="mb-2 text-lg font-bold">Your next bookings</h2>
          <ul className="divide-y divide-sand-200 text-sm">
            {mine.map((b) => (
              <li key={b.id} className="flex min-h-11 flex-wrap items-center gap-x-2 py-1">
                <Link href={`${base}/${b.id}`} className="inline-flex min-h-11 items-center font-bold">{b.registration}</Link>
                <span>{dayHeading(isoDateInTimeZone(b.startsAt, tz))} {clockTime(b.startsAt, tz)}–{clockTime(b.endsAt, tz)}</span>
                <span className="text-ink-500">{b.userId === user.id ? BOOKING_STATUS_WORDS[b.status] : `instructing ${b.memberName ?? b.memberEmail}`}</span>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      <nav aria-label="Days shown" className="card mb-4 space-y-2">
        <p className="font-bold">{count === 1 ? dayHeading(dates[0]!) : `${dayHeading(dates[0]!)} to ${dayHeading(dates.at(-1)!)}`}</p>
        <div className="flex flex-wrap gap-2">
          {first > today ? <Link className={buttonClass("secondary")} href={link(addDays(first, -count) < today ? today : addDays(first, -count))}>Previous {count} days</Link> : null}
          {first !== today ? <Link className={buttonClass("secondary")} href={link(today)}>From today</Link> : null}
          <Link className={buttonClass("secondary")} href={link(addDays(first, count))}>Next {count} days</Link>
        </div>
        <div className="flex flex-wrap items-center gap-2 text-sm">
          <span>Show</span>
          {[3, 7, 14].map((n) => (
            <Link key={n} href={link(first, n)} aria-current={n === count ? "page" : undefined} className={buttonClass(n === count ? "primary" : "quiet", "px-3")}>{n} days</Link>
          ))}
        </div>
      </nav>
      <nav aria-label="Aircraft and their status" className="mb-4">
        <ul className="flex flex-wrap gap-2">
          {aircraft.map((a) => (
            <li key={a.id}>
              <a href={`#aircraft-${a.id}`} className="inline-flex min-h-11 items-center gap-2 rounded bg-white px-3 font-bold no-underline ring-1 ring-sand-300 hover:bg-sand-100">
                {a.registration} <StatusBadge status={a.status} />
              </a>
            </li>
          ))}
        </ul>
      </nav>
      <AircraftSchedule
        slug={club.slug}
        timeZone={tz}
        days={days}
        aircraft={aircraft}
        nights={nights}
        now={now.getTime()}
        canBook={canBook}
        blocks={blocks.map((b) => ({ id: b.id, aircraftId: b.aircraftId, start: b.startsAt.getTime(), end: b.endsAt.getTime(), reason: b.reason }))}
        bookings={rows.map((b) => ({
          id: b.id, aircraftId: b.aircraftId, start: b.startsAt.getTime(), end: b.endsAt.getTime(), status: b.status,
          who: `${b.memberName ?? b.memberEmail}${b.instructorName ? ` with ${b.instructorName}` : ""}`, mine: b.userId === user.id || b.instructorId === user.id,
        }))}
      />
      <div className="mt-5">
        <InstructorTimesList
          timeZone={tz}
          instructors={instructors.map((i) => ({
            id: i.userId,
            name: i.name ?? i.email,
            keepsList: keeps.has(i.userId),
            windows: availability.filter((a) => a.userId === i.userId).map((a) => ({ id: a.id, start: a.startsAt.getTime(), end: a.endsAt.getTime() })),
            busy: rows.filter((b) => b.instructorId === i.userId && b.endsAt.getTime() > now.getTime()).map((b) => ({ start: b.startsAt.getTime(), end: b.endsAt.getTime() })),
          }))}
        />
      </div>
      <p className="mt-4 text-sm text-ink-500">
        ○ free time · ☾ free at night (from an hour after sunset to an hour before sunrise at the home field, as 14 CFR 61.57(b) counts it for passengers) · ■ blocked for maintenance. Bookings: {Object.entries(BOOKING_STATUS_WORDS).map(([k, w]) => `${BOOKING_STATUS_MARK[k as BookingStatus]} ${w}`).join(" · ")}.
      </p>
    </div>
  );
}
