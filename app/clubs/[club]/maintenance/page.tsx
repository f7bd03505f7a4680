import type { Metadata } from "next";
import { Day } from "@/components/ui/day";
import Link from "next/link";
import { ReviewMeterFlagForm } from "@/components/fleet/flight-forms";
import { NoticeList } from "@/components/fleet/notice-list";
import { SquawkList } from "@/components/fleet/squawk-list";
import { DueGlyph } from "@/components/fleet/due-view";
import { DUE_STATE_WORDS, dueState, remainingWords } from "@/lib/fleet/due-words";
import { PageHeader } from "@/components/ui/page-header";
import { SafetyCaution } from "@/components/ui/safety-caution";
import { StatusBadge } from "@/components/ui/status-badge";
import { listUploadsFor } from "@/db/queries/fleet";
import { listUnreviewedFlags } from "@/db/queries/fleet-flights";
import { listNotices } from "@/db/queries/fleet-notices";
import { getFlightLine } from "@/db/queries/fleet-status";
import { listSquawkEvents, listSquawks } from "@/db/queries/fleet-squawks";
import { authorizePageAny } from "@/lib/server/authorize";
import { can } from "@/permissions";

export const metadata: Metadata = { title: "Maintenance" };
export const dynamic = "force-dynamic";

/** The maintenance work queue: squawks to triage and close, meter flags, items coming due. */
export default async function MaintenancePage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club, ability } = await authorizePageAny(slug, ["triage", "Squawk"], ["record", "Inspection"]);
  const base = `/clubs/${club.slug}`;
  const line = getFlightLine(db, club);
  const open = listSquawks(db, club.id, { status: "open", limit: 200 });
  const events = listSquawkEvents(db, club.id, open.map((s) => s.id));
  const files = listUploadsFor(db, club.id, "Squawk", open.map((s) => s.id));
  const active = listNotices(db, club.id, { limit: 200 }).filter((n) => !n.liftedAt);
  const flags = can(ability, "read", "Flight") ? listUnreviewedFlags(db, club.id) : [];
  const canReview = can(ability, "update", "Flight");
  const attention = line.entries.flatMap((e) => e.due.filter((d) => d.overdue || d.incomplete || d.dueSoon).map((d) => ({ entry: e, d })));
  const untriaged = open.filter((s) => s.triage === "untriaged");
  const triaged = open.filter((s) => s.triage !== "untriaged");

  return (
    <div className="max-w-6xl">
      <PageHeader title="Maintenance" lead={`What needs maintenance at ${club.name}: to triage ${untriaged.length}, open squawks ${triaged.length}, meter flags ${flags.length}, items due or unknown ${attention.length}.`} />
      <SafetyCaution compact />

      <section aria-labelledby="fleet-h" className="mt-6">
        <h2 id="fleet-h" className="mb-3 text-xl font-bold">Fleet</h2>
        <ul className="grid gap-2 sm:grid-cols-2 lg:grid-cols-3">
          {line.entries.map((e) => (
            <li key={e.aircraft.id} className="card flex items-center justify-between gap-2 py-3">
              <Link href={`${base}/aircraft/${e.aircraft.id}`} className="font-bold">{e.aircraft.registration}</Link>
              <StatusBadge status={e.status} />
            </li>
          ))}
        </ul>
      </section>

      <section aria-labelledby="triage-h" className="mt-8">
        <h2 id="triage-h" className="mb-3 text-xl font-bold">Squawks awaiting triage</h2>
        <SquawkList slug={club.slug} locale={club.locale} timeZone={club.timeZone} rows={untriaged} events={events} files={files} today={line.today} canTriage={can(ability, "triage", "Squawk")} canClose={can(ability, "close", "Squawk")} showAircraft empty="Nothing waiting for triage." />
      </section>

      <section aria-labelledby="open-h" className="mt-8">
        <h2 id="open-h" className="mb-3 text-xl font-bold">Open squawks</h2>
        <SquawkList slug={club.slug} locale={club.locale} timeZone={club.timeZone} rows={triaged} events={events} files={files} today={line.today} canTriage={can(ability, "triage", "Squawk")} canClose={can(ability, "close", "Squawk")} showAircraft empty="No other open squawks." />
      </section>

      <section aria-labelledby="due-h" className="mt-8">
        <h2 id="due-h" className="mb-3 text-xl font-bold">Overdue, status unknown or coming up</h2>
        {attention.length === 0 ? <p className="text-ink-700">Nothing inside the club&apos;s due-soon window ({club.settings.dueSoonDays} days, {club.settings.dueSoonHours} h).</p> : (
          <ul className="card divide-y divide-sand-200 py-1">
            {attention.map(({ entry, d }) => (
              <li key={`${entry.aircraft.id}-${d.key}`} className="py-2">
                <Link href={`${base}/aircraft/${entry.aircraft.id}#due`} className="font-bold">{entry.aircraft.registration}</Link>{" "}
                <span className="inline-flex items-center gap-1 font-bold"><DueGlyph state={dueState(d)} size={14} />{DUE_STATE_WORDS[dueState(d)]}:</span> {d.name} — {remainingWords(d)}
              </li>
            ))}
          </ul>
        )}
      </section>

      <section aria-labelledby="flags-h" className="mt-8">
        <h2 id="flags-h" className="mb-3 text-xl font-bold">Meter continuity flags</h2>
        {flags.length === 0 ? <p className="text-ink-700">Every logged flight continues from the one before it, or its flag has been reviewed.</p> : (
          <ul className="space-y-3">
            {flags.map((f) => (
              <li key={f.id} className="rounded border border-stop-600 bg-white p-3" data-flight={f.id}>
                <p className="font-bold">{f.registration} · <Day date={f.flownOn} locale={club.locale} /> · {f.pilotName ?? "pilot"}: {f.continuity === "gap" ? "gap" : "overlap"}</p>
                <p className="text-sm">{f.continuityText}</p>
                {canReview ? <details className="mt-2"><summary className="cursor-pointer font-bold text-fin-600">Review</summary><div className="mt-2"><ReviewMeterFlagForm slug={club.slug} flightId={f.id} /></div></details> : null}
              </li>
            ))}
          </ul>
        )}
      </section>

      <section aria-labelledby="notices-h" className="mt-8">
        <h2 id="notices-h" className="mb-3 text-xl font-bold">Grounding notices in force</h2>
        <NoticeList slug={club.slug} rows={active} timeZone={club.timeZone} canLift={can(ability, "lift", "GroundingNotice")} showAircraft />
      </section>
    </div>
  );
}
