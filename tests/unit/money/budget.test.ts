// Budget against actual. Sources: standard accounting practice for management accounts — a
// variance is favourable when income beats the budget or an expense stays under it, and the
// variance % is the variance over the budget; every check value is re-derived in its comment.
import { describe, expect, it } from "vitest";
import { budgetVsActual, monthsBetween, spreadOverYear, variancePercent } from "@/lib/money/budget";
import type { Posting } from "@/lib/money/reports";

const p = (date: string, accountCode: string, accountType: Posting["accountType"], debit: number, credit: number): Posting => ({ date, accountCode, accountName: accountCode, accountType, debitMinor: debit, creditMinor: credit });

const POSTINGS: Posting[] = [
  p("2026-01-10", "flight-income", "income", 0, 1_200_000),
  p("2026-01-10", "bank", "asset", 1_200_000, 0),
  p("2026-01-15", "fuel-oil", "expense", 300_000, 0),
  p("2026-01-15", "bank", "asset", 0, 300_000),
  p("2026-02-03", "fuel-oil", "expense", 150_000, 0),
  p("2026-02-03", "bank", "asset", 0, 150_000),
  p("2026-03-01", "hangar-tie-down", "expense", 90_000, 0),
  p("2026-03-01", "bank", "asset", 0, 90_000),
];
const ACCOUNTS = [
  { code: "flight-income", name: "Flight income", type: "income" as const },
  { code: "fuel-oil", name: "Fuel and oil", type: "expense" as const },
  { code: "hangar-tie-down", name: "Hangar and tie-down", type: "expense" as const },
  { code: "dues-income", name: "Dues income", type: "income" as const },
];
const CELLS = [
  { accountCode: "flight-income", month: "2026-01", amountMinor: 1_000_000 },
  { accountCode: "fuel-oil", month: "2026-01", amountMinor: 250_000 },
  { accountCode: "fuel-oil", month: "2026-02", amountMinor: 250_000 },
  { accountCode: "dues-income", month: "2026-02", amountMinor: 80_000 },
];

describe("budgetVsActual", () => {
  it("one month: income above budget is favourable, an expense above budget is not", () => {
    const r = budgetVsActual(POSTINGS, CELLS, ACCOUNTS, { from: "2026-01", to: "2026-01" });
    expect(r.lines).toEqual([
      // 12,000 actual − 10,000 budget = +2,000, 2,000 / 10,000 = +20.0 % (standard accounting practice)
      { code: "flight-income", name: "Flight income", type: "income", budgetMinor: 1_000_000, actualMinor: 1_200_000, varianceMinor: 200_000, variancePercent: 20, favourable: true },
      // 2,500 budget − 3,000 actual = −500, −500 / 2,500 = −20.0 % (standard accounting practice)
      { code: "fuel-oil", name: "Fuel and oil", type: "expense", budgetMinor: 250_000, actualMinor: 300_000, varianceMinor: -50_000, variancePercent: -20, favourable: false },
    ]);
    // Net budget 10,000 − 2,500 = 7,500; net actual 12,000 − 3,000 = 9,000; variance +1,500 (arithmetic)
    expect(r.net).toEqual({ budgetMinor: 750_000, actualMinor: 900_000, varianceMinor: 150_000 });
  });

  it("a quarter adds the months; an account with a budget and no actual, or an actual and no budget, is listed", () => {
    const r = budgetVsActual(POSTINGS, CELLS, ACCOUNTS, { from: "2026-01", to: "2026-03" });
    expect(r.lines.map((l) => [l.code, l.budgetMinor, l.actualMinor, l.varianceMinor, l.variancePercent])).toEqual([
      ["dues-income", 80_000, 0, -80_000, -100], // budgeted 800, nothing in: −800, −100 % (arithmetic)
      ["flight-income", 1_000_000, 1_200_000, 200_000, 20], // as January (arithmetic)
      ["fuel-oil", 500_000, 450_000, 50_000, 10], // 5,000 − 4,500 = +500 under budget, 500 / 5,000 = +10 % (arithmetic)
      ["hangar-tie-down", 0, 90_000, -90_000, null], // no budget: no percent (standard accounting practice)
    ]);
    expect(r.income).toEqual({ budgetMinor: 1_080_000, actualMinor: 1_200_000 }); // 10,000 + 800; 12,000 (arithmetic)
    expect(r.expense).toEqual({ budgetMinor: 500_000, actualMinor: 540_000 }); // 5,000; 4,500 + 900 (arithmetic)
  });

  it("refuses a negative budget", () => {
    expect(() => budgetVsActual([], [{ accountCode: "fuel-oil", month: "2026-01", amountMinor: -1 }], ACCOUNTS, { from: "2026-01", to: "2026-01" })).toThrow(RangeError);
  });
});

describe("variancePercent", () => {
  it("rounds to one decimal, half away from zero", () => {
    expect(variancePercent(1, 3)).toBe(33.3); // 1/3 = 33.33 % (arithmetic)
    expect(variancePercent(-2, 3)).toBe(-66.7); // −2/3 = −66.67 % (arithmetic)
    expect(variancePercent(5, 0)).toBeNull(); // no budget, no percent (standard accounting practice)
  });
});

describe("spreadOverYear and monthsBetween", () => {
  it("twelve parts adding up to the year exactly", () => {
    const parts = spreadOverYear(100_000_05); // 100,000.05 a year (arithmetic)
    expect(parts.reduce((s, x) => s + x, 0)).toBe(100_000_05);
    expect(parts[0]).toBe(833_334); // 10,000,005 / 12 = 833,333 rest 9: the first nine months carry one more (arithmetic)
    expect(parts[11]).toBe(833_333);
  });
  it("months across a year end", () => {
    expect(monthsBetween("2025-11", "2026-02")).toEqual(["2025-11", "2025-12", "2026-01", "2026-02"]); // Gregorian calendar (common practice)
  });
});
