// Sources: the Gregorian calendar (month lengths, leap years; from memory) and calendar
// quarters Jan–Mar, Apr–Jun, Jul–Sep, Oct–Dec (common practice).
import { describe, expect, it } from "vitest";
import { reportPresets } from "@/lib/money/report-periods";

describe("reportPresets", () => {
  it("gives this month, last month, year to date, last year and the last full quarter", () => {
    expect(reportPresets("2026-05-14")).toEqual([
      { label: "This month", from: "2026-05-01", to: "2026-05-14" },
      { label: "Last month", from: "2026-04-01", to: "2026-04-30" }, // April has 30 days
      { label: "Year to date", from: "2026-01-01", to: "2026-05-14" },
      { label: "Last year", from: "2025-01-01", to: "2025-12-31" },
      { label: "Last full quarter", from: "2026-01-01", to: "2026-03-31" }, // Q1 ends 31 March
    ]);
  });

  it("crosses the year in January, and February of a leap year ends on the 29th", () => {
    const jan = reportPresets("2026-01-10");
    expect(jan[1]).toEqual({ label: "Last month", from: "2025-12-01", to: "2025-12-31" });
    expect(jan[4]).toEqual({ label: "Last full quarter", from: "2025-10-01", to: "2025-12-31" }); // Q4 of the previous year
    expect(reportPresets("2028-03-02")[1]).toEqual({ label: "Last month", from: "2028-02-01", to: "2028-02-29" }); // 2028 is a leap year
  });
});
