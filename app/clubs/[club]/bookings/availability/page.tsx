import type { Metadata } from "next";
import Link from "next/link";
import { clockTime, dayHeading, localInputValue } from "@/components/bookings/booking-words";
import { AvailabilityForm, RemoveAvailabilityButton } from "@/components/bookings/schedule-forms";
import { PageHeader } from "@/components/ui/page-header";
import { listAvailability } from "@/db/queries/bookings-schedule";
import { addDays, isoDateInTimeZone } from "@/lib/dates";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "My available times" };
export const dynamic = "force-dynamic";

export default async function AvailabilityPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club, user } = await authorizePage(slug, ["create", "Availability"]);
  const now = new Date();
  const tz = club.timeZone;
  const tomorrow = addDays(isoDateInTimeZone(now, tz), 1);
  const windows = listAvailability(db, club.id, now, new Date(now.getTime() + 400 * 86_400_000), user.id);
  const when = (d: Date) => `${dayHeading(localInputValue(d, tz).slice(0, 10))} ${clockTime(d, tz)}`;
  return (
    <div className="max-w-2xl">
      <PageHeader
        title="My available times"
        lead={`When you are available to fly with members, in club time (${tz}). Once you keep any, members can book you only inside them; with none, you can be booked whenever you are not already flying.`}
      />
      <section className="card mb-4">
        <AvailabilityForm slug={club.slug} defaults={{ startsAt: `${tomorrow}T09:00`, endsAt: `${tomorrow}T17:00` }} />
      </section>
      <section className="card" aria-labelledby="times-h">
        <h2 id="times-h" className="mb-2 text-lg font-bold">Your times to come</h2>
        {windows.length === 0 ? <p className="text-sm text-ink-500">You have no available times to come.</p> : null}
        <ul className="divide-y divide-sand-200 text-sm">
          {windows.map((w) => (
            <li key={w.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
              <span className="tabular">{`${when(w.startsAt)} – ${clockTime(w.endsAt, tz)}`}</span>
              <RemoveAvailabilityButton slug={club.slug} availabilityId={w.id} label={when(w.startsAt)} />
            </li>
          ))}
        </ul>
      </section>
      <p className="mt-4"><Link href={`/clubs/${club.slug}/bookings`} className="inline-flex min-h-11 items-center">Back to the bookings</Link></p>
    </div>
  );
}
