// Year-end close (standard accounting practice; e.g. Weygandt, Kimmel & Kieso, "Accounting
// Principles", the closing entries): at the end of the financial year every income and expense
// account is brought to zero and the net income (or loss) moves into equity — here in one entry,
// straight to retained funds, dated the year's last day. Afterwards the year is locked: nothing
// may be dated on or before that day. The balance sheet is unchanged by the close (equity already
// includes net income not yet closed), so it stays balanced; the profit and loss of the closed
// year is read without the closing entry.

import type { Posting } from "./reports";

export type ClosingLine = { accountCode: string; debitMinor?: number; creditMinor?: number };

export type YearEndClosing = {
  /** The year's last day, YYYY-12-31: the closing entry's date and the end of the lock. */
  date: string;
  /** Income and expense accounts zeroed, and retained funds taking the difference; empty when there is nothing to close. */
  lines: ClosingLine[];
  /** Income − expense closed (a loss is negative). */
  netIncomeMinor: number;
};

export const RETAINED_FUNDS_CODE = "retained-funds";

/**
 * The closing entry for `year` from the club's postings: the income and expense balances at the
 * year's last day (yearCloseProblem refuses a year while an earlier one is open), each posted on its other side,
 * the net to `retainedCode`. Postings after the year are ignored.
 */
export function yearEndClosing(postings: readonly Posting[], year: number, retainedCode = RETAINED_FUNDS_CODE): YearEndClosing {
  if (!Number.isInteger(year) || year < 1900 || year > 2200) throw new RangeError(`year must be a whole year 1900–2200, got ${year}`);
  const date = `${year}-12-31`;
  const debitPositive = new Map<string, number>();
  postings.forEach((p, i) => {
    if (!Number.isSafeInteger(p.debitMinor) || !Number.isSafeInteger(p.creditMinor) || p.debitMinor < 0 || p.creditMinor < 0) throw new RangeError(`postings[${i}] must have whole minor units ≥ 0`);
    if (p.date > date || (p.accountType !== "income" && p.accountType !== "expense")) return;
    if (p.accountCode === retainedCode) throw new RangeError(`${retainedCode} must be an equity account`);
    debitPositive.set(p.accountCode, (debitPositive.get(p.accountCode) ?? 0) + p.debitMinor - p.creditMinor);
  });
  const lines: ClosingLine[] = [];
  let netDebit = 0;
  for (const [accountCode, balance] of [...debitPositive.entries()].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))) {
    if (balance === 0) continue;
    lines.push(balance > 0 ? { accountCode, creditMinor: balance } : { accountCode, debitMinor: -balance });
    netDebit += balance;
  }
  // netDebit > 0: expenses exceeded income (a loss). Retained funds takes the other side.
  const netIncomeMinor = -netDebit;
  if (netIncomeMinor > 0) lines.push({ accountCode: retainedCode, creditMinor: netIncomeMinor });
  if (netIncomeMinor < 0) lines.push({ accountCode: retainedCode, debitMinor: -netIncomeMinor });
  return { date, lines, netIncomeMinor: netIncomeMinor === 0 ? 0 : netIncomeMinor };
}

/**
 * Why `year` may not be closed, or null when it may: the year must be over in the club's
 * calendar, not closed already, no later year closed, and no earlier year with postings still
 * open (years close in order: closing a year over an open earlier one would sweep that year's
 * income and expenses into this one's close). `postedYears`: the years that have postings.
 */
export function yearCloseProblem(year: number, today: string, closedYears: readonly number[], postedYears: readonly number[] = []): string | null {
  if (!Number.isInteger(year)) return "Choose a year.";
  if (closedYears.includes(year)) return `${year} is already closed; a closed year is never closed twice.`;
  const later = closedYears.filter((y) => y > year);
  if (later.length) return `${Math.max(...later)} is already closed; years close in order, so ${year} can no longer be closed.`;
  if (today <= `${year}-12-31`) return `${year} is not over yet: a year is closed after its last day (${year}-12-31).`;
  const open = [...new Set(postedYears)].filter((y) => y < year && !closedYears.includes(y)).sort((a, b) => a - b);
  if (open.length) {
    const first = open[0]!;
    const which = open.length === 1 ? `${first} has postings and is still open` : `${open.slice(0, -1).join(", ")} and ${open.at(-1)} have postings and are still open`;
    return `Close ${first} first: ${which}, and years close in order (${open.length === 1 ? first : open.join(", ")}, then ${year}). Nothing was closed.`;
  }
  return null;
}
