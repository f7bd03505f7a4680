"use server";
import { createRecurringBill } from "@/db/queries/money-recurring";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { formatMoney } from "@/lib/money";
import { CADENCE_WORDS } from "@/lib/money/recurring";
import { writeAudit } from "@/lib/server/audit";
import { createRecurringBillSchema } from "@/lib/validation/money";
import { minorOf } from "./amounts";

// A bill that comes back (insurance, hangar rent). Its bills are produced when due, each once,
// through the one bill write path (produce-due-bills).
export const createRecurringBillAction = clubAction({
  schema: createRecurringBillSchema,
  permission: ["create", "Bill"],
  success: "Recurring bill saved.",
  run(tx, { club, user }, input) {
    const amountMinor = minorOf(input.amount, club.currency, "amount");
    const row = createRecurringBill(tx, club, user.id, { ...input, amountMinor });
    if ("refused" in row) throw new ActionError("Some fields need attention; nothing was saved.", { [row.field]: [row.refused] });
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "money.recurring-bill.create", subjectType: "RecurringBill", subjectId: row.id, after: { ...input, amountMinor } });
    return {
      message: `Recurring bill saved: ${row.vendor}, ${formatMoney(amountMinor, club.currency)}, ${CADENCE_WORDS[row.cadence].toLowerCase()} from ${row.nextOn}${row.endsOn ? ` to ${row.endsOn}` : ""}.`,
      data: { recurringBillId: row.id },
      refresh: true,
    };
  },
});
