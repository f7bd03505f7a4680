import type { Metadata } from "next";
import Link from "next/link";
import { AssignAdminForm } from "@/components/operator/assign-admin-form";
import { PageHeader } from "@/components/ui/page-header";
import { getDb } from "@/db/client";
import { listOperatorClubSummaries } from "@/db/queries/operator";
import { authorizeOperatorPage } from "@/lib/server/authorize";
import { formatMoney } from "@/lib/money";
import { STATUS_WORDS } from "@/lib/fleet/status-words";
import { STATUS_TEXT_TONE, StatusShape } from "@/components/ui/status-badge";

// Not "Operator console": that is the layout's header, and a render that skips the layout must not carry it.
export const metadata: Metadata = { title: "Clubs you administer" };

export default async function OperatorHome() {
  const user = await authorizeOperatorPage();
  const summaries = listOperatorClubSummaries(getDb(), user);
  return (
    <div>
      <PageHeader title="Clubs you administer" lead={`${summaries.length} clubs. Totals only: member-level detail stays with each club.`} actions={<Link href="/operator/clubs/new">Create a club</Link>} />
      <ul className="grid gap-4 md:grid-cols-2">
        {summaries.map((c) => (
          <li key={c.id} className="card">
            <h2 className="text-lg font-bold">{c.name}</h2>
            <p className="text-sm text-ink-500">/clubs/{c.slug} · {c.timeZone} · {c.currency} · {c.unitSystem === "metric" ? "metric" : "US units"}</p>
            <dl className="mt-3 grid grid-cols-2 gap-2 text-sm">
              <div><dt className="text-ink-500">Active members</dt><dd className="text-xl font-bold tabular">{c.activeMembers}</dd></div>
              <div><dt className="text-ink-500">Admins</dt><dd className="text-xl font-bold tabular">{c.admins}</dd></div>
              <div><dt className="text-ink-500">Receivables</dt><dd className="text-xl font-bold tabular">{formatMoney(c.receivables.totalMinor, c.currency, c.locale)}</dd></div>
              <div><dt className="text-ink-500">Overdue more than 30 days</dt><dd className="text-xl font-bold tabular">{formatMoney(c.receivables.over30Minor, c.currency, c.locale)}</dd></div>
            </dl>
            <p className="mt-3 text-sm font-bold text-ink-700">Fleet</p>
            <ul className="mt-1 flex flex-wrap gap-2 text-sm" aria-label={`Fleet status of ${c.name}`}>
              {(["flyable", "limited", "grounded", "unknown"] as const).map((s) => (
                <li key={s} className={`inline-flex items-center gap-1 rounded border border-sand-300 bg-sand-50 px-2 py-1 ${STATUS_TEXT_TONE[s]}`}><StatusShape status={s} size={14} /><span className="tabular font-bold">{c.fleet[s]}</span> {STATUS_WORDS[s]}</li>
              ))}
            </ul>
            {c.admins === 0 ? <p className="mt-2 text-sm text-sock-700">No active admin yet: appoint one.</p> : null}
            <AssignAdminForm clubId={c.id} clubName={c.name} />
          </li>
        ))}
      </ul>
    </div>
  );
}
