import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { PreflightForm } from "@/components/preflight/preflight-form";
import { buttonClass } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { SafetyCaution } from "@/components/ui/safety-caution";
import { StatusBadge } from "@/components/ui/status-badge";
import { getBooking } from "@/db/queries/bookings";
import { getAircraftStatusEntry } from "@/db/queries/fleet-status";
import { getPreflightRecord, getPreflightTemplate, listPreflightRecords, preflightTanks } from "@/db/queries/tools-preflight";
import { mayActOnBooking } from "@/lib/actions/bookings/booking-access";
import { formatLocalTime } from "@/lib/fleet/time";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Preflight" };
export const dynamic = "force-dynamic";

export default async function PreflightPage({ params }: { params: Promise<{ club: string; bookingId: string }> }) {
  const { club: slug, bookingId } = await params;
  const ctx = await authorizePage(slug, ["read", "Booking"]);
  const { db, club } = ctx;
  const booking = getBooking(db, club.id, bookingId);
  if (!booking || !mayActOnBooking(ctx, booking)) notFound();
  const template = getPreflightTemplate(db, club.id, booking.aircraftId);
  const tanks = preflightTanks(db, club.id, template, booking.aircraftId);
  const status = getAircraftStatusEntry(db, club, booking.aircraftId);
  const records = listPreflightRecords(db, club.id, booking.id).slice(0, 3).map((r) => getPreflightRecord(db, club.id, r.id)!);
  const metric = club.unitSystem === "metric";
  const open = booking.status === "reserved" || booking.status === "dispatched";
  return (
    <div className="max-w-3xl">
      <PageHeader
        title={`Preflight · ${booking.registration}`}
        lead={<span className="inline-flex flex-wrap items-center gap-2">{booking.aircraftName} <StatusBadge status={status?.status} /></span>}
        actions={<Link className={buttonClass("quiet")} href={`/clubs/${club.slug}/bookings/${booking.id}`}>← The booking</Link>}
      />
      <div className="mb-4"><SafetyCaution compact /></div>
      {!template ? (
        <p className="card">This aircraft has no preflight checklist yet; maintenance sets it up under Pilot tools.</p>
      ) : open ? (
        <section className="card mb-4">
          <PreflightForm
            slug={club.slug}
            bookingId={booking.id}
            items={template.items.map((i) => ({ id: i.id, section: i.section, label: i.label, kind: i.kind }))}
            tanks={tanks}
            sumpPoints={template.sumpPoints}
            oilMinimum={template.oilMinimum}
            oilMaximum={template.oilMaximum}
            units={{ fuel: metric ? "L" : "US gal", oil: metric ? "L" : "qt" }}
          />
        </section>
      ) : (
        <p className="card mb-4">This booking is closed; its preflight records are below.</p>
      )}
      {records.length ? (
        <section className="card" aria-labelledby="records-h">
          <h2 id="records-h" className="mb-2 text-lg font-bold">Recorded on this booking</h2>
          <ul className="divide-y divide-sand-200">
            {records.map((r) => (
              <li key={r.id} className="py-2 text-sm">
                <p className="font-bold">{formatLocalTime(r.createdAt, club.timeZone)} — {r.outcome === "ok" ? "● All as expected" : `▲ ${r.findingCount} finding${r.findingCount === 1 ? "" : "s"}`}</p>
                <p>Fuel: {r.fuel.map((f) => `${f.tank} ${f.quantity}`).join(", ")} {metric ? "L" : "US gal"} · Oil {r.oilQuantity} {metric ? "L" : "qt"} (minimum {r.oilMinimum}) · Samples: {r.sumps.map((s) => `${s.point} ${s.result === "clear" ? "clear" : "water or sediment"}`).join(", ")}</p>
                {r.items.filter((i) => i.result === "finding").map((i) => (
                  <p key={i.id}>Finding: {i.label}{i.note ? ` — ${i.note}` : ""}{i.squawkId ? " (reported as a squawk)" : ""}</p>
                ))}
              </li>
            ))}
          </ul>
        </section>
      ) : null}
    </div>
  );
}
