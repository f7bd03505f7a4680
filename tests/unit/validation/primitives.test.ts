import { describe, expect, it } from "vitest";
import { isIsoDateInRange } from "@/lib/dates";
import { adjustmentSchema, monthField } from "@/lib/validation/money";
import { calendarDate, calendarMonth, isLocalDateTime, localDateTimeField, recordId } from "@/lib/validation/primitives";

// The bounds are the product's own choice (1900–2200, see lib/dates); the calendar facts
// (2024 is a leap year, 2026 is not, February has at most 29 days) are the Gregorian rules, common practice.
const issues = (r: { success: boolean; error?: { issues: { message: string }[] } }) => (r.success ? [] : r.error!.issues.map((i) => i.message));

describe("shared input primitives", () => {
  const date = calendarDate("the date", "Enter the date as a date (YYYY-MM-DD).");

  it("accepts real calendar dates from 1900-01-01 to 2200-12-31", () => {
    for (const v of ["1900-01-01", "2024-02-29", "2026-05-01", "2200-12-31"]) expect(date.safeParse(v).success).toBe(true);
    expect(isIsoDateInRange(" 2026-05-01")).toBe(false);
  });

  it("refuses impossible days with the area's words, and years outside the range with the range", () => {
    expect(issues(date.safeParse("2026-02-30"))).toEqual(["Enter the date as a date (YYYY-MM-DD)."]);
    expect(issues(date.safeParse("2026-13-01"))).toEqual(["Enter the date as a date (YYYY-MM-DD)."]);
    for (const v of ["0000-01-01", "1899-12-31", "2201-01-01", "9999-12-31"]) expect(issues(date.safeParse(v))).toEqual(["Enter the date between 1900 and 2200."]);
  });

  it("bounds months and club-local date-times the same way", () => {
    const month = calendarMonth("Choose the month, like 2026-05.");
    expect(month.safeParse("2026-05").success).toBe(true);
    expect(issues(month.safeParse("2026-13"))).toEqual(["Choose the month, like 2026-05."]);
    expect(issues(month.safeParse("9999-12"))).toEqual(["Choose a month between 1900 and 2200."]);
    expect(issues(monthField.safeParse("0000-01"))).toEqual(["Choose a month between 1900 and 2200."]);
    const at = localDateTimeField("the start", "Enter the start as a date and time.");
    expect(at.safeParse("2026-05-01T10:00").success).toBe(true);
    expect(issues(at.safeParse("9999-12-31T23:59"))).toEqual(["Enter the start between 1900 and 2200."]);
    expect(issues(at.safeParse("2026-05-01T24:00"))).toEqual(["Enter the start as a date and time."]);
    expect(isLocalDateTime("2026-02-29T10:00")).toBe(false);
  });

  it("keeps record ids short and plain", () => {
    const id = recordId("Choose a member.");
    expect(id.safeParse("3f2b8c1e-6a7d-4e59-9c1a-2b7f0d9e4a61").success).toBe(true);
    for (const v of ["", "x".repeat(65), "../../etc/passwd", "a b", "__proto__", "' OR 1=1 --"]) expect(issues(id.safeParse(v))).toEqual(["Choose a member."]);
  });

  it("refuses a ledger adjustment dated 0000-01-01", () => {
    const r = adjustmentSchema.safeParse({ memberUserId: "3f2b8c1e-6a7d-4e59-9c1a-2b7f0d9e4a61", direction: "charge", account: "dues-income", amount: "10", date: "0000-01-01", memo: "Hangar key" });
    expect(issues(r)).toEqual(["Enter the date between 1900 and 2200."]);
  });
});
