// Every action and subject type the portal checks. One word per concept, as in the UI.
export const ACTIONS = [
  "manage", "read", "create", "update",
  "invite", "assignRoles", "deactivate",
  "triage", "close", "lift", "record",
  "publish", "acknowledge", "readAcknowledgements",
  "readDetails", "pay", "refund", "reconcile", "export", "approve",
  "verify",
] as const;
export type Action = (typeof ACTIONS)[number];

export const SUBJECTS = [
  "Club", "ClubSettings", "Member", "Invitation", "AuditLog", "Outbox",
  "Aircraft", "Inspection", "Squawk", "GroundingNotice", "Flight", "Upload",
  "Booking", "Bulletin", "SafetyReport", "CurrencyBoard", "Currency", "MemberDocument", "Medical", "Checkout",
  "Ledger", "Account", "Payment", "Reconciliation", "Rates", "Tools", "Bill",
  "MaintenanceBlock", "Availability",
] as const;
export type SubjectName = (typeof SUBJECTS)[number];

/** A record checked against conditions, e.g. { __type: "Account", userId } for "their own". */
export type SubjectRecord = { __caslSubjectType__?: SubjectName; userId?: string; reporterId?: string | null };
