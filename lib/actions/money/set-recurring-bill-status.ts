"use server";
import { getRecurringBill, setRecurringBillStatus } from "@/db/queries/money-recurring";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { writeAudit } from "@/lib/server/audit";
import { recurringBillStatusSchema } from "@/lib/validation/money";

const DONE = { active: "resumed", paused: "paused", ended: "ended" } as const;

// Pause, resume or end a recurring bill. An ended one is never resumed (start a new one); the
// bills it already produced stay as they are.
export const setRecurringBillStatusAction = clubAction({
  schema: recurringBillStatusSchema,
  permission: ["create", "Bill"],
  success: "Recurring bill changed.",
  run(tx, { club, user }, input) {
    const row = getRecurringBill(tx, club.id, input.recurringBillId);
    if (!row) throw new ActionError("That recurring bill was not found in this club.", {}, "not_found");
    if (row.status === "ended") throw new ActionError(`The recurring bill from ${row.vendor} has ended; enter a new one instead.`, {}, "conflict");
    if (row.status === input.status) throw new ActionError(`The recurring bill from ${row.vendor} is already ${input.status === "active" ? "running" : DONE[input.status]}.`, {}, "conflict");
    if (!setRecurringBillStatus(tx, club.id, row.id, input.status)) throw new ActionError("Someone else changed this recurring bill a moment ago.", {}, "conflict");
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "money.recurring-bill.status", subjectType: "RecurringBill", subjectId: row.id, before: { status: row.status }, after: { status: input.status } });
    return { message: `Recurring bill from ${row.vendor} ${DONE[input.status]}${input.status === "active" ? `; next bill on ${row.nextOn}` : ""}.`, refresh: true };
  },
});
