import { describe, expect, it } from "vitest";
import { aircraftStatus, hoursChain, nextDue, type Completion, type InspectionItem } from "@/lib/airworthiness";
import { aircraft, changeItem, currentItems, IFR_TRAINER, TODAY, VFR_PRIVATE } from "./fixtures";

// Source for every check: 14 CFR 91.409(b) counts the 100-hour in hours of time in service; which
// meter stands for it is the club's choice (common practice). A due point read on one meter says
// nothing about the other (they run at different rates, common practice), so a completion read on
// the other meter cannot be placed: "Status unknown", never flyable.

const hundredOnly = (completions: Completion[]): InspectionItem[] =>
  changeItem(currentItems(IFR_TRAINER), "100-hour", { completions }).filter((i) => i.key === "100-hour" || i.key === "annual")
    .map((i) => (i.key === "annual" ? { ...i, completions: [{ date: "2025-06-06", hours: 985, meter: "hobbs" as const }] } : i));

describe("meter provenance: a completion read on another meter", () => {
  it("turns an overdue 100-hour into 'Status unknown', never 'flyable', after a switch to tach", () => {
    // 14 CFR 91.409(b): on the Hobbs it is overdue (due 1120.0, Hobbs now 1125.0)
    const items = hundredOnly([{ date: "2026-03-02", hours: 1020, meter: "hobbs" }]);
    expect(aircraftStatus(aircraft(IFR_TRAINER, { items, meter: "hobbs" }), TODAY, 1125).status).toBe("grounded");
    // After the switch the tach reads 960.0: compared bare, 1120.0 would look 160 h away
    const switched = aircraftStatus(aircraft(IFR_TRAINER, { items, meter: "tach" }), TODAY, 960);
    expect(switched.status).toBe("unknown"); // common practice: no due point on the tach is known
    const reason = switched.reasons.find((r) => r.code === "other-meter");
    expect(reason?.text).toBe(
      "100-hour inspection: last done at 1020.0 h on the Hobbs, but inspections now count by the tach; missing record: its due point " +
        "on the tach, until maintenance records that completion's reading on the tach (14 CFR 91.409(b))",
    );
    expect(reason?.grounding).toBe(false);
  });

  it("names both meters the other way round too (tach to Hobbs)", () => {
    const items = hundredOnly([{ date: "2026-03-02", hours: 1020, meter: "tach" }]);
    const result = aircraftStatus(aircraft(IFR_TRAINER, { items, meter: "hobbs" }), TODAY, 1030);
    expect(result.status).toBe("unknown"); // common practice
    expect(result.reasons.map((r) => r.text).join(" ")).toContain("on the tach, but inspections now count by the Hobbs");
  });

  it("is computed again once maintenance records a reading on the new meter", () => {
    // 14 CFR 91.409(b): tach 900.0 → due 1000.0; tach now 960.0 → 40.0 h left
    const items = hundredOnly([{ date: "2026-03-02", hours: 1020, meter: "hobbs" }, { date: "2026-04-02", hours: 900, meter: "tach" }]);
    const next = nextDue(items.find((i) => i.key === "100-hour")!, TODAY, 960, items, "tach");
    expect(next.meterMismatch).toBeNull();
    expect(next.dueHours).toBe(1000);
    expect(next.hoursLeft).toBe(40);
  });

  it("stops an hours chain at a meter change: no excess is carried across meters", () => {
    // 14 CFR 91.409(b) carries excess within one count of hours; across meters it starts afresh (our choice)
    const chain = hoursChain([{ date: "2026-01-01", hours: 1000, meter: "hobbs" }, { date: "2026-02-01", hours: 905, meter: "tach" }], 100, 10);
    expect(chain.at(-1)?.point?.dueAt).toBe(1005); // own arithmetic: 905 + 100
    expect(chain.at(-1)?.point?.late).toBeNull();
  });

  it("keeps the old behaviour when either meter is not said (backward compatible)", () => {
    // 14 CFR 91.409(b): due 1120.0, meter 1070.0 → 50 h left; no meters given on either side
    const items = hundredOnly([{ date: "2026-03-02", hours: 1020 }]);
    expect(nextDue(items.find((i) => i.key === "100-hour")!, TODAY, 1070, items, "tach").dueHours).toBe(1120);
    const withMeter = hundredOnly([{ date: "2026-03-02", hours: 1020, meter: "hobbs" }]);
    expect(nextDue(withMeter.find((i) => i.key === "100-hour")!, TODAY, 1070, withMeter).dueHours).toBe(1120);
  });

  it("leaves date-based items alone", () => {
    // 14 CFR 91.409(a): the annual counts calendar months, whatever the meter
    const items = currentItems(VFR_PRIVATE).filter((i) => i.key === "annual").map((i) => ({ ...i, completions: [{ date: "2025-06-06", meter: "hobbs" as const }] }));
    expect(aircraftStatus({ flags: VFR_PRIVATE, items, meter: "tach" }, TODAY, 960).status).toBe("flyable");
  });
});

describe("100-hour done late: flagged in the records", () => {
  it("flags the governing completion with how late it was and keeps the due point", () => {
    // 14 CFR 91.409(b): due 1100.0, done 1112.0 (12.0 h late, beyond the 10-hour overrun) → next due 1200.0
    const items = hundredOnly([{ date: "2026-01-02", hours: 1000, meter: "hobbs" }, { date: "2026-03-02", hours: 1112, meter: "hobbs" }])
      .map((i) => (i.key === "annual" ? { ...i, completions: [{ date: "2025-06-06", hours: 900, meter: "hobbs" as const }] } : i));
    const next = nextDue(items.find((i) => i.key === "100-hour")!, TODAY, 1150, items, "hobbs");
    expect(next.dueHours).toBe(1200);
    expect(next.late).toEqual({ lateHours: 12, beyondOverrun: true, fellDueAt: 1100, countsFromDuePoint: true });
  });

  it("flags a whole interval late as counted afresh", () => {
    // hoursDue's documented choice (14 CFR 91.409(b)): due 1100.0, done 1230.0 → a gap in the records, next 1330.0
    const items = hundredOnly([{ date: "2026-01-02", hours: 1000, meter: "hobbs" }, { date: "2026-03-02", hours: 1230, meter: "hobbs" }])
      .map((i) => (i.key === "annual" ? { ...i, completions: [{ date: "2025-06-06", hours: 900, meter: "hobbs" as const }] } : i));
    const next = nextDue(items.find((i) => i.key === "100-hour")!, TODAY, 1250, items, "hobbs");
    expect(next.dueHours).toBe(1330);
    expect(next.late).toEqual({ lateHours: 130, beyondOverrun: true, fellDueAt: 1100, countsFromDuePoint: false });
  });

  it("does not flag an inspection done on time", () => {
    // 14 CFR 91.409(b): due 1100.0, done 1095.0 → on time, next 1195.0
    const items = hundredOnly([{ date: "2026-01-02", hours: 1000, meter: "hobbs" }, { date: "2026-03-02", hours: 1095, meter: "hobbs" }])
      .map((i) => (i.key === "annual" ? { ...i, completions: [{ date: "2025-06-06", hours: 900, meter: "hobbs" as const }] } : i));
    const next = nextDue(items.find((i) => i.key === "100-hour")!, TODAY, 1150, items, "hobbs");
    expect(next.dueHours).toBe(1195);
    expect(next.late).toBeNull();
  });
});
