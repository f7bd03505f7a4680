// Bills the club owes: the approval rule and the two entries a bill makes (accrual basis,
// standard accounting practice): entering it books the expense against "Bills to pay" (a
// liability) on the bill's date; paying it moves the money from the bank and clears the
// liability. Above the club's approval amount, a second officer — not the one who entered it —
// approves before it is paid (segregation of duties, common practice for a club's treasury).

export type BillApprovalRule = { approvalOverMinor: number };

/** A bill strictly above the club's amount waits for a second officer. */
export function billNeedsApproval(amountMinor: number, rule: BillApprovalRule): boolean {
  if (!Number.isSafeInteger(amountMinor) || amountMinor <= 0) throw new RangeError(`amountMinor must be whole minor units > 0, got ${amountMinor}`);
  if (!Number.isSafeInteger(rule.approvalOverMinor) || rule.approvalOverMinor < 0) throw new RangeError(`approvalOverMinor must be whole minor units ≥ 0, got ${rule.approvalOverMinor}`);
  return amountMinor > rule.approvalOverMinor;
}

/** Why this person may not approve the bill, or null when they may. */
export function approvalProblem(bill: { status: string; enteredById: string }, approverId: string): string | null {
  if (bill.status !== "awaiting_approval") return bill.status === "paid" ? "This bill is already paid." : "This bill does not need an approval.";
  if (bill.enteredById === approverId) return "A second officer approves a bill: not the person who entered it.";
  return null;
}

export type BillEntryLines = { accountCode: string; debitMinor?: number; creditMinor?: number }[];

/** The entry for a bill received: the category debited, bills to pay credited. */
export function billEntryLines(accountCode: string, amountMinor: number): BillEntryLines {
  return [{ accountCode, debitMinor: amountMinor }, { accountCode: "bills-payable", creditMinor: amountMinor }];
}

/** The entry for a bill paid from the bank: bills to pay debited, the bank credited. */
export function billPaymentLines(amountMinor: number): BillEntryLines {
  return [{ accountCode: "bills-payable", debitMinor: amountMinor }, { accountCode: "bank", creditMinor: amountMinor }];
}
