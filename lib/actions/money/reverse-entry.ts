"use server";
import { and, eq } from "drizzle-orm";
import { journalEntries } from "@/db/schema";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { lockedThrough, reverseEntry } from "@/db/queries/money-post-entry";
import { clubToday } from "@/lib/money/settings";
import { writeAudit } from "@/lib/server/audit";
import { reverseEntrySchema } from "@/lib/validation/money";
import { ledger } from "./ledger-errors";

// Card payments, refunds and payouts mirror the provider; they are undone there, not here.
const PROVIDER_KINDS = new Set(["card-payment", "card-refund", "payout-received"]);

export const reverseJournalEntry = clubAction({
  schema: reverseEntrySchema,
  permission: ["create", "Ledger"],
  success: "Reversing entry posted.",
  run(tx, ctx, input) {
    const original = tx.select().from(journalEntries).where(and(eq(journalEntries.clubId, ctx.club.id), eq(journalEntries.id, input.entryId))).get();
    if (!original) throw new ActionError("That entry was not found in this club.", {}, "not_found");
    if (PROVIDER_KINDS.has(original.kind)) throw new ActionError("Card payments, refunds and payouts follow the payment provider: refund the payment, or undo the match in reconciliation.");
    if (original.kind === "year-end-close") throw new ActionError("A year-end close is not reversed: the closed year stays closed. Correct it with an adjustment in the open year.", {}, "conflict");
    const through = lockedThrough(tx, ctx.club.id);
    // A correction to a locked period is dated today, so the locked month stays as reconciled.
    const date = input.date ?? (through && original.entryDate <= through ? clubToday(ctx.club) : original.entryDate);
    const { entryId } = ledger(() => reverseEntry(tx, ctx.club.id, original.id, { date, createdById: ctx.user.id }));
    writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "money.entry.reverse", subjectType: "JournalEntry", subjectId: original.id, after: { reversalId: entryId, date } });
    return { refresh: true };
  },
});
