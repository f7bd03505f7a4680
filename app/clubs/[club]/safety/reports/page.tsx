import { scrollArea } from "@/components/ui/scroll-area";
import { Day } from "@/components/ui/day";
import type { Metadata } from "next";
import Link from "next/link";
import { ReportStatusBadge } from "@/components/safety/status-shapes";
import { SafetyLinks } from "@/components/safety/safety-links";
import { PageHeader } from "@/components/ui/page-header";
import { listOwnNamedReports, listReportsForOfficer, type ReportListRow } from "@/db/queries/safety-reports";
import { authorizePageAny } from "@/lib/server/authorize";
import { canTriageReports } from "@/lib/safety/report-access";
import { can } from "@/permissions";
import { REPORT_FILED_MESSAGE } from "@/lib/safety/report-filed";

export const metadata: Metadata = { title: "Safety reports" };

function ReportTable({ slug, rows, officer, locale }: { slug: string; rows: ReportListRow[]; officer: boolean; locale: string }) {
  return (
    <div className="overflow-x-auto rounded border border-sand-300 bg-white" {...scrollArea("Safety reports")}>
      <table className="w-full min-w-[40rem] text-left text-sm">
        <thead className="bg-sand-200">
          <tr><th scope="col" className="px-3 py-2">Happened</th><th scope="col" className="px-3 py-2">Where</th><th scope="col" className="px-3 py-2">Summary</th><th scope="col" className="px-3 py-2">State</th>{officer ? <th scope="col" className="px-3 py-2">Filed</th> : null}</tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.id} className="border-t border-sand-200 align-top">
              <td className="whitespace-nowrap px-3 py-2 tabular"><Day date={r.occurredOn} locale={locale} /></td>
              <td className="px-3 py-2">{r.location}{r.aircraftRegistration ? <span className="block text-xs text-ink-500">{r.aircraftRegistration}</span> : null}</td>
              <td className="px-3 py-2"><Link href={`/clubs/${slug}/safety/reports/${r.id}`}>{r.whatHappened.slice(0, 90)}{r.whatHappened.length > 90 ? "…" : ""}</Link></td>
              <td className="px-3 py-2"><ReportStatusBadge status={r.status} /></td>
              {officer ? <td className="px-3 py-2">{r.anonymous ? "Anonymously" : "Named"}</td> : null}
            </tr>
          ))}
          {rows.length === 0 ? <tr><td colSpan={officer ? 5 : 4} className="px-3 py-6 text-center text-ink-500">No reports.</td></tr> : null}
        </tbody>
      </table>
    </div>
  );
}

export default async function ReportsPage({ params, searchParams }: { params: Promise<{ club: string }>; searchParams: Promise<{ filed?: string }> }) {
  const { club: slug } = await params;
  const sp = await searchParams;
  const { db, club, user, ability } = await authorizePageAny(slug, ["triage", "SafetyReport"], ["create", "SafetyReport"]);
  const officer = canTriageReports(ability);
  const rows = officer ? listReportsForOfficer(db, club.id) : listOwnNamedReports(db, club.id, user.id);
  const open = rows.filter((r) => r.status !== "closed");
  const closed = rows.filter((r) => r.status === "closed");
  return (
    <div className="max-w-5xl">
      <PageHeader
        title={officer ? "Safety reports" : "My safety reports"}
        lead={officer ? "Every report filed in the club. Anonymous reports carry no link to who filed them." : "Reports you filed under your name. Anonymous reports are not linked to you and do not appear here."}
        actions={can(ability, "create", "SafetyReport") ? <Link href={`/clubs/${club.slug}/safety/reports/new`} className="inline-flex min-h-11 items-center rounded bg-fin-600 px-4 py-2 font-bold text-white no-underline hover:bg-fin-700">File a report</Link> : null}
      />
      <SafetyLinks slug={club.slug} ability={ability} userId={user.id} />
      {/* One answer for every filer: it must not say which kind of report was filed. */}
      {sp.filed ? <p role="status" className="mb-4 rounded border border-go-600 bg-go-100 px-3 py-2 text-go-800">{REPORT_FILED_MESSAGE} Reports filed under your name are listed here; anonymous reports are not linked to you and never appear.</p> : null}
      <section aria-labelledby="open-h" className="mb-6">
        <h2 id="open-h" className="mb-2 text-lg font-bold">Open ({open.length})</h2>
        <ReportTable slug={club.slug} rows={open} officer={officer} locale={club.locale} />
      </section>
      <section aria-labelledby="closed-h">
        <h2 id="closed-h" className="mb-2 text-lg font-bold">Closed ({closed.length})</h2>
        <ReportTable slug={club.slug} rows={closed} officer={officer} locale={club.locale} />
      </section>
    </div>
  );
}
