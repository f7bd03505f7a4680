"use server";
import { clubAction } from "@/lib/actions/create-action";
import { autoMatchStatement } from "@/db/queries/money-reconcile-match";
import { bookBankLine, lockPeriod, matchManually, setLineIgnored, undoMatch } from "@/db/queries/money-reconcile-edits";
import { formatMoney } from "@/lib/money";
import { writeAudit } from "@/lib/server/audit";
import type { ClubContext } from "@/lib/server/club-context";
import { bankLineSchema, bookLineSchema, ignoreLineSchema, manualMatchSchema, statementIdSchema } from "@/lib/validation/money";
import { ledger } from "./ledger-errors";

// The reconciliation workspace's actions, one wrapper each: all need "reconcile" on Reconciliation.
const actor = (ctx: ClubContext) => ({ clubId: ctx.club.id, userId: ctx.user.id, currency: ctx.club.currency });

export const runAutoMatch = clubAction({
  schema: statementIdSchema,
  permission: ["reconcile", "Reconciliation"],
  success: "Matched automatically.",
  run(tx, ctx, input) {
    const r = ledger(() => autoMatchStatement(tx, actor(ctx), input.statementId));
    writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "money.bank.match", subjectType: "BankStatement", subjectId: input.statementId, after: r });
    return { message: r.matched ? `${r.matched} more lines matched; ${r.unmatched} still open.` : `No further automatic matches; ${r.unmatched} lines still open.`, refresh: true };
  },
});

export const matchBankLine = clubAction({
  schema: manualMatchSchema,
  permission: ["reconcile", "Reconciliation"],
  success: "Matched.",
  run(tx, ctx, input) {
    ledger(() => matchManually(tx, actor(ctx), input.bankLineId, input.bookIds));
    writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "money.bank.match", subjectType: "BankLine", subjectId: input.bankLineId, after: { bookIds: input.bookIds } });
    return { refresh: true };
  },
});

export const bookLine = clubAction({
  schema: bookLineSchema,
  permission: ["reconcile", "Reconciliation"],
  success: "Posted to the books and matched.",
  run(tx, ctx, input) {
    const entryId = ledger(() => bookBankLine(tx, actor(ctx), input.bankLineId, input.account, input.memo ?? ""));
    writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "money.bank.book", subjectType: "BankLine", subjectId: input.bankLineId, after: { entryId, account: input.account } });
    return { refresh: true };
  },
});

export const unmatchLine = clubAction({
  schema: bankLineSchema,
  permission: ["reconcile", "Reconciliation"],
  success: "Match undone.",
  run(tx, ctx, input) {
    ledger(() => undoMatch(tx, actor(ctx), input.bankLineId));
    writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "money.bank.unmatch", subjectType: "BankLine", subjectId: input.bankLineId });
    return { refresh: true };
  },
});

export const ignoreLine = clubAction({
  schema: ignoreLineSchema,
  permission: ["reconcile", "Reconciliation"],
  success: "Saved.",
  run(tx, ctx, input) {
    ledger(() => setLineIgnored(tx, actor(ctx), input.bankLineId, input.ignored));
    writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "money.bank.ignore", subjectType: "BankLine", subjectId: input.bankLineId, after: { ignored: input.ignored } });
    return { message: input.ignored ? "Line set aside." : "Line brought back.", refresh: true };
  },
});

export const lockReconciledPeriod = clubAction({
  schema: statementIdSchema,
  permission: ["reconcile", "Reconciliation"],
  success: "Period reconciled and locked.",
  run(tx, ctx, input) {
    const report = ledger(() => lockPeriod(tx, actor(ctx), input.statementId));
    writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "money.period.lock", subjectType: "BankStatement", subjectId: input.statementId, after: { periodEnd: report.periodEnd, statement: report.statementBalanceMinor, book: report.bookBalanceMinor } });
    return { message: `Reconciled: ${formatMoney(report.adjustedBankBalanceMinor, ctx.club.currency, ctx.club.locale)} on both sides. The books are locked through ${report.periodEnd}.`, refresh: true };
  },
});
