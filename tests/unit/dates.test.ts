import { describe, expect, it } from "vitest";
import { addDays, daysBetween, endOfMonthAfter, isIsoDate, isoDateInTimeZone, shiftMonth } from "@/lib/dates";

describe("lib/dates", () => {
  it("rejects impossible dates", () => {
    expect(isIsoDate("2025-02-29")).toBe(false); // 2025 is not a leap year (Gregorian rule)
    expect(isIsoDate("2024-02-29")).toBe(true); // 2024 is a leap year (Gregorian rule)
    expect(isIsoDate("2024-13-01")).toBe(false);
  });
  it("rolls months over December", () => {
    expect(shiftMonth(2025, 12, 1)).toEqual({ year: 2026, month: 1 });
    expect(shiftMonth(2025, 1, -1)).toEqual({ year: 2024, month: 12 });
  });
  it("ends calendar months on their last day", () => {
    // PHAK FAA-H-8083-25, Aircraft Inspections: 12 calendar months run to the end of the month
    expect(endOfMonthAfter("2025-06-06", 12)).toBe("2026-06-30");
    expect(endOfMonthAfter("2023-02-10", 12)).toBe("2024-02-29"); // leap year, Gregorian rule
  });
  it("counts days across a leap day", () => {
    expect(addDays("2024-02-28", 1)).toBe("2024-02-29");
    expect(daysBetween("2024-02-28", "2024-03-01")).toBe(2);
  });
  it("takes the calendar date in the club's time zone", () => {
    const instant = new Date("2026-01-01T03:00:00Z");
    expect(isoDateInTimeZone(instant, "America/Denver")).toBe("2025-12-31");
    expect(isoDateInTimeZone(instant, "Europe/Berlin")).toBe("2026-01-01");
  });
});
