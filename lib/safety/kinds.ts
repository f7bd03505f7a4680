// The words a safety bulletin, report and member document are filed under (the schema's enums).
export const BULLETIN_URGENCIES = ["routine", "priority", "urgent"] as const;
export const BULLETIN_AUDIENCES = ["everyone", "type_group", "instructors"] as const;
export const REPORT_STATUSES = ["received", "reviewing", "action_taken", "closed"] as const;
export const DOCUMENT_KINDS = ["pilot_certificate", "flight_review", "renters_insurance", "club_agreement"] as const;
export type BulletinUrgency = (typeof BULLETIN_URGENCIES)[number];
export type BulletinAudience = (typeof BULLETIN_AUDIENCES)[number];
export type ReportStatus = (typeof REPORT_STATUSES)[number];
export type DocumentKind = (typeof DOCUMENT_KINDS)[number];
