import { describe, expect, it } from "vitest";
import { aircraftStatus } from "@/lib/airworthiness";
import { defaultItemColumns } from "@/lib/fleet/default-items";
import { RuleConfigError, buildStatusInput, maintenanceHours, toRule } from "@/lib/fleet/status-input";
import { NOW, SOON, TODAY, currentCompletions, items, plane } from "./records";

describe("mapping database rows to the airworthiness input", () => {
  it("turns every rule kind into the rule the library expects", () => {
    const cols = defaultItemColumns({ months: 4, hours: 50 });
    const rule = (key: string) => toRule({ ...cols.find((c) => c.key === key)!, id: key, aircraftId: "a" });
    expect(rule("annual")).toEqual({ kind: "calendar-months", months: 12 }); // 14 CFR 91.409(a)
    expect(rule("100-hour")).toEqual({ kind: "hours", hours: 100, overrunHours: 10 }); // 14 CFR 91.409(b)
    expect(rule("transponder")).toEqual({ kind: "calendar-months", months: 24 }); // 14 CFR 91.413(a)
    expect(rule("vor-check")).toEqual({ kind: "days", days: 30 }); // 14 CFR 91.171(a)
    expect(rule("elt-battery")).toEqual({ kind: "fixed-date" }); // 14 CFR 91.207(c)
    expect(rule("oil-change")).toEqual({ kind: "months-or-hours", months: 4, hours: 50, overrunHours: undefined }); // club rule
  });

  it("refuses a rule with its interval missing rather than guessing one", () => {
    const annual = { ...items("a").find((i) => i.key === "annual")!, months: null };
    expect(() => toRule(annual)).toThrow(RuleConfigError);
  });

  it("keeps the 100-hour satisfied by the annual and the ELT battery's use limit", () => {
    const input = buildStatusInput({ aircraft: plane("a", { usedForInstruction: true }), items: items("a"), completions: currentCompletions("a"), squawks: [], notices: [], dueSoon: SOON, now: NOW });
    expect(input.items.find((i) => i.key === "100-hour")?.satisfiedBy).toEqual(["annual"]); // 14 CFR 91.409(b)
    expect(input.items.find((i) => i.key === "elt-battery")?.usage).toEqual({ limitHours: 1, usedHours: 0 }); // 14 CFR 91.207(c)(1)
    expect(aircraftStatus(input, TODAY, maintenanceHours(plane("a"))).status).toBe("flyable");
  });

  it("picks the meter the inspections count by, and null when unread", () => {
    expect(maintenanceHours(plane("a"))).toBe(1070);
    expect(maintenanceHours(plane("a", { maintenanceMeter: "hobbs" }))).toBe(1200);
    expect(maintenanceHours(plane("a", { currentTach: null }))).toBeNull();
  });

  it("drops other aircraft's squawks and closed squawks do not count", () => {
    const input = buildStatusInput({
      aircraft: plane("a"),
      items: items("a"),
      completions: currentCompletions("a"),
      squawks: [
        { id: "s1", aircraftId: "b", description: "other", triage: "grounding", limitation: null, placarded: false, suspectedGrounding: false, status: "open", reportedAt: NOW },
        { id: "s2", aircraftId: "a", description: "fixed", triage: "grounding", limitation: null, placarded: false, suspectedGrounding: false, status: "closed", reportedAt: NOW },
      ],
      notices: [],
      dueSoon: SOON,
      now: NOW,
    });
    expect(input.squawks).toHaveLength(1);
    expect(aircraftStatus(input, TODAY, 1070).status).toBe("flyable");
  });
});
