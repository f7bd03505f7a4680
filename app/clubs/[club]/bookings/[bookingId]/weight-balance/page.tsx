import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { LoadingForm } from "@/components/tools/loading-form";
import { LoadingResult } from "@/components/tools/loading-result";
import { buttonClass } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { SafetyCaution } from "@/components/ui/safety-caution";
import { getBooking } from "@/db/queries/bookings";
import { getBookingLoading, getWeightBalanceProfile } from "@/db/queries/tools-wb";
import { mayActOnBooking } from "@/lib/actions/bookings/booking-access";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Weight and balance" };
export const dynamic = "force-dynamic";

export default async function BookingWeightBalancePage({ params }: { params: Promise<{ club: string; bookingId: string }> }) {
  const { club: slug, bookingId } = await params;
  const ctx = await authorizePage(slug, ["read", "Tools"]);
  const { db, club } = ctx;
  const booking = getBooking(db, club.id, bookingId);
  if (!booking || !mayActOnBooking(ctx, booking)) notFound();
  const profile = getWeightBalanceProfile(db, club.id, booking.aircraftId);
  const saved = getBookingLoading(db, club.id, booking.id);
  const back = <Link className={buttonClass("quiet")} href={`/clubs/${club.slug}/bookings/${booking.id}`}>← The booking</Link>;
  if (!profile) {
    return (
      <div className="max-w-3xl">
        <PageHeader title={`Weight and balance · ${booking.registration}`} actions={back} />
        <p className="card">This aircraft has no weight and balance figures yet. Ask maintenance to enter them under Pilot tools.</p>
      </div>
    );
  }
  const defaults = saved
    ? { stationWeights: saved.stationWeights, fuelVolumes: saved.fuelVolumes, burnVolume: saved.burnVolume, category: saved.category }
    : { stationWeights: {}, fuelVolumes: Object.fromEntries(profile.tanks.map((t) => [t.key, t.usableCapacity])), burnVolume: 0, category: "normal" };
  return (
    <div className="max-w-3xl">
      <PageHeader title={`Weight and balance · ${booking.registration}`} lead={`Figures for ${booking.aircraftName} in ${profile.unitSystem === "metric" ? "kg and mm" : "lb and inches"}.${profile.source ? ` Source: ${profile.source}.` : ""}`} actions={back} />
      <div className="mb-4"><SafetyCaution compact /></div>
      <div className="grid gap-4 lg:grid-cols-2">
        <section className="card">
          <LoadingForm slug={club.slug} bookingId={booking.id} unitSystem={profile.unitSystem} stations={profile.stations} tanks={profile.tanks} hasUtility={Boolean(profile.envelopeUtility)} values={defaults} />
        </section>
        <section className="card min-w-0">
          <h2 className="mb-3 text-lg font-bold">Saved with the booking</h2>
          {saved ? (
            <LoadingResult
              unitSystem={profile.unitSystem}
              locale={club.locale}
              fuelKind={profile.fuelKind}
              takeoff={saved.takeoff}
              landing={saved.landing}
              problems={saved.problems}
              envelope={profile.envelopeNormal}
              utility={profile.envelopeUtility ?? null}
              maxTakeoffWeight={profile.maxTakeoffWeight}
              maxLandingWeight={profile.maxLandingWeight}
            />
          ) : (
            <p className="text-ink-700">Nothing saved yet. Enter the people, baggage and fuel, then work it out.</p>
          )}
        </section>
      </div>
    </div>
  );
}
