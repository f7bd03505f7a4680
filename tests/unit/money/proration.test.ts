// Sources: proration by days, both ends counted, is common practice for club dues (no regulation);
// month lengths follow the Gregorian calendar rule; rounding half away from zero is the rule fixed
// in REFERENCES.md (common practice, from memory). Values are own arithmetic.
import { describe, expect, it } from "vitest";
import { prorate } from "@/lib/money";

// prorate: amount × days(from..end) ÷ days(start..end), both ends counted, half away from zero.
// Every expected value below is our own arithmetic on that rule; month lengths are the
// Gregorian calendar's (leap year: divisible by 4, except centuries not divisible by 400).
describe("prorate", () => {
  it("charges the share of a 31-day month", () => {
    // January has 31 days; 17–31 January is 15 days: 3100 × 15 ÷ 31 = 1500 (own arithmetic)
    expect(prorate(3100, "2025-01-01", "2025-01-31", "2025-01-17")).toBe(1500);
    // 10000 × 15 ÷ 31 = 4838.70… → 4839 (own arithmetic)
    expect(prorate(10000, "2025-01-01", "2025-01-31", "2025-01-17")).toBe(4839);
  });
  it("counts 29 days in February of a leap year and 28 otherwise", () => {
    // Feb 2024 has 29 days (2024 divisible by 4, Gregorian rule): 15–29 Feb = 15 days → 2900 × 15 ÷ 29 = 1500
    expect(prorate(2900, "2024-02-01", "2024-02-29", "2024-02-15")).toBe(1500);
    // Feb 2025 has 28 days: 15–28 Feb = 14 days → 2800 × 14 ÷ 28 = 1400 (own arithmetic)
    expect(prorate(2800, "2025-02-01", "2025-02-28", "2025-02-15")).toBe(1400);
    // Joining on the leap day itself: 1 day of 29 → 2900 ÷ 29 = 100 (own arithmetic)
    expect(prorate(2900, "2024-02-01", "2024-02-29", "2024-02-29")).toBe(100);
    // 1900 is not a leap year (century not divisible by 400, Gregorian rule): 28 days → 2800 ÷ 28 × 1 = 100
    expect(prorate(2800, "1900-02-01", "1900-02-28", "1900-02-28")).toBe(100);
  });
  it("counts 366 days in a leap year", () => {
    // 1 Mar – 31 Dec 2024 is 306 of 366 days: 36600 × 306 ÷ 366 = 30600 (own arithmetic)
    expect(prorate(36600, "2024-01-01", "2024-12-31", "2024-03-01")).toBe(30600);
    // last day of the year: 36600 ÷ 366 = 100 (own arithmetic)
    expect(prorate(36600, "2024-01-01", "2024-12-31", "2024-12-31")).toBe(100);
  });
  it("charges the whole amount from the first day or earlier and nothing after the end", () => {
    expect(prorate(4500, "2025-03-01", "2025-03-31", "2025-03-01")).toBe(4500); // first day: full period
    expect(prorate(4500, "2025-03-01", "2025-03-31", "2025-02-10")).toBe(4500); // before the period: full
    expect(prorate(4500, "2025-03-01", "2025-03-31", "2025-04-01")).toBe(0); // after the period: nothing
    // last day of a 30-day month: 3000 × 1 ÷ 30 = 100 (own arithmetic)
    expect(prorate(3000, "2025-04-01", "2025-04-30", "2025-04-30")).toBe(100);
  });
  it("rounds half away from zero, symmetric for credits", () => {
    // 5 × 1 ÷ 2 = 2.5 → 3 and −2.5 → −3 (half away from zero, our documented rule)
    expect(prorate(5, "2025-01-01", "2025-01-02", "2025-01-02")).toBe(3);
    expect(prorate(-5, "2025-01-01", "2025-01-02", "2025-01-02")).toBe(-3);
    expect(prorate(-10000, "2025-01-01", "2025-01-31", "2025-01-17")).toBe(-4839);
  });
  it("rejects bad input", () => {
    expect(() => prorate(100, "2025-01-31", "2025-01-01", "2025-01-10")).toThrow(RangeError);
    expect(() => prorate(100, "2025-02-01", "2025-02-28", "2025-02-29")).toThrow(RangeError); // no 29 Feb in 2025
    expect(() => prorate(10.5, "2025-01-01", "2025-01-31", "2025-01-10")).toThrow(RangeError);
  });
});
