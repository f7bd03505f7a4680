"use server";
import { and, eq } from "drizzle-orm";
import { safetyReportEvents, safetyReports } from "@/db/schema";
import { getReport } from "@/db/queries/safety-reports";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { REPORT_STATUS_LABELS } from "@/lib/safety/labels";
import { canMoveReport, moveNeedsNote } from "@/lib/safety/report-states";
import { writeAudit } from "@/lib/server/audit";
import { triageReportSchema } from "@/lib/validation/safety";

export const triageReport = clubAction({
  schema: triageReportSchema,
  permission: ["triage", "SafetyReport"],
  success: "Report updated.",
  run(tx, { club, user }, input) {
    const report = getReport(tx, club.id, input.reportId);
    if (!report) throw new ActionError("That report was not found.", {}, "not_found");
    if (!canMoveReport(report.status, input.toStatus)) {
      throw new ActionError(`A report that is "${REPORT_STATUS_LABELS[report.status]}" cannot move to "${REPORT_STATUS_LABELS[input.toStatus]}".`, { toStatus: ["Choose one of the states offered."] });
    }
    if (moveNeedsNote(input.toStatus) && !input.note) {
      throw new ActionError("Some fields need attention; nothing was saved.", { note: [input.toStatus === "closed" ? "Say why the report is closed." : "Say what action was taken."] });
    }
    const moved = tx.update(safetyReports).set({ status: input.toStatus }).where(and(eq(safetyReports.clubId, club.id), eq(safetyReports.id, report.id), eq(safetyReports.status, report.status))).run();
    if (moved.changes === 0) throw new ActionError("Someone else changed this report just now; reload and try again.", {}, "conflict");
    tx.insert(safetyReportEvents).values({ clubId: club.id, reportId: report.id, actorId: user.id, kind: "status", fromStatus: report.status, toStatus: input.toStatus, note: input.note ?? null }).run();
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "safety_report.triage", subjectType: "SafetyReport", subjectId: report.id, before: { status: report.status }, after: { status: input.toStatus } });
    return { message: `Report marked "${REPORT_STATUS_LABELS[input.toStatus]}".`, refresh: true };
  },
});
