import { describe, expect, it } from "vitest";
import { defaultInspectionItems, nextDue, type InspectionItem } from "@/lib/airworthiness";

const HUNDRED: InspectionItem = {
  key: "100-hour",
  name: "100-hour inspection",
  rule: { kind: "hours", hours: 100, overrunHours: 10 },
  required: true,
  ifrOnly: false,
  satisfiedBy: ["annual"],
  completions: [],
};
const ANNUAL: InspectionItem = {
  key: "annual",
  name: "Annual inspection",
  rule: { kind: "calendar-months", months: 12 },
  required: true,
  ifrOnly: false,
  completions: [],
};

describe("nextDue", () => {
  it("carries the 100-hour overrun through the recorded history", () => {
    const item = {
      ...HUNDRED,
      completions: [
        { date: "2026-01-05", hours: 1000 },
        { date: "2026-04-20", hours: 1106 },
      ],
    };
    const next = nextDue(item, "2026-05-15", 1150);
    expect(next.dueHours).toBe(1200); // 14 CFR 91.409(b): due 1100.0, done 1106.0 → 1200.0 (M)
    expect(next.overrunLimitHours).toBe(1210); // 14 CFR 91.409(b): 10 hours
    expect(next.hoursLeft).toBe(50); // own arithmetic
    expect(next.overdue).toBe(false);
  });

  it("counts an annual as a 100-hour", () => {
    const hundred = { ...HUNDRED, completions: [{ date: "2026-01-05", hours: 1000 }] };
    const annual = { ...ANNUAL, completions: [{ date: "2026-03-01", hours: 1080 }] };
    const next = nextDue(hundred, "2026-05-15", 1150, [hundred, annual]);
    expect(next.dueHours).toBe(1180); // 14 CFR 91.409(b): an annual satisfies the 100-hour; early → from 1080
    expect(next.lastDone).toEqual({ date: "2026-03-01", hours: 1080 });
    expect(next.hoursLeft).toBe(30);
  });

  it("gives both due points of a whichever-first item", () => {
    const oil: InspectionItem = {
      key: "oil-change",
      name: "Oil change",
      rule: { kind: "months-or-hours", months: 4, hours: 50 },
      required: true,
      ifrOnly: false,
      completions: [{ date: "2026-01-10", hours: 500 }],
    };
    const next = nextDue(oil, "2026-05-15", 540.5);
    expect(next.dueDate).toBe("2026-05-31"); // 4 calendar months, common practice
    expect(next.daysLeft).toBe(16);
    expect(next.dueHours).toBe(550); // 50 hours, common practice
    expect(next.hoursLeft).toBe(9.5);
  });

  it("takes the ELT battery's expiry from the completion and its use from the item", () => {
    const battery = defaultInspectionItems({}).find((i) => i.key === "elt-battery");
    if (!battery) throw new Error("no ELT battery item");
    const item = {
      ...battery,
      completions: [{ date: "2024-09-01", expiresOn: "2026-05-31" }],
      usage: { limitHours: 1, usedHours: 0.4 },
    };
    const next = nextDue(item, "2026-05-15", null);
    expect(next.dueDate).toBe("2026-05-31"); // 14 CFR 91.207(c): 50 % of useful life, date set at replacement
    expect(next.useLeftHours).toBe(0.6); // 14 CFR 91.207(c): 1 cumulative hour, own arithmetic
    expect(next.missing).toEqual([]); // no meter needed for a date-and-use item
  });

  it("reports what is missing instead of guessing", () => {
    expect(nextDue(ANNUAL, "2026-05-15", 1000).missing).toEqual(["no-completion"]);
    const done = { ...HUNDRED, completions: [{ date: "2026-01-05", hours: 1000 }] };
    expect(nextDue(done, "2026-05-15", Number.NaN).missing).toEqual(["no-current-hours"]);
    expect(nextDue(done, "2026-05-15", Number.NaN).hoursLeft).toBeNull();
    const noMeter = { ...HUNDRED, completions: [{ date: "2026-01-05" }] };
    expect(nextDue(noMeter, "2026-05-15", 1000).missing).toEqual(["no-completion-hours"]);
  });
});

describe("defaultInspectionItems", () => {
  it("gives a private VFR aircraft no 100-hour and no IFR-only tests", () => {
    // 14 CFR 91.409(a),(b); 91.207(c),(d); 91.413(a); oil change common practice
    expect(defaultInspectionItems({}).map((i) => i.key)).toEqual([
      "annual",
      "elt",
      "elt-battery",
      "transponder",
      "oil-change",
    ]);
  });

  it("adds the 100-hour for instruction and the IFR-only tests for IFR", () => {
    const items = defaultInspectionItems({ usedForInstruction: true, ifrEquipped: true });
    const byKey = new Map(items.map((i) => [i.key, i]));
    expect(byKey.get("100-hour")?.rule).toEqual({ kind: "hours", hours: 100, overrunHours: 10 }); // 14 CFR 91.409(b)
    expect(byKey.get("100-hour")?.satisfiedBy).toEqual(["annual"]); // 14 CFR 91.409(b)
    expect(byKey.get("altimeter-static")?.rule).toEqual({ kind: "calendar-months", months: 24 }); // 14 CFR 91.411(a)
    expect(byKey.get("altimeter-static")?.ifrOnly).toBe(true); // 14 CFR 91.411(a): IFR in controlled airspace
    expect(byKey.get("vor-check")?.rule).toEqual({ kind: "days", days: 30 }); // 14 CFR 91.171(a)
    expect(byKey.get("transponder")?.rule).toEqual({ kind: "calendar-months", months: 24 }); // 14 CFR 91.413(a)
    expect(byKey.get("elt")?.rule).toEqual({ kind: "calendar-months", months: 12 }); // 14 CFR 91.207(d)
    expect(byKey.get("elt-battery")?.usage?.limitHours).toBe(1); // 14 CFR 91.207(c)
    expect(defaultInspectionItems({ usedForHire: true }).some((i) => i.key === "100-hour")).toBe(true); // 91.409(b)
  });
});
