import { describe, expect, it } from "vitest";
import { addDays } from "@/lib/dates";
import { autoMatch, normalizeReference, type BookItem, type MatchBankLine } from "@/lib/reconcile";

const bank = (date: string, amountMinor: number, reference?: string, id?: string): MatchBankLine => ({
  date,
  amountMinor,
  description: "line",
  ...(reference === undefined ? {} : { reference }),
  ...(id === undefined ? {} : { id }),
});

describe("autoMatch — exact amount within the date window", () => {
  it("matches the same amount within ±3 days and nothing further away", () => {
    const result = autoMatch(
      [bank("2025-03-05", 4500), bank("2025-03-20", 9900)],
      [
        { id: "dues-1", date: "2025-03-02", amountMinor: 4500 }, // 3 days before: inside the default window
        { id: "far", date: "2025-03-10", amountMinor: 9900 }, // 10 days before: outside
      ],
    );
    expect(result.matches).toEqual([{ bankIndex: 0, bookIds: ["dues-1"], kind: "exact" }]);
    expect(result.unmatchedBank).toEqual([1]);
    expect(result.unmatchedBook).toEqual(["far"]);
  });
  it("prefers the nearest date, then the earlier book date, then input order", () => {
    const book: BookItem[] = [
      { id: "a", date: "2025-03-01", amountMinor: 100 },
      { id: "b", date: "2025-03-04", amountMinor: 100 },
      { id: "c", date: "2025-03-06", amountMinor: 100 },
      { id: "d", date: "2025-03-06", amountMinor: 100 },
    ];
    const { matches } = autoMatch([bank("2025-03-05", 100), bank("2025-03-05", 100), bank("2025-03-05", 100)], book);
    // 4 Mar and 6 Mar are both 1 day away: the earlier book date first, then "c" before "d"
    expect(matches.map((m) => m.bookIds[0])).toEqual(["b", "c", "d"]);
  });
  it("is one-to-one and keeps bank line ids", () => {
    const { matches, unmatchedBank } = autoMatch(
      [bank("2025-03-05", 700, undefined, "L1"), bank("2025-03-05", 700, undefined, "L2")],
      [{ id: 9, date: "2025-03-05", amountMinor: 700 }],
    );
    expect(matches).toEqual([{ bankIndex: 0, bankLineId: "L1", bookIds: [9], kind: "exact" }]);
    expect(unmatchedBank).toEqual([1]);
  });
  it("honours a custom window and never matches on sign-flipped amounts", () => {
    const book: BookItem[] = [{ id: "x", date: "2025-03-01", amountMinor: -4800 }];
    expect(autoMatch([bank("2025-03-08", -4800)], book, { windowDays: 7 }).matches).toHaveLength(1);
    expect(autoMatch([bank("2025-03-02", 4800)], book).matches).toHaveLength(0);
  });
});

describe("autoMatch — references", () => {
  it("lets an equal reference win over a nearer date", () => {
    const book: BookItem[] = [
      { id: "chq-1041", date: "2025-03-05", amountMinor: -5000, reference: "1041", kind: "cheque" },
      { id: "chq-1042", date: "2025-02-20", amountMinor: -5000, reference: "1042", kind: "cheque" },
    ];
    // The bank line is the same day as cheque 1041 but carries cheque number 001042.
    const { matches, unmatchedBook } = autoMatch([bank("2025-03-05", -5000, "001042")], book);
    expect(matches).toEqual([{ bankIndex: 0, bookIds: ["chq-1042"], kind: "reference" }]);
    expect(unmatchedBook).toEqual(["chq-1041"]);
  });
  it("still matches by amount when the references differ (a bank's own transaction id)", () => {
    const { matches } = autoMatch(
      [bank("2025-03-05", 4500, "FIT-0001")],
      [{ id: "d", date: "2025-03-04", amountMinor: 4500, reference: "DUES-7" }],
    );
    expect(matches).toEqual([{ bankIndex: 0, bookIds: ["d"], kind: "exact" }]);
  });
  it("normalizes references", () => {
    expect(normalizeReference(" 001042 ")).toBe("1042");
    expect(normalizeReference("po_ab  c")).toBe("PO_AB C");
    expect(normalizeReference("0")).toBe("0");
    expect(normalizeReference("   ")).toBeUndefined();
  });
});

