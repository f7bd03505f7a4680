import type { Db, Tx } from "@/db/client";
import { auditLog } from "@/db/schema";

export type AuditAction =
  | "club.create" | "club.settings.update" | "club.admin.assign"
  | "member.invite" | "member.invitation.revoke" | "member.join" | "member.roles.change" | "member.deactivate" | "member.reactivate"
  | "aircraft.create" | "aircraft.update" | "inspection.item.create" | "inspection.item.update" | "inspection.record"
  | "squawk.triage" | "squawk.close" | "grounding.issue" | "grounding.lift" | "flight.meter.review";

export function writeAudit(
  tx: Tx | Db,
  entry: { clubId: string; actorId: string | null; action: AuditAction | (string & {}); subjectType: string; subjectId: string; before?: unknown; after?: unknown },
): void {
  tx.insert(auditLog)
    .values({ ...entry, before: entry.before ?? null, after: entry.after ?? null })
    .run();
}
