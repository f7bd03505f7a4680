// Sources: double-entry bookkeeping — every entry's debits equal its credits, corrections by a
// reversing entry — standard accounting practice (common practice, from memory). Values are own arithmetic.
import { describe, expect, it } from "vitest";
import {
  assertBalanced,
  balancesByAccount,
  findEntryProblem,
  isBalanced,
  normalSideOf,
  presentBalance,
  reversalOf,
  UnbalancedEntryError,
  type JournalEntry,
} from "@/lib/money";

// Double entry (standard accounting practice): every entry's debits equal its credits;
// a posted entry is corrected by a reversing entry, never edited.
const flight: JournalEntry = {
  id: 41,
  date: "2025-05-03",
  memo: "Flight 1.2 h N0123X",
  lines: [
    { accountId: "member-receivables:7", debitMinor: 17400 },
    { accountId: "flight-income", creditMinor: 12400 },
    { accountId: "fuel-credits", creditMinor: 5000 },
  ],
};

describe("ledger balance", () => {
  it("accepts an entry whose debits equal its credits", () => {
    expect(isBalanced(flight)).toBe(true); // 17400 = 12400 + 5000
    expect(isBalanced(flight.lines)).toBe(true);
    expect(() => assertBalanced(flight)).not.toThrow();
  });
  it("rejects an unbalanced entry and says by how much", () => {
    const lines = [
      { accountId: "bank", debitMinor: 10000 },
      { accountId: "dues-income", creditMinor: 9999 },
    ];
    expect(isBalanced(lines)).toBe(false);
    expect(findEntryProblem(lines)).toMatchObject({ code: "unbalanced", differenceMinor: 1 });
    expect(() => assertBalanced(lines)).toThrow(UnbalancedEntryError);
  });
  it("rejects lines that are not plain one-sided whole minor units", () => {
    expect(findEntryProblem([])?.code).toBe("empty");
    expect(findEntryProblem([{ accountId: 1, debitMinor: 5, creditMinor: 5 }])?.code).toBe("both-sides");
    expect(findEntryProblem([{ accountId: 1 }, { accountId: 2 }])?.code).toBe("no-amount");
    expect(
      findEntryProblem([
        { accountId: 1, debitMinor: -5 },
        { accountId: 2, creditMinor: -5 },
      ])?.code,
    ).toBe("invalid-amount");
    expect(
      isBalanced([
        { accountId: 1, debitMinor: 10.5 },
        { accountId: 2, creditMinor: 10.5 },
      ]),
    ).toBe(false);
  });
});

describe("reversalOf", () => {
  it("puts every line on the other side and points back at the original", () => {
    const reversal = reversalOf(flight, { date: "2025-05-10" });
    expect(reversal.reversesEntryId).toBe(41);
    expect(reversal.date).toBe("2025-05-10");
    expect(reversal.id).toBeUndefined();
    expect(reversal.lines).toEqual([
      { accountId: "member-receivables:7", creditMinor: 17400 },
      { accountId: "flight-income", debitMinor: 12400 },
      { accountId: "fuel-credits", debitMinor: 5000 },
    ]);
    expect(isBalanced(reversal)).toBe(true);
  });
  it("nets every account to zero together with the original", () => {
    const all = [...flight.lines, ...reversalOf(flight).lines];
    for (const balance of balancesByAccount(all).values()) expect(balance).toBe(0);
  });
  it("reversing a reversal restores the original lines", () => {
    expect(reversalOf(reversalOf(flight)).lines).toEqual(flight.lines);
  });
});

describe("chart of accounts sides", () => {
  it("keeps assets and expenses on the debit side (standard accounting practice)", () => {
    expect(normalSideOf("asset")).toBe("debit");
    expect(normalSideOf("expense")).toBe("debit");
    expect(normalSideOf("income")).toBe("credit");
    expect(normalSideOf("liability")).toBe("credit");
    expect(presentBalance(-12400, "income")).toBe(12400); // income credited 12400 reads as +12400
  });
});
