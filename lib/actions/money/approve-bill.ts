"use server";
import { approveBill, getBill } from "@/db/queries/money-bills";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { approvalProblem } from "@/lib/money/bills";
import { writeAudit } from "@/lib/server/audit";
import { billIdSchema } from "@/lib/validation/money";

// The second officer's approval of a bill above the club's amount: never the one who entered it.
export const approveBillAction = clubAction({
  schema: billIdSchema,
  permission: ["approve", "Bill"],
  success: "Bill approved.",
  run(tx, { club, user }, input) {
    const bill = getBill(tx, club.id, input.billId);
    if (!bill) throw new ActionError("That bill was not found in this club.", {}, "not_found");
    const problem = approvalProblem(bill, user.id);
    if (problem) throw new ActionError(problem, {}, bill.enteredById === user.id ? "forbidden" : "conflict");
    if (!approveBill(tx, club.id, bill.id, user.id)) throw new ActionError("Someone else approved this bill a moment ago.", {}, "conflict");
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "money.bill.approve", subjectType: "Bill", subjectId: bill.id, before: { status: bill.status }, after: { status: "approved" } });
    return { message: `Approved: the bill from ${bill.vendor} can be paid.`, refresh: true };
  },
});