describe("autoMatch — card payouts net of fees", () => {
  // Fees at 2.9 % + 30¢ per charge (a common card-processing price; from memory), rounded
  // half away from zero: 5000 → 175; 7500 → 247.5 → 248; 2000 → 88.
  // Net payout = (5000 − 175) + (7500 − 248) + (2000 − 88) = 4825 + 7252 + 1912 = 13989 (own arithmetic).
  const payments: BookItem[] = [
    { id: "pay-1", date: "2025-03-01", amountMinor: 5000, feeMinor: 175, payoutId: "po_0001", kind: "payment" },
    { id: "pay-2", date: "2025-03-02", amountMinor: 7500, feeMinor: 248, payoutId: "po_0001", kind: "payment" },
    { id: "pay-3", date: "2025-03-03", amountMinor: 2000, feeMinor: 88, payoutId: "po_0001", kind: "payment" },
    { id: "pay-4", date: "2025-03-03", amountMinor: 5000, feeMinor: 175, payoutId: "po_0002", kind: "payment" },
  ];

  it("matches one payout line to all the payments it carries", () => {
    const result = autoMatch([bank("2025-03-05", 13989)], payments);
    expect(result.matches).toEqual([{ bankIndex: 0, bookIds: ["pay-1", "pay-2", "pay-3"], kind: "payout" }]);
    expect(result.unmatchedBook).toEqual(["pay-4"]);
  });
  it("never matches a card payment on its own gross amount", () => {
    // pay-4 is 5000 gross but reaches the bank as 4825 inside payout po_0002
    const { matches } = autoMatch([bank("2025-03-04", 5000), bank("2025-03-06", 4825)], payments);
    expect(matches).toEqual([{ bankIndex: 1, bookIds: ["pay-4"], kind: "payout" }]);
  });
  it("matches a payout by its id even when it arrives late", () => {
    const { matches } = autoMatch([bank("2025-03-25", 13989, "po_0001")], payments);
    expect(matches).toEqual([{ bankIndex: 0, bookIds: ["pay-1", "pay-2", "pay-3"], kind: "payout" }]);
  });
  it("counts refunds inside a payout and leaves a payout outside its window alone", () => {
    const withRefund: BookItem[] = [
      ...payments.slice(0, 3),
      { id: "refund-1", date: "2025-03-03", amountMinor: -2000, feeMinor: 0, payoutId: "po_0001", kind: "refund" },
    ];
    // 13989 − 2000 = 11989 (own arithmetic)
    expect(autoMatch([bank("2025-03-06", 11989)], withRefund).matches[0]?.bookIds).toHaveLength(4);
    // 20 days after the last payment is past the default 10-day payout window
    expect(autoMatch([bank("2025-03-23", 13989)], payments).matches).toEqual([]);
  });
  it("matches a recorded payout item directly like any other deposit", () => {
    const book: BookItem[] = [{ id: "po-rec", date: "2025-03-05", amountMinor: 13989, payoutId: "po_0001", kind: "payout" }];
    expect(autoMatch([bank("2025-03-06", 13989)], book).matches).toEqual([
      { bankIndex: 0, bookIds: ["po-rec"], kind: "exact" },
    ]);
  });
});

describe("autoMatch — scale", () => {
  it("pairs thousands of lines correctly (indexed by amount, not compared pairwise)", () => {
    // Sanity timing, not asserted: 10,000 bank lines × 10,000 book items took about 0.1–0.2 s
    // on the development container (the benchmark in tests/bench reports the median).
    const n = 3000;
    const book: BookItem[] = [];
    const lines: MatchBankLine[] = [];
    for (let i = 0; i < n; i++) {
      const date = addDays("2025-01-01", i % 28);
      book.push({ id: i, date, amountMinor: 1000 + i });
      lines.push(bank(addDays(date, i % 3), 1000 + i));
    }
    const result = autoMatch(lines.reverse(), book);
    expect(result.matches).toHaveLength(n);
    expect(result.unmatchedBook).toEqual([]);
    expect(result.matches.every((m) => lines[m.bankIndex]?.amountMinor === 1000 + Number(m.bookIds[0]))).toBe(true);
  });
});
