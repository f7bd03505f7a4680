import { describe, expect, it } from "vitest";
import { canMoveReport, moveNeedsNote, nextReportStatuses } from "@/lib/safety/report-states";

describe("safety report states", () => {
  it("moves forward one step or straight to closed, and can be reopened for review", () => {
    expect(nextReportStatuses("received")).toEqual(["reviewing", "closed"]);
    expect(canMoveReport("reviewing", "action_taken")).toBe(true);
    expect(canMoveReport("received", "action_taken")).toBe(false);
    expect(canMoveReport("closed", "reviewing")).toBe(true);
    expect(canMoveReport("closed", "received")).toBe(false);
    expect(canMoveReport("reviewing", "reviewing")).toBe(false);
  });

  it("needs a note when action is taken or the report is closed", () => {
    expect(moveNeedsNote("action_taken")).toBe(true);
    expect(moveNeedsNote("closed")).toBe(true);
    expect(moveNeedsNote("reviewing")).toBe(false);
  });
});
