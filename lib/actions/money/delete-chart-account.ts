"use server";
import { deleteChartAccount } from "@/db/queries/money-chart";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { writeAudit } from "@/lib/server/audit";
import { deleteChartAccountSchema } from "@/lib/validation/money";

// Only an account with no postings, no sub-accounts and not used by the application itself.
export const deleteChartAccountAction = clubAction({
  schema: deleteChartAccountSchema,
  permission: ["create", "Ledger"],
  success: "Account deleted.",
  run(tx, ctx, input) {
    const result = deleteChartAccount(tx, ctx.club.id, input.accountId);
    if (!result.ok) throw new ActionError(result.message, result.fieldErrors, result.code);
    writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "money.chart.delete", subjectType: "LedgerAccount", subjectId: input.accountId, before: { code: result.account.code, name: result.account.name, type: result.account.type } });
    return { message: `Deleted ${result.account.code} · ${result.account.name}.`, refresh: true };
  },
});
