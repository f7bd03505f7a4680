// Sources: a closed (reconciled, locked) period is not reopened; items arriving late are booked
// in the first open period with a note of their original date — standard accounting practice.
import { describe, expect, it } from "vitest";
import { firstOpenDay, lockedPeriodNote } from "@/lib/money/open-period";

describe("firstOpenDay", () => {
  it("keeps a date after the lock, or when nothing is locked", () => {
    expect(firstOpenDay("2026-04-01", "2026-03-31")).toEqual({ postOn: "2026-04-01", originalDate: "2026-04-01", moved: false }); // common practice (standard accounting practice: a closed period stays closed; late items post in the first open one)
    expect(firstOpenDay("2026-03-15", null)).toEqual({ postOn: "2026-03-15", originalDate: "2026-03-15", moved: false }); // common practice (standard accounting practice: a closed period stays closed; late items post in the first open one)
    expect(lockedPeriodNote(firstOpenDay("2026-04-01", "2026-03-31"))).toBe(""); // common practice (standard accounting practice: a closed period stays closed; late items post in the first open one)
  });

  it("moves a date inside the lock (the last locked day included) to the day after it", () => {
    expect(firstOpenDay("2026-03-31", "2026-03-31")).toEqual({ postOn: "2026-04-01", originalDate: "2026-03-31", moved: true }); // common practice (standard accounting practice: a closed period stays closed; late items post in the first open one)
    // Across a year end: 2025-12-31 locked → first open day 2026-01-01 (calendar arithmetic)
    expect(firstOpenDay("2025-11-02", "2025-12-31").postOn).toBe("2026-01-01"); // common practice (standard accounting practice: a closed period stays closed; late items post in the first open one)
    expect(lockedPeriodNote(firstOpenDay("2026-03-02", "2026-03-31"))).toBe(" (dated 2026-03-02, in a locked period; posted on the first open day 2026-04-01)"); // common practice (standard accounting practice: a closed period stays closed; late items post in the first open one)
  });
});
