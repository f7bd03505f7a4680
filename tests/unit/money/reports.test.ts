// Sources: the income statement and balance sheet as standard accounting practice defines them
// (income credit-normal, expense debit-normal; assets = liabilities + equity, equity including
// the period's net income until it is closed). The first example is the one-month service
// business used in chapter 1 of Weygandt, Kimmel & Kieso, "Accounting Principles" (the
// "Softbyte" illustration), from memory; every check value below is also re-derived by the
// arithmetic in the comment beside it.
import { describe, expect, it } from "vitest";
import { accountLines, balanceSheet, balanceSheetLines, profitAndLoss, type Posting } from "@/lib/money/reports";
import type { AccountType } from "@/lib/money";

const ACCOUNTS: Record<string, { name: string; type: AccountType }> = {
  cash: { name: "Cash", type: "asset" },
  receivable: { name: "Accounts receivable", type: "asset" },
  supplies: { name: "Supplies", type: "asset" },
  equipment: { name: "Equipment", type: "asset" },
  payable: { name: "Accounts payable", type: "liability" },
  capital: { name: "Owner's capital", type: "equity" },
  drawings: { name: "Owner's drawings", type: "equity" },
  revenue: { name: "Service revenue", type: "income" },
  rent: { name: "Rent expense", type: "expense" },
  salaries: { name: "Salaries expense", type: "expense" },
  utilities: { name: "Utilities expense", type: "expense" },
  advertising: { name: "Advertising expense", type: "expense" },
};

/** One balanced entry as postings: [code, debit, credit] in whole dollars → minor units. */
function entry(date: string, ...lines: [string, number, number][]): Posting[] {
  return lines.map(([code, dr, cr]) => ({ date, accountCode: code, accountName: ACCOUNTS[code]!.name, accountType: ACCOUNTS[code]!.type, debitMinor: dr * 100, creditMinor: cr * 100 }));
}

// The month's ten transactions (Weygandt, Kimmel & Kieso ch. 1, from memory).
const SOFTBYTE: Posting[] = [
  ...entry("2025-09-01", ["cash", 15_000, 0], ["capital", 0, 15_000]), // 1 owner invests cash
  ...entry("2025-09-02", ["equipment", 7_000, 0], ["cash", 0, 7_000]), // 2 equipment for cash
  ...entry("2025-09-03", ["supplies", 1_600, 0], ["payable", 0, 1_600]), // 3 supplies on account
  ...entry("2025-09-05", ["cash", 1_200, 0], ["revenue", 0, 1_200]), // 4 services for cash
  ...entry("2025-09-08", ["advertising", 250, 0], ["payable", 0, 250]), // 5 advertising on account
  ...entry("2025-09-12", ["cash", 1_500, 0], ["receivable", 2_000, 0], ["revenue", 0, 3_500]), // 6 services, part on account
  ...entry("2025-09-20", ["rent", 600, 0], ["salaries", 900, 0], ["utilities", 200, 0], ["cash", 0, 1_700]), // 7 expenses paid
  ...entry("2025-09-25", ["payable", 250, 0], ["cash", 0, 250]), // 8 pays the advertising bill
  ...entry("2025-09-27", ["cash", 600, 0], ["receivable", 0, 600]), // 9 customer pays on account
  ...entry("2025-09-30", ["drawings", 1_300, 0], ["cash", 0, 1_300]), // 10 owner withdraws cash
];

