// Sources: accrual accounting for a bill (expense and accounts payable when received, payable
// and cash when paid) — standard accounting practice; a second person approving payments above
// an amount (segregation of duties) — common practice.
import { describe, expect, it } from "vitest";
import { approvalProblem, billEntryLines, billNeedsApproval, billPaymentLines } from "@/lib/money/bills";
import { assertBalanced } from "@/lib/money";

describe("bills", () => {
  it("needs a second officer only strictly above the club's amount (common practice)", () => {
    expect(billNeedsApproval(50_000, { approvalOverMinor: 50_000 })).toBe(false);
    expect(billNeedsApproval(50_001, { approvalOverMinor: 50_000 })).toBe(true);
    expect(billNeedsApproval(1, { approvalOverMinor: 0 })).toBe(true);
    expect(() => billNeedsApproval(0, { approvalOverMinor: 0 })).toThrow(RangeError);
  });

  it("the one who entered a bill does not approve it (segregation of duties, common practice)", () => {
    expect(approvalProblem({ status: "awaiting_approval", enteredById: "t" }, "t")).toMatch(/second officer/);
    expect(approvalProblem({ status: "awaiting_approval", enteredById: "t" }, "a")).toBeNull();
    expect(approvalProblem({ status: "paid", enteredById: "t" }, "a")).toMatch(/already paid/);
  });

  it("a bill and its payment are each one balanced entry (standard accounting practice)", () => {
    // Received: Dr expense 4,800.00 / Cr bills to pay 4,800.00; paid: Dr bills to pay / Cr bank
    const received = billEntryLines("aircraft-insurance", 480_000);
    const paid = billPaymentLines(480_000);
    expect(received).toEqual([{ accountCode: "aircraft-insurance", debitMinor: 480_000 }, { accountCode: "bills-payable", creditMinor: 480_000 }]);
    expect(paid).toEqual([{ accountCode: "bills-payable", debitMinor: 480_000 }, { accountCode: "bank", creditMinor: 480_000 }]);
    expect(() => assertBalanced(received.map((l) => ({ ...l, accountId: l.accountCode })))).not.toThrow();
    expect(() => assertBalanced(paid.map((l) => ({ ...l, accountId: l.accountCode })))).not.toThrow();
  });
});
