import { describe, expect, it } from "vitest";
import { expandWeekly, describeLocalWindow, MAX_REPEAT_WEEKS } from "@/lib/bookings/recurrence";
import { reminderDue } from "@/lib/bookings/reminders";
import { coveredBy, flyingWindow, freeWindows, mergeSpans, planDay, splitByNight } from "@/lib/bookings/schedule";
import { scheduleRefusals } from "@/lib/bookings/schedule-guards";

// Instants are built from UTC clock times so that each check value can be read off directly.
const at = (hhmm: string, date = "2026-06-10") => Date.parse(`${date}T${hhmm}:00Z`);
const span = (a: string, b: string, date = "2026-06-10") => ({ start: at(a, date), end: at(b, date) });
const hm = (ms: number) => new Date(ms).toISOString().slice(11, 16);
const words = (list: { start: number; end: number }[]) => list.map((s) => `${hm(s.start)}-${hm(s.end)}`);

describe("free windows inside the flying day (half-open intervals, as bookings are: common practice)", () => {
  const day = span("07:00", "21:00");
  it("is the whole day when nothing holds the aircraft", () => {
    expect(words(freeWindows(day, []))).toEqual(["07:00-21:00"]);
  });
  it("is what lies between bookings and blocks, joined where they touch or overlap", () => {
    const busy = [span("09:00", "11:30"), span("11:30", "12:00"), span("14:00", "16:00"), span("15:00", "17:00")];
    expect(words(freeWindows(day, busy))).toEqual(["07:00-09:00", "12:00-14:00", "17:00-21:00"]);
  });
  it("drops gaps shorter than 30 minutes (a booking is made in quarter hours: common practice)", () => {
    expect(words(freeWindows(day, [span("07:00", "09:00"), span("09:15", "21:00")]))).toEqual([]);
    expect(words(freeWindows(day, [span("07:00", "09:00"), span("09:30", "21:00")]))).toEqual(["09:00-09:30"]);
  });
  it("starts no earlier than now, rounded up to the next quarter hour", () => {
    expect(words(freeWindows(day, [span("12:00", "13:00")], { notBefore: at("10:07") }))).toEqual(["10:15-12:00", "13:00-21:00"]);
    expect(words(freeWindows(day, [], { notBefore: at("22:00") }))).toEqual([]);
  });
  it("counts a booking that runs past the window's edges", () => {
    expect(words(freeWindows(day, [{ start: at("20:00", "2026-06-09"), end: at("08:00") }]))).toEqual(["08:00-21:00"]);
  });
  it("merges spans in start order", () => {
    expect(words(mergeSpans([span("10:00", "11:00"), span("08:00", "10:00"), span("12:00", "13:00")]))).toEqual(["08:00-11:00", "12:00-13:00"]);
  });
});

describe("the club's flying window in club time", () => {
  it("07:00–21:00 in America/Chicago in June is 12:00–02:00 UTC (CDT is UTC−5: from the time zone database)", () => {
    const w = flyingWindow("2026-06-10", { opens: "07:00", closes: "21:00" }, "America/Chicago");
    expect(new Date(w.start).toISOString()).toBe("2026-06-10T12:00:00.000Z");
    expect(new Date(w.end).toISOString()).toBe("2026-06-11T02:00:00.000Z");
  });
  it("a closing time before the opening time runs into the next day", () => {
    const w = flyingWindow("2026-06-10", { opens: "18:00", closes: "02:00" }, "UTC");
    expect((w.end - w.start) / 3_600_000).toBe(8);
  });
});

describe("night marked on free time", () => {
  const night = [{ start: at("21:30", "2026-06-09"), end: at("04:30") }, { start: at("19:30"), end: at("04:30", "2026-06-11") }];
  it("splits a free window where night begins and ends", () => {
    const pieces = splitByNight(span("03:00", "21:00"), night);
    expect(pieces.map((p) => `${hm(p.start)}-${hm(p.end)}${p.night ? " night" : ""}`)).toEqual(["03:00-04:30 night", "04:30-19:30", "19:30-21:00 night"]);
  });
  it("leaves a window wholly in daylight whole", () => {
    expect(splitByNight(span("08:00", "12:00"), night)).toEqual([{ ...span("08:00", "12:00"), night: false }]);
  });
});

describe("a day's plan for one aircraft", () => {
  it("lists bookings, blocks and free time in time order; a booking before the club opens still shows", () => {
    const plan = planDay({
      day: span("00:00", "23:59"),
      window: span("07:00", "21:00"),
      bookings: [{ ...span("05:00", "06:30"), id: "early" }, { ...span("09:00", "11:30"), id: "b" }],
      blocks: [{ ...span("13:00", "15:00"), id: "k" }],
      nights: [{ start: at("20:00"), end: at("23:59") }],
      now: at("06:00"),
    });
    expect(plan.map((e) => `${e.kind} ${hm(e.start)}-${hm(e.end)}${e.kind === "free" && e.night ? " night" : ""}`)).toEqual([
      "booking 05:00-06:30",
      "free 07:00-09:00",
      "booking 09:00-11:30",
      "free 11:30-13:00",
      "block 13:00-15:00",
      "free 15:00-20:00",
      "free 20:00-21:00 night",
    ]);
  });
});

