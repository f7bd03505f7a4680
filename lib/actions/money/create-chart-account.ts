"use server";
import { createChartAccount } from "@/db/queries/money-chart";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { writeAudit } from "@/lib/server/audit";
import { createChartAccountSchema } from "@/lib/validation/money";

export const createChartAccountAction = clubAction({
  schema: createChartAccountSchema,
  permission: ["create", "Ledger"],
  success: "Account added to the chart.",
  run(tx, ctx, input) {
    const result = createChartAccount(tx, ctx.club.id, input);
    if (!result.ok) throw new ActionError(result.message, result.fieldErrors, result.code);
    writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "money.chart.create", subjectType: "LedgerAccount", subjectId: result.account.id, after: input });
    return { message: `Added ${result.account.code} · ${result.account.name} to the chart.`, refresh: true };
  },
});
