import { describe, expect, it } from "vitest";
import { aircraftStatus, type InspectionItem } from "@/lib/airworthiness";
import { aircraft, changeItem, codes, currentItems, IFR_TRAINER, METER, TODAY, VFR_PRIVATE } from "./fixtures";

const annualOnly = (completions: InspectionItem["completions"]): InspectionItem[] =>
  changeItem(currentItems(VFR_PRIVATE), "annual", { completions }).filter((i) => i.key === "annual");

describe("aircraftStatus: inspections", () => {
  it("is flyable with no reasons when everything is current", () => {
    expect(aircraftStatus(aircraft(VFR_PRIVATE), TODAY, METER)).toEqual({ status: "flyable", reasons: [] });
    expect(aircraftStatus(aircraft(IFR_TRAINER), TODAY, METER)).toEqual({ status: "flyable", reasons: [] });
  });

  it("keeps the annual good through the last day of the month and grounds the day after", () => {
    // 14 CFR 91.409(a): signed 2025-06-06, good through 2026-06-30 (M, from the rule)
    expect(aircraftStatus(aircraft(VFR_PRIVATE), "2026-06-30", METER).status).toBe("flyable");
    const after = aircraftStatus(aircraft(VFR_PRIVATE), "2026-07-01", METER);
    expect(after.status).toBe("grounded");
    expect(after.reasons[0]).toEqual({
      code: "inspection-overdue",
      text: "Annual inspection overdue since 2026-06-30 (14 CFR 91.409(a))",
      grounding: true,
    });
  });

  it("runs a leap-year annual to 29 February", () => {
    const input = { flags: VFR_PRIVATE, items: annualOnly([{ date: "2023-02-15" }]) };
    expect(aircraftStatus(input, "2024-02-29", METER).status).toBe("flyable"); // 14 CFR 91.409(a), Gregorian leap year
    expect(aircraftStatus(input, "2024-03-01", METER).status).toBe("grounded"); // 14 CFR 91.409(a)
  });

  it("rolls a December annual over into next December", () => {
    const input = { flags: VFR_PRIVATE, items: annualOnly([{ date: "2025-12-05" }]) };
    expect(aircraftStatus(input, "2026-12-31", METER).status).toBe("flyable"); // 14 CFR 91.409(a)
    expect(aircraftStatus(input, "2027-01-01", METER).status).toBe("grounded"); // 14 CFR 91.409(a)
  });

  it("says 'unknown' when a required item has no completion on record", () => {
    const result = aircraftStatus({ flags: VFR_PRIVATE, items: annualOnly([]) }, TODAY, METER);
    expect(result.status).toBe("unknown");
    expect(result.reasons).toEqual([
      {
        code: "no-completion",
        text: "Annual inspection: missing record: its last completion (14 CFR 91.409(a))",
        grounding: false,
      },
    ]);
  });

  it("says 'unknown' when the meter is not known and an hours item applies", () => {
    const withNaN = aircraftStatus(aircraft(VFR_PRIVATE), TODAY, Number.NaN); // oil change is hours-based
    expect(withNaN.status).toBe("unknown");
    expect(codes(withNaN)).toEqual(["hours-unknown"]);
    expect(aircraftStatus(aircraft(IFR_TRAINER), TODAY, null).status).toBe("unknown"); // 100-hour, 91.409(b)
    // Without hours-based items the meter does not matter
    expect(
      aircraftStatus({ flags: VFR_PRIVATE, items: annualOnly([{ date: "2025-06-06" }]) }, TODAY, Number.NaN).status,
    ).toBe("flyable");
  });

  it("treats an unrecorded meter reading at the last completion as missing data", () => {
    const items = changeItem(currentItems(VFR_PRIVATE), "oil-change", { completions: [{ date: "2026-04-01" }] });
    const result = aircraftStatus({ flags: VFR_PRIVATE, items }, TODAY, METER);
    expect(result.status).toBe("unknown");
    expect(result.reasons[0]?.text).toBe("Oil change: missing record: the meter reading at its last completion (club rule)");
  });
});

