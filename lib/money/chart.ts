// The accounts every club starts with. Codes are our own; a club may add more. Member
// receivables are one sub-account per member under "member-receivables".

export type AccountType = "asset" | "liability" | "equity" | "income" | "expense";

export type ChartAccount = { code: string; name: string; type: AccountType };

export const DEFAULT_CHART: readonly ChartAccount[] = [
  { code: "bank", name: "Bank", type: "asset" },
  { code: "card-clearing", name: "Card clearing", type: "asset" },
  { code: "member-receivables", name: "Member receivables", type: "asset" },
  { code: "dues-income", name: "Dues income", type: "income" },
  { code: "flight-income", name: "Flight income", type: "income" },
  { code: "late-fee-income", name: "Late fees", type: "income" },
  { code: "fuel-credits", name: "Fuel credits", type: "expense" },
  { code: "processor-fees", name: "Card processing fees", type: "expense" },
  { code: "bank-fees", name: "Bank fees", type: "expense" },
  { code: "refunds", name: "Refunds", type: "expense" },
  { code: "member-credits", name: "Member prepayments", type: "liability" },
  { code: "retained-funds", name: "Retained funds", type: "equity" },
];

/** The side on which an account's balance normally sits (assets and expenses grow as debits). */
export function normalSideOf(type: AccountType): "debit" | "credit" {
  return type === "asset" || type === "expense" ? "debit" : "credit";
}

/** A debit-positive balance shown the way the account's owner reads it (income as positive). */
export function presentBalance(debitPositiveMinor: number, type: AccountType): number {
  const shown = normalSideOf(type) === "debit" ? debitPositiveMinor : -debitPositiveMinor;
  return shown === 0 ? 0 : shown;
}
