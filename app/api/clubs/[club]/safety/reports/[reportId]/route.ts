import { NextResponse } from "next/server";
import { getReport, getReporterName, listReportEvents } from "@/db/queries/safety-reports";
import { apiError, withClub } from "@/lib/server/api";
import { canReadReport, canTriageReports } from "@/lib/safety/report-access";
import { isRecordId } from "@/lib/validation/primitives";

export const dynamic = "force-dynamic";

/**
 * One safety report. Readable by the safety officer, and by the reporter of a named report;
 * anyone else — including the filer of an anonymous report and club admins — gets the same 404
 * as for a report that does not exist.
 */
export async function GET(_req: Request, { params }: { params: Promise<{ club: string; reportId: string }> }) {
  const { club, reportId } = await params;
  return withClub(club, null, (ctx) => {
    if (!isRecordId(reportId)) return apiError("not_found", "Not found.");
    const report = getReport(ctx.db, ctx.club.id, reportId);
    if (!report || !canReadReport(ctx.ability, report)) return apiError("not_found", "Not found.");
    const officer = canTriageReports(ctx.ability);
    return NextResponse.json({
      report: {
        id: report.id,
        anonymous: report.anonymous,
        reporter: report.anonymous ? null : getReporterName(ctx.db, ctx.club.id, report),
        occurredOn: report.occurredOn,
        occurredTime: report.occurredTime,
        location: report.location,
        aircraftId: report.aircraftId,
        whatHappened: report.whatHappened,
        contributingFactors: report.contributingFactors,
        factorsNote: report.factorsNote,
        status: report.status,
      },
      events: officer ? listReportEvents(ctx.db, ctx.club.id, report.id).map((e) => ({ ...e, createdAt: e.createdAt.toISOString() })) : [],
    });
  });
}