describe("aircraftStatus: the 100-hour", () => {
  // Only the annual and the 100-hour, so that the meter can run past the oil change.
  const hourItems = (items: InspectionItem[]) => items.filter((i) => i.key === "annual" || i.key === "100-hour");
  const trainer = (completions: InspectionItem["completions"]) =>
    aircraft(IFR_TRAINER, { items: hourItems(changeItem(currentItems(IFR_TRAINER), "100-hour", { completions })) });

  it("grounds inside the overrun: the 10 hours are only for reaching a place to do it", () => {
    const result = aircraftStatus(trainer([{ date: "2026-03-02", hours: 1020 }]), TODAY, 1125);
    expect(result.status).toBe("grounded"); // 14 CFR 91.409(b): due 1120.0, allowance to 1130.0 for the ferry only
    expect(result.reasons[0]?.text).toBe(
      "100-hour inspection overdue: due at 1120.0 h, meter now 1125.0 h; grounded — only a ferry flight of up to " +
        "5.0 h (to 1130.0 h) to reach the inspection (14 CFR 91.409(b))",
    );
    const beyond = aircraftStatus(trainer([{ date: "2026-03-02", hours: 1020 }]), TODAY, 1131.2);
    expect(beyond.reasons[0]?.text).toContain("beyond the overrun allowance of 1130.0 h"); // 14 CFR 91.409(b)
  });

  it("is not due at exactly its due point", () => {
    // 14 CFR 91.409(b): "within the preceding 100 hours"; 0.0 h left is a due-soon reason
    const result = aircraftStatus(trainer([{ date: "2026-03-02", hours: 1020 }]), TODAY, 1120);
    expect(result.status).toBe("flyable");
    expect(result.reasons).toEqual([
      {
        code: "due-soon",
        text: "100-hour inspection due at 1120.0 h (0.0 h left) (14 CFR 91.409(b))",
        grounding: false,
      },
    ]);
  });

  it("carries the overrun forward and starts an early one from when it was done", () => {
    const late = trainer([
      { date: "2026-01-10", hours: 1000 },
      { date: "2026-03-02", hours: 1106 },
    ]);
    expect(aircraftStatus(late, TODAY, 1200).status).toBe("flyable"); // 14 CFR 91.409(b): next due 1200.0
    expect(aircraftStatus(late, TODAY, 1200.1).status).toBe("grounded"); // 14 CFR 91.409(b): not 1206.0
    const early = trainer([
      { date: "2026-01-10", hours: 1000 },
      { date: "2026-03-02", hours: 1090 },
    ]);
    expect(aircraftStatus(early, TODAY, 1190.1).status).toBe("grounded"); // 14 CFR 91.409(b): next due 1190.0
  });

  it("counts an annual done since the last 100-hour", () => {
    // 14 CFR 91.409(b): 100-hour due 1120.0; an annual at 1110.0 moves it to 1210.0
    const items = changeItem(currentItems(IFR_TRAINER), "annual", {
      completions: [{ date: "2026-05-01", hours: 1110 }],
    });
    expect(aircraftStatus(aircraft(IFR_TRAINER, { items: hourItems(items) }), TODAY, 1150).status).toBe("flyable");
    expect(aircraftStatus(aircraft(IFR_TRAINER, { items: hourItems(items) }), TODAY, 1210.1).status).toBe("grounded");
  });

  it("does not apply to a private aircraft even if the item is on record", () => {
    const items = hourItems(
      changeItem(currentItems(IFR_TRAINER), "100-hour", { completions: [{ date: "2025-11-01", hours: 900 }] }),
    );
    // 14 CFR 91.409(b): due at 1000.0; binding only for hire or instruction
    expect(aircraftStatus({ flags: IFR_TRAINER, items }, TODAY, METER).status).toBe("grounded");
    expect(aircraftStatus({ flags: { ifrEquipped: true }, items }, TODAY, METER).status).toBe("flyable");
  });
});

describe("aircraftStatus: ELT battery", () => {
  const battery = (change: Partial<InspectionItem>) =>
    aircraft(VFR_PRIVATE, { items: changeItem(currentItems(VFR_PRIVATE), "elt-battery", change) });

  it("grounds after the 50 % useful-life date", () => {
    const item = battery({ completions: [{ date: "2023-05-01", expiresOn: "2026-05-14" }] });
    const result = aircraftStatus(item, TODAY, METER);
    expect(result.status).toBe("grounded"); // 14 CFR 91.207(c)
    expect(result.reasons[0]?.text).toBe("ELT battery overdue since 2026-05-14 (14 CFR 91.207(c))");
    expect(aircraftStatus(item, "2026-05-14", METER).status).toBe("flyable"); // 14 CFR 91.207(c), last day
  });

  it("grounds after more than 1 cumulative hour of use, not at exactly 1 hour", () => {
    const used = aircraftStatus(battery({ usage: { limitHours: 1, usedHours: 1.2 } }), TODAY, METER);
    expect(used.status).toBe("grounded"); // 14 CFR 91.207(c): "more than 1 cumulative hour"
    expect(used.reasons[0]?.text).toBe(
      "ELT battery overdue: 1.2 h of cumulative use, more than 1.0 h (14 CFR 91.207(c))",
    );
    expect(aircraftStatus(battery({ usage: { limitHours: 1, usedHours: 1 } }), TODAY, METER).status).toBe("flyable"); // 91.207(c)
  });

  it("says 'unknown' without an expiry date or a use record", () => {
    const noDate = battery({ completions: [{ date: "2024-09-01" }] });
    expect(codes(aircraftStatus(noDate, TODAY, METER))).toEqual(["expiry-unknown"]); // 14 CFR 91.207(c)
    const noUse = battery({ usage: { limitHours: 1, usedHours: null } });
    expect(aircraftStatus(noUse, TODAY, METER).status).toBe("unknown"); // 14 CFR 91.207(c)
  });
});

