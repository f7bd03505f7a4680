import { describe, expect, it } from "vitest";
import { buildFlightLine, pickNextDue, sortDue } from "@/lib/fleet/flight-line";
import type { DueSummary, FleetNoticeRecord, FleetSquawkRecord } from "@/lib/fleet/types";
import { NOW, SOON, TODAY, currentCompletions, items, plane } from "./records";

function squawk(aircraftId: string, over: Partial<FleetSquawkRecord>): FleetSquawkRecord {
  return { id: `s-${aircraftId}`, aircraftId, description: "Left brake soft", triage: "untriaged", limitation: null, placarded: false, suspectedGrounding: false, status: "open", reportedAt: NOW, ...over };
}

describe("buildFlightLine", () => {
  const fleet = [plane("a1"), plane("a2", { usedForInstruction: true }), plane("a3")];
  const base = { aircraft: fleet, items: fleet.flatMap((a) => items(a.id)), completions: fleet.flatMap((a) => currentCompletions(a.id)), squawks: [] as FleetSquawkRecord[], notices: [] as FleetNoticeRecord[] };

  it("keeps each aircraft's records to itself", () => {
    const line = buildFlightLine({ ...base, squawks: [squawk("a2", { triage: "grounding" })] }, TODAY, NOW, SOON);
    expect(line.map((e) => [e.aircraft.id, e.status])).toEqual([["a1", "flyable"], ["a2", "grounded"], ["a3", "flyable"]]);
    expect(line[1]!.reasons[0]).toEqual({ code: "squawk-grounding", text: "Grounding squawk: Left brake soft", grounding: true });
    expect(line[1]!.openSquawks).toHaveLength(1);
    expect(line[0]!.openSquawks).toHaveLength(0);
  });

  it("lists only the items that apply: no 100-hour on a private aircraft, no IFR tests on a VFR one (14 CFR 91.409(b), 91.411, 91.171)", () => {
    const [a1, a2] = buildFlightLine(base, TODAY, NOW, SOON);
    expect(a1!.due.map((d) => d.key).sort()).toEqual(["annual", "elt", "elt-battery", "oil-change", "transponder"]);
    expect(a2!.due.map((d) => d.key)).toContain("100-hour");
    // 100-hour done at 1020.0 → due 1120.0; tach 1070 → 50.0 h left (14 CFR 91.409(b), arithmetic)
    expect(a2!.due.find((d) => d.key === "100-hour")).toMatchObject({ dueHours: 1120, hoursLeft: 50, overdue: false });
  });

  it("says 'Status unknown' with the reason when a rule cannot be computed, never flyable", () => {
    const broken = base.items.map((i) => (i.aircraftId === "a3" && i.key === "annual" ? { ...i, months: null } : i));
    const line = buildFlightLine({ ...base, items: broken }, TODAY, NOW, SOON);
    expect(line[2]!.status).toBe("unknown");
    expect(line[2]!.reasons[0]!.code).toBe("status-error");
    expect(line[2]!.reasons[0]!.text).toMatch(/Annual inspection: the rule has no number of months/);
  });

  it("says 'Status unknown' when the meter the inspections count has never been read", () => {
    const line = buildFlightLine({ ...base, aircraft: [plane("a1", { currentTach: null })] }, TODAY, NOW, SOON);
    expect(line[0]!.status).toBe("unknown");
    expect(line[0]!.reasons.map((r) => r.code)).toContain("hours-unknown");
  });

  it("counts the Hobbs when the aircraft's inspections go by Hobbs", () => {
    // oil change done at 1050 → due 1100; Hobbs 1200 is past it: overdue, a club rule that grounds
    const line = buildFlightLine({ ...base, aircraft: [plane("a1", { maintenanceMeter: "hobbs" })] }, TODAY, NOW, SOON);
    expect(line[0]!.status).toBe("grounded");
    expect(line[0]!.reasons[0]!.code).toBe("inspection-overdue");
  });

  it("grounds for an active notice and lists it", () => {
    const notice: FleetNoticeRecord = { id: "n1", aircraftId: "a1", category: "safety", reason: "Hail damage inspection", effectiveAt: "2026-05-15T12:00:00.000Z", liftedAt: null };
    const line = buildFlightLine({ ...base, notices: [notice] }, TODAY, NOW, SOON);
    expect(line[0]!.status).toBe("grounded");
    expect(line[0]!.notices).toEqual([{ id: "n1", category: "safety", reason: "Hail damage inspection", effectiveAt: "2026-05-15T12:00:00.000Z" }]);
  });
});

function due(key: string, over: Partial<DueSummary>): DueSummary {
  return { key, name: key, source: null, lastDoneOn: "2026-01-01", lastDoneHours: null, dueDate: null, daysLeft: null, dueHours: null, hoursLeft: null, overrunLimitHours: null, useLeftHours: null, overdue: false, incomplete: false, dueSoon: false, ifrOnly: false, ...over };
}

describe("sortDue and pickNextDue", () => {
  const list = sortDue([
    due("far-date", { dueDate: "2027-01-31", daysLeft: 261 }),
    due("near-hours", { dueHours: 1100, hoursLeft: 30 }),
    due("near-date", { dueDate: "2026-08-31", daysLeft: 108 }),
    due("overdue", { dueDate: "2026-04-30", daysLeft: -15, overdue: true }),
    due("unknown", { incomplete: true, lastDoneOn: null }),
    due("far-hours", { dueHours: 2000, hoursLeft: 930 }),
  ]);

  it("puts overdue first, then unknown, then the nearest dates", () => {
    expect(list.map((d) => d.key)).toEqual(["overdue", "unknown", "near-date", "far-date", "near-hours", "far-hours"]);
  });

  it("shows what needs attention, then the nearest by date and by hours in turn", () => {
    expect(pickNextDue(list).map((d) => d.key)).toEqual(["overdue", "unknown", "near-date"]);
    const calm = list.filter((d) => !d.overdue && !d.incomplete);
    expect(pickNextDue(calm).map((d) => d.key)).toEqual(["near-date", "far-date", "near-hours"]);
    expect(pickNextDue(calm, 2).map((d) => d.key)).toEqual(["near-date", "near-hours"]);
  });
});
