import "server-only";
import { isInArrears } from "@/lib/money";
import type { IsoDate } from "@/lib/dates";
import type { DbLike } from "./money-accounts";
import { memberPositions } from "./money-member-balances";
import { getMoneySettings } from "./money-settings";

export type ArrearsStatus = { inArrears: boolean; balanceMinor: number; oldestDueDate: IsoDate | null; graceDays: number };

/**
 * Whether a member is in arrears on `asOf`: they owe money and their oldest unpaid charge is
 * more than the club's "late fee after" days past due (isInArrears in lib/money). Bookings
 * use this to refuse or warn, as the club's settings decide.
 */
export function memberArrears(tx: DbLike, clubId: string, memberUserId: string, asOf: IsoDate): ArrearsStatus {
  const graceDays = getMoneySettings(tx, clubId).lateFeeAfterDays;
  const position = memberPositions(tx, clubId, memberUserId).get(memberUserId);
  const balanceMinor = position?.balanceMinor ?? 0;
  const oldestDueDate = position?.oldestDueDate ?? null;
  return { inArrears: isInArrears(balanceMinor, oldestDueDate, asOf, graceDays), balanceMinor, oldestDueDate, graceDays };
}

/** Every member in arrears on `asOf`, by user id. */
export function membersInArrears(tx: DbLike, clubId: string, asOf: IsoDate): Map<string, ArrearsStatus> {
  const graceDays = getMoneySettings(tx, clubId).lateFeeAfterDays;
  const out = new Map<string, ArrearsStatus>();
  for (const [userId, p] of memberPositions(tx, clubId)) {
    if (isInArrears(p.balanceMinor, p.oldestDueDate, asOf, graceDays)) {
      out.set(userId, { inArrears: true, balanceMinor: p.balanceMinor, oldestDueDate: p.oldestDueDate, graceDays });
    }
  }
  return out;
}