describe("covered by availability windows", () => {
  const windows = [span("09:00", "12:00"), span("12:00", "14:00"), span("16:00", "18:00")];
  it("is covered when the windows together hold the whole span, touching ones joined", () => {
    expect(coveredBy(span("10:00", "13:30"), windows)).toBe(true);
    expect(coveredBy(span("09:00", "14:00"), windows)).toBe(true);
  });
  it("is not covered across a gap or past an edge", () => {
    expect(coveredBy(span("13:00", "16:30"), windows)).toBe(false);
    expect(coveredBy(span("08:30", "10:00"), windows)).toBe(false);
    expect(coveredBy(span("10:00", "11:00"), [])).toBe(false);
  });
});

describe("schedule refusals", () => {
  const format = (ms: number) => hm(ms);
  it("refuses a booking overlapping a maintenance block, naming the block and its reason", () => {
    const out = scheduleRefusals({ wanted: span("10:00", "12:00"), registration: "N0527L", blocks: [{ ...span("11:00", "15:00"), reason: "100-hour inspection" }], instructor: null, format });
    expect(out).toEqual([{ field: "startsAt", reason: "N0527L is blocked for maintenance from 11:00 to 15:00: 100-hour inspection." }]);
  });
  it("lets a booking end the minute a block begins (half-open, as bookings: common practice)", () => {
    expect(scheduleRefusals({ wanted: span("09:00", "11:00"), registration: "N0527L", blocks: [{ ...span("11:00", "15:00"), reason: "x" }], instructor: null, format })).toEqual([]);
  });
  it("refuses an instructor who keeps times and is not available for all of the window, quoting their times", () => {
    const out = scheduleRefusals({ wanted: span("10:00", "13:00"), registration: "N0527L", blocks: [], instructor: { name: "Imani", keepsAvailability: true, windows: [span("09:00", "12:00")] }, format });
    expect(out).toHaveLength(1);
    expect(out[0]!.field).toBe("instructorId");
    expect(out[0]!.reason).toContain("Imani is not available for the whole of 10:00 to 13:00. Available then only 09:00 to 12:00.");
  });
  it("books an instructor who keeps no list whenever they are not already booked", () => {
    expect(scheduleRefusals({ wanted: span("10:00", "13:00"), registration: "N0527L", blocks: [], instructor: { name: "Imani", keepsAvailability: false, windows: [] }, format })).toEqual([]);
  });
});

describe("weekly repeats", () => {
  it("repeats the same club-local clock times 7 calendar days apart, across a month end", () => {
    expect(expandWeekly({ startsAt: "2026-12-22T09:00", endsAt: "2026-12-22T11:00" }, 3)).toEqual([
      { startsAt: "2026-12-22T09:00", endsAt: "2026-12-22T11:00" },
      { startsAt: "2026-12-29T09:00", endsAt: "2026-12-29T11:00" },
      { startsAt: "2027-01-05T09:00", endsAt: "2027-01-05T11:00" }, // from the calendar
    ]);
  });
  it("keeps 09:00 local across a daylight-saving change (US DST ends 2026-11-01: 15 U.S.C. 260a)", () => {
    const weeks = expandWeekly({ startsAt: "2026-10-27T09:00", endsAt: "2026-10-27T10:00" }, 2);
    expect(weeks[1]).toEqual({ startsAt: "2026-11-03T09:00", endsAt: "2026-11-03T10:00" });
  });
  it("a window past midnight keeps its two dates", () => {
    expect(expandWeekly({ startsAt: "2026-06-10T22:00", endsAt: "2026-06-11T01:00" }, 2)[1]).toEqual({ startsAt: "2026-06-17T22:00", endsAt: "2026-06-18T01:00" });
  });
  it("refuses 0 weeks and more than the most", () => {
    expect(() => expandWeekly({ startsAt: "2026-06-10T09:00", endsAt: "2026-06-10T10:00" }, 0)).toThrow();
    expect(() => expandWeekly({ startsAt: "2026-06-10T09:00", endsAt: "2026-06-10T10:00" }, MAX_REPEAT_WEEKS + 1)).toThrow();
  });
  it("words a window for the answer (2026-06-10 is a Wednesday: from the calendar)", () => {
    expect(describeLocalWindow({ startsAt: "2026-06-10T09:00", endsAt: "2026-06-10T11:00" })).toBe("Wed, Jun 10, 09:00–11:00");
  });
});

describe("the day-before reminder, in the club's time zone", () => {
  const tz = "America/Chicago"; // CDT, UTC−5 in June (time zone database)
  const start = new Date("2026-06-11T14:00:00Z"); // 09:00 club time on Thursday Jun 11
  it("is due on the club's day before, from 08:00 club time", () => {
    expect(reminderDue(start, new Date("2026-06-10T13:00:00Z"), tz)).toBe(true); // 08:00 Jun 10 club time
    expect(reminderDue(start, new Date("2026-06-11T04:30:00Z"), tz)).toBe(true); // 23:30 Jun 10 club time, already Jun 11 in UTC
  });
  it("is not due before 08:00 the day before, on the day itself, or two days before", () => {
    expect(reminderDue(start, new Date("2026-06-10T12:59:00Z"), tz)).toBe(false); // 07:59 club time
    expect(reminderDue(start, new Date("2026-06-11T05:30:00Z"), tz)).toBe(false); // 00:30 Jun 11 club time
    expect(reminderDue(start, new Date("2026-06-09T20:00:00Z"), tz)).toBe(false);
  });
});
