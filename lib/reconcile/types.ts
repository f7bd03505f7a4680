/** One line of a bank statement, from the club's side: deposits positive, withdrawals negative. */
export type BankLine = {
  /** Calendar date the bank posted it, ISO "YYYY-MM-DD". */
  date: string;
  amountMinor: number;
  description: string;
  /** Cheque number, the bank's reference or transaction id, when the statement gives one. */
  reference?: string;
};
