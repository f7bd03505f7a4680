// The treasurer's two statements, computed from postings (journal lines with their account),
// pure: no database, no framework. Standard accounting practice throughout:
// - income accounts are credit-normal (credits raise them), expense accounts debit-normal;
// - profit and loss covers a period, both dates inclusive;
// - the balance sheet is a position at a day: assets = liabilities + equity, where equity
//   includes the net income earned to that day (income − expense from the first posting on,
//   not yet closed to retained funds by a year-end entry).
// Amounts are integer minor units; a wrong input throws rather than report a wrong figure.

import type { AccountType } from "./chart";

export type Posting = {
  /** The entry's date, YYYY-MM-DD. */
  date: string;
  accountCode: string;
  accountName: string;
  accountType: AccountType;
  debitMinor: number;
  creditMinor: number;
};

/**
 * One line of a report: an account and its amount on its normal side (income and liability
 * and equity: credits − debits; asset and expense: debits − credits). A negative amount is an
 * account running against its nature (a refund larger than the income it refunds).
 */
export type ReportLine = {
  code: string;
  name: string;
  type: AccountType;
  amountMinor: number;
};

export type ProfitAndLoss = {
  /** Income earned in the period (credits − debits of income accounts). */
  incomeMinor: number;
  /** Expenses incurred in the period (debits − credits of expense accounts). */
  expenseMinor: number;
  /** incomeMinor − expenseMinor: a surplus when positive, a deficit when negative. */
  netMinor: number;
  /**
   * One line per income or expense account with at least one posting in the period: income
   * accounts first, then expense accounts, each group ordered by account code.
   */
  byAccount: ReportLine[];
};

export type BalanceSheet = {
  assetsMinor: number;
  liabilitiesMinor: number;
  /** Equity accounts plus net income (income − expense) of every posting up to asOf. */
  equityMinor: number;
  /** assets = liabilities + equity: true whenever every entry posted balanced. */
  balanced: boolean;
};

const ISO_DATE = /^\d{4}-(0[1-9]|1[0-2])-(0[1-9]|[12]\d|3[01])$/;
const TYPES: ReadonlySet<string> = new Set(["asset", "liability", "equity", "income", "expense"]);
const TYPE_ORDER: Record<AccountType, number> = { asset: 0, liability: 1, equity: 2, income: 3, expense: 4 };

function assertDate(value: string, name: string): void {
  if (typeof value !== "string" || !ISO_DATE.test(value)) throw new RangeError(`${name} must be a date as YYYY-MM-DD, got ${String(value)}`);
}

function assertPosting(p: Posting, i: number): void {
  assertDate(p.date, `postings[${i}].date`);
  if (!TYPES.has(p.accountType)) throw new RangeError(`postings[${i}].accountType must be asset, liability, equity, income or expense, got ${String(p.accountType)}`);
  for (const side of ["debitMinor", "creditMinor"] as const) {
    const v = p[side];
    if (!Number.isSafeInteger(v) || v < 0) throw new RangeError(`postings[${i}].${side} must be whole minor units ≥ 0, got ${v}`);
  }
}

/** The posting's effect on its account, on the account's normal side. */
export function normalAmount(p: Pick<Posting, "accountType" | "debitMinor" | "creditMinor">): number {
  const debitPositive = p.debitMinor - p.creditMinor;
  const shown = p.accountType === "asset" || p.accountType === "expense" ? debitPositive : -debitPositive;
  return shown === 0 ? 0 : shown;
}

/** Per-account totals on each account's normal side, ordered by type then code. */
export function accountLines(postings: readonly Posting[]): ReportLine[] {
  const byCode = new Map<string, ReportLine>();
  postings.forEach((p, i) => {
    assertPosting(p, i);
    const line = byCode.get(p.accountCode);
    if (line && line.type !== p.accountType) throw new RangeError(`Account ${p.accountCode} appears as both ${line.type} and ${p.accountType}`);
    if (line) line.amountMinor += normalAmount(p);
    else byCode.set(p.accountCode, { code: p.accountCode, name: p.accountName, type: p.accountType, amountMinor: normalAmount(p) });
  });
  return [...byCode.values()].sort((a, b) => TYPE_ORDER[a.type] - TYPE_ORDER[b.type] || (a.code < b.code ? -1 : a.code > b.code ? 1 : 0));
}

const sumOf = (lines: readonly ReportLine[], type: AccountType) => lines.filter((l) => l.type === type).reduce((s, l) => s + l.amountMinor, 0);

/**
 * Income, expenses and the net result of the postings dated from `from` to `to`, both
 * inclusive. Asset, liability and equity postings are not part of it.
 */
export function profitAndLoss(postings: readonly Posting[], period: { from: string; to: string }): ProfitAndLoss {
  assertDate(period.from, "from");
  assertDate(period.to, "to");
  if (period.from > period.to) throw new RangeError(`from (${period.from}) is after to (${period.to})`);
  postings.forEach(assertPosting);
  const inPeriod = postings.filter((p) => (p.accountType === "income" || p.accountType === "expense") && p.date >= period.from && p.date <= period.to);
  const byAccount = accountLines(inPeriod);
  const incomeMinor = sumOf(byAccount, "income");
  const expenseMinor = sumOf(byAccount, "expense");
  return { incomeMinor, expenseMinor, netMinor: incomeMinor - expenseMinor, byAccount };
}

/** The position at the end of `asOf` (postings dated on or before it). */
export function balanceSheet(postings: readonly Posting[], asOf: string): BalanceSheet {
  assertDate(asOf, "asOf");
  const lines = accountLines(postings.filter((p, i) => (assertPosting(p, i), p.date <= asOf)));
  const assetsMinor = sumOf(lines, "asset");
  const liabilitiesMinor = sumOf(lines, "liability");
  const equityMinor = sumOf(lines, "equity") + sumOf(lines, "income") - sumOf(lines, "expense");
  return { assetsMinor, liabilitiesMinor, equityMinor, balanced: assetsMinor === liabilitiesMinor + equityMinor };
}

/**
 * The balance sheet's lines for display: each asset, liability and equity account at `asOf`,
 * and one equity line for the net income not yet closed ("Net income to date").
 */
export function balanceSheetLines(postings: readonly Posting[], asOf: string): ReportLine[] {
  assertDate(asOf, "asOf");
  const lines = accountLines(postings.filter((p, i) => (assertPosting(p, i), p.date <= asOf)));
  const net = sumOf(lines, "income") - sumOf(lines, "expense");
  const netLine: ReportLine = { code: "net-income-to-date", name: "Net income to date (not yet closed)", type: "equity", amountMinor: net };
  return [...lines.filter((l) => l.type === "asset" || l.type === "liability" || l.type === "equity"), netLine].sort((a, b) => TYPE_ORDER[a.type] - TYPE_ORDER[b.type]);
}
