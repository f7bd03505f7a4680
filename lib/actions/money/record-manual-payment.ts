"use server";
import { payments } from "@/db/schema";
import { clubAction } from "@/lib/actions/create-action";
import { kickOutbox } from "@/lib/email/runner";
import { accountId, memberAccountId } from "@/db/queries/money-accounts";
import { openPostingDate, postEntry } from "@/db/queries/money-post-entry";
import { lockedPeriodNote } from "@/lib/money/open-period";
import { queueReceipt } from "@/db/queries/money-receipts";
import { writeAudit } from "@/lib/server/audit";
import { manualPaymentSchema } from "@/lib/validation/money";
import { minorOf } from "./amounts";
import { ledger } from "./ledger-errors";

const WORDS = { cheque: "Cheque", cash: "Cash", transfer: "Bank transfer" } as const;

export const recordManualPayment = clubAction({
  schema: manualPaymentSchema,
  permission: ["create", "Payment"],
  success: "Payment recorded.",
  run(tx, { club, user }, input) {
    const amountMinor = minorOf(input.amount, club.currency, "amount");
    // Money received is never refused: dated in a locked period, it posts on the first open day.
    const open = openPostingDate(tx, club.id, input.receivedOn);
    const { entryId } = ledger(() =>
      postEntry(tx, club.id, {
        date: open.postOn,
        kind: "manual-payment",
        memo: `${WORDS[input.method]} payment${input.reference ? ` ${input.reference}` : ""}${lockedPeriodNote(open)}`,
        lines: [
          { accountId: accountId(tx, club.id, "bank"), debitMinor: amountMinor },
          { accountId: memberAccountId(tx, club.id, input.memberUserId), creditMinor: amountMinor },
        ],
        memberUserId: input.memberUserId,
        sourceType: "payment",
        reference: input.reference ?? null,
        createdById: user.id,
      }),
    );
    const [row] = tx
      .insert(payments)
      .values({ clubId: club.id, memberUserId: input.memberUserId, method: input.method, status: "succeeded", amountMinor, currency: club.currency, receivedOn: input.receivedOn, reference: input.reference ?? null, journalEntryId: entryId, recordedById: user.id })
      .returning({ id: payments.id })
      .all();
    queueReceipt(tx, club.id, { memberUserId: input.memberUserId, amountMinor, method: input.method, receivedOn: input.receivedOn, reference: input.reference });
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "money.payment.manual", subjectType: "Payment", subjectId: row!.id, after: { ...input, amountMinor, entryId } });
    return {
      message: open.moved ? `Payment recorded. ${input.receivedOn} is in a locked period, so it was posted on ${open.postOn}, the first open day; the entry names the day received.` : "Payment recorded.",
      refresh: true,
    };
  },
  after: () => kickOutbox(),
});
