import { describe, expect, it } from "vitest";
import { scheduleStatusNote } from "@/lib/bookings/status-note";

// Our own product rule, not a computation from a published source: a grounded aircraft offers no
// "Book" link and says why; an unknown status keeps its links but names the missing record and
// never reads as flyable.

describe("the booking page's note beside an aircraft", () => {
  it("grounded: not bookable, the status word and every grounding reason, not the others", () => {
    const note = scheduleStatusNote("grounded", [
      { code: "squawk-grounding", text: "Grounding squawk: Right brake fades", grounding: true },
      { code: "notice-active", text: "Grounding notice in effect since 1 June 09:00: bird strike.", grounding: true },
      { code: "squawk-note", text: "Open squawk (note): intercom crackles", grounding: false },
    ]);
    expect(note).toEqual({
      status: "grounded",
      bookable: false,
      reasons: ["Grounding squawk: Right brake fades", "Grounding notice in effect since 1 June 09:00: bird strike."],
      text: "Grounded — Grounding squawk: Right brake fades; Grounding notice in effect since 1 June 09:00: bird strike. Booking opens when maintenance returns it to service.",
    });
  });

  it("grounded without a reason given still stops booking and says that no reason came with it", () => {
    const note = scheduleStatusNote("grounded", []);
    expect(note?.bookable).toBe(false);
    expect(note?.text).toBe("Grounded — no grounding reason was given with the status. Booking opens when maintenance returns it to service.");
  });

  it("unknown: still bookable (the guards decide), naming the missing record and no advisory", () => {
    const note = scheduleStatusNote("unknown", [
      { code: "no-completion", text: "Annual inspection: missing record: its last completion (14 CFR 91.409(a))", grounding: false },
      { code: "due-soon", text: "Oil change due in 3 days", grounding: false },
    ]);
    expect(note).toMatchObject({ status: "unknown", bookable: true, reasons: ["Annual inspection: missing record: its last completion (14 CFR 91.409(a))"] });
    expect(note?.text).toBe("Status unknown — Annual inspection: missing record: its last completion (14 CFR 91.409(a)). Until it is recorded, check the aircraft's records with maintenance before you fly.");
  });

  it("unknown with no reason it can name says a record is missing rather than nothing", () => {
    expect(scheduleStatusNote("unknown", [])?.text).toMatch(/^Status unknown — missing record: /);
  });

  it("flyable and flyable with limits add nothing", () => {
    expect(scheduleStatusNote("flyable", [])).toBeNull();
    expect(scheduleStatusNote("limited", [{ code: "squawk-deferred", text: "No night flight", grounding: false }])).toBeNull();
  });
});
