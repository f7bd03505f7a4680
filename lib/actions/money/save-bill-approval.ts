"use server";
import { billApprovalOverMinor, setBillApprovalOverMinor } from "@/db/queries/money-bills";
import { clubAction } from "@/lib/actions/create-action";
import { formatMoney } from "@/lib/money";
import { writeAudit } from "@/lib/server/audit";
import { billApprovalAmountSchema } from "@/lib/validation/money";
import { minorOf } from "./amounts";

// The amount above which a bill needs a second officer is the club's setting (an admin's), so
// the treasurer who pays bills does not set their own limit.
export const saveBillApprovalAction = clubAction({
  schema: billApprovalAmountSchema,
  permission: ["update", "ClubSettings"],
  success: "Approval amount saved.",
  run(tx, { club, user }, input) {
    const before = billApprovalOverMinor(tx, club.id);
    const amountMinor = Number(input.amount) === 0 ? 0 : minorOf(input.amount, club.currency, "amount");
    setBillApprovalOverMinor(tx, club.id, amountMinor);
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "money.bill.approval-amount", subjectType: "Club", subjectId: club.id, before: { billApprovalOverMinor: before }, after: { billApprovalOverMinor: amountMinor } });
    return { message: `Bills above ${formatMoney(amountMinor, club.currency, club.locale)} now need a second officer's approval.`, refresh: true };
  },
});
