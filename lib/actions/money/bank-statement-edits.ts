"use server";
import { correctStatementBalance, removeStatement } from "@/db/queries/money-reconcile-import";
import { clubAction } from "@/lib/actions/create-action";
import { formatMoney } from "@/lib/money";
import { writeAudit } from "@/lib/server/audit";
import { correctStatementSchema, statementIdSchema } from "@/lib/validation/money";
import { minorOf } from "./amounts";
import { ledger } from "./ledger-errors";

// An imported statement corrected or removed, until its period is locked: the treasurer's
// permission only ("reconcile" on Reconciliation), an audit row for each.

export const correctBankStatement = clubAction({
  schema: correctStatementSchema,
  permission: ["reconcile", "Reconciliation"],
  success: "Closing balance corrected.",
  run(tx, ctx, input) {
    const closing = minorOf(input.closingBalance, ctx.club.currency, "closingBalance");
    const change = ledger(() => correctStatementBalance(tx, ctx.club.id, input.statementId, closing));
    writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "money.bank.correct", subjectType: "BankStatement", subjectId: input.statementId, before: change.before, after: change.after });
    const was = formatMoney(change.before.closingBalanceMinor, ctx.club.currency);
    const now = formatMoney(change.after.closingBalanceMinor, ctx.club.currency);
    return { message: `Closing balance corrected from ${was} to ${now}.`, refresh: true };
  },
});

export const removeBankStatement = clubAction({
  schema: statementIdSchema,
  permission: ["reconcile", "Reconciliation"],
  success: "Statement removed.",
  run(tx, ctx, input) {
    const removed = ledger(() => removeStatement(tx, ctx.club.id, input.statementId));
    writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "money.bank.remove", subjectType: "BankStatement", subjectId: input.statementId, before: removed });
    return {
      message: `Statement ${removed.periodStart} to ${removed.periodEnd} (${removed.fileName}) removed with its ${removed.linesRemoved} line${removed.linesRemoved === 1 ? "" : "s"}; the file can be imported again.`,
      redirectTo: `/clubs/${ctx.club.slug}/money/reconciliation`,
    };
  },
});
