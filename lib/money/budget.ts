// Budget against actual for income and expense accounts, month by month. Actuals come from the
// profit and loss over the same postings (lib/money/reports), so the two pages never disagree.
// Standard accounting practice (management accounts): a variance is favourable when income is
// above budget or an expense is below it; the variance % is the variance over the budget.
// Amounts are integer minor units on the account's normal side.

import type { AccountType } from "./chart";
import { profitAndLoss, type Posting } from "./reports";

/** Short month names for the budget's grid and tables (index 0 = January). */
export const MONTH_SHORT = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"] as const;

export type BudgetCell = { accountCode: string; month: string; amountMinor: number };

export type BudgetAccount = { code: string; name: string; type: Extract<AccountType, "income" | "expense"> };

export type BudgetLine = {
  code: string;
  name: string;
  type: "income" | "expense";
  budgetMinor: number;
  actualMinor: number;
  /** Favourable positive: actual − budget for income, budget − actual for an expense. */
  varianceMinor: number;
  /** The variance as a percent of the budget, one decimal; null when there is no budget. */
  variancePercent: number | null;
  favourable: boolean | null;
};

export type BudgetReport = {
  lines: BudgetLine[];
  income: { budgetMinor: number; actualMinor: number };
  expense: { budgetMinor: number; actualMinor: number };
  /** Net (income − expense) budgeted and actual, and the variance between them (actual − budget). */
  net: { budgetMinor: number; actualMinor: number; varianceMinor: number };
};

const MONTH = /^\d{4}-(0[1-9]|1[0-2])$/;

function lastDayOf(month: string): string {
  const [y, m] = month.split("-").map(Number) as [number, number];
  const d = new Date(Date.UTC(y, m, 0)).getUTCDate();
  return `${month}-${String(d).padStart(2, "0")}`;
}

/** The months from `from` to `to`, both inclusive ("2026-01".."2026-03" → three months). */
export function monthsBetween(from: string, to: string): string[] {
  if (!MONTH.test(from) || !MONTH.test(to)) throw new RangeError(`months are YYYY-MM, got ${from} and ${to}`);
  if (from > to) throw new RangeError(`${from} is after ${to}`);
  const out: string[] = [];
  let [y, m] = from.split("-").map(Number) as [number, number];
  for (let at = from; at <= to; at = `${y}-${String(m).padStart(2, "0")}`) {
    out.push(at);
    m += 1;
    if (m > 12) [y, m] = [y + 1, 1];
  }
  return out;
}

/** The variance % (one decimal, rounded half away from zero), or null without a budget. */
export function variancePercent(varianceMinor: number, budgetMinor: number): number | null {
  if (budgetMinor === 0) return null;
  const tenths = (Math.abs(varianceMinor) * 1000) / Math.abs(budgetMinor);
  return (Math.sign(varianceMinor) * Math.round(tenths)) / 10;
}

/**
 * Budget against actual for the months `from`..`to` (YYYY-MM, inclusive). One line per income
 * or expense account that has a budget or an actual in those months (`accounts` names them and
 * orders them: income first, then expense, by code), and the totals.
 */
export function budgetVsActual(postings: readonly Posting[], cells: readonly BudgetCell[], accounts: readonly BudgetAccount[], months: { from: string; to: string }): BudgetReport {
  const span = monthsBetween(months.from, months.to);
  const inSpan = new Set(span);
  const budgetBy = new Map<string, number>();
  for (const c of cells) {
    if (!Number.isSafeInteger(c.amountMinor) || c.amountMinor < 0) throw new RangeError(`budget for ${c.accountCode} ${c.month} must be whole minor units ≥ 0, got ${c.amountMinor}`);
    if (inSpan.has(c.month)) budgetBy.set(c.accountCode, (budgetBy.get(c.accountCode) ?? 0) + c.amountMinor);
  }
  const pnl = profitAndLoss(postings, { from: `${span[0]}-01`, to: lastDayOf(span.at(-1)!) });
  const actualBy = new Map(pnl.byAccount.map((l) => [l.code, l]));
  const known = new Map(accounts.map((a) => [a.code, a]));
  for (const l of pnl.byAccount) if (!known.has(l.code) && (l.type === "income" || l.type === "expense")) known.set(l.code, { code: l.code, name: l.name, type: l.type });
  const lines: BudgetLine[] = [];
  for (const a of known.values()) {
    const budgetMinor = budgetBy.get(a.code) ?? 0;
    const actual = actualBy.get(a.code);
    if (!actual && !budgetBy.has(a.code)) continue;
    const actualMinor = actual?.amountMinor ?? 0;
    const varianceMinor = a.type === "income" ? actualMinor - budgetMinor : budgetMinor - actualMinor;
    lines.push({ code: a.code, name: a.name, type: a.type, budgetMinor, actualMinor, varianceMinor, variancePercent: variancePercent(varianceMinor, budgetMinor), favourable: varianceMinor === 0 ? null : varianceMinor > 0 });
  }
  lines.sort((x, y) => (x.type === y.type ? (x.code < y.code ? -1 : x.code > y.code ? 1 : 0) : x.type === "income" ? -1 : 1));
  const total = (type: "income" | "expense") => ({
    budgetMinor: lines.filter((l) => l.type === type).reduce((s, l) => s + l.budgetMinor, 0),
    actualMinor: lines.filter((l) => l.type === type).reduce((s, l) => s + l.actualMinor, 0),
  });
  const income = total("income");
  const expense = total("expense");
  const netBudget = income.budgetMinor - expense.budgetMinor;
  const netActual = income.actualMinor - expense.actualMinor;
  return { lines, income, expense, net: { budgetMinor: netBudget, actualMinor: netActual, varianceMinor: netActual - netBudget } };
}

/**
 * An annual amount spread over twelve months in whole minor units: equal parts, the remainder
 * one unit at a time from January, so the months add up to the year exactly.
 */
export function spreadOverYear(annualMinor: number): number[] {
  if (!Number.isSafeInteger(annualMinor) || annualMinor < 0) throw new RangeError(`annualMinor must be whole minor units ≥ 0, got ${annualMinor}`);
  const base = Math.floor(annualMinor / 12);
  const rest = annualMinor - base * 12;
  return Array.from({ length: 12 }, (_, i) => base + (i < rest ? 1 : 0));
}
