import type { Metadata } from "next";
import Link from "next/link";
import type { ReactNode } from "react";
import { notFound } from "next/navigation";
import { BeginFlightForm, CancelBookingForm, ChangeBookingForm, SeriesActions } from "@/components/bookings/booking-actions";
import { limitationTexts } from "@/lib/bookings/guards";
import { BOOKING_STATUS_MARK, BOOKING_STATUS_WORDS, dayHeading, localInputValue } from "@/components/bookings/booking-words";
import { buttonClass } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { SafetyCaution } from "@/components/ui/safety-caution";
import { StatusBadge } from "@/components/ui/status-badge";
import { getBooking, listSeriesFrom } from "@/db/queries/bookings";
import { getAircraftStatusEntry } from "@/db/queries/fleet-status";
import { listMembers } from "@/db/queries/members";
import { listPreflightRecords } from "@/db/queries/tools-preflight";
import { getBookingLoading } from "@/db/queries/tools-wb";
import { visibleBookingWarnings } from "@/lib/bookings/warning-access";
import { mayActOnBooking } from "@/lib/actions/bookings/booking-access";
import { describeLateCheck, lateCancellation } from "@/lib/bookings/late-cancellation";
import { isoDateInTimeZone } from "@/lib/dates";
import { formatDateWords } from "@/lib/dates/words";
import { formatLocalTime } from "@/lib/fleet/time";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Booking" };
export const dynamic = "force-dynamic";

function Step({ n, title, done, children }: { n: number; title: string; done: boolean; children: ReactNode }) {
  return (
    <li className="card">
      <h3 className="mb-2 flex items-center gap-2 font-bold">
        <span aria-hidden="true" className={`inline-flex h-7 w-7 items-center justify-center rounded-full border-2 ${done ? "border-go-600 bg-go-100 text-go-800" : "border-fin-600 text-fin-600"}`}>{done ? "✓" : n}</span>
        {title}{done ? <span className="sr-only"> (done)</span> : null}
      </h3>
      {children}
    </li>
  );
}

