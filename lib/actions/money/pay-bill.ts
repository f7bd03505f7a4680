"use server";
import { getBill, payBill } from "@/db/queries/money-bills";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { formatMoney } from "@/lib/money";
import { writeAudit } from "@/lib/server/audit";
import { payBillSchema } from "@/lib/validation/money";
import { ledger } from "./ledger-errors";

// Paying an approved bill from the bank: one entry (bills to pay ← bank). The bank statement
// line is matched to it later in reconciliation, like any payment out.
export const payBillAction = clubAction({
  schema: payBillSchema,
  permission: ["create", "Bill"],
  success: "Bill paid.",
  run(tx, { club, user }, input) {
    const bill = getBill(tx, club.id, input.billId);
    if (!bill) throw new ActionError("That bill was not found in this club.", {}, "not_found");
    if (bill.status === "paid") throw new ActionError(`This bill was already paid on ${bill.paidOn}.`, {}, "conflict");
    if (bill.status === "awaiting_approval") throw new ActionError("This bill waits for a second officer's approval before it is paid.", {}, "conflict");
    if (input.paidOn < bill.billDate) throw new ActionError("Some fields need attention; nothing was saved.", { paidOn: ["A bill cannot be paid before its date."] });
    const entryId = ledger(() => payBill(tx, club.id, bill, user.id, input.paidOn));
    if (!entryId) throw new ActionError("Someone else paid this bill a moment ago.", {}, "conflict");
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "money.bill.pay", subjectType: "Bill", subjectId: bill.id, before: { status: bill.status }, after: { status: "paid", paidOn: input.paidOn, entryId } });
    return { message: `Paid: ${formatMoney(bill.amountMinor, club.currency, club.locale)} to ${bill.vendor} from the bank on ${input.paidOn}. Match it to the bank statement in reconciliation.`, refresh: true };
  },
});
