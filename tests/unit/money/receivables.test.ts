import { describe, expect, it } from "vitest";
import { ageingBucketOf, ageReceivables, isInArrears, lateFee, latefee } from "@/lib/money";

// Ageing buckets current / 1–30 / 31–60 / 61–90 / over 90 days past due (common practice);
// day counts are calendar days between the due date and the as-of date (own arithmetic).
describe("ageReceivables", () => {
  const asOf = "2025-06-30";
  const items = [
    { id: "due-today", dueDate: "2025-06-30", openMinor: 100 }, // 0 days → current
    { id: "not-yet-due", dueDate: "2025-07-15", openMinor: 200 }, // future → current
    { id: "d1", dueDate: "2025-06-29", openMinor: 300 }, // 1 day
    { id: "d30", dueDate: "2025-05-31", openMinor: 400 }, // 30 days (June has 30 days)
    { id: "d31", dueDate: "2025-05-30", openMinor: 500 }, // 31 days
    { id: "d60", dueDate: "2025-05-01", openMinor: 600 }, // 30 + 30 = 60 days (May has 31 days)
    { id: "d61", dueDate: "2025-04-30", openMinor: 700 }, // 61 days
    { id: "d90", dueDate: "2025-04-01", openMinor: 800 }, // 29 + 61 = 90 days
    { id: "d91", dueDate: "2025-03-31", openMinor: 900 }, // 91 days
    { id: "paid", dueDate: "2025-01-31", openMinor: 0 }, // nothing open: left out
  ];
  const report = ageReceivables(items, asOf);
  const ids = (key: keyof typeof report.buckets) => report.buckets[key].items.map((i) => i.id);

  it("puts 30 days in 1–30 and 31 days in 31–60", () => {
    expect(ids("current")).toEqual(["due-today", "not-yet-due"]);
    expect(ids("days1To30")).toEqual(["d1", "d30"]);
    expect(ids("days31To60")).toEqual(["d31", "d60"]);
    expect(ids("days61To90")).toEqual(["d61", "d90"]);
    expect(ids("over90")).toEqual(["d91"]);
  });
  it("totals each bucket and the whole", () => {
    expect(report.buckets.days1To30.totalMinor).toBe(700); // 300 + 400
    expect(report.buckets.over90.totalMinor).toBe(900);
    expect(report.totalMinor).toBe(4500); // 100 + 200 + … + 900
    expect(report.buckets.days1To30.items[1]?.daysPastDue).toBe(30);
  });
  it("maps day counts to buckets at the edges", () => {
    expect([0, 1, 30, 31, 60, 61, 90, 91].map(ageingBucketOf)).toEqual([
      "current",
      "days1To30",
      "days1To30",
      "days31To60",
      "days31To60",
      "days61To90",
      "days61To90",
      "over90",
    ]);
  });
});

describe("arrears and late fees", () => {
  it("flags a member only after the grace period", () => {
    // due 1 June, 15 days' grace: 16 June is day 15 (not yet), 17 June is day 16 (in arrears)
    expect(isInArrears(5000, "2025-06-01", "2025-06-16", 15)).toBe(false);
    expect(isInArrears(5000, "2025-06-01", "2025-06-17", 15)).toBe(true);
    expect(isInArrears(0, "2025-01-01", "2025-06-17", 15)).toBe(false); // owes nothing
    expect(isInArrears(-500, "2025-01-01", "2025-06-17", 15)).toBe(false); // in credit
    expect(isInArrears(5000, null, "2025-06-17", 15)).toBe(false); // nothing is due
  });
  it("charges the policy's fee once in arrears", () => {
    expect(lateFee(20000, "2025-06-01", "2025-06-16", 15, { flatMinor: 1500 })).toBe(0);
    expect(lateFee(20000, "2025-06-01", "2025-06-17", 15, { flatMinor: 1500 })).toBe(1500);
    // 1.5 % of 20,000 = 300 (own arithmetic)
    expect(latefee(20000, "2025-06-01", "2025-06-17", 15, { percent: 1.5 })).toBe(300);
    // 1.5 % of 10,100 = 151.5 → 152, half away from zero (own arithmetic)
    expect(lateFee(10100, "2025-06-01", "2025-06-17", 15, { percent: 1.5 })).toBe(152);
    expect(lateFee(1000, "2025-06-01", "2025-06-17", 15, { percent: 1.5, minimumMinor: 500 })).toBe(500);
    expect(lateFee(900000, "2025-06-01", "2025-06-17", 15, { percent: 1.5, maximumMinor: 2500 })).toBe(2500);
  });
});
