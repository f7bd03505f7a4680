"use server";
import { produceDueBills } from "@/db/queries/money-recurring";
import { clubAction } from "@/lib/actions/create-action";
import { clubToday } from "@/lib/money/settings";
import { formatMoney } from "@/lib/money";
import { emptySchema } from "@/lib/validation/money";
import { ledger } from "./ledger-errors";

// Enters the bills due by today (the club's day) from the active recurring bills, each period
// once: running it again enters nothing new. The scheduled tick enters them through the same
// produceDueBills (with no person as the actor), so the button finds nothing left to do.
export const produceDueBillsAction = clubAction({
  schema: emptySchema,
  permission: ["create", "Bill"],
  success: "Due bills entered.",
  run(tx, { club, user }) {
    const today = clubToday(club);
    const { produced, skipped } = ledger(() => produceDueBills(tx, club, user.id, today));
    if (produced.length === 0) return { message: `No recurring bill is due by ${today}; nothing was entered${skipped ? ` (${skipped} already entered)` : ""}.`, data: { produced: 0 } };
    const total = produced.reduce((s, b) => s + b.amountMinor, 0);
    const list = produced.map((b) => `${b.vendor} ${b.periodKey}`).join(", ");
    return { message: `${produced.length} bill${produced.length === 1 ? "" : "s"} entered (${formatMoney(total, club.currency)}): ${list}.`, data: { produced: produced.length }, refresh: true };
  },
});