describe("profitAndLoss — a textbook month (Weygandt, Kimmel & Kieso ch. 1, from memory)", () => {
  const pnl = profitAndLoss(SOFTBYTE, { from: "2025-09-01", to: "2025-09-30" });

  it("income is the service revenue, credit-normal", () => {
    // 1,200 + 3,500 = 4,700 (textbook income statement: revenues $4,700)
    expect(pnl.incomeMinor).toBe(470_000);
  });

  it("expenses are debit-normal", () => {
    // 600 + 900 + 200 + 250 = 1,950 (textbook: total expenses $1,950)
    expect(pnl.expenseMinor).toBe(195_000);
  });

  it("net income is income − expense", () => {
    // 4,700 − 1,950 = 2,750 (textbook: net income $2,750)
    expect(pnl.netMinor).toBe(275_000);
  });

  it("lists each income and expense account once: income first, then expense, by code", () => {
    // Same four expense lines and one revenue line (standard accounting practice: no balance sheet accounts, no drawings)
    expect(pnl.byAccount).toEqual([
      { code: "revenue", name: "Service revenue", type: "income", amountMinor: 470_000 },
      { code: "advertising", name: "Advertising expense", type: "expense", amountMinor: 25_000 },
      { code: "rent", name: "Rent expense", type: "expense", amountMinor: 60_000 },
      { code: "salaries", name: "Salaries expense", type: "expense", amountMinor: 90_000 },
      { code: "utilities", name: "Utilities expense", type: "expense", amountMinor: 20_000 },
    ]);
  });

  it("both dates are inclusive; a posting a day outside is not counted", () => {
    // Only transaction 4 (09-05, 1,200) and 6 (09-12, 3,500) fall in 09-05..09-12 (arithmetic)
    expect(profitAndLoss(SOFTBYTE, { from: "2025-09-05", to: "2025-09-12" })).toMatchObject({ incomeMinor: 470_000, expenseMinor: 25_000, netMinor: 445_000 });
    // 09-06..09-11: only the advertising (250) on 09-08 (arithmetic)
    expect(profitAndLoss(SOFTBYTE, { from: "2025-09-06", to: "2025-09-11" })).toMatchObject({ incomeMinor: 0, expenseMinor: 25_000, netMinor: -25_000 });
    // A period with no income or expense postings: all zero, no lines (standard accounting practice)
    expect(profitAndLoss(SOFTBYTE, { from: "2025-10-01", to: "2025-10-31" })).toEqual({ incomeMinor: 0, expenseMinor: 0, netMinor: 0, byAccount: [] });
  });
});

describe("balanceSheet — the same month (Weygandt, Kimmel & Kieso ch. 1, from memory)", () => {
  it("assets = liabilities + equity at month end, equity including the month's net income", () => {
    // Cash 8,050 + receivable 1,400 + supplies 1,600 + equipment 7,000 = 18,050 (textbook total assets $18,050)
    // Liabilities: payable 1,600 + 250 − 250 = 1,600 (textbook $1,600)
    // Equity: capital 15,000 + net income 2,750 − drawings 1,300 = 16,450 (textbook owner's equity $16,450)
    expect(balanceSheet(SOFTBYTE, "2025-09-30")).toEqual({ assetsMinor: 1_805_000, liabilitiesMinor: 160_000, equityMinor: 1_645_000, balanced: true });
  });

  it("is a position at a day: later postings are left out", () => {
    // After transactions 1–3 only: assets 15,000 − 7,000 + 7,000 + 1,600 = 16,600; liabilities 1,600; equity 15,000 (arithmetic)
    expect(balanceSheet(SOFTBYTE, "2025-09-04")).toEqual({ assetsMinor: 1_660_000, liabilitiesMinor: 160_000, equityMinor: 1_500_000, balanced: true });
    // Before any posting everything is zero, and zero = zero + zero balances (standard accounting practice)
    expect(balanceSheet(SOFTBYTE, "2025-08-31")).toEqual({ assetsMinor: 0, liabilitiesMinor: 0, equityMinor: 0, balanced: true });
  });

  it("shows the lines, with net income to date as its own equity line", () => {
    const lines = balanceSheetLines(SOFTBYTE, "2025-09-30");
    // Cash: 15,000 − 7,000 + 1,200 + 1,500 − 1,700 − 250 + 600 − 1,300 = 8,050 (textbook $8,050)
    expect(lines.find((l) => l.code === "cash")?.amountMinor).toBe(805_000);
    // Drawings are a debit to equity: −1,300 on equity's credit-normal side (standard accounting practice)
    expect(lines.find((l) => l.code === "drawings")?.amountMinor).toBe(-130_000);
    expect(lines.find((l) => l.code === "net-income-to-date")?.amountMinor).toBe(275_000);
    expect(lines.some((l) => l.type === "income" || l.type === "expense")).toBe(false);
  });

  it("says when the postings do not balance", () => {
    // A one-sided posting breaks the equation: assets 100 ≠ 0 + 0 (standard accounting practice)
    const lopsided: Posting[] = [{ date: "2025-09-01", accountCode: "cash", accountName: "Cash", accountType: "asset", debitMinor: 10_000, creditMinor: 0 }];
    expect(balanceSheet(lopsided, "2025-09-30")).toEqual({ assetsMinor: 10_000, liabilitiesMinor: 0, equityMinor: 0, balanced: false });
  });
});

