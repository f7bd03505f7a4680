import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { FlightSheetForm } from "@/components/bookings/flight-sheet-form";
import { clockTime } from "@/components/bookings/booking-words";
import { buttonClass } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { getBooking } from "@/db/queries/bookings";
import { getAircraft } from "@/db/queries/fleet";
import { getPreflightRecord, listPreflightRecords } from "@/db/queries/tools-preflight";
import { mayActOnBooking } from "@/lib/actions/bookings/booking-access";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Flight sheet" };
export const dynamic = "force-dynamic";

export default async function FlightSheetPage({ params }: { params: Promise<{ club: string; bookingId: string }> }) {
  const { club: slug, bookingId } = await params;
  const ctx = await authorizePage(slug, ["create", "Flight"]);
  const { db, club } = ctx;
  const booking = getBooking(db, club.id, bookingId);
  if (!booking || !mayActOnBooking(ctx, booking)) notFound();
  const plane = getAircraft(db, club.id, booking.aircraftId);
  if (!plane) notFound();
  // Fuel out: what the confirmed preflight record found in the tanks (the pilot may correct it).
  const recordId = booking.preflightRecordId ?? listPreflightRecords(db, club.id, booking.id)[0]?.id;
  const record = recordId ? getPreflightRecord(db, club.id, recordId) : undefined;
  const fuelOut = record ? String(Math.round(record.fuel.reduce((sum, f) => sum + f.quantity, 0) * 100) / 100) : "";
  const back = <Link className={buttonClass("quiet")} href={`/clubs/${club.slug}/bookings/${booking.id}`}>← The booking</Link>;
  return (
    <div className="max-w-2xl">
      <PageHeader title={`Flight sheet · ${booking.registration}`} lead="Out and in, side by side: the flight goes into the log and its charge onto your account in one step." actions={back} />
      <section className="card">
        {booking.status === "dispatched" || booking.status === "checked_in" ? (
          <FlightSheetForm
            slug={club.slug}
            bookingId={booking.id}
            closed={booking.status === "checked_in"}
            defaults={{
              hobbsOut: plane.currentHobbs?.toFixed(1) ?? "",
              tachOut: plane.currentTach?.toFixed(1) ?? "",
              fuelOut,
              timeOut: booking.dispatchedAt ? clockTime(booking.dispatchedAt, club.timeZone) : "",
            }}
            metric={club.unitSystem === "metric"}
            rate={{ perHourMinor: plane.hourlyRateMinor, currency: club.currency, meter: plane.rateMeter === "tach" ? "tach" : "hobbs" }}
          />
        ) : (
          <p>Begin the flight first: record the preflight and confirm it.</p>
        )}
      </section>
    </div>
  );
}
