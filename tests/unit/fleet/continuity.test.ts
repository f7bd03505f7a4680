import { describe, expect, it } from "vitest";
import { advanceMeters, checkBetween, checkMeterContinuity } from "@/lib/fleet/continuity";

// Meter continuity is common practice in flight logs: each flight's "out" reading is the
// previous flight's "in" reading. The check values below are plain arithmetic.
describe("checkMeterContinuity", () => {
  it("accepts out readings equal to the previous in readings", () => {
    expect(checkMeterContinuity({ hobbsIn: 1234.5, tachIn: 1010.2 }, { hobbsOut: 1234.5, tachOut: 1010.2 })).toEqual({ status: "ok", issues: [] });
  });

  it("treats float noise below half a tenth as continuous (meters read to tenths)", () => {
    expect(checkMeterContinuity({ hobbsIn: 0.1 + 0.2, tachIn: 5 }, { hobbsOut: 0.3, tachOut: 5.04 }).status).toBe("ok");
    expect(checkMeterContinuity({ hobbsIn: 100, tachIn: 5 }, { hobbsOut: 100.05, tachOut: 5 }).status).toBe("gap"); // 0.05 h, half a tenth
  });

  it("flags a gap: time nobody logged (1234.8 − 1234.5 = 0.3 h)", () => {
    const r = checkMeterContinuity({ hobbsIn: 1234.5, tachIn: 1010.2 }, { hobbsOut: 1234.8, tachOut: 1010.2 });
    expect(r.status).toBe("gap");
    expect(r.issues).toEqual([{ meter: "hobbs", kind: "gap", hours: 0.3, text: "Hobbs out 1234.8 is 0.3 h after the previous Hobbs in 1234.5: 0.3 h not logged" }]);
  });

  it("flags an overlap: time logged twice (1010.2 − 1009.9 = 0.3 h), and an overlap outranks a gap", () => {
    const r = checkMeterContinuity({ hobbsIn: 1234.5, tachIn: 1010.2 }, { hobbsOut: 1234.7, tachOut: 1009.9 });
    expect(r.status).toBe("overlap");
    expect(r.issues.map((i) => [i.meter, i.kind, i.hours])).toEqual([["hobbs", "gap", 0.2], ["tach", "overlap", 0.3]]);
    expect(r.issues[1]!.text).toBe("Tach out 1009.9 is 0.3 h before the previous Tach in 1010.2: 0.3 h logged twice");
  });

  it("has nothing to compare for an aircraft's first flight", () => {
    expect(checkMeterContinuity(null, { hobbsOut: 12, tachOut: 10 })).toEqual({ status: "ok", issues: [] });
  });
});

describe("checkBetween (a flight entered late)", () => {
  it("checks the flight after it as well, and says which side", () => {
    const r = checkBetween({ hobbsIn: 100, tachIn: 80 }, { hobbsOut: 100, hobbsIn: 101, tachOut: 80, tachIn: 80.8 }, { hobbsOut: 101.4, tachOut: 80.8 });
    expect(r.status).toBe("gap");
    expect(r.issues).toHaveLength(1);
    expect(r.issues[0]!.text).toBe("Next flight: Hobbs out 101.4 is 0.4 h after the previous Hobbs in 101.0: 0.4 h not logged");
  });
});

describe("advanceMeters", () => {
  it("moves the meters to the flight's in readings", () => {
    expect(advanceMeters({ hobbs: 100, tach: 80 }, { hobbsIn: 101.2, tachIn: 81 })).toEqual({ hobbs: 101.2, tach: 81 });
  });
  it("never moves them backwards for a flight entered late", () => {
    expect(advanceMeters({ hobbs: 110, tach: 90 }, { hobbsIn: 101.2, tachIn: 81 })).toEqual({ hobbs: 110, tach: 90 });
  });
  it("starts from the flight when the aircraft had no readings", () => {
    expect(advanceMeters({ hobbs: null, tach: null }, { hobbsIn: 5, tachIn: 4 })).toEqual({ hobbs: 5, tach: 4 });
  });
});
