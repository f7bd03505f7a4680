import type { Metadata } from "next";
import { Day, dayText } from "@/components/ui/day";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ReportStatusBadge } from "@/components/safety/status-shapes";
import { GroundFromReportForm, TriageForm } from "@/components/safety/triage-forms";
import { buttonClass } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { getReport, getReporterName, listClubAircraftChoices, listReportEvents } from "@/db/queries/safety-reports";
import { FACTOR_LABELS, REPORT_STATUS_LABELS, type ContributingFactor } from "@/lib/safety/labels";
import { canReadReport, canTriageReports } from "@/lib/safety/report-access";
import { nextReportStatuses } from "@/lib/safety/report-states";
import { formatLocalTime } from "@/lib/fleet/time";
import { authorizePage } from "@/lib/server/authorize";
import { isoDateInTimeZone } from "@/lib/dates";

export const metadata: Metadata = { title: "Safety report" };

export default async function ReportPage({ params }: { params: Promise<{ club: string; reportId: string }> }) {
  const { club: slug, reportId } = await params;
  const { db, club, ability } = await authorizePage(slug); // the report itself is checked below, once read
  const report = getReport(db, club.id, reportId);
  // Not readable is answered exactly like not there.
  if (!report || !canReadReport(ability, report)) notFound();
  const officer = canTriageReports(ability);
  const events = officer ? listReportEvents(db, club.id, report.id) : [];
  const aircraft = listClubAircraftChoices(db, club.id);
  const base = `/clubs/${club.slug}/safety`;
  return (
    <div className="max-w-5xl">
      <p className="mb-2 text-sm"><Link href={`${base}/reports`}>← Reports</Link></p>
      <PageHeader title={`Safety report of ${dayText(report.occurredOn, club.locale)}`} lead={<span className="inline-flex flex-wrap items-center gap-2"><ReportStatusBadge status={report.status} /> {report.anonymous ? "Filed anonymously — no link to the reporter is stored." : `Filed by ${getReporterName(db, club.id, report) ?? "a member"}.`}</span>} />
      <article className="card mb-6">
        <dl className="mb-4 grid gap-x-6 gap-y-2 sm:grid-cols-3">
          <div><dt className="text-sm font-bold text-ink-700">When</dt><dd><Day date={report.occurredOn} locale={club.locale} />{report.occurredTime ? ` ${report.occurredTime}` : ""}</dd></div>
          <div><dt className="text-sm font-bold text-ink-700">Where</dt><dd className="break-words">{report.location}</dd></div>
          <div><dt className="text-sm font-bold text-ink-700">Aircraft</dt><dd>{aircraft.find((a) => a.id === report.aircraftId)?.label ?? (report.aircraftId ? "A club aircraft" : "None given")}</dd></div>
        </dl>
        <h2 className="mb-1 font-bold">What happened</h2>
        <p className="mb-4 whitespace-pre-wrap break-words">{report.whatHappened}</p>
        <h2 className="mb-1 font-bold">Contributing factors</h2>
        <p className="break-words">{report.contributingFactors.length ? report.contributingFactors.map((f) => FACTOR_LABELS[f as ContributingFactor] ?? f).join(", ") : "None marked"}{report.factorsNote ? ` — ${report.factorsNote}` : ""}</p>
      </article>
      {officer ? (
        <div className="grid gap-6 lg:grid-cols-2">
          <section className="card min-w-0" aria-labelledby="triage-h">
            <h2 id="triage-h" className="mb-3 text-lg font-bold">Triage</h2>
            <TriageForm slug={club.slug} reportId={report.id} next={nextReportStatuses(report.status)} />
            <p className="mt-4"><Link href={`${base}/bulletins/new?fromReport=${report.id}`} className={buttonClass("secondary", "no-underline")}>Turn the lesson into a bulletin</Link></p>
          </section>
          <section className="card min-w-0" aria-labelledby="ground-h">
            <h2 id="ground-h" className="mb-1 text-lg font-bold">Ground an aircraft</h2>
            <p className="mb-3 text-sm text-ink-700">Issues a safety grounding notice at once and e-mails every member. Lifting it is done from the aircraft&apos;s page.</p>
            <GroundFromReportForm slug={club.slug} reportId={report.id} aircraft={aircraft} preselected={report.aircraftId} />
          </section>
          <section className="card min-w-0 lg:col-span-2" aria-labelledby="history-h">
            <h2 id="history-h" className="mb-2 text-lg font-bold">History</h2>
            <ol className="flex flex-col gap-2 text-sm">
              {/* The day only, in the club's calendar: an anonymous report keeps nothing finer. */}
              <li>{isoDateInTimeZone(report.createdAt, club.timeZone)} · Received</li>
              {events.map((e) => (
                <li key={e.id} className="break-words">
                  {formatLocalTime(e.createdAt, club.timeZone)} · {e.actorName ?? "Safety officer"} ·{" "}
                  {e.kind === "status" ? `${REPORT_STATUS_LABELS[e.fromStatus!]} → ${REPORT_STATUS_LABELS[e.toStatus!]}` : null}
                  {e.kind === "bulletin" && e.bulletinId ? <>Bulletin <Link href={`${base}/bulletins/${e.bulletinId}`}>{e.bulletinTitle ?? "draft"}</Link></> : null}
                  {e.kind === "grounding" ? "Aircraft grounded" : null}
                  {e.note ? <span className="block text-ink-700">{e.note}</span> : null}
                </li>
              ))}
            </ol>
          </section>
        </div>
      ) : (
        <p className="text-ink-700">The safety officer reads and follows up your report. You will see its state change here.</p>
      )}
    </div>
  );
}
