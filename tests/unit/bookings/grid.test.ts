import { describe, expect, it } from "vitest";
import { dayBounds, hourMarks, layoutDay, weekDates, weekStart } from "@/lib/bookings/grid";

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
  it("hour marks sit where the local hours fall", () => {
    const d = dayBounds("2026-05-04", "Europe/Berlin");
    expect(hourMarks(d, "Europe/Berlin").map((m) => [m.label, m.left])).toEqual([["00:00", 0], ["06:00", 25], ["12:00", 50], ["18:00", 75]]);
  });
});

describe("layoutDay", () => {
  const day = dayBounds("2026-05-04", "UTC");
  const h = (n: number) => day.start + n * 3_600_000;
  it("places each booking on its aircraft's track, clipped to the day", () => {
    const out = layoutDay(
      [
        { id: "b", aircraftId: "A", startsAt: h(12), endsAt: h(18) },
        { id: "a", aircraftId: "A", startsAt: h(-2), endsAt: h(6) },
        { id: "c", aircraftId: "B", startsAt: h(20), endsAt: h(30) },
        { id: "x", aircraftId: "B", startsAt: h(24), endsAt: h(26) },
      ],
      day,
    );
    expect(out.get("A")!.map((s) => [s.booking.id, s.left, s.width, s.fromEarlier, s.intoLater])).toEqual([["a", 0, 25, true, false], ["b", 50, 25, false, false]]);
    expect(out.get("B")!.map((s) => [s.booking.id, s.intoLater])).toEqual([["c", true]]);
  });
});
