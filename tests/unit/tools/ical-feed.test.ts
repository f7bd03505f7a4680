import ICAL from "ical.js";
import { describe, expect, it } from "vitest";
import { buildBookingFeed } from "@/lib/bookings/ical-feed";

const booking = {
  id: "b-1", startsAt: new Date("2026-05-04T14:00:00Z"), endsAt: new Date("2026-05-04T16:00:00Z"), updatedAt: new Date("2026-05-01T10:00:00Z"), createdAt: new Date("2026-05-01T09:00:00Z"),
  status: "reserved" as const, registration: "N0123X", aircraftName: "Fernwhistle F160", homeField: "Reedwater Field (REEDWATER)", role: "member" as const, otherPerson: "I. Instructor", purpose: "Pattern work", url: "http://app.test/b-1",
};

// RFC 5545: VCALENDAR with PRODID and VERSION 2.0; one VEVENT per booking with UID, DTSTAMP,
// DTSTART and DTEND (here UTC "Z" times). Parsed back with ical.js, an independent parser.
describe("buildBookingFeed", () => {
  it("writes a calendar ical.js reads back, one event per booking", () => {
    const text = buildBookingFeed({ clubName: "Reedwater Flying Society", personName: "Rowan", domain: "app.test", bookings: [booking, { ...booking, id: "b-2", role: "instructor", otherPerson: "S. Student" }] });
    expect(text).toMatch(/^BEGIN:VCALENDAR\r\n/);
    expect(text).toContain("VERSION:2.0");
    const cal = new ICAL.Component(ICAL.parse(text));
    const events = cal.getAllSubcomponents("vevent").map((v) => new ICAL.Event(v));
    expect(events.map((e) => e.uid)).toEqual(["b-1@app.test", "b-2@app.test"]);
    expect(events[0]!.startDate.toJSDate().toISOString()).toBe("2026-05-04T14:00:00.000Z");
    expect(events[0]!.endDate.toJSDate().toISOString()).toBe("2026-05-04T16:00:00.000Z");
    expect(events[0]!.summary).toBe("N0123X Fernwhistle F160 with I. Instructor");
    expect(events[1]!.summary).toBe("N0123X Fernwhistle F160 with S. Student (instructing)");
    expect(events[0]!.location).toBe("Reedwater Field (REEDWATER)");
    expect(String(cal.getAllSubcomponents("vevent")[0]!.getFirstPropertyValue("status"))).toBe("CONFIRMED");
  });
  it("an empty feed is still a valid calendar", () => {
    const cal = new ICAL.Component(ICAL.parse(buildBookingFeed({ clubName: "C", personName: "P", domain: "app.test", bookings: [] })));
    expect(cal.getAllSubcomponents("vevent")).toHaveLength(0);
    expect(cal.getFirstPropertyValue("version")).toBe("2.0");
  });
});
