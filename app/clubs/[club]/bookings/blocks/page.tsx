import type { Metadata } from "next";
import Link from "next/link";
import { clockTime, dayHeading, localInputValue } from "@/components/bookings/booking-words";
import { BlockForm, RemoveBlockButton } from "@/components/bookings/schedule-forms";
import { PageHeader } from "@/components/ui/page-header";
import { listBlocksInRange } from "@/db/queries/bookings-schedule";
import { listAircraft } from "@/db/queries/fleet";
import { addDays, isoDateInTimeZone } from "@/lib/dates";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Maintenance blocks" };
export const dynamic = "force-dynamic";

export default async function MaintenanceBlocksPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club } = await authorizePage(slug, ["create", "MaintenanceBlock"]);
  const now = new Date();
  const tz = club.timeZone;
  const tomorrow = addDays(isoDateInTimeZone(now, tz), 1);
  const blocks = listBlocksInRange(db, club.id, now, new Date(now.getTime() + 400 * 86_400_000));
  const when = (d: Date) => `${dayHeading(localInputValue(d, tz).slice(0, 10))} ${clockTime(d, tz)}`;
  return (
    <div className="max-w-2xl">
      <PageHeader title="Maintenance blocks" lead={`Time an aircraft is with maintenance. Members see each block and its reason on the booking page, and bookings over it are refused. Club time (${tz}).`} />
      <section className="card mb-4">
        <BlockForm slug={club.slug} aircraft={listAircraft(db, club.id).map((a) => ({ id: a.id, label: `${a.registration} — ${a.make} ${a.model}` }))} defaults={{ startsAt: `${tomorrow}T08:00`, endsAt: `${tomorrow}T17:00` }} />
      </section>
      <section className="card" aria-labelledby="blocks-h">
        <h2 id="blocks-h" className="mb-2 text-lg font-bold">Blocks now and to come</h2>
        {blocks.length === 0 ? <p className="text-sm text-ink-500">No aircraft is blocked.</p> : null}
        <ul className="divide-y divide-sand-200 text-sm">
          {blocks.map((b) => (
            <li key={b.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
              <span><strong>{b.registration}</strong> {`${when(b.startsAt)} – ${when(b.endsAt)}`} · {b.reason}</span>
              <RemoveBlockButton slug={club.slug} blockId={b.id} label={`${b.registration} ${when(b.startsAt)}`} />
            </li>
          ))}
        </ul>
      </section>
      <p className="mt-4"><Link href={`/clubs/${club.slug}/bookings`} className="inline-flex min-h-11 items-center">Back to the bookings</Link></p>
    </div>
  );
}
