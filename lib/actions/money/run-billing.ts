"use server";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { kickOutbox } from "@/lib/email/runner";
import { runBillingPeriod } from "@/db/queries/money-billing-run";
import { monthLabel, monthOf, shiftMonthKey } from "@/lib/money/months";
import { clubToday } from "@/lib/money/settings";
import { writeAudit } from "@/lib/server/audit";
import { billingRunSchema } from "@/lib/validation/money";
import { ledger } from "./ledger-errors";

export const runBilling = clubAction({
  schema: billingRunSchema,
  permission: ["create", "Ledger"],
  success: "Billing run finished.",
  run(tx, ctx, input) {
    const today = clubToday(ctx.club);
    if (input.month > shiftMonthKey(monthOf(today), 1)) {
      throw new ActionError("Some fields need attention; nothing was saved.", { month: ["Bill this month or next month at the latest."] });
    }
    const result = ledger(() => runBillingPeriod(tx, ctx, { month: input.month, runDate: today }));
    const posted = result.duesPosted + result.lateFeesPosted;
    writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "money.billing.run", subjectType: "BillingRun", subjectId: result.runId, after: result });
    const message =
      posted === 0 && result.statementsIssued === 0
        ? `Nothing new: ${monthLabel(input.month, ctx.club.locale)} was already billed and its statements issued.`
        : `${monthLabel(input.month, ctx.club.locale)}: ${result.duesPosted} dues and ${result.lateFeesPosted} late fees posted, ${result.statementsIssued} statements for ${monthLabel(shiftMonthKey(input.month, -1), ctx.club.locale)} e-mailed.`;
    return { message, data: result, refresh: true };
  },
  after: () => kickOutbox(),
});
