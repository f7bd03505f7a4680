"use server";
import { clubAction } from "@/lib/actions/create-action";
import { accountId, memberAccountId } from "@/db/queries/money-accounts";
import { postEntry } from "@/db/queries/money-post-entry";
import { getMoneySettings } from "@/db/queries/money-settings";
import { dueDateFor } from "@/lib/money/settings";
import { writeAudit } from "@/lib/server/audit";
import { adjustmentSchema } from "@/lib/validation/money";
import { minorOf } from "./amounts";
import { ledger } from "./ledger-errors";

/** A charge or credit to one member's account against an income or expense account. */
export const postAdjustment = clubAction({
  schema: adjustmentSchema,
  permission: ["create", "Ledger"],
  success: "Posted to the member's account.",
  run(tx, { club, user }, input) {
    const amountMinor = minorOf(input.amount, club.currency, "amount");
    const { entryId } = ledger(() => {
      const member = memberAccountId(tx, club.id, input.memberUserId);
      const other = accountId(tx, club.id, input.account);
      const charge = input.direction === "charge";
      return postEntry(tx, club.id, {
        date: input.date,
        kind: "adjustment",
        memo: input.memo,
        lines: charge ? [{ accountId: member, debitMinor: amountMinor }, { accountId: other, creditMinor: amountMinor }] : [{ accountId: other, debitMinor: amountMinor }, { accountId: member, creditMinor: amountMinor }],
        memberUserId: input.memberUserId,
        dueOn: charge ? dueDateFor(input.date, getMoneySettings(tx, club.id)) : null,
        sourceType: "adjustment",
        createdById: user.id,
      });
    });
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "money.entry.adjust", subjectType: "JournalEntry", subjectId: entryId, after: { ...input, amountMinor } });
    return { refresh: true };
  },
});
