import { describe, expect, it } from "vitest";
import { aircraftStatus, type Squawk } from "@/lib/airworthiness";
import { aircraft, changeItem, codes, currentItems, METER, TODAY, VFR_PRIVATE } from "./fixtures";

const squawk = (change: Partial<Squawk>): Squawk => ({
  description: "Left landing light inoperative",
  open: true,
  triage: "untriaged",
  ...change,
});
const withSquawks = (...squawks: Squawk[]) => aircraft(VFR_PRIVATE, { squawks });

describe("aircraftStatus: squawks", () => {
  it("grounds on an open grounding squawk and not on a closed one", () => {
    const open = aircraftStatus(
      withSquawks(squawk({ triage: "grounding", description: "Nose tire worn to cord" })),
      TODAY,
      METER,
    );
    expect(open).toEqual({
      status: "grounded",
      reasons: [{ code: "squawk-grounding", text: "Grounding squawk: Nose tire worn to cord", grounding: true }],
    });
    const closed = squawk({ triage: "grounding", open: false });
    expect(aircraftStatus(withSquawks(closed), TODAY, METER).status).toBe("flyable");
  });

  it("is flyable with limits for a deferred item placarded inoperative, naming the limitation", () => {
    const deferred = squawk({ triage: "deferred", placarded: true, limitation: "Day VFR only" });
    const result = aircraftStatus(withSquawks(deferred), TODAY, METER);
    expect(result.status).toBe("limited"); // 14 CFR 91.213(d)(3)(ii): deactivated and placarded "Inoperative"
    expect(result.reasons).toEqual([
      {
        code: "deferred-item",
        text: "Deferred, placarded inoperative (14 CFR 91.213(d)): Left landing light inoperative. Limitation: Day VFR only",
        grounding: false,
      },
    ]);
  });

  it("grounds a deferred item not confirmed deactivated and placarded", () => {
    // 14 CFR 91.213(d)(3): the deferral is lawful only once removed/deactivated and placarded
    const result = aircraftStatus(
      withSquawks(squawk({ triage: "deferred", limitation: "Day VFR only" })),
      TODAY,
      METER,
    );
    expect(result.status).toBe("grounded");
    expect(codes(result)).toEqual(["deferred-not-placarded"]);
  });

  it("never ignores an untriaged squawk", () => {
    const plain = aircraftStatus(withSquawks(squawk({})), TODAY, METER);
    expect(plain.status).toBe("unknown"); // our conservative choice: maintenance must look first
    expect(plain.reasons[0]?.text).toBe("Squawk awaiting triage by maintenance: Left landing light inoperative");
    const suspected = aircraftStatus(withSquawks(squawk({ suspectedGrounding: true })), TODAY, METER);
    expect(suspected.status).toBe("grounded"); // the reporter's word stands until triage
    expect(codes(suspected)).toEqual(["squawk-untriaged"]);
  });

  it("lists a note without changing the status", () => {
    const result = aircraftStatus(
      withSquawks(squawk({ triage: "note", description: "Cabin placard faded" })),
      TODAY,
      METER,
    );
    expect(result.status).toBe("flyable");
    expect(result.reasons).toEqual([
      { code: "squawk-note", text: "Open squawk (note): Cabin placard faded", grounding: false },
    ]);
  });
});

describe("aircraftStatus: grounding notices", () => {
  const notice = { reason: "Bird strike on the right wing", effectiveAt: "2026-05-15T14:00:00Z" };

  it("grounds while a notice is in effect and not lifted", () => {
    const active = aircraftStatus(
      aircraft(VFR_PRIVATE, { notices: [notice], now: "2026-05-15T14:00:00Z" }),
      TODAY,
      METER,
    );
    expect(active.status).toBe("grounded");
    expect(active.reasons).toEqual([
      {
        code: "notice-active",
        text: "Grounding notice in effect since Fri 15 May 2026, 14:00 UTC: Bird strike on the right wing", // no club zone given: UTC, said so
        grounding: true,
      },
    ]);
    const lifted = { ...notice, liftedAt: "2026-05-16T09:00:00Z" };
    expect(aircraftStatus(aircraft(VFR_PRIVATE, { notices: [lifted] }), "2026-05-16", METER).status).toBe("flyable");
  });

  it("announces a notice before it takes effect", () => {
    const early = aircraftStatus(
      aircraft(VFR_PRIVATE, { notices: [notice], now: "2026-05-15T13:59:00Z" }),
      TODAY,
      METER,
    );
    expect(early.status).toBe("flyable");
    expect(codes(early)).toEqual(["notice-pending"]);
  });

  it("writes the notice's time on the club's clock, never as a raw instant (ECMA-402 Intl.DateTimeFormat; CDT is UTC−5, from memory)", () => {
    const active = aircraftStatus(aircraft(VFR_PRIVATE, { notices: [notice], now: "2026-05-15T14:00:00Z", timeZone: "America/Chicago" }), TODAY, METER);
    expect(active.reasons[0]?.text).toBe("Grounding notice in effect since Fri 15 May 2026, 09:00: Bird strike on the right wing");
    const early = aircraftStatus(aircraft(VFR_PRIVATE, { notices: [notice], now: "2026-05-15T13:59:00Z", timeZone: "America/Chicago" }), TODAY, METER);
    expect(early.reasons[0]?.text).toBe("Grounding notice takes effect Fri 15 May 2026, 09:00: Bird strike on the right wing");
    expect(active.reasons[0]?.text).not.toMatch(/\d{4}-\d{2}-\d{2}T/);
  });

  it("counts a notice from the start of its date when no instant is given", () => {
    expect(aircraftStatus(aircraft(VFR_PRIVATE, { notices: [notice] }), TODAY, METER).status).toBe("grounded");
    expect(aircraftStatus(aircraft(VFR_PRIVATE, { notices: [notice] }), "2026-05-14", METER).status).toBe("flyable");
  });
});

describe("aircraftStatus: precedence grounded > unknown > limited > flyable", () => {
  const missingAnnual = changeItem(currentItems(VFR_PRIVATE), "annual", { completions: [] });
  const deferred = squawk({ triage: "deferred", placarded: true, limitation: "Day VFR only" });

  it("puts a grounding above missing data, and lists it first", () => {
    const input = aircraft(VFR_PRIVATE, { items: missingAnnual, squawks: [deferred, squawk({ triage: "grounding" })] });
    const result = aircraftStatus(input, TODAY, METER);
    expect(result.status).toBe("grounded");
    expect(codes(result)).toEqual(["squawk-grounding", "no-completion", "deferred-item"]);
    expect(result.reasons.map((r) => r.grounding)).toEqual([true, false, false]);
  });

  it("puts missing data above a limitation", () => {
    const result = aircraftStatus(aircraft(VFR_PRIVATE, { items: missingAnnual, squawks: [deferred] }), TODAY, METER);
    expect(result.status).toBe("unknown");
  });

  it("returns reasons with only code, text and grounding", () => {
    const result = aircraftStatus(aircraft(VFR_PRIVATE, { squawks: [deferred] }), TODAY, METER);
    expect(Object.keys(result.reasons[0] ?? {}).sort()).toEqual(["code", "grounding", "text"]);
  });

  it("refuses a 'today' that is not a calendar date", () => {
    expect(() => aircraftStatus(aircraft(VFR_PRIVATE), "2026-02-30", METER)).toThrow(RangeError);
  });
});
