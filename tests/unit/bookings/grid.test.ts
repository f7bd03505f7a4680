import { describe, expect, it } from "vitest";
import { dayBounds, weekDates, weekStart } from "@/lib/bookings/grid";

describe("weeks (ISO 8601: Monday first)", () => {
  it("finds the Monday of the week", () => {
    expect(weekStart("2026-05-06")).toBe("2026-05-04"); // a Wednesday (from the calendar)
    expect(weekStart("2026-05-04")).toBe("2026-05-04");
    expect(weekStart("2026-05-10")).toBe("2026-05-04"); // Sunday ends the ISO week
    expect(weekDates("2026-12-30")).toEqual(["2026-12-28", "2026-12-29", "2026-12-30", "2026-12-31", "2027-01-01", "2027-01-02", "2027-01-03"]);
  });
});

describe("days in the club's time zone", () => {
  it("a day with the spring daylight-saving change is 23 hours long (America/Chicago, 2026-03-08)", () => {
    const d = dayBounds("2026-03-08", "America/Chicago");
    expect((d.end - d.start) / 3_600_000).toBe(23);
    expect(new Date(d.start).toISOString()).toBe("2026-03-08T06:00:00.000Z");
  });
});
