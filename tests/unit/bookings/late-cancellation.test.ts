import { describe, expect, it } from "vitest";
import { describeLateCheck, lateCancellation, lateChange } from "@/lib/bookings/late-cancellation";

const start = new Date("2026-05-02T15:00:00Z");
const hoursBefore = (h: number) => new Date(start.getTime() - h * 3_600_000);

// The club's own rule (club setting lateCancellationHours); values below are our arithmetic.
describe("lateCancellation", () => {
  it("is late inside the window, not outside it, and exactly N hours before is on time", () => {
    expect(lateCancellation(start, hoursBefore(23.5), 24)).toEqual({ late: true, hoursBefore: 23.5 });
    expect(lateCancellation(start, hoursBefore(24), 24).late).toBe(false);
    expect(lateCancellation(start, hoursBefore(30), 24).late).toBe(false);
    expect(lateCancellation(start, hoursBefore(-1), 24).late).toBe(true);
  });
  it("0 hours means the club has no late rule", () => {
    expect(lateCancellation(start, hoursBefore(-2), 0).late).toBe(false);
  });
  it("refuses a negative setting", () => expect(() => lateCancellation(start, start, -1)).toThrow(RangeError));
  it("says it in words", () => {
    expect(describeLateCheck(lateCancellation(start, hoursBefore(3), 24), 24)).toBe("Late cancellation: 3.0 h before the start, inside the club's 24-hour rule.");
    expect(describeLateCheck(lateCancellation(start, hoursBefore(-1), 24), 24)).toMatch(/after the booking had started/);
    expect(describeLateCheck(lateCancellation(start, hoursBefore(48), 24), 24)).toBe("");
  });
});

describe("lateChange", () => {
  const old = { startsAt: start, endsAt: new Date(start.getTime() + 2 * 3_600_000) };
  it("giving back booked time inside the window is late; keeping all of it is not", () => {
    const shorter = { startsAt: start, endsAt: new Date(start.getTime() + 3_600_000) };
    const longer = { startsAt: new Date(start.getTime() - 3_600_000), endsAt: new Date(start.getTime() + 3 * 3_600_000) };
    expect(lateChange(old, shorter, hoursBefore(2), 24).late).toBe(true);
    expect(lateChange(old, longer, hoursBefore(2), 24).late).toBe(false);
    expect(lateChange(old, shorter, hoursBefore(48), 24).late).toBe(false);
  });
});
