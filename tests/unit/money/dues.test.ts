// Sources: calendar periods per the Gregorian calendar rule; proration by days is common practice
// for club dues (from memory). Values are own arithmetic.
import { describe, expect, it } from "vitest";
import { duesForMember, duesPeriod } from "@/lib/money";

// Period edges follow the Gregorian calendar (2024 is a leap year); amounts are our own
// arithmetic on the prorate rule (by days, both ends counted, half away from zero).
describe("duesPeriod", () => {
  it("finds the month, quarter and year containing a date", () => {
    expect(duesPeriod("monthly", "2024-02-10")).toEqual({ start: "2024-02-01", end: "2024-02-29" }); // leap year
    expect(duesPeriod("monthly", "2025-02-10")).toEqual({ start: "2025-02-01", end: "2025-02-28" });
    expect(duesPeriod("quarterly", "2025-05-15")).toEqual({ start: "2025-04-01", end: "2025-06-30" });
    expect(duesPeriod("quarterly", "2025-12-31")).toEqual({ start: "2025-10-01", end: "2025-12-31" });
    expect(duesPeriod("annual", "2025-07-04")).toEqual({ start: "2025-01-01", end: "2025-12-31" });
  });
  it("follows a fiscal year that starts in another month", () => {
    expect(duesPeriod("annual", "2025-03-10", 7)).toEqual({ start: "2024-07-01", end: "2025-06-30" });
    expect(duesPeriod("annual", "2025-07-01", 7)).toEqual({ start: "2025-07-01", end: "2026-06-30" });
    expect(duesPeriod("quarterly", "2025-01-15", 2)).toEqual({ start: "2024-11-01", end: "2025-01-31" });
  });
});

describe("duesForMember", () => {
  it("prorates a member who joins mid-period", () => {
    // Feb 2024: 15–29 Feb = 15 of 29 days; 4500 × 15 ÷ 29 = 2327.58… → 2328 (own arithmetic)
    expect(duesForMember({ plan: "monthly", amountMinor: 4500, date: "2024-02-01", joinedOn: "2024-02-15" })).toBe(2328);
    // Q2 2025 has 91 days; 1 May – 30 June = 61 days; 9100 × 61 ÷ 91 = 6100 (own arithmetic)
    expect(duesForMember({ plan: "quarterly", amountMinor: 9100, date: "2025-06-30", joinedOn: "2025-05-01" })).toBe(
      6100,
    );
  });
  it("charges existing members in full and future members nothing", () => {
    expect(duesForMember({ plan: "monthly", amountMinor: 4500, date: "2024-03-05", joinedOn: "2024-02-15" })).toBe(4500);
    expect(duesForMember({ plan: "monthly", amountMinor: 4500, date: "2024-03-05" })).toBe(4500);
    expect(duesForMember({ plan: "monthly", amountMinor: 4500, date: "2024-03-05", joinedOn: "2024-04-02" })).toBe(0);
  });
});
