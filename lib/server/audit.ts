import type { Db, Tx } from "@/db/client";
import { auditLog } from "@/db/schema";

export type AuditAction =
  | "club.create" | "club.settings.update" | "club.admin.assign"
  | "member.invite" | "member.invitation.revoke" | "member.join" | "member.roles.change" | "member.deactivate" | "member.reactivate"
  | "aircraft.create" | "aircraft.update" | "inspection.item.create" | "inspection.item.update" | "inspection.record"
  | "squawk.triage" | "squawk.close" | "grounding.issue" | "grounding.lift" | "flight.meter.review"
  | "money.billing.run" | "money.plan.save" | "money.plan.assign" | "money.payment.manual" | "money.payment.refund"
  | "money.entry.adjust" | "money.entry.reverse" | "money.bank.import" | "money.bank.correct" | "money.bank.remove" | "money.bank.match" | "money.bank.unmatch"
  | "money.bank.ignore" | "money.bank.book" | "money.period.lock" | "money.rates.save" | "money.settings.save"
  | "money.reminders.send" | "money.statement.email"
  | "bulletin.create" | "bulletin.draft.update" | "bulletin.publish" | "bulletin.remind"
  | "safety_report.triage" | "safety_report.grounding" | "member_document.record" | "member_document.remind" | "medical.record" | "currency.verify"
  | "checkout.record" | "checkout.revoke"
  | "booking.create" | "booking.change" | "booking.cancel" | "booking.flight.begin" | "booking.flight.close"
  | "calendar.link.create" | "calendar.link.rotate" | "calendar.link.revoke" | "weight-balance.profile.update" | "preflight.template.update" | "preflight.record";

export function writeAudit(
  tx: Tx | Db,
  entry: { clubId: string; actorId: string | null; action: AuditAction | (string & {}); subjectType: string; subjectId: string; before?: unknown; after?: unknown },
): void {
  tx.insert(auditLog)
    .values({ ...entry, before: entry.before ?? null, after: entry.after ?? null })
    .run();
}
