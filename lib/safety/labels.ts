import type { BulletinAudience, BulletinUrgency, DocumentKind, ReportStatus } from "./kinds";

// Words shown for each stored value. Status is never colour alone: each urgency and report state
// also has a shape (components/safety/status-shapes.tsx).
export const URGENCY_LABELS: Record<BulletinUrgency, string> = {
  routine: "Routine",
  priority: "Priority",
  urgent: "Urgent",
};

export const URGENCY_HINTS: Record<BulletinUrgency, string> = {
  routine: "Good to know; read when convenient.",
  priority: "Read before your next flight.",
  urgent: "Read now: it affects flights already planned.",
};

export const REPORT_STATUS_LABELS: Record<ReportStatus, string> = {
  received: "Received",
  reviewing: "Reviewing",
  action_taken: "Action taken",
  closed: "Closed",
};

export const DOCUMENT_KIND_LABELS: Record<DocumentKind, string> = {
  pilot_certificate: "Pilot certificate and ratings",
  flight_review: "Flight review",
  renters_insurance: "Renter's insurance",
  club_agreement: "Club agreement",
};

export function audienceLabel(audience: BulletinAudience, typeGroup: string | null): string {
  if (audience === "everyone") return "Every member";
  if (audience === "instructors") return "Instructors";
  return `Members checked out in ${typeGroup ?? "a type group"}`;
}

export const CONTRIBUTING_FACTORS = [
  "weather",
  "fatigue_health",
  "communication",
  "procedures",
  "aircraft_equipment",
  "training_experience",
  "time_pressure",
  "other",
] as const;
export type ContributingFactor = (typeof CONTRIBUTING_FACTORS)[number];

export const FACTOR_LABELS: Record<ContributingFactor, string> = {
  weather: "Weather",
  fatigue_health: "Fatigue or health",
  communication: "Communication or radio",
  procedures: "Procedures or checklists",
  aircraft_equipment: "Aircraft or equipment",
  training_experience: "Training or experience",
  time_pressure: "Time pressure",
  other: "Something else",
};
