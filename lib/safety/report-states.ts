import type { ReportStatus } from "./kinds";

// How a safety report moves. Forward one step or straight to closed; a closed report can be
// reopened for review when something new comes to light. Nothing moves back silently: every
// move is an event row.
const MOVES: Record<ReportStatus, readonly ReportStatus[]> = {
  received: ["reviewing", "closed"],
  reviewing: ["action_taken", "closed"],
  action_taken: ["reviewing", "closed"],
  closed: ["reviewing"],
};

export function nextReportStatuses(from: ReportStatus): readonly ReportStatus[] {
  return MOVES[from];
}

export function canMoveReport(from: ReportStatus, to: ReportStatus): boolean {
  return MOVES[from].includes(to);
}

/** Moving to these needs a note saying what was done or why it was closed. */
export function moveNeedsNote(to: ReportStatus): boolean {
  return to === "action_taken" || to === "closed";
}
