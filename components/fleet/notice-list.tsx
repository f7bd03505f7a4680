import type { NoticeListRow } from "@/db/queries/fleet-notices";
import { formatLocalTime } from "@/lib/fleet/time";
import { LiftNoticeForm } from "./notice-forms";

/** Grounding notices, active first, each with who issued and lifted it. */
export function NoticeList({ slug, rows, timeZone, canLift, showAircraft = false }: { slug: string; rows: NoticeListRow[]; timeZone: string; canLift: boolean; showAircraft?: boolean }) {
  if (rows.length === 0) return <p className="text-ink-700">No grounding notices on record.</p>;
  const ordered = [...rows].sort((a, b) => Number(Boolean(a.liftedAt)) - Number(Boolean(b.liftedAt)));
  return (
    <ul className="space-y-3">
      {ordered.map((n) => (
        <li key={n.id} className={`rounded border p-3 ${n.liftedAt ? "border-sand-300 bg-white" : "border-stop-600 bg-stop-100"}`}>
          <p className="break-words font-bold">{showAircraft ? `${n.registration}: ` : ""}{n.reason}</p>
          <p className="text-sm text-ink-700">
            {n.category === "maintenance" ? "Maintenance" : "Safety"} notice, in effect from {formatLocalTime(n.effectiveAt, timeZone)} · issued by {n.issuedByName ?? "someone"}
          </p>
          {n.liftedAt ? (
            <p className="text-sm">Lifted {formatLocalTime(n.liftedAt, timeZone)} by {n.liftedByName ?? "someone"}: {n.liftNote}{n.liftMechanicName ? ` (returned to service by ${n.liftMechanicName}, certificate ${n.liftCertificate})` : ""}</p>
          ) : canLift ? (
            <details className="mt-2 rounded border border-sand-300 bg-white p-2">
              <summary className="cursor-pointer font-bold text-fin-600">Lift this notice</summary>
              <div className="mt-2"><LiftNoticeForm slug={slug} noticeId={n.id} category={n.category} /></div>
            </details>
          ) : null}
        </li>
      ))}
    </ul>
  );
}
