import type { SquawkEventView, SquawkListRow } from "@/db/queries/fleet-squawks";
import type { UploadLink } from "@/db/queries/fleet";
import { FOUND_DURING_WORDS, TRIAGE_WORDS } from "@/lib/fleet/status-words";
import { formatLocalTime } from "@/lib/fleet/time";
import { CloseSquawkForm, TriageSquawkForm } from "./squawk-forms";
import { Day } from "@/components/ui/day";

const EVENT_WORDS = { reported: "Reported", triaged: "Triaged", closed: "Closed" } as const;

/** When something happened, on the club's clock (every reader is at or near the home field). */
function stamp(d: Date, timeZone: string): string {
  return formatLocalTime(d, timeZone);
}

/** Squawks with their whole history (who and when) and files; maintenance controls where allowed. */
export function SquawkList({ slug, timeZone, rows, events, files, today, canTriage, canClose, showAircraft = false, empty = "No squawks on record.", locale }: {
  locale?: string;
  slug: string;
  timeZone: string;
  rows: SquawkListRow[];
  events: SquawkEventView[];
  files: UploadLink[];
  today: string;
  canTriage: boolean;
  canClose: boolean;
  showAircraft?: boolean;
  empty?: string;
}) {
  if (rows.length === 0) return <p className="text-ink-700">{empty}</p>;
  return (
    <ul className="space-y-3">
      {rows.map((s) => {
        const history = events.filter((e) => e.squawkId === s.id);
        const photos = files.filter((f) => f.subjectId === s.id);
        return (
          <li key={s.id} className="rounded border border-sand-300 bg-white p-3" data-squawk={s.id}>
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <p className="min-w-0 break-words font-bold">{showAircraft ? `${s.registration}: ` : ""}{s.description}</p>
              <span className={`text-sm font-bold ${s.status === "closed" ? "text-go-800" : s.triage === "grounding" ? "text-stop-800" : "text-ink-700"}`}>
                {s.status === "closed" ? "Closed" : TRIAGE_WORDS[s.triage]}
              </span>
            </div>
            <p className="text-sm text-ink-500">{FOUND_DURING_WORDS[s.foundDuring]} · reported by {s.reportedByName ?? "a member"}{s.suspectedGrounding ? " · reporter thinks it may affect airworthiness" : ""}</p>
            {s.limitation && s.status === "open" ? <p className="mt-1 text-sm font-bold text-sock-700">Limitation: {s.limitation}</p> : null}
            {s.status === "closed" ? (
              <p className="mt-1 text-sm">{s.triage === "note" ? "Closed" : "Returned to service"} <Day date={s.rtsOn} locale={locale} />{s.rtsMechanicName ? ` by ${s.rtsMechanicName}, certificate ${s.rtsCertificate}` : ""}: {s.repairNotes}</p>
            ) : null}
            {photos.length ? (
              <ul className="mt-2 flex flex-wrap gap-2" aria-label="Files">
                {photos.map((f) => (
                  <li key={f.id}>
                    <a href={`/api/clubs/${slug}/uploads/${f.id}`} target="_blank" rel="noreferrer" className="text-sm">
                      {f.mimeType.startsWith("image/") ? (
                        <img src={`/api/clubs/${slug}/uploads/${f.id}`} alt={`Photo: ${f.originalName}`} className="h-20 w-20 rounded border border-sand-300 object-cover" />
                      ) : (
                        `${f.originalName} (PDF)`
                      )}
                    </a>
                  </li>
                ))}
              </ul>
            ) : null}
            <details className="mt-2 text-sm">
              <summary className="cursor-pointer text-fin-600">History ({history.length})</summary>
              <ol className="mt-1 space-y-1 border-l-2 border-sand-300 pl-3">
                {history.map((e) => (
                  <li key={e.id}>
                    <span className="font-mono tabular text-xs">{stamp(e.at, timeZone)}</span> {EVENT_WORDS[e.kind]}
                    {e.kind === "triaged" ? ` as ${TRIAGE_WORDS[e.toTriage as keyof typeof TRIAGE_WORDS] ?? e.toTriage}` : ""} by {e.actorName ?? "someone"}
                    {e.note ? <span className="block text-ink-700">{e.note}</span> : null}
                  </li>
                ))}
              </ol>
            </details>
            {s.status === "open" && (canTriage || canClose) ? (
              <div className="mt-3 grid gap-3 md:grid-cols-2">
                {canTriage ? (
                  <details className="rounded border border-sand-200 p-2">
                    <summary className="cursor-pointer font-bold text-fin-600">Triage</summary>
                    <div className="mt-2"><TriageSquawkForm slug={slug} squawkId={s.id} current={s.triage} limitation={s.limitation} determinedBy={s.deferralDeterminedBy} placarded={s.placarded} /></div>
                  </details>
                ) : null}
                {canClose ? (
                  <details className="rounded border border-sand-200 p-2">
                    <summary className="cursor-pointer font-bold text-fin-600">{s.triage === "note" ? "Close the note" : "Close (return to service)"}</summary>
                    <div className="mt-2"><CloseSquawkForm slug={slug} squawkId={s.id} today={today} needsMechanic={s.triage !== "note"} /></div>
                  </details>
                ) : null}
              </div>
            ) : null}
          </li>
        );
      })}
    </ul>
  );
}
