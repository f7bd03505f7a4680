import { describe, expect, it } from "vitest";
import { formatLocalTime, localTimeToInstant } from "@/lib/fleet/time";

// Offsets from the IANA time zone database as the runtime ships it (from memory: CST UTC−6,
// CDT UTC−5, CET UTC+1, CEST UTC+2; US change 2026-03-08, EU change 2026-03-29).
describe("club-local times", () => {
  it("reads a local time in the club's zone, summer and winter", () => {
    expect(localTimeToInstant("2026-01-10T08:00", "America/Chicago").toISOString()).toBe("2026-01-10T14:00:00.000Z");
    expect(localTimeToInstant("2026-07-10T08:00", "America/Chicago").toISOString()).toBe("2026-07-10T13:00:00.000Z");
    expect(localTimeToInstant("2026-07-10T08:00", "Europe/Berlin").toISOString()).toBe("2026-07-10T06:00:00.000Z");
  });

  it("takes the earlier instant in the hour a spring change skips, so a notice is never late", () => {
    // 02:30 does not exist in Berlin on 2026-03-29; 01:30 CET is 00:30 UTC
    expect(localTimeToInstant("2026-03-29T02:30", "Europe/Berlin").toISOString()).toBe("2026-03-29T00:30:00.000Z");
  });

  it("writes an instant back in the club's zone", () => {
    expect(formatLocalTime(new Date("2026-07-10T13:00:00Z"), "America/Chicago")).toBe("Fri 10 Jul 2026, 08:00");
    expect(formatLocalTime(new Date("2026-12-31T23:30:00Z"), "Europe/Berlin")).toBe("Fri 1 Jan 2027, 00:30");
  });

  it("refuses text that is not a local date and time", () => {
    expect(() => localTimeToInstant("tomorrow", "Europe/Berlin")).toThrow(RangeError);
  });
});
