import Link from "next/link";
import { StatusBadge } from "@/components/ui/status-badge";
import { formatHours } from "@/lib/airworthiness";
import { pickNextDue } from "@/lib/fleet/flight-line";
import { TRIAGE_WORDS } from "@/lib/fleet/status-words";
import type { FlightLineEntry } from "@/lib/fleet/types";
import { DUE_STATE_WORDS, dueState, remainingWords } from "@/lib/fleet/due-words";
import { DueGlyph } from "./due-view";

const DUE_TONE = { overdue: "text-plum-800", unknown: "text-fog-800", soon: "text-dusk-800", ok: "text-ink-700" } as const;

function meter(value: number | null): string {
  return value === null ? "missing record" : formatHours(value);
}

/** One aircraft on the flight line: status word and shape, every reason, next due, open squawks. */
export function AircraftCard({ entry, slug, blockLines = [] }: { entry: FlightLineEntry; slug: string; blockLines?: string[] }) {
  const a = entry.aircraft;
  const href = `/clubs/${slug}/aircraft/${a.id}`;
  const headingId = `ac-${a.id}`;
  const next = pickNextDue(entry.due);
  return (
    <article className="card flex min-w-0 flex-col gap-3" aria-labelledby={headingId} data-registration={a.registration} data-status={entry.status}>
      <header className="flex flex-wrap items-start justify-between gap-2">
        <div className="min-w-0">
          <h2 id={headingId} className="text-xl font-bold">
            <Link href={href} className="tap">{a.registration}</Link>
          </h2>
          <p className="text-sm text-ink-700">{a.make} {a.model}{a.homeField ? ` · ${a.homeField}` : ""}</p>
        </div>
        <StatusBadge status={entry.status} large />
      </header>

      <section aria-label={`Reasons for ${a.registration}`}>
        {entry.reasons.length === 0 ? (
          <p className="text-sm text-ink-700">No open squawks, notices or due items on record.</p>
        ) : (
          <ul className="space-y-1 text-sm">
            {entry.reasons.map((r, i) => (
              <li key={`${r.code}-${i}`} className={`flex gap-2 ${r.grounding ? "font-bold text-plum-800" : "text-ink-900"}`}>
                <span aria-hidden="true">{r.grounding ? "■" : "•"}</span>
                <span className="min-w-0 break-words">{r.grounding ? <span className="sr-only">Grounding reason: </span> : null}{r.text}</span>
              </li>
            ))}
          </ul>
        )}
      </section>

      {blockLines.length ? (
        <section aria-label={`Maintenance blocks for ${a.registration}`}>
          <ul className="space-y-1 text-sm">
            {blockLines.map((line) => (
              <li key={line} className="flex gap-2 rounded border-l-4 border-sand-500 bg-sand-50 px-2 py-1 text-ink-900">
                <svg aria-hidden="true" viewBox="0 0 16 16" className="mt-0.5 h-4 w-4 shrink-0" data-shape="block"><rect x="1.5" y="3.5" width="13" height="9" fill="none" stroke="currentColor" strokeWidth="1.5" /><path d="M4 12l5-8M8 12l5-8" stroke="currentColor" strokeWidth="1.5" /></svg>
                <span className="min-w-0 break-words">{line}. Bookings are refused while it lasts.</span>
              </li>
            ))}
          </ul>
        </section>
      ) : null}

      {next.length ? (
        <section aria-label={`Next due for ${a.registration}`}>
          <h3 className="text-sm font-bold uppercase tracking-wide text-ink-500">Next due</h3>
          <ul className="mt-1 space-y-0.5 text-sm">
            {next.map((d) => (
              <li key={d.key} className={`flex gap-1.5 ${DUE_TONE[dueState(d)]}`}>
                <span className="mt-0.5"><DueGlyph state={dueState(d)} size={14} /></span>
                <span className="min-w-0"><span className="font-bold">{d.name}</span>{dueState(d) === "ok" ? "" : ` · ${DUE_STATE_WORDS[dueState(d)]}`}: {remainingWords(d)}</span>
              </li>
            ))}
          </ul>
        </section>
      ) : null}

      <footer className="mt-auto flex flex-wrap items-center justify-between gap-2 border-t border-sand-200 pt-2 text-sm text-ink-700">
        <span className="tabular font-mono">Hobbs {meter(a.hobbs)} · Tach {meter(a.tach)}</span>
        <Link href={`${href}#squawks`} className="tap">
          {entry.openSquawks.length === 0 ? "No open squawks" : `${entry.openSquawks.length} open squawk${entry.openSquawks.length === 1 ? "" : "s"}`}
          {entry.openSquawks.some((s) => s.triage === "untriaged") ? ` (${TRIAGE_WORDS.untriaged.toLowerCase()})` : ""}
        </Link>
      </footer>
    </article>
  );
}
