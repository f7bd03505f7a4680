"use server";
import { closeYear } from "@/db/queries/money-year-end";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { clubToday } from "@/lib/money/settings";
import { formatMoney } from "@/lib/money";
import { writeAudit } from "@/lib/server/audit";
import { closeYearSchema } from "@/lib/validation/money";
import { ledger } from "./ledger-errors";

// The year-end close: income and expense closed into retained funds by one entry on the year's
// last day, and the year locked. A year closes once, after it has ended, in order.
export const closeYearAction = clubAction({
  schema: closeYearSchema,
  permission: ["create", "Ledger"],
  success: "Year closed.",
  run(tx, { club, user }, input) {
    const result = ledger(() => closeYear(tx, club.id, user.id, input.year, clubToday(club)));
    if (!result.ok) throw new ActionError(result.message, {}, "conflict");
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "money.year.close", subjectType: "YearClose", subjectId: result.close.id, after: { year: input.year, entryId: result.close.entryId, netIncomeMinor: result.close.netIncomeMinor } });
    const net = result.close.netIncomeMinor;
    return {
      message: `${input.year} closed: ${net >= 0 ? "surplus" : "deficit"} of ${formatMoney(Math.abs(net), club.currency)} moved into retained funds on ${result.close.closedThrough}; nothing can be dated on or before that day now.`,
      data: { closeId: result.close.id },
      refresh: true,
    };
  },
});
