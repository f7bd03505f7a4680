"use server";
import { updateChartAccount } from "@/db/queries/money-chart";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { writeAudit } from "@/lib/server/audit";
import { updateChartAccountSchema } from "@/lib/validation/money";

export const updateChartAccountAction = clubAction({
  schema: updateChartAccountSchema,
  permission: ["create", "Ledger"],
  success: "Account saved.",
  run(tx, ctx, input) {
    const { accountId, ...change } = input;
    const result = updateChartAccount(tx, ctx.club.id, accountId, change);
    if (!result.ok) throw new ActionError(result.message, result.fieldErrors, result.code);
    writeAudit(tx, {
      clubId: ctx.club.id, actorId: ctx.user.id, action: "money.chart.update", subjectType: "LedgerAccount", subjectId: accountId,
      before: result.before ? { code: result.before.code, name: result.before.name, type: result.before.type, parentCode: result.before.parentCode } : null, after: change,
    });
    return { message: `Saved ${result.account.code} · ${result.account.name}.`, refresh: true };
  },
});
