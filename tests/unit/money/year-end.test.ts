// Year-end close against the textbook closing entries (Weygandt, Kimmel & Kieso, "Accounting
// Principles", chapters 1 and 4: revenue and expense accounts closed, net income to equity;
// from memory) on the chapter 1 "Softbyte" month, taken here as a whole year; every value is
// also re-derived by the arithmetic beside it. Standard accounting practice: the close leaves the
// balance sheet unchanged and balanced, and zeroes every income and expense account.
import { describe, expect, it } from "vitest";
import { balanceSheet, balanceSheetLines, type Posting } from "@/lib/money/reports";
import { yearCloseProblem, yearEndClosing } from "@/lib/money/year-end";
import type { AccountType } from "@/lib/money";

const ACCOUNTS: Record<string, { name: string; type: AccountType }> = {
  cash: { name: "Cash", type: "asset" },
  receivable: { name: "Accounts receivable", type: "asset" },
  supplies: { name: "Supplies", type: "asset" },
  equipment: { name: "Equipment", type: "asset" },
  payable: { name: "Accounts payable", type: "liability" },
  capital: { name: "Owner's capital", type: "equity" },
  drawings: { name: "Owner's drawings", type: "equity" },
  "retained-funds": { name: "Retained funds", type: "equity" },
  revenue: { name: "Service revenue", type: "income" },
  rent: { name: "Rent expense", type: "expense" },
  salaries: { name: "Salaries expense", type: "expense" },
  utilities: { name: "Utilities expense", type: "expense" },
  advertising: { name: "Advertising expense", type: "expense" },
};

function entry(date: string, ...lines: [string, number, number][]): Posting[] {
  return lines.map(([code, dr, cr]) => ({ date, accountCode: code, accountName: ACCOUNTS[code]!.name, accountType: ACCOUNTS[code]!.type, debitMinor: dr * 100, creditMinor: cr * 100 }));
}

// Weygandt, Kimmel & Kieso ch. 1 "Softbyte" transactions (from memory).
const SOFTBYTE: Posting[] = [
  ...entry("2025-09-01", ["cash", 15_000, 0], ["capital", 0, 15_000]),
  ...entry("2025-09-02", ["equipment", 7_000, 0], ["cash", 0, 7_000]),
  ...entry("2025-09-03", ["supplies", 1_600, 0], ["payable", 0, 1_600]),
  ...entry("2025-09-05", ["cash", 1_200, 0], ["revenue", 0, 1_200]),
  ...entry("2025-09-08", ["advertising", 250, 0], ["payable", 0, 250]),
  ...entry("2025-09-12", ["cash", 1_500, 0], ["receivable", 2_000, 0], ["revenue", 0, 3_500]),
  ...entry("2025-09-20", ["rent", 600, 0], ["salaries", 900, 0], ["utilities", 200, 0], ["cash", 0, 1_700]),
  ...entry("2025-09-25", ["payable", 250, 0], ["cash", 0, 250]),
  ...entry("2025-09-27", ["cash", 600, 0], ["receivable", 0, 600]),
  ...entry("2025-09-30", ["drawings", 1_300, 0], ["cash", 0, 1_300]),
];

const asPostings = (date: string, lines: { accountCode: string; debitMinor?: number; creditMinor?: number }[]): Posting[] =>
  lines.map((l) => ({ date, accountCode: l.accountCode, accountName: ACCOUNTS[l.accountCode]!.name, accountType: ACCOUNTS[l.accountCode]!.type, debitMinor: l.debitMinor ?? 0, creditMinor: l.creditMinor ?? 0 }));