export default async function BookingPage({ params }: { params: Promise<{ club: string; bookingId: string }> }) {
  const { club: slug, bookingId } = await params;
  const ctx = await authorizePage(slug, ["read", "Booking"]);
  const { db, club } = ctx;
  const booking = getBooking(db, club.id, bookingId);
  if (!booking) notFound();
  const status = getAircraftStatusEntry(db, club, booking.aircraftId);
  const mayAct = mayActOnBooking(ctx, booking);
  const warnings = visibleBookingWarnings(ctx.ability, ctx.user.id, booking);
  const loading = getBookingLoading(db, club.id, booking.id);
  const records = listPreflightRecords(db, club.id, booking.id);
  const base = `/clubs/${club.slug}/bookings/${booking.id}`;
  const tz = club.timeZone;
  const late = describeLateCheck(lateCancellation(booking.startsAt, new Date(), club.settings.lateCancellationHours), club.settings.lateCancellationHours);
  const lateNote = late ? `${late.replace("Late cancellation:", "Cancelling or shortening now is late:")}` : null;
  const instructors = listMembers(db, club.id).filter((m) => m.status === "active" && m.roles.includes("instructor") && m.userId !== booking.userId).map((m) => ({ id: m.userId, label: m.name ?? m.email }));
  const open = booking.status === "reserved" || booking.status === "dispatched";
  // The weeks of this booking's weekly series from this one on that can still be cancelled or
  // moved: reserved and yet to start (the actions check each week again).
  const now = Date.now();
  const laterWeeks = booking.seriesId ? listSeriesFrom(db, club.id, booking.seriesId, booking.startsAt).filter((w) => w.status === "reserved" && w.startsAt.getTime() > now) : [];
  const clock = (d: Date) => localInputValue(d, tz).slice(11);
  return (
    <div className="max-w-4xl">
      <PageHeader
        title={`${booking.registration} · ${dayHeading(isoDateInTimeZone(booking.startsAt, tz))}`}
        lead={`${formatLocalTime(booking.startsAt, tz)} to ${formatLocalTime(booking.endsAt, tz)} (${tz}) · ${booking.memberName ?? booking.memberEmail}${booking.instructorName ? ` with ${booking.instructorName}` : ""}`}
        actions={<Link className={buttonClass("quiet")} href={`/clubs/${club.slug}/bookings`}>← All bookings</Link>}
      />
      <section className="card mb-4 space-y-3" aria-label="Booking and aircraft">
        <p className="flex flex-wrap items-center gap-2">
          <span className="font-bold">{BOOKING_STATUS_MARK[booking.status]} {BOOKING_STATUS_WORDS[booking.status]}</span>
          <span className="text-ink-500">·</span>
          <span>{booking.aircraftName}</span>
          <StatusBadge status={status?.status} />
        </p>
        {status && status.reasons.length ? (
          <ul className="list-disc space-y-1 pl-5 text-sm">{status.reasons.map((r, i) => <li key={i} className={r.grounding ? "font-bold text-stop-800" : ""}>{r.text}</li>)}</ul>
        ) : null}
        <SafetyCaution compact />
        {booking.purpose ? <p className="text-sm"><strong>Purpose:</strong> {booking.purpose}</p> : null}
        {warnings.length ? (
          <div className="text-sm"><strong>Warnings read when booked:</strong><ul className="list-disc pl-5">{warnings.map((w) => <li key={w.guard}>{w.reason}</li>)}</ul></div>
        ) : null}
        {booking.lateCancel ? <p className="text-sm font-bold text-sock-700">▲ Booked time was given back inside the club&apos;s {club.settings.lateCancellationHours}-hour late-cancellation window.</p> : null}
        {booking.status === "cancelled" ? <p className="text-sm">Cancelled {booking.cancelledAt ? formatLocalTime(booking.cancelledAt, tz) : ""}{booking.cancelReason ? `: ${booking.cancelReason}` : ""}.</p> : null}
      </section>

      {mayAct && booking.status !== "cancelled" ? (
        <ol className="mb-4 grid gap-4 md:grid-cols-2" aria-label="Before and after the flight">
          <Step n={1} title="Weight and balance" done={Boolean(loading)}>
            <p className="mb-2 text-sm">{loading ? (loading.problems.length ? `Saved, out of limits: ${loading.problems.join(" ")}` : "Saved: within the envelope and every limit at takeoff and at landing.") : "Not done yet."}</p>
            <Link className={buttonClass("secondary")} href={`${base}/weight-balance`}>{loading ? "Review weight and balance" : "Work out weight and balance"}</Link>
          </Step>
          <Step n={2} title="Preflight" done={records.length > 0}>
            <p className="mb-2 text-sm">{records[0] ? (records[0].outcome === "ok" ? "Recorded: everything as expected." : `Recorded with ${records[0].findingCount} finding${records[0].findingCount === 1 ? "" : "s"}.`) : "Not recorded yet."}</p>
            {open ? <Link className={buttonClass("secondary")} href={`${base}/preflight`}>{records.length ? "Record it again" : "Record the preflight"}</Link> : null}
          </Step>
          <Step n={3} title="Begin flight" done={booking.status !== "reserved"}>
            {booking.status === "reserved" ? (
              records.length ? (
                <BeginFlightForm slug={club.slug} bookingId={booking.id} limitations={status ? limitationTexts(status.reasons) : []} records={records.map((r) => ({ id: r.id, label: `${formatLocalTime(r.createdAt, tz)} — ${r.outcome === "ok" ? "all as expected" : `${r.findingCount} finding(s)`}` }))} />
              ) : (
                <p className="text-sm">Record the preflight first; beginning the flight confirms it.</p>
              )
            ) : (
              <p className="text-sm">Flight begun {booking.dispatchedAt ? formatLocalTime(booking.dispatchedAt, tz) : ""}.</p>
            )}
          </Step>
          <Step n={4} title="Flight sheet" done={booking.status === "checked_in"}>
            {booking.status === "dispatched" ? <Link className={buttonClass("primary")} href={`${base}/flight-sheet`}>Close the flight sheet</Link> : null}
            {booking.status === "checked_in" ? <p className="text-sm">Flight sheet closed {booking.checkedInAt ? formatLocalTime(booking.checkedInAt, tz) : ""}; the flight is in the log.</p> : null}
            {booking.status === "reserved" ? <p className="text-sm">After the flight: the flight sheet, Out and In — meters, fuel, time, landings and squawks.</p> : null}
          </Step>
        </ol>
      ) : null}

      {mayAct && booking.status === "reserved" ? (
        <div className="grid gap-4 md:grid-cols-2">
          <section className="card" aria-labelledby="change-h">
            <h2 id="change-h" className="mb-3 text-lg font-bold">Change</h2>
            <ChangeBookingForm slug={club.slug} bookingId={booking.id} instructors={instructors} lateNote={lateNote} defaults={{ startsAt: localInputValue(booking.startsAt, tz), endsAt: localInputValue(booking.endsAt, tz), instructorId: booking.instructorId ?? "" }} />
          </section>
          <section className="card" aria-labelledby="cancel-h">
            <h2 id="cancel-h" className="mb-3 text-lg font-bold">Cancel</h2>
            <CancelBookingForm slug={club.slug} bookingId={booking.id} lateNote={lateNote} />
          </section>
        </div>
      ) : null}

      {mayAct && booking.seriesId ? (
        <SeriesActions
          slug={club.slug}
          bookingId={booking.id}
          lateNote={lateNote}
          defaults={{ startTime: clock(booking.startsAt), endTime: clock(booking.endsAt) }}
          weeks={laterWeeks.map((w) => ({ id: w.id, current: w.id === booking.id, label: `${formatDateWords(isoDateInTimeZone(w.startsAt, tz))}, ${clock(w.startsAt)}–${clock(w.endsAt)}` }))}
        />
      ) : null}
    </div>
  );
}
