import { describe, expect, it } from "vitest";
import { checkWindow, findConflicts, windowsOverlap } from "@/lib/bookings/overlap";

const at = (h: number) => new Date(Date.UTC(2026, 4, 1, h));
const held = (id: string, from: number, to: number, extra: Partial<{ aircraftId: string; userId: string; instructorId: string | null; status: string }> = {}) => ({
  id, startsAt: at(from), endsAt: at(to), aircraftId: "A", userId: "u1", instructorId: null, status: "reserved", ...extra,
});

// Windows are half-open intervals [start, end) — our own rule, so that back-to-back bookings fit.
describe("windowsOverlap", () => {
  it("back-to-back windows do not overlap; any shared minute does", () => {
    expect(windowsOverlap({ startsAt: at(9), endsAt: at(11) }, { startsAt: at(11), endsAt: at(12) })).toBe(false);
    expect(windowsOverlap({ startsAt: at(9), endsAt: at(11) }, { startsAt: at(10), endsAt: at(12) })).toBe(true);
    expect(windowsOverlap({ startsAt: at(9), endsAt: at(12) }, { startsAt: at(10), endsAt: at(11) })).toBe(true);
  });
});

describe("findConflicts", () => {
  const wanted = { startsAt: at(10), endsAt: at(12), aircraftId: "A", userId: "u9", instructorId: "i1" };
  it("names the aircraft, the instructor and the member conflicts, and skips cancelled and self", () => {
    const list = [
      held("b1", 9, 11),
      held("b2", 11, 13, { aircraftId: "B", userId: "u2", instructorId: "i1" }),
      held("b3", 11, 13, { aircraftId: "C", userId: "u9" }),
      held("b4", 10, 12, { status: "cancelled" }),
      held("b5", 10, 12, { status: "checked_in", aircraftId: "A" }),
      held("b6", 12, 14),
    ];
    expect(findConflicts(wanted, list).map((c) => [c.kind, c.booking.id])).toEqual([["aircraft", "b1"], ["instructor", "b2"], ["member", "b3"]]);
    expect(findConflicts(wanted, list, "b1").map((c) => c.booking.id)).toEqual(["b2", "b3"]);
  });
  it("an instructor flying as the member of another booking is busy too", () => {
    expect(findConflicts(wanted, [held("b7", 11, 12, { aircraftId: "D", userId: "i1" })]).map((c) => c.kind)).toEqual(["instructor"]);
  });
});

describe("checkWindow", () => {
  const now = at(8);
  it("accepts a window in the future", () => expect(checkWindow({ startsAt: at(9), endsAt: at(10) }, now)).toEqual({}));
  it("refuses an end before the start, and more than 14 days", () => {
    expect(checkWindow({ startsAt: at(10), endsAt: at(9) }, now).endsAt?.[0]).toMatch(/after the start/);
    expect(checkWindow({ startsAt: at(9), endsAt: new Date(at(9).getTime() + 15 * 86_400_000) }, now).endsAt?.[0]).toMatch(/14 days/);
  });
  it("allows a start up to an hour ago, not more", () => {
    expect(checkWindow({ startsAt: new Date(now.getTime() - 59 * 60_000), endsAt: at(10) }, now)).toEqual({});
    expect(checkWindow({ startsAt: new Date(now.getTime() - 61 * 60_000), endsAt: at(10) }, now).startsAt?.[0]).toMatch(/past/);
  });
});
