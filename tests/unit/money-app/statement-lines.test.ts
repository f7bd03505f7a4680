// Source: common practice (account statement arithmetic); no published rule is cited.
// A statement: opening + charges − credits = closing (standard account statement arithmetic;
// figures are our own).
import { describe, expect, it } from "vitest";
import { statementFigures } from "@/lib/money/statement-lines";
import { monthLabel, monthRange, shiftMonthKey } from "@/lib/money/months";

describe("statementFigures", () => {
  const moves = [
    { entryId: "a", date: "2026-03-01", memo: "Dues March", amountMinor: 9500 },
    { entryId: "b", date: "2026-03-31", memo: "Flight", amountMinor: 15200 },
    { entryId: "c", date: "2026-04-01", memo: "Dues April", amountMinor: 9500 },
    { entryId: "d", date: "2026-04-10", memo: "Card payment", amountMinor: -24700 },
    { entryId: "e", date: "2026-04-30", memo: "Flight", amountMinor: 7600 },
    { entryId: "f", date: "2026-05-01", memo: "Dues May", amountMinor: 9500 },
  ];
  it("brings forward everything before the month and runs the balance through it", () => {
    const f = statementFigures(moves, "2026-04-01", "2026-04-30");
    // opening 9,500 + 15,200 = 24,700; charges 9,500 + 7,600 = 17,100; credits 24,700;
    // closing 24,700 + 17,100 − 24,700 = 17,100 (own arithmetic)
    expect(f).toMatchObject({ openingMinor: 24700, chargesMinor: 17100, creditsMinor: 24700, closingMinor: 17100 });
    expect(f.lines.map((l) => l.balanceMinor)).toEqual([34200, 9500, 17100]);
  });
  it("gives an empty month its brought-forward balance", () => {
    expect(statementFigures(moves, "2026-06-01", "2026-06-30")).toMatchObject({ openingMinor: 26600, closingMinor: 26600, lines: [] });
  });
});

describe("months", () => {
  it("knows month ends, leap Februaries and neighbours", () => {
    // 2028 is a Gregorian leap year: divisible by 4 and not a century
    expect(monthRange("2028-02")).toEqual({ start: "2028-02-01", end: "2028-02-29" });
    expect(monthRange("2026-02").end).toBe("2026-02-28");
    expect(shiftMonthKey("2026-01", -1)).toBe("2025-12");
    expect(shiftMonthKey("2026-12", 1)).toBe("2027-01");
    expect(monthLabel("2026-04")).toBe("April 2026");
    expect(() => monthRange("2026-13")).toThrow(RangeError);
  });
});
