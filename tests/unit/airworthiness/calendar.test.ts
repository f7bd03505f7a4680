import { describe, expect, it } from "vitest";
import { calendarDue, daysDue } from "@/lib/airworthiness";
import { lastDayOfWindow } from "@/lib/currency";

describe("calendarDue: calendar months run to the end of the month", () => {
  it("gives the examples of the annual and the ELT inspection", () => {
    // 14 CFR 91.409(a) with FAA-H-8083-25 "calendar months"; example from memory/own arithmetic
    expect(calendarDue("2025-06-06", 12)).toBe("2026-06-30");
    // 14 CFR 91.207(d); example from memory/own arithmetic
    expect(calendarDue("2025-03-10", 12)).toBe("2026-03-31");
  });

  it("counts from any day of the month, first or last", () => {
    // FAA-H-8083-25: "from any day of a month to the last day of the same month the following year"
    expect(calendarDue("2025-01-01", 12)).toBe("2026-01-31");
    expect(calendarDue("2025-01-31", 12)).toBe("2026-01-31");
  });

  it("lands on 29 February in a leap year and 28 February otherwise", () => {
    expect(calendarDue("2023-02-15", 12)).toBe("2024-02-29"); // 14 CFR 91.409(a); 2024 leap (Gregorian rule)
    expect(calendarDue("2024-02-29", 12)).toBe("2025-02-28"); // 14 CFR 91.409(a); 2025 common year
    expect(calendarDue("2024-02-29", 24)).toBe("2026-02-28"); // 14 CFR 91.411(a), 24 calendar months
    expect(calendarDue("2098-02-10", 24)).toBe("2100-02-28"); // 2100 is not a leap year (Gregorian rule)
  });

  it("rolls over December into the next year", () => {
    expect(calendarDue("2025-12-05", 12)).toBe("2026-12-31"); // 14 CFR 91.409(a)
    expect(calendarDue("2025-11-20", 2)).toBe("2026-01-31"); // calendar months (FAA-H-8083-25), own arithmetic
    expect(calendarDue("2025-10-15", 4)).toBe("2026-02-28"); // 4-month oil change, common practice
    expect(calendarDue("2024-12-31", 24)).toBe("2026-12-31"); // 14 CFR 91.413(a), 24 calendar months
  });

  it("uses 24 calendar months for the transponder and the altimeter/static test", () => {
    expect(calendarDue("2024-01-31", 24)).toBe("2026-01-31"); // 14 CFR 91.413(a)
    expect(calendarDue("2024-07-02", 24)).toBe("2026-07-31"); // 14 CFR 91.411(a)
  });

  it("refuses periods that are not whole calendar months and dates that do not exist", () => {
    expect(() => calendarDue("2025-06-06", 1.5)).toThrow(RangeError);
    expect(() => calendarDue("2025-06-06", -1)).toThrow(RangeError);
    expect(() => calendarDue("2025-02-30", 12)).toThrow(RangeError);
  });
});

describe("daysDue: periods in days are counted to the day, not in calendar months", () => {
  it("keeps a 30-day VOR check good through day 30, the check day being day 1", () => {
    // 14 CFR 91.171(a)(2) "within the preceding 30 days"; the check day is day 1 (our one convention)
    expect(daysDue("2026-05-01", 30)).toBe("2026-05-30");
    expect(daysDue("2026-04-10", 30)).toBe("2026-05-09"); // not the end of May: days, not calendar months
    expect(daysDue("2026-05-01", 1)).toBe("2026-05-01"); // own arithmetic: a 1-day window is the day itself
  });

  it("counts across a leap day and across the new year", () => {
    expect(daysDue("2024-02-10", 30)).toBe("2024-03-10"); // 14 CFR 91.171(a)(2); 2024 has 29 February
    expect(daysDue("2025-02-10", 30)).toBe("2025-03-11"); // 14 CFR 91.171(a)(2); 2025 does not
    expect(daysDue("2025-12-15", 30)).toBe("2026-01-13"); // 14 CFR 91.171(a)(2); own arithmetic
  });

  it("uses the same day count as passenger currency's window", () => {
    // 14 CFR 61.57(a) and 91.171(a)(2) both say "preceding N days": one convention for both
    for (const date of ["2024-02-10", "2025-12-15", "2026-05-01", "2026-03-31"]) {
      for (const n of [1, 2, 30, 90, 365]) expect(daysDue(date, n)).toBe(lastDayOfWindow(date, n));
    }
    expect(lastDayOfWindow("2026-05-01", 90)).toBe("2026-07-29"); // 14 CFR 61.57(a): day 1 + 89
  });

  it("refuses fractional, zero or negative days", () => {
    expect(() => daysDue("2026-05-01", 0.5)).toThrow(RangeError);
    expect(() => daysDue("2026-05-01", 0)).toThrow(RangeError);
    expect(() => daysDue("2026-05-01", -30)).toThrow(RangeError);
  });
});
