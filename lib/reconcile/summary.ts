/** An amount, or anything that carries one (a bank line, a book item). */
export type AmountLike = number | { amountMinor: number };

/** The items themselves, or their total. */
export type AmountList = number | readonly AmountLike[];

export type ReconciliationInput = {
  /** Closing balance printed on the bank statement. */
  statementBalanceMinor: number;
  /** The bank account's balance in the club's books on the same date. */
  bookBalanceMinor: number;
  /** Deposits recorded in the books that the bank has not yet credited. */
  depositsInTransit?: AmountList;
  /** Cheques written and booked that have not yet cleared the bank. */
  outstandingCheques?: AmountList;
  /** Bank charges on the statement not yet in the books (service fees, returned items). */
  bankChargesNotInBooks?: AmountList;
  /** Credits on the statement not yet in the books (interest, direct deposits). */
  bankCreditsNotInBooks?: AmountList;
};

export type ReconciliationSummary = {
  statementBalanceMinor: number;
  bookBalanceMinor: number;
  depositsInTransitMinor: number;
  outstandingChequesMinor: number;
  bankChargesMinor: number;
  bankCreditsMinor: number;
  adjustedBankBalanceMinor: number;
  adjustedBookBalanceMinor: number;
  /** Adjusted bank − adjusted book; zero when the period reconciles. */
  differenceMinor: number;
  agrees: boolean;
};

function sizeOf(items: AmountList | undefined, name: string): number {
  let total = 0;
  for (const item of typeof items === "number" ? [items] : (items ?? [])) {
    const amount = typeof item === "number" ? item : item.amountMinor;
    if (!Number.isSafeInteger(amount)) throw new RangeError(`${name}: ${amount} is not a whole number of minor units`);
    // Each list already says which way its items move the balance, so only their size counts:
    // a cheque given as −5000 (its effect on the bank) and as 5000 (its face) are the same cheque.
    total += Math.abs(amount);
  }
  return total;
}

/**
 * The bank reconciliation (standard accounting practice): adjusted bank balance = statement
 * balance + deposits in transit − outstanding cheques; adjusted book balance = book balance +
 * bank credits not yet booked − bank charges not yet booked. The period reconciles when the
 * two agree to the minor unit.
 */
export function reconciliationSummary(input: ReconciliationInput): ReconciliationSummary {
  for (const [name, v] of [
    ["statementBalanceMinor", input.statementBalanceMinor],
    ["bookBalanceMinor", input.bookBalanceMinor],
  ] as const) {
    if (!Number.isSafeInteger(v)) throw new RangeError(`${name} must be a whole number of minor units, got ${v}`);
  }
  const depositsInTransitMinor = sizeOf(input.depositsInTransit, "depositsInTransit");
  const outstandingChequesMinor = sizeOf(input.outstandingCheques, "outstandingCheques");
  const bankChargesMinor = sizeOf(input.bankChargesNotInBooks, "bankChargesNotInBooks");
  const bankCreditsMinor = sizeOf(input.bankCreditsNotInBooks, "bankCreditsNotInBooks");
  const adjustedBankBalanceMinor = input.statementBalanceMinor + depositsInTransitMinor - outstandingChequesMinor;
  const adjustedBookBalanceMinor = input.bookBalanceMinor + bankCreditsMinor - bankChargesMinor;
  const differenceMinor = adjustedBankBalanceMinor - adjustedBookBalanceMinor;
  return {
    statementBalanceMinor: input.statementBalanceMinor,
    bookBalanceMinor: input.bookBalanceMinor,
    depositsInTransitMinor,
    outstandingChequesMinor,
    bankChargesMinor,
    bankCreditsMinor,
    adjustedBankBalanceMinor,
    adjustedBookBalanceMinor,
    differenceMinor,
    agrees: differenceMinor === 0,
  };
}
