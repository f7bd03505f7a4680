import { describe, expect, it } from "vitest";
import { dueEffect, dueMargin, dueState, groupForDueView, remainingWords } from "@/lib/fleet/due-words";
import type { DueSummary } from "@/lib/fleet/types";

function due(over: Partial<DueSummary>): DueSummary {
  return {
    key: "k", name: "Item", source: null, lastDoneOn: null, lastDoneHours: null, dueDate: null, daysLeft: null,
    dueHours: null, hoursLeft: null, overrunLimitHours: null, useLeftHours: null, overdue: false, incomplete: false,
    dueSoon: false, ifrOnly: false, required: true, ...over,
  };
}

// A 100-hour done at 1000.0 h on 2026-01-01, due at 1100.0 h, and a 12-month annual; "whichever
// comes first" is how a time-or-calendar item is read (14 CFR 91.409(a) and (b); common practice).
const HUNDRED = due({ name: "100-hour inspection", lastDoneOn: "2026-01-01", lastDoneHours: 1000, dueHours: 1100, hoursLeft: 12.4 });
const BOTH = due({ name: "Oil change", lastDoneOn: "2026-11-01", lastDoneHours: 3500, dueDate: "2027-01-01", daysLeft: 23, dueHours: 3550, hoursLeft: 12.4 });

describe("due items in words", () => {
  it("states what remains, and 'whichever comes first' when both limits count (common practice)", () => {
    expect(remainingWords(BOTH)).toBe("12.4 hours or 23 days left, whichever comes first");
    expect(remainingWords(HUNDRED)).toBe("12.4 hours left");
    expect(remainingWords(due({ dueDate: "2027-01-01", daysLeft: 1, lastDoneOn: "2026-01-01" }))).toBe("1 day left");
    expect(remainingWords(due({ dueDate: "2027-01-01", daysLeft: 0, lastDoneOn: "2026-01-01" }))).toBe("Due today");
  });

  it("says how far past due an overdue item is, in one word: overdue (our wording rule)", () => {
    expect(remainingWords(due({ overdue: true, daysLeft: -4, dueDate: "2026-11-28" }))).toBe("Overdue by 4 days");
    expect(remainingWords(due({ overdue: true, hoursLeft: -2.1, dueHours: 1100, daysLeft: -3, dueDate: "2026-11-29" }))).toBe("Overdue by 2.1 hours and by 3 days");
  });

  it("names the missing record when the state cannot be computed, never counts it as in hand (our product rule)", () => {
    const never = due({ incomplete: true });
    expect(dueState(never)).toBe("unknown");
    expect(remainingWords(never)).toBe("Status unknown — missing record: its last completion");
    expect(dueMargin(never)).toBeNull();
  });

  it("measures the margin by whichever limit is nearer, 0 when overdue (common practice)", () => {
    // 12.4 of 100 h left; 23 of 61 days left (2026-11-01 → 2027-01-01): hours are nearer.
    expect(dueMargin(HUNDRED)).toBeCloseTo(0.124, 3);
    expect(dueMargin(BOTH)).toBeCloseTo(12.4 / 50, 3);
    expect(dueMargin(due({ overdue: true, daysLeft: -1 }))).toBe(0);
  });

  it("groups by what the item does when due: grounds, stops IFR, reminds; an item of unknown kind grounds (our product rule)", () => {
    expect(dueEffect({ required: true, ifrOnly: false })).toBe("grounds");
    expect(dueEffect({ required: true, ifrOnly: true })).toBe("limits");
    expect(dueEffect({ required: false, ifrOnly: false })).toBe("reminds");
    expect(dueEffect({ required: undefined, ifrOnly: false })).toBe("grounds");
    const groups = groupForDueView([
      due({ key: "a", required: false }),
      due({ key: "b", hoursLeft: 50, dueHours: 1100, lastDoneHours: 1000 }),
      due({ key: "c", overdue: true, daysLeft: -2 }),
      due({ key: "d", ifrOnly: true }),
    ]);
    expect(groups.map((g) => [g.effect, g.items.map((d) => d.key)])).toEqual([["grounds", ["c", "b"]], ["limits", ["d"]], ["reminds", ["a"]]]);
  });
});
