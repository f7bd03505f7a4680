import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { LogFlightForm } from "@/components/fleet/flight-forms";
import { FlightsTable } from "@/components/fleet/flights-table";
import { PageHeader } from "@/components/ui/page-header";
import { getAircraft, listAircraft } from "@/db/queries/fleet";
import { listFlights } from "@/db/queries/fleet-flights";
import { isoDateInTimeZone } from "@/lib/dates";
import { can } from "@/permissions";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Flight log" };
export const dynamic = "force-dynamic";

export default async function FlightsPage({ params, searchParams }: { params: Promise<{ club: string }>; searchParams: Promise<{ aircraft?: string }> }) {
  const { club: slug } = await params;
  const { aircraft: filter } = await searchParams;
  const { db, club, ability } = await authorizePage(slug, ["read", "Flight"]);
  const selected = filter ? getAircraft(db, club.id, filter) : undefined;
  if (filter && !selected) notFound();
  const fleet = listAircraft(db, club.id);
  const rows = listFlights(db, club.id, { aircraftId: selected?.id, limit: 200 });
  const base = `/clubs/${club.slug}/flights`;
  return (
    <div className="max-w-6xl">
      <PageHeader title="Flight log" lead="Meter readings out and in for every flight. A gap or overlap with the flight before is flagged for maintenance." />
      {can(ability, "create", "Flight") ? (
        <details className="card mb-6" open={rows.length === 0}>
          <summary className="cursor-pointer text-lg font-bold text-fin-600">Log a flight</summary>
          <div className="mt-3 max-w-xl">
            <LogFlightForm slug={club.slug} aircraft={fleet.map((a) => ({ id: a.id, registration: a.registration, hobbs: a.currentHobbs, tach: a.currentTach }))} today={isoDateInTimeZone(new Date(), club.timeZone)} metric={club.unitSystem === "metric"} />
          </div>
        </details>
      ) : null}
      <nav aria-label="Filter by aircraft" className="mb-3 flex flex-wrap gap-2 text-sm">
        <Link href={base} aria-current={!selected ? "page" : undefined} className={!selected ? "font-bold" : ""}>All aircraft</Link>
        {fleet.map((a) => (
          <Link key={a.id} href={`${base}?aircraft=${a.id}`} aria-current={selected?.id === a.id ? "page" : undefined} className={selected?.id === a.id ? "font-bold" : ""}>{a.registration}</Link>
        ))}
      </nav>
      <FlightsTable rows={rows} locale={club.locale} />
    </div>
  );
}
