import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { AircraftSchedule, type ScheduleAircraft } from "@/components/bookings/aircraft-schedule";
import { scheduleStatusNote } from "@/lib/bookings/status-note";

// Our own product rule, not a computation: a grounded aircraft offers no "Book" link and says why;
// an unknown status keeps its links beside the missing record and the airworthiness caution.
const day = { start: Date.parse("2026-06-10T05:00:00Z"), end: Date.parse("2026-06-11T05:00:00Z") };
const window = { start: Date.parse("2026-06-10T12:00:00Z"), end: Date.parse("2026-06-11T02:00:00Z") };

function render(plane: ScheduleAircraft): string {
  return renderToStaticMarkup(createElement(AircraftSchedule, {
    slug: "demo", timeZone: "America/Chicago", days: [{ date: "2026-06-10", day, window, note: "Flying day 07:00–21:00" }],
    aircraft: [plane], bookings: [], blocks: [], nights: [], now: Date.parse("2026-06-01T00:00:00Z"), canBook: true,
  }));
}

describe("the booking page's aircraft card", () => {
  it("grounded: no Book link, the status word and reason where the links were", () => {
    const reasons = [{ code: "squawk-grounding", text: "Grounding squawk: Brake fades", grounding: true }];
    const html = render({ id: "a1", registration: "N0999X", name: "Test Plane", status: "grounded", note: scheduleStatusNote("grounded", reasons) });
    expect(html).not.toMatch(/>Book\b/);
    expect(html).not.toContain("/bookings/new");
    expect(html).toContain("Grounded — no booking");
    expect(html).toContain("Grounding squawk: Brake fades. Booking opens when maintenance returns it to service.");
    expect(html).toContain('data-status-note="grounded"');
  });

  it("unknown: the Book links stay, with the missing record named and the caution beside them", () => {
    const reasons = [{ code: "no-completion", text: "Annual inspection: missing record: its last completion", grounding: false }];
    const html = render({ id: "a2", registration: "N0998X", name: "Test Plane", status: "unknown", note: scheduleStatusNote("unknown", reasons) });
    expect(html).toContain("/bookings/new?aircraft=a2");
    expect(html).toMatch(/>Book<\/a>/);
    expect(html).toContain("Annual inspection: missing record: its last completion");
    expect(html).toContain('aria-label="Airworthiness caution"');
    expect(html).toContain("Status unknown");
  });

  it("flyable: the links, no note", () => {
    const html = render({ id: "a3", registration: "N0997X", name: "Test Plane", status: "flyable", note: null });
    expect(html).toMatch(/>Book<\/a>/);
    expect(html).not.toContain("data-status-note");
  });
});
