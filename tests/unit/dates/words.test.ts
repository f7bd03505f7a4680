import { describe, expect, it } from "vitest";
import { formatDateWords, formatInstantWords } from "@/lib/dates/words";
import { formatLocalTime } from "@/lib/fleet/time";

// Offsets and weekdays from the IANA time zone database and the proleptic Gregorian calendar as
// ECMA-402 Intl.DateTimeFormat applies them (from memory: PST UTC−8, CDT UTC−5, CET UTC+1;
// 2026-12-02 is a Wednesday).
describe("instants and dates in words", () => {
  it("writes an instant on the club's clock, not in UTC (ECMA-402 Intl.DateTimeFormat)", () => {
    // The flight line once showed "2026-12-02T04:25:49.969Z": in Los Angeles that is the evening before.
    expect(formatInstantWords("2026-12-02T04:25:49.969Z", "America/Los_Angeles")).toBe("Tue 1 Dec 2026, 20:25");
    expect(formatInstantWords(new Date("2026-07-10T13:00:00Z"), "America/Chicago")).toBe("Fri 10 Jul 2026, 08:00");
    expect(formatInstantWords(new Date("2026-12-31T23:30:00Z"), "Europe/Berlin")).toBe("Fri 1 Jan 2027, 00:30");
  });

  it("uses a 24-hour clock with midnight as 00, never 24 (ECMA-402 hourCycle h23)", () => {
    expect(formatInstantWords("2026-03-01T06:00:00Z", "America/Chicago")).toBe("Sun 1 Mar 2026, 00:00");
  });

  it("returns an unreadable instant as given, so a reason never loses it (common practice)", () => {
    expect(formatInstantWords("not a time", "UTC")).toBe("not a time");
  });

  it("writes a calendar date as the day it is, whatever the zone (proleptic Gregorian calendar)", () => {
    expect(formatDateWords("2026-12-02")).toBe("Wed 2 Dec 2026");
    expect(formatDateWords("2028-02-29")).toBe("Tue 29 Feb 2028");
  });

  it("formatLocalTime is the same words (ECMA-402 Intl.DateTimeFormat)", () => {
    expect(formatLocalTime(new Date("2026-12-02T04:25:49.969Z"), "America/Los_Angeles")).toBe("Tue 1 Dec 2026, 20:25");
  });
});
