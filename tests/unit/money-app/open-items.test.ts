// Open-item accounting for member accounts: payments settle the oldest charge first (FIFO,
// common practice for ageing receivables). Figures are our own arithmetic.
import { describe, expect, it } from "vitest";
import { oldestOpenDueDate, openItemsOf } from "@/lib/money/open-items";

describe("openItemsOf", () => {
  it("settles the oldest charge first and keeps the rest open", () => {
    const r = openItemsOf([
      { entryId: "dues-mar", date: "2026-03-01", dueOn: "2026-03-15", amountMinor: 9500 },
      { entryId: "flight", date: "2026-03-12", dueOn: "2026-03-26", amountMinor: 18240 },
      { entryId: "pay", date: "2026-03-20", amountMinor: -12000 },
    ]);
    // 12,000 settles the 9,500 dues, then 2,500 of the flight: 18,240 − 2,500 = 15,740 open (own arithmetic)
    expect(r.items).toEqual([{ entryId: "flight", date: "2026-03-12", dueDate: "2026-03-26", originalMinor: 18240, openMinor: 15740 }]);
    expect(r.balanceMinor).toBe(15740);
    expect(r.unappliedCreditMinor).toBe(0);
    expect(oldestOpenDueDate(r)).toBe("2026-03-26");
  });

  it("holds an overpayment as a credit and applies it to the next charge", () => {
    const r = openItemsOf([
      { entryId: "a", date: "2026-01-01", amountMinor: 5000 },
      { entryId: "pay", date: "2026-01-05", amountMinor: -8000 },
      { entryId: "b", date: "2026-02-01", amountMinor: 2000 },
    ]);
    // 8,000 − 5,000 = 3,000 credit; the 2,000 charge uses it up, 1,000 credit left (own arithmetic)
    expect(r.items).toEqual([]);
    expect(r.unappliedCreditMinor).toBe(1000);
    expect(r.balanceMinor).toBe(-1000);
  });

  it("lets a reversal settle the charge it reverses, not the oldest one", () => {
    const r = openItemsOf([
      { entryId: "old", date: "2026-01-01", amountMinor: 4000 },
      { entryId: "wrong", date: "2026-02-01", amountMinor: 7000 },
      { entryId: "rev", date: "2026-02-02", amountMinor: -7000, appliesToEntryId: "wrong" },
    ]);
    expect(r.items.map((i) => [i.entryId, i.openMinor])).toEqual([["old", 4000]]);
  });

  it("keeps Σ open − unapplied credit equal to the balance for any order", () => {
    const moves = [3000, -1200, 450, -5000, 2600, 800, -100].map((amountMinor, i) => ({ entryId: `m${i}`, date: `2026-04-${String(10 + i).padStart(2, "0")}`, amountMinor }));
    const r = openItemsOf(moves);
    const open = r.items.reduce((s, i) => s + i.openMinor, 0);
    expect(open - r.unappliedCreditMinor).toBe(moves.reduce((s, m) => s + m.amountMinor, 0));
    expect(() => openItemsOf([{ entryId: "x", date: "2026-01-01", amountMinor: 1.5 }])).toThrow(RangeError);
  });
});
