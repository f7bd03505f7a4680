import { CurrencyStateBadge } from "@/components/currency/state-badge";
import type { DocumentRow } from "@/db/queries/safety-documents";
import { documentExpiryStatus } from "@/lib/currency";
import { DOCUMENT_KIND_LABELS } from "@/lib/safety/labels";
import { Day } from "@/components/ui/day";

/** A member's documents, newest first; older ones stay listed as history. */
export function DocumentsList({ slug, docs, today, warnDays, locale }: { slug: string; docs: DocumentRow[]; today: string; warnDays: number; locale?: string }) {
  if (docs.length === 0) return <p className="text-ink-500">No documents recorded yet.</p>;
  const newestOfKind = new Set<string>();
  return (
    <ul className="divide-y divide-sand-200">
      {docs.map((d) => {
        const superseded = newestOfKind.has(d.kind);
        newestOfKind.add(d.kind);
        const status = d.expiresOn ? documentExpiryStatus(d.expiresOn, today, warnDays) : null;
        return (
          <li key={d.id} className={`flex flex-wrap items-start justify-between gap-2 py-2 ${superseded ? "opacity-70" : ""}`}>
            <span className="min-w-0">
              <span className="font-bold">{DOCUMENT_KIND_LABELS[d.kind]}</span>
              {superseded ? <span className="ml-2 text-xs text-ink-500">(earlier record)</span> : null}
              {d.kind === "flight_review" ? <span className="ml-2 text-xs">{d.verifiedAt ? "✓ Verified" : "◇ Claimed: counts once an instructor or the safety officer verifies it"}</span> : null}
              <span className="block break-words text-sm text-ink-700">
                {[d.reference, d.details].filter(Boolean).join(" · ") || "—"} · issued <Day date={d.issuedOn} locale={locale} />
              </span>
              {d.uploadId ? <a className="text-sm" href={`/api/clubs/${slug}/uploads/${d.uploadId}`} target="_blank" rel="noopener">Open {d.fileName ?? "file"}</a> : null}
            </span>
            <span className="flex flex-wrap items-center gap-2 text-sm">
              {d.expiresOn ? <span className="tabular">until <Day date={d.expiresOn} locale={locale} /></span> : <span className="text-ink-500">No expiry</span>}
              {status && !superseded ? <CurrencyStateBadge state={status === "valid" ? "current" : status} /> : null}
            </span>
          </li>
        );
      })}
    </ul>
  );
}