describe("a flying club's year (common practice for a small non-profit club; own arithmetic)", () => {
  const club: Posting[] = [
    // Dues billed and collected: 20 members × 600.00
    { date: "2026-01-05", accountCode: "member-receivables", accountName: "Member receivables", accountType: "asset", debitMinor: 1_200_000, creditMinor: 0 },
    { date: "2026-01-05", accountCode: "dues-income", accountName: "Dues income", accountType: "income", debitMinor: 0, creditMinor: 1_200_000 },
    { date: "2026-01-20", accountCode: "bank", accountName: "Bank", accountType: "asset", debitMinor: 1_200_000, creditMinor: 0 },
    { date: "2026-01-20", accountCode: "member-receivables", accountName: "Member receivables", accountType: "asset", debitMinor: 0, creditMinor: 1_200_000 },
    // Aircraft insurance paid for the year: 4,800.00
    { date: "2026-02-01", accountCode: "aircraft-insurance", accountName: "Aircraft insurance", accountType: "expense", debitMinor: 480_000, creditMinor: 0 },
    { date: "2026-02-01", accountCode: "bank", accountName: "Bank", accountType: "asset", debitMinor: 0, creditMinor: 480_000 },
    // Hangar rent on account (a bill not yet paid): 350.00
    { date: "2026-02-28", accountCode: "hangar-tie-down", accountName: "Hangar and tie-down", accountType: "expense", debitMinor: 35_000, creditMinor: 0 },
    { date: "2026-02-28", accountCode: "bills-payable", accountName: "Bills to pay", accountType: "liability", debitMinor: 0, creditMinor: 35_000 },
    // A flight refunded in full, booked against flight income: 152.00
    { date: "2026-03-03", accountCode: "flight-income", accountName: "Flight income", accountType: "income", debitMinor: 15_200, creditMinor: 0 },
    { date: "2026-03-03", accountCode: "bank", accountName: "Bank", accountType: "asset", debitMinor: 0, creditMinor: 15_200 },
  ];

  it("profit and loss for the first quarter", () => {
    // Income: 12,000.00 dues − 152.00 refunded flight income = 11,848.00; expense 4,800 + 350 = 5,150; net 6,698.00
    const pnl = profitAndLoss(club, { from: "2026-01-01", to: "2026-03-31" });
    expect(pnl).toMatchObject({ incomeMinor: 1_184_800, expenseMinor: 515_000, netMinor: 669_800 });
    // An income account debited more than credited shows a negative amount on its normal side
    expect(pnl.byAccount.find((l) => l.code === "flight-income")?.amountMinor).toBe(-15_200);
  });

  it("balance sheet at the quarter's end", () => {
    // Bank 12,000 − 4,800 − 152 = 7,048.00; receivables 0; liabilities 350.00; equity = net income 6,698.00; 7,048 = 350 + 6,698
    expect(balanceSheet(club, "2026-03-31")).toEqual({ assetsMinor: 704_800, liabilitiesMinor: 35_000, equityMinor: 669_800, balanced: true });
  });
});

describe("bad input fails loudly", () => {
  const ok: Posting = { date: "2026-01-01", accountCode: "bank", accountName: "Bank", accountType: "asset", debitMinor: 1, creditMinor: 0 };
  it("refuses fractions of a minor unit, negative sides, bad dates, reversed periods and unknown types", () => {
    expect(() => profitAndLoss([{ ...ok, debitMinor: 1.5 }], { from: "2026-01-01", to: "2026-01-31" })).toThrow(RangeError);
    expect(() => balanceSheet([{ ...ok, creditMinor: -1 }], "2026-01-31")).toThrow(RangeError);
    expect(() => balanceSheet([ok], "2026-13-01")).toThrow(/YYYY-MM-DD/);
    expect(() => profitAndLoss([ok], { from: "2026-02-01", to: "2026-01-01" })).toThrow(/after/);
    expect(() => accountLines([{ ...ok, accountType: "cash" as AccountType }])).toThrow(/accountType/);
    expect(() => accountLines([ok, { ...ok, accountType: "liability" }])).toThrow(/both asset and liability/);
  });
});
