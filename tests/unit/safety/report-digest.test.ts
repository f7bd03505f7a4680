import { describe, expect, it } from "vitest";
import { anonymousReportStamp, dueDigestBatch, startOfClubDay, zonedInstant } from "@/lib/safety/report-digest";

// Zone offsets below are from the IANA time zone database rules (tzdata): America/Chicago is
// UTC−6 in winter (CST) and UTC−5 in summer (CDT), switching on the second Sunday of March and
// the first Sunday of November at 02:00; Europe/Berlin is UTC+1 (CET) / UTC+2 (CEST), switching
// on the last Sunday of March at 02:00 local.
describe("safety digest schedule", () => {
  it("finds the first instant of a club day on either side of UTC", () => {
    expect(startOfClubDay("2026-01-10", "America/Chicago").toISOString()).toBe("2026-01-10T06:00:00.000Z");
    expect(startOfClubDay("2026-07-10", "America/Chicago").toISOString()).toBe("2026-07-10T05:00:00.000Z");
    expect(startOfClubDay("2026-01-10", "Europe/Berlin").toISOString()).toBe("2026-01-09T23:00:00.000Z");
    expect(startOfClubDay("2026-01-10", "UTC").toISOString()).toBe("2026-01-10T00:00:00.000Z");
  });

  it("keeps the day boundary right on the days the clocks change", () => {
    // 2026-03-08 is the second Sunday of March (US change); 2026-03-29 the last Sunday of March (EU change).
    expect(startOfClubDay("2026-03-08", "America/Chicago").toISOString()).toBe("2026-03-08T06:00:00.000Z");
    expect(startOfClubDay("2026-03-09", "America/Chicago").toISOString()).toBe("2026-03-09T05:00:00.000Z");
    expect(zonedInstant("2026-03-08", 6, "America/Chicago").toISOString()).toBe("2026-03-08T11:00:00.000Z");
    expect(zonedInstant("2026-03-29", 6, "Europe/Berlin").toISOString()).toBe("2026-03-29T04:00:00.000Z");
  });

  it("stamps an anonymous report with the start of the club day, whatever the hour of filing", () => {
    // 03:30 UTC on the 11th is still the evening of the 10th in Chicago.
    expect(anonymousReportStamp(new Date("2026-01-11T03:30:12.345Z"), "America/Chicago").toISOString()).toBe("2026-01-10T06:00:00.000Z");
    expect(anonymousReportStamp(new Date("2026-01-10T06:00:00.000Z"), "America/Chicago").toISOString()).toBe("2026-01-10T06:00:00.000Z");
    expect(anonymousReportStamp(new Date("2026-01-10T23:30:00.000Z"), "Europe/Berlin").toISOString()).toBe("2026-01-10T23:00:00.000Z");
  });

  it("is due once the digest hour of a day has passed, covering the whole days not yet covered", () => {
    const tz = "America/Chicago";
    // 05:59 local on the 11th: the batch of the 11th has not come; the one of the 10th covers the 9th.
    expect(dueDigestBatch(new Date("2026-01-11T11:59:00Z"), tz, null)).toMatchObject({ fromDay: "2026-01-09", toDay: "2026-01-09" });
    const due = dueDigestBatch(new Date("2026-01-11T12:00:00Z"), tz, null)!;
    expect(due).toMatchObject({ fromDay: "2026-01-10", toDay: "2026-01-10" });
    expect(due.batchAt.toISOString()).toBe("2026-01-11T12:00:00.000Z");
    expect(due.from.toISOString()).toBe("2026-01-10T06:00:00.000Z");
    expect(due.until.toISOString()).toBe("2026-01-11T06:00:00.000Z");
    // Already covered: nothing due, however often the tick runs that day.
    expect(dueDigestBatch(new Date("2026-01-11T23:00:00Z"), tz, "2026-01-10")).toBeNull();
    // Days without a digest are folded into the next one.
    expect(dueDigestBatch(new Date("2026-01-14T13:00:00Z"), tz, "2026-01-10")).toMatchObject({ fromDay: "2026-01-11", toDay: "2026-01-13" });
  });
});
