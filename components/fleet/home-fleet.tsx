import Link from "next/link";
import type { Db } from "@/db/client";
import type { Club } from "@/db/schema";
import { getFlightLine } from "@/db/queries/fleet-status";
import { StatusBadge } from "@/components/ui/status-badge";

/** Club home tile: each aircraft's status word and shape, with the first reason when it is not flyable. */
export function HomeFleet({ db, club }: { db: Db; club: Club }) {
  const line = getFlightLine(db, club);
  const base = `/clubs/${club.slug}`;
  return (
    <article className="card" aria-labelledby="home-fleet-h">
      <h2 id="home-fleet-h" className="text-lg font-bold"><Link href={`${base}/flight-line`}>Flight line</Link></h2>
      {line.entries.length === 0 ? <p className="mt-1 text-ink-700">No aircraft on the fleet yet.</p> : (
        <ul className="mt-2 space-y-2">
          {line.entries.map((e) => (
            <li key={e.aircraft.id} className="flex flex-wrap items-center justify-between gap-x-2 gap-y-1">
              <Link href={`${base}/aircraft/${e.aircraft.id}`} className="font-bold">{e.aircraft.registration}</Link>
              <StatusBadge status={e.status} />
              {e.status !== "flyable" && e.reasons[0] ? <span className="w-full text-sm text-ink-700">{e.reasons[0].text}</span> : null}
            </li>
          ))}
        </ul>
      )}
      <p className="mt-2 text-xs text-ink-500">The pilot in command decides airworthiness; see the caution above.</p>
    </article>
  );
}