describe("aircraftStatus: IFR-only tests", () => {
  const stale = (flags: typeof VFR_PRIVATE) =>
    aircraft(flags, {
      items: changeItem(currentItems(IFR_TRAINER), "altimeter-static", { completions: [{ date: "2024-03-20" }] }),
    });

  it("leave a VFR aircraft flyable", () => {
    // 14 CFR 91.411(a): only for IFR in controlled airspace; due 2026-03-31
    expect(aircraftStatus(stale(VFR_PRIVATE), TODAY, METER)).toEqual({ status: "flyable", reasons: [] });
    const neverChecked = changeItem(currentItems(IFR_TRAINER), "vor-check", { completions: [] });
    expect(aircraftStatus({ flags: VFR_PRIVATE, items: neverChecked }, TODAY, METER).status).toBe("flyable"); // 91.171(a)
  });

  it("make an IFR aircraft flyable with limits, saying IFR is not allowed", () => {
    const result = aircraftStatus(stale(IFR_TRAINER), TODAY, METER);
    expect(result.status).toBe("limited"); // 14 CFR 91.411(a): 24 calendar months from 2024-03 → 2026-03-31
    expect(result.reasons).toEqual([
      {
        code: "ifr-test-overdue",
        text: "Altimeter and static system test overdue since 2026-03-31 (14 CFR 91.411(a)): no IFR flight until it is done",
        grounding: false,
      },
    ]);
  });

  it("say 'unknown' on an IFR aircraft when never recorded, like any required item", () => {
    const items = changeItem(currentItems(IFR_TRAINER), "vor-check", { completions: [] });
    const result = aircraftStatus(aircraft(IFR_TRAINER, { items }), TODAY, METER);
    expect(result.status).toBe("unknown"); // 14 CFR 91.171(a) applies; no record to decide from
    expect(result.reasons[0]?.text).toBe("VOR check: missing record: its last completion (14 CFR 91.171(a))");
  });

  it("counts the VOR check in days", () => {
    const items = changeItem(currentItems(IFR_TRAINER), "vor-check", { completions: [{ date: "2026-04-10" }] });
    const input = aircraft(IFR_TRAINER, { items });
    expect(aircraftStatus(input, "2026-05-09", METER).status).toBe("flyable"); // 14 CFR 91.171(a)(2): day 30, the check day being day 1
    expect(aircraftStatus(input, "2026-05-10", METER).status).toBe("limited"); // 14 CFR 91.171(a)(2): day 31
  });
});

describe("aircraftStatus: due soon and other items", () => {
  it("makes due soon a reason, never a status", () => {
    const result = aircraftStatus(aircraft(VFR_PRIVATE), "2026-06-20", 1097);
    expect(result.status).toBe("flyable");
    expect(result.reasons).toEqual([
      {
        code: "due-soon",
        text: "Annual inspection due by 2026-06-30 (10 days left) (14 CFR 91.409(a))",
        grounding: false,
      },
      { code: "due-soon", text: "Oil change due at 1100.0 h (3.0 h left) (club rule)", grounding: false },
    ]);
  });

  it("uses the club's thresholds", () => {
    const wide = aircraft(VFR_PRIVATE, { dueSoon: { days: 60, hours: 40 } });
    expect(codes(aircraftStatus(wide, TODAY, METER))).toEqual(["due-soon", "due-soon"]); // annual 46 d, oil 30 h
  });

  it("grounds on whichever of the months or the hours comes first", () => {
    // Oil change every 50 h or 4 calendar months (common practice): due 2026-08-31 or 1100.0
    expect(aircraftStatus(aircraft(VFR_PRIVATE), TODAY, 1100.3).status).toBe("grounded");
    expect(aircraftStatus(aircraft(VFR_PRIVATE), "2026-09-01", METER).status).toBe("grounded");
  });

  it("only advises about an overdue item that is not required", () => {
    const items = changeItem(currentItems(VFR_PRIVATE), "oil-change", { required: false });
    const result = aircraftStatus({ flags: VFR_PRIVATE, items }, TODAY, 1101);
    expect(result.status).toBe("flyable");
    expect(codes(result)).toEqual(["item-overdue"]);
  });
});
