import { canOn, type AppAbility } from "@/permissions";
import { can } from "@/permissions";

// Reading a safety report is checked against the report itself: the safety officer's grant
// has no condition, a member's is { reporterId: their id }. An anonymous report has no
// reporter id at all, so no member condition can ever match it — not even its filer's.
export function canReadReport(ability: AppAbility, report: { reporterId: string | null }): boolean {
  return canOn(ability, "read", "SafetyReport", { reporterId: report.reporterId });
}

/** Officers triage every report; members only ever see their own named ones. */
export function canTriageReports(ability: AppAbility): boolean {
  return can(ability, "triage", "SafetyReport");
}
