"use server";
import { and, eq } from "drizzle-orm";
import { safetyReportEvents } from "@/db/schema";
import { getReport } from "@/db/queries/safety-reports";
import { initialActionState, type ActionState } from "@/lib/actions/action-state";
import { formDataToObject, zodFieldErrors } from "@/lib/actions/create-action";
import { issueGroundingNotice } from "@/lib/actions/fleet/issue-grounding-notice";
import { writeAudit } from "@/lib/server/audit";
import { resolveClubContext } from "@/lib/server/club-context";
import { canTriageReports } from "@/lib/safety/report-access";
import { groundFromReportSchema } from "@/lib/validation/safety";
import { can } from "@/permissions";
import { logError } from "@/lib/server/log";

/**
 * Grounds an aircraft from a safety report through the fleet's own grounding action (which
 * checks the officer's right to ground, writes the notice and e-mails every member), then
 * links the notice to the report. If the link cannot be written the aircraft stays grounded:
 * on the safe side, and the notice itself is the record that matters.
 */
export async function groundFromReport(_prev: ActionState, formData: FormData): Promise<ActionState> {
  const raw = formDataToObject(formData);
  const slug = typeof raw.club === "string" ? raw.club : "";
  const resolved = await resolveClubContext(slug);
  if (!resolved.ok) return { ok: false, message: resolved.code === "unauthenticated" ? "Your session has ended. Sign in again." : "That club was not found.", fieldErrors: {} };
  const ctx = resolved.ctx;
  const parsed = groundFromReportSchema.safeParse(raw);
  if (!parsed.success) return { ok: false, message: "Some fields need attention; nothing was saved.", fieldErrors: zodFieldErrors(parsed.error) };
  if (!canTriageReports(ctx.ability) || !can(ctx.ability, "create", "GroundingNotice")) {
    return { ok: false, message: "Only the safety officer can ground an aircraft from a safety report.", fieldErrors: {} };
  }
  const report = getReport(ctx.db, ctx.club.id, parsed.data.reportId);
  if (!report) return { ok: false, message: "That report was not found.", fieldErrors: {} };

  const notice = new FormData();
  notice.set("club", ctx.club.slug);
  notice.set("aircraftId", parsed.data.aircraftId);
  notice.set("category", "safety");
  notice.set("reason", parsed.data.reason);
  // The form's idempotency key goes to the grounding action, which writes the notice once per key;
  // a replay gets the same notice back and the link below is not written twice.
  if (typeof raw.idempotencyKey === "string") notice.set("idempotencyKey", raw.idempotencyKey);
  const issued = (await issueGroundingNotice(initialActionState, notice)) as ActionState<{ noticeId: string; recipients: number }>;
  if (!issued.ok || !issued.data) return { ...issued, fieldErrors: issued.fieldErrors ?? {} };
  const noticeId = issued.data.noticeId;

  try {
    ctx.db.transaction((tx) => {
      const linked = tx.select({ id: safetyReportEvents.id }).from(safetyReportEvents)
        .where(and(eq(safetyReportEvents.clubId, ctx.club.id), eq(safetyReportEvents.reportId, report.id), eq(safetyReportEvents.groundingNoticeId, noticeId))).get();
      if (linked) return;
      tx.insert(safetyReportEvents).values({ clubId: ctx.club.id, reportId: report.id, actorId: ctx.user.id, kind: "grounding", groundingNoticeId: noticeId, note: parsed.data.reason }).run();
      writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "safety_report.grounding", subjectType: "SafetyReport", subjectId: report.id, after: { groundingNoticeId: noticeId, aircraftId: parsed.data.aircraftId } });
    });
  } catch (error) {
    logError("safety", "grounding issued but not linked to the report", error);
    return { ok: true, message: "The aircraft is grounded and members are being told, but the link to this report could not be saved.", fieldErrors: {}, refresh: true };
  }
  // The answer first; the form's hook then refreshes the report's page (actions never revalidate).
  return { ok: true, message: issued.message, fieldErrors: {}, data: { noticeId }, refresh: true };
}
