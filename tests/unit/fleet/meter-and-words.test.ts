import { describe, expect, it } from "vitest";
import { toCompletion } from "@/lib/fleet/status-input";
import { toldText } from "@/lib/fleet/squawk-words";

describe("toCompletion: a completion as the rules read it after a meter switch", () => {
  const row = { id: "c1", itemId: "i1", doneOn: "2026-03-02", hours: 1020, expiresOn: null, meter: "tach" as const };

  it("keeps the completion's own reading and meter when no conversion applies", () => {
    // common practice: the reading stays on the meter it was taken on
    expect(toCompletion(row, "tach")).toEqual({ id: "c1", date: "2026-03-02", hours: 1020, expiresOn: null, meter: "tach" });
    expect(toCompletion(row, "hobbs")).toMatchObject({ hours: 1020, meter: "tach" });
  });

  it("uses maintenance's reading on the meter counted now, the latest one winning", () => {
    // common practice: maintenance's logbook reading on the new meter stands for the completion
    const conversions = [
      { completionId: "c1", toMeter: "hobbs" as const, toReading: 1190 },
      { completionId: "c1", toMeter: "hobbs" as const, toReading: 1188.5 },
      { completionId: "other", toMeter: "hobbs" as const, toReading: 5 },
    ];
    expect(toCompletion(row, "hobbs", conversions)).toMatchObject({ hours: 1188.5, meter: "hobbs", date: "2026-03-02" });
    // a conversion to a meter not counted now is not used
    expect(toCompletion(row, "tach", conversions)).toMatchObject({ hours: 1020, meter: "tach" });
  });
});

describe("toldText: the squawk confirmation says only who was e-mailed", () => {
  it("names who was told, or nothing when nobody was", () => {
    expect(toldText(0, 0)).toBeNull(); // common practice: say nothing that did not happen
    expect(toldText(1, 0)).toBe("maintenance (1 person) was e-mailed");
    expect(toldText(2, 1)).toBe("maintenance (2 people) and 1 member holding a booking on it were e-mailed");
    expect(toldText(0, 3)).toBe("3 members holding bookings on it were e-mailed");
    expect(toldText(Number.NaN, -1)).toBeNull(); // nonsense counts claim nothing
  });
});
