import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { CheckInForm } from "@/components/bookings/check-in-form";
import { buttonClass } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { getBooking } from "@/db/queries/bookings";
import { getAircraft } from "@/db/queries/fleet";
import { mayActOnBooking } from "@/lib/actions/bookings/booking-access";
import { formatMoney } from "@/lib/money";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Check in" };
export const dynamic = "force-dynamic";

export default async function CheckInPage({ params }: { params: Promise<{ club: string; bookingId: string }> }) {
  const { club: slug, bookingId } = await params;
  const ctx = await authorizePage(slug, ["create", "Flight"]);
  const { db, club } = ctx;
  const booking = getBooking(db, club.id, bookingId);
  if (!booking || !mayActOnBooking(ctx, booking)) notFound();
  const plane = getAircraft(db, club.id, booking.aircraftId);
  if (!plane) notFound();
  const back = <Link className={buttonClass("quiet")} href={`/clubs/${club.slug}/bookings/${booking.id}`}>← The booking</Link>;
  return (
    <div className="max-w-2xl">
      <PageHeader title={`Check in · ${booking.registration}`} lead="The flight-log entry and the charge for the flight, in one step." actions={back} />
      <section className="card">
        {booking.status === "dispatched" || booking.status === "checked_in" ? (
          <CheckInForm slug={club.slug} bookingId={booking.id} checkedIn={booking.status === "checked_in"} hobbs={plane.currentHobbs} tach={plane.currentTach} metric={club.unitSystem === "metric"} rateText={`${formatMoney(plane.hourlyRateMinor, club.currency, club.locale)} per ${plane.rateMeter === "tach" ? "tach" : "Hobbs"} hour`} />
        ) : (
          <p>Dispatch the booking first: record and confirm the preflight.</p>
        )}
      </section>
    </div>
  );
}
