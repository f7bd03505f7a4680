import { describe, expect, it } from "vitest";
import { acknowledgementStats, deadlineState } from "@/lib/safety/acknowledgements";

const audience = [
  { userId: "u1", name: "Zed", email: "z@example.test" },
  { userId: "u2", name: "Amy", email: "a@example.test" },
  { userId: "u3", name: null, email: "m@example.test" },
];

describe("acknowledgementStats", () => {
  it("counts only the audience, puts outstanding people first, and rounds the share down", () => {
    const acks = [
      { userId: "u1", acknowledgedAt: new Date("2026-01-02T10:00:00Z") },
      { userId: "gone", acknowledgedAt: new Date("2026-01-02T11:00:00Z") }, // left the audience: not counted
    ];
    const s = acknowledgementStats(audience, acks);
    expect(s).toMatchObject({ audience: 3, acknowledged: 1, outstanding: 2, percent: 33 }); // 1/3 = 33.3 % → 33 (own arithmetic)
    expect(s.rows.map((r) => r.userId)).toEqual(["u2", "u3", "u1"]); // Amy, then e-mail m@ (no name), then the acknowledged Zed
    expect(s.rows[2]!.acknowledgedAt?.toISOString()).toBe("2026-01-02T10:00:00.000Z");
  });

  it("never shows 100 % before everyone has acknowledged", () => {
    const many = Array.from({ length: 300 }, (_, i) => ({ userId: `p${i}`, name: `P${i}`, email: `p${i}@example.test` }));
    const acks = many.slice(0, 299).map((p) => ({ userId: p.userId, acknowledgedAt: new Date() }));
    expect(acknowledgementStats(many, acks).percent).toBe(99); // 299/300 = 99.67 % → 99 (own arithmetic)
    expect(acknowledgementStats([], []).percent).toBe(0);
  });
});

describe("deadlineState — on the club's calendar date", () => {
  it("is open before, due on the day and overdue after", () => {
    expect(deadlineState(null, "2026-03-01")).toBe("none");
    expect(deadlineState("2026-03-10", "2026-03-09")).toBe("open");
    expect(deadlineState("2026-03-10", "2026-03-10")).toBe("due_today");
    expect(deadlineState("2026-03-10", "2026-03-11")).toBe("overdue");
  });
});
