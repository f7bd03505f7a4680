// Source: common practice (standard bank reconciliation, from memory of accounting textbooks).
import { describe, expect, it } from "vitest";
import { reconciliationSummary } from "@/lib/reconcile";

// Bank reconciliation (standard accounting practice): adjusted bank = statement + deposits in
// transit − outstanding cheques; adjusted book = book + unbooked bank credits − unbooked bank
// charges; the period reconciles when they are equal. Figures are invented; sums are own arithmetic.
describe("reconciliationSummary", () => {
  it("agrees when the reconciling items explain the difference", () => {
    const s = reconciliationSummary({
      statementBalanceMinor: 1_250_000,
      bookBalanceMinor: 1_240_900,
      depositsInTransit: [30_000, { amountMinor: 12_500 }], // 42,500
      outstandingCheques: [45_000, -7_800], // 52,800: a cheque's size, whichever sign it is given with
      bankChargesNotInBooks: [1_200],
    });
    expect(s.adjustedBankBalanceMinor).toBe(1_239_700); // 1,250,000 + 42,500 − 52,800
    expect(s.adjustedBookBalanceMinor).toBe(1_239_700); // 1,240,900 − 1,200
    expect(s.differenceMinor).toBe(0);
    expect(s.agrees).toBe(true);
  });
  it("shows the unexplained difference", () => {
    const s = reconciliationSummary({
      statementBalanceMinor: 500_000,
      bookBalanceMinor: 520_000,
      depositsInTransit: [15_000],
      outstandingCheques: [],
    });
    expect(s.adjustedBankBalanceMinor).toBe(515_000); // 500,000 + 15,000
    expect(s.differenceMinor).toBe(-5_000); // 515,000 − 520,000
    expect(s.agrees).toBe(false);
  });
  it("accepts totals instead of item lists", () => {
    const s = reconciliationSummary({
      statementBalanceMinor: 100_000,
      bookBalanceMinor: 90_000,
      depositsInTransit: 5_000,
      outstandingCheques: 15_000,
    });
    expect(s.adjustedBankBalanceMinor).toBe(90_000); // 100,000 + 5,000 − 15,000
    expect(s.agrees).toBe(true);
  });
  it("refuses fractional minor units", () => {
    expect(() =>
      reconciliationSummary({ statementBalanceMinor: 1.5, bookBalanceMinor: 0, depositsInTransit: [], outstandingCheques: [] }),
    ).toThrow(RangeError);
  });
});
