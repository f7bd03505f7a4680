// Recurring bills: Gregorian calendar arithmetic (common practice) — months of 28 to 31 days,
// February 29 in leap years (2028 is one: divisible by 4, not by 100).
import { describe, expect, it } from "vitest";
import { dueOccurrences, nextBillDate, periodKeyFor } from "@/lib/money/recurring";

describe("periodKeyFor", () => {
  it("names one period per cadence", () => {
    expect(periodKeyFor("2026-05-17", "monthly")).toBe("2026-05"); // common practice
    expect(periodKeyFor("2026-05-17", "quarterly")).toBe("2026-Q2"); // April–June is the second quarter (common practice)
    expect(periodKeyFor("2026-12-31", "quarterly")).toBe("2026-Q4"); // common practice
    expect(periodKeyFor("2026-05-17", "yearly")).toBe("2026"); // common practice
  });
});

describe("nextBillDate", () => {
  it("keeps the anchor day, falling on a shorter month's last day without drifting", () => {
    expect(nextBillDate("2027-01-31", "monthly", 31)).toBe("2027-02-28"); // February 2027 has 28 days (Gregorian calendar)
    expect(nextBillDate("2027-02-28", "monthly", 31)).toBe("2027-03-31"); // back on the 31st (common practice)
    expect(nextBillDate("2028-01-31", "monthly", 31)).toBe("2028-02-29"); // 2028 is a leap year (Gregorian calendar)
    expect(nextBillDate("2026-11-15", "quarterly", 15)).toBe("2027-02-15"); // three months later (common practice)
    expect(nextBillDate("2028-02-29", "yearly", 29)).toBe("2029-02-28"); // no February 29 in 2029 (Gregorian calendar)
  });
});

describe("dueOccurrences", () => {
  const rent = { cadence: "monthly" as const, anchorDay: 1, nextOn: "2026-10-01", endsOn: null, dueDays: 10 };

  it("every period due by today, once each, and the next date after them", () => {
    expect(dueOccurrences(rent, "2026-12-02")).toEqual({
      due: [
        { billDate: "2026-10-01", dueOn: "2026-10-11", periodKey: "2026-10" }, // 1 Oct + 10 days (arithmetic)
        { billDate: "2026-11-01", dueOn: "2026-11-11", periodKey: "2026-11" },
        { billDate: "2026-12-01", dueOn: "2026-12-11", periodKey: "2026-12" },
      ],
      nextOn: "2027-01-01",
      ended: false,
    });
  });

  it("nothing before the next date", () => {
    expect(dueOccurrences(rent, "2026-09-30")).toEqual({ due: [], nextOn: "2026-10-01", ended: false }); // common practice
  });

  it("stops at the end date and says the recurrence has ended", () => {
    const r = dueOccurrences({ ...rent, endsOn: "2026-11-15" }, "2027-03-01");
    expect(r.due.map((d) => d.periodKey)).toEqual(["2026-10", "2026-11"]); // 1 Dec is after 15 Nov (arithmetic)
    expect(r.ended).toBe(true);
  });

  it("catches up at most a year at a time", () => {
    expect(dueOccurrences({ ...rent, nextOn: "2020-01-01" }, "2026-12-02").due).toHaveLength(12); // bounded catch-up (common practice)
  });
});
