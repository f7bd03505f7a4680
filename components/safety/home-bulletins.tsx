import Link from "next/link";
import type { Db } from "@/db/client";
import { listBulletinsToAcknowledge } from "@/db/queries/safety-bulletins";
import { deadlineState } from "@/lib/safety/acknowledgements";
import type { Role } from "@/permissions";
import { ShapeIcon, UrgencyBadge } from "./status-shapes";

/** Home page tile: the bulletins waiting for this member's acknowledgement. */
export function HomeBulletins({ db, clubId, slug, userId, roles, today }: { db: Db; clubId: string; slug: string; userId: string; roles: Role[]; today: string }) {
  const waiting = listBulletinsToAcknowledge(db, clubId, { userId, roles });
  return (
    <article className="card" aria-labelledby="home-bulletins-h">
      <h2 id="home-bulletins-h" className="text-lg font-bold"><Link href={`/clubs/${slug}/safety`}>Safety bulletins</Link></h2>
      {waiting.length === 0 ? (
        <p className="mt-1 inline-flex items-center gap-2 text-ink-700"><ShapeIcon shape="check" className="text-go-600" />Nothing waiting: you have acknowledged every bulletin addressed to you.</p>
      ) : (
        <>
          <p className="mt-1 text-ink-700">{waiting.length === 1 ? "One bulletin waits" : `${waiting.length} bulletins wait`} for your acknowledgement.</p>
          <ul className="mt-2 flex flex-col gap-2" aria-label="Bulletins to acknowledge">
            {waiting.slice(0, 5).map((b) => {
              const d = deadlineState(b.acknowledgeBy, today);
              return (
                <li key={b.id} className="rounded border border-sand-300 bg-sand-50 p-2">
                  <div className="flex flex-wrap items-center gap-2"><UrgencyBadge urgency={b.urgency} />{b.acknowledgeBy ? <span className={`text-xs ${d === "overdue" ? "font-bold text-stop-800" : "text-ink-700"}`}>{d === "overdue" ? `Deadline passed ${b.acknowledgeBy}` : `By ${b.acknowledgeBy}`}</span> : null}</div>
                  <Link href={`/clubs/${slug}/safety/bulletins/${b.id}`} className="mt-1 block font-bold">{b.title}</Link>
                </li>
              );
            })}
          </ul>
          {waiting.length > 5 ? <p className="mt-2 text-sm"><Link href={`/clubs/${slug}/safety`}>All {waiting.length} bulletins</Link></p> : null}
        </>
      )}
    </article>
  );
}
