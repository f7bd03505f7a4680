import Link from "next/link";
import { isoDateInTimeZone } from "@/lib/dates";
import type { BulletinListRow } from "@/db/queries/safety-bulletins";
import { deadlineState } from "@/lib/safety/acknowledgements";
import { audienceLabel } from "@/lib/safety/labels";
import { ShapeIcon, UrgencyBadge } from "./status-shapes";

type Row = BulletinListRow & { mine?: boolean; stats?: { acknowledged: number; audience: number } | null };

function Deadline({ by, today }: { by: string | null; today: string }) {
  const s = deadlineState(by, today);
  if (s === "none") return null;
  if (s === "overdue") return <span className="inline-flex items-center gap-1 text-stop-800"><ShapeIcon shape="octagon" />Deadline passed {by}</span>;
  if (s === "due_today") return <span className="inline-flex items-center gap-1 text-sock-700"><ShapeIcon shape="triangle" />Due today</span>;
  return <span>Acknowledge by {by}</span>;
}

export function BulletinList({ slug, timeZone, rows, today }: { slug: string; timeZone: string; rows: Row[]; today: string }) {
  return (
    <ul className="flex flex-col gap-3">
      {rows.map((b) => (
        <li key={b.id} className="card">
          <div className="flex flex-wrap items-center gap-2">
            <UrgencyBadge urgency={b.urgency} />
            {b.version > 1 ? <span className="text-xs text-ink-500">Version {b.version}</span> : null}
            {b.mine ? <span className="inline-flex items-center gap-1 rounded border border-sock-500 px-2 py-0.5 text-xs font-bold text-sock-700"><ShapeIcon shape="ring" />For you to acknowledge</span> : null}
          </div>
          <h3 className="mt-2 text-lg font-bold"><Link href={`/clubs/${slug}/safety/bulletins/${b.id}`}>{b.title}</Link></h3>
          <p className="mt-1 flex flex-wrap gap-x-4 gap-y-1 text-sm text-ink-700">
            <span>{audienceLabel(b.audience, b.audienceTypeGroup)}</span>
            <span>{b.publishedAt ? `Published ${isoDateInTimeZone(b.publishedAt, timeZone)}` : `Draft by ${b.authorName ?? "the safety officer"}`}</span>
            <Deadline by={b.acknowledgeBy} today={today} />
            {b.stats ? <span className="tabular">{b.stats.acknowledged} of {b.stats.audience} acknowledged</span> : null}
          </p>
        </li>
      ))}
    </ul>
  );
}