describe("yearEndClosing — the textbook closing entries in one entry", () => {
  const closing = yearEndClosing(SOFTBYTE, 2025, "retained-funds");

  it("is dated the year's last day", () => {
    expect(closing.date).toBe("2025-12-31"); // standard accounting practice: closing entries dated at the period's end
  });

  it("debits revenue, credits each expense, and credits equity with the net income", () => {
    expect(closing.lines).toEqual([
      { accountCode: "advertising", creditMinor: 25_000 }, // advertising expense $250 (Weygandt ch. 1)
      { accountCode: "rent", creditMinor: 60_000 }, // rent expense $600 (Weygandt ch. 1)
      { accountCode: "revenue", debitMinor: 470_000 }, // service revenue $4,700 (Weygandt ch. 1)
      { accountCode: "salaries", creditMinor: 90_000 }, // salaries expense $900 (Weygandt ch. 1)
      { accountCode: "utilities", creditMinor: 20_000 }, // utilities expense $200 (Weygandt ch. 1)
      { accountCode: "retained-funds", creditMinor: 275_000 }, // net income $2,750 = 4,700 − 1,950 (Weygandt ch. 1)
    ]);
    expect(closing.netIncomeMinor).toBe(275_000); // $2,750 (Weygandt ch. 1)
    // The entry balances: 4,700 debit = 250 + 600 + 900 + 200 + 2,750 credit (arithmetic)
    const dr = closing.lines.reduce((s, l) => s + (l.debitMinor ?? 0), 0);
    const cr = closing.lines.reduce((s, l) => s + (l.creditMinor ?? 0), 0);
    expect(dr).toBe(cr);
  });

  it("leaves the balance sheet as it was, balanced, with the income now in retained funds", () => {
    const before = balanceSheet(SOFTBYTE, "2025-12-31");
    const after = [...SOFTBYTE, ...asPostings(closing.date, closing.lines)];
    // Assets 8,050 + 1,400 + 1,600 + 7,000 = 18,050; liabilities 1,600; equity 15,000 − 1,300 + 2,750 = 16,450 (Weygandt ch. 1 balance sheet)
    expect(before).toEqual({ assetsMinor: 1_805_000, liabilitiesMinor: 160_000, equityMinor: 1_645_000, balanced: true });
    expect(balanceSheet(after, "2025-12-31")).toEqual(before); // standard accounting practice: closing moves amounts within equity only
    const lines = balanceSheetLines(after, "2025-12-31");
    expect(lines.find((l) => l.code === "retained-funds")?.amountMinor).toBe(275_000); // net income $2,750 closed (Weygandt ch. 4)
    expect(lines.find((l) => l.code === "net-income-to-date")?.amountMinor).toBe(0); // nothing left unclosed (standard accounting practice)
  });

  it("a second close of the same postings finds nothing left to close", () => {
    const after = [...SOFTBYTE, ...asPostings(closing.date, closing.lines)];
    expect(yearEndClosing(after, 2025)).toEqual({ date: "2025-12-31", lines: [], netIncomeMinor: 0 }); // standard accounting practice: temporary accounts start the new year at zero
  });

  it("a loss debits retained funds", () => {
    // Rent 600 paid, no income: a loss of 600 (arithmetic)
    const loss = entry("2026-03-01", ["rent", 600, 0], ["cash", 0, 600]);
    expect(yearEndClosing(loss, 2026)).toEqual({ date: "2026-12-31", lines: [{ accountCode: "rent", creditMinor: 60_000 }, { accountCode: "retained-funds", debitMinor: 60_000 }], netIncomeMinor: -60_000 });
  });

  it("ignores postings after the year and balance sheet accounts", () => {
    const later = [...SOFTBYTE, ...entry("2026-01-02", ["cash", 100, 0], ["revenue", 0, 100])];
    expect(yearEndClosing(later, 2025).netIncomeMinor).toBe(275_000); // the 2026 sale is next year's income (standard accounting practice)
  });

  it("a refund larger than its income (a debit balance on an income account) is credited back", () => {
    const odd = [...entry("2026-02-01", ["revenue", 50, 0], ["cash", 0, 50])];
    // revenue carries a 50 debit balance: closed with a 50 credit, retained funds debited 50 (arithmetic)
    expect(yearEndClosing(odd, 2026).lines).toEqual([{ accountCode: "revenue", creditMinor: 5_000 }, { accountCode: "retained-funds", debitMinor: 5_000 }]);
  });
});

describe("yearCloseProblem — years close once, in order, after they end", () => {
  it("refuses a year not yet over", () => {
    expect(yearCloseProblem(2026, "2026-12-31", [])).toMatch(/not over yet/); // closed after its last day (standard accounting practice)
    expect(yearCloseProblem(2026, "2027-01-01", [])).toBeNull();
  });
  it("refuses a second close of the same year", () => {
    expect(yearCloseProblem(2025, "2026-02-01", [2025])).toMatch(/already closed/); // a closed period is never reopened (standard accounting practice)
  });
  it("refuses a year before one already closed", () => {
    expect(yearCloseProblem(2024, "2026-02-01", [2025])).toMatch(/years close in order/); // standard accounting practice
  });
  it("refuses a year while an earlier year with postings is still open, naming the earliest", () => {
    // Closing entries are made period by period, in order (standard accounting practice).
    expect(yearCloseProblem(2025, "2026-02-01", [], [2024])).toBe("Close 2024 first: 2024 has postings and is still open, and years close in order (2024, then 2025). Nothing was closed.");
    expect(yearCloseProblem(2026, "2027-02-01", [], [2024, 2025, 2024])).toMatch(/^Close 2024 first: 2024 and 2025 have postings and are still open/); // standard accounting practice
    expect(yearCloseProblem(2026, "2027-02-01", [2024], [2024, 2025])).toMatch(/^Close 2025 first: /); // standard accounting practice
    expect(yearCloseProblem(2025, "2026-02-01", [2024], [2024])).toBeNull(); // the earlier year is closed
    expect(yearCloseProblem(2025, "2026-02-01", [], [2025, 2026])).toBeNull(); // postings in the year itself or later do not block it
    expect(yearCloseProblem(2025, "2025-06-01", [], [2024])).toMatch(/not over yet/); // the year's own problem first
  });
});
