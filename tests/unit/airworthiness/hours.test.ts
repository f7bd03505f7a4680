import { describe, expect, it } from "vitest";
import { formatHours, hoursDue, hoursLateness, roundHours } from "@/lib/airworthiness";

const HUNDRED = { intervalHours: 100, overrunHours: 10 }; // 14 CFR 91.409(b): 100 h, up to 10 h excess

describe("hoursDue: the 100-hour inspection", () => {
  it("is due 100 hours after the first recorded inspection, with 10 hours of overrun", () => {
    // 14 CFR 91.409(b)
    expect(hoursDue({ lastDoneAt: 1000, ...HUNDRED })).toEqual({ dueAt: 1100, overrunLimitAt: 1110 });
  });

  it("carries the overrun forward into the next interval", () => {
    // 14 CFR 91.409(b) "excess time ... must be included"; example 1100.0 → done 1106.0 → 1200.0 (M)
    expect(hoursDue({ lastDoneAt: 1106, previousDueAt: 1100, ...HUNDRED })).toEqual({
      dueAt: 1200,
      overrunLimitAt: 1210,
    });
    // 14 CFR 91.409(b); own arithmetic: the whole 10-hour allowance used
    expect(hoursDue({ lastDoneAt: 1110, previousDueAt: 1100, ...HUNDRED }).dueAt).toBe(1200);
    // 14 CFR 91.409(b); own arithmetic with tenths
    expect(hoursDue({ lastDoneAt: 1207.4, previousDueAt: 1200.3, ...HUNDRED }).dueAt).toBe(1300.3);
  });

  it("starts an early inspection's interval from when it was done", () => {
    // 14 CFR 91.409(b); example 1100.0 due, done 1090.0 → 1190.0 (M)
    expect(hoursDue({ lastDoneAt: 1090, previousDueAt: 1100, ...HUNDRED })).toEqual({
      dueAt: 1190,
      overrunLimitAt: 1200,
    });
    // 14 CFR 91.409(b); on time is the same either way (own arithmetic)
    expect(hoursDue({ lastDoneAt: 1100, previousDueAt: 1100, ...HUNDRED }).dueAt).toBe(1200);
  });

  it("counts from where it fell due even when done beyond the overrun: the late time is not handed back", () => {
    // 14 CFR 91.409(b) "excess time ... must be included in computing the next 100 hours"; issue 11's example
    expect(hoursDue({ lastDoneAt: 1112, intervalHours: 100, overrunHours: 10, previousDueAt: 1100 }).dueAt).toBe(1200);
    // 14 CFR 91.409(b); own arithmetic: 0.1 h beyond the overrun
    expect(hoursDue({ lastDoneAt: 1110.1, previousDueAt: 1100, ...HUNDRED }).dueAt).toBe(1200);
    // 14 CFR 91.409(b); own arithmetic: 25 h late, the next still at 1200.0, overrun limit 1210.0
    expect(hoursDue({ lastDoneAt: 1125, previousDueAt: 1100, ...HUNDRED })).toEqual({ dueAt: 1200, overrunLimitAt: 1210 });
  });

  it("starts afresh when done a whole interval or more after it fell due (a gap in the records)", () => {
    // Our documented choice beside hoursDue: no 100-hour is skipped lawfully (14 CFR 91.409(b)), so the
    // history cannot place a due point across the gap; the lateness is still flagged (hoursLateness)
    expect(hoursDue({ lastDoneAt: 1200, previousDueAt: 1100, ...HUNDRED }).dueAt).toBe(1300);
    expect(hoursDue({ lastDoneAt: 1250.5, previousDueAt: 1100, ...HUNDRED }).dueAt).toBe(1350.5);
    // own arithmetic: 99.9 h late still counts from the due point
    expect(hoursDue({ lastDoneAt: 1199.9, previousDueAt: 1100, ...HUNDRED }).dueAt).toBe(1200);
  });

  it("says how late an inspection was, for the records", () => {
    // 14 CFR 91.409(b): 1112.0 done against 1100.0 due is 12.0 h late, beyond the 10-hour overrun
    expect(hoursLateness({ lastDoneAt: 1112, previousDueAt: 1100, overrunHours: 10 })).toEqual({ lateHours: 12, beyondOverrun: true });
    // 14 CFR 91.409(b): 6.0 h late is within the 10-hour overrun
    expect(hoursLateness({ lastDoneAt: 1106, previousDueAt: 1100, overrunHours: 10 })).toEqual({ lateHours: 6, beyondOverrun: false });
    // 14 CFR 91.409(b): exactly at the overrun limit is still within it
    expect(hoursLateness({ lastDoneAt: 1110, previousDueAt: 1100, overrunHours: 10 })).toEqual({ lateHours: 10, beyondOverrun: false });
    // own arithmetic: early or on time is not late
    expect(hoursLateness({ lastDoneAt: 1090, previousDueAt: 1100, overrunHours: 10 })).toEqual({ lateHours: 0, beyondOverrun: false });
    expect(hoursLateness({ lastDoneAt: 1000 })).toEqual({ lateHours: 0, beyondOverrun: false });
  });

  it("has no overrun unless one is given", () => {
    // Oil change every 50 h, late by 3 h: next from when done (common practice)
    expect(hoursDue({ lastDoneAt: 553, intervalHours: 50, previousDueAt: 550 })).toEqual({
      dueAt: 603,
      overrunLimitAt: 603,
    });
  });

  it("keeps tenths free of floating-point noise", () => {
    // Own arithmetic: 1100.1 + 100 = 1200.1 exactly, as a meter reads it
    expect(hoursDue({ lastDoneAt: 1100.1, ...HUNDRED })).toEqual({ dueAt: 1200.1, overrunLimitAt: 1210.1 });
    expect(hoursDue({ lastDoneAt: 0.3, intervalHours: 0.6 }).dueAt).toBe(0.9); // 0.3 + 0.6 ≠ 0.9 in binary
    expect(roundHours(0.1 + 0.2)).toBe(0.3);
  });

  it("refuses impossible intervals and readings", () => {
    expect(() => hoursDue({ lastDoneAt: 1000, intervalHours: 0 })).toThrow(RangeError);
    expect(() => hoursDue({ lastDoneAt: 1000, intervalHours: 100, overrunHours: -1 })).toThrow(RangeError);
    expect(() => hoursDue({ lastDoneAt: Number.NaN, intervalHours: 100 })).toThrow(RangeError);
  });
});

describe("formatHours", () => {
  it("shows tenths, and hundredths only when the reading has them", () => {
    expect(formatHours(1100)).toBe("1100.0");
    expect(formatHours(1200.1 + 1e-9)).toBe("1200.1");
    expect(formatHours(1100.05)).toBe("1100.05");
  });
});
