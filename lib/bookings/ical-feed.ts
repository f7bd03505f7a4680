// A member's bookings as an iCalendar feed (RFC 5545), written by ical-generator. Times are
// UTC instants (DTSTART/DTEND with "Z"), so no time-zone data is needed for calendars to show
// them right. The UID is the booking's id, stable across fetches, so a change updates the
// event instead of adding one (RFC 5545 §3.8.4.7).

import ical, { ICalEventStatus } from "ical-generator";

export type FeedBooking = {
  id: string;
  startsAt: Date;
  endsAt: Date;
  updatedAt: Date;
  createdAt: Date;
  status: "reserved" | "dispatched" | "checked_in" | "cancelled";
  registration: string;
  aircraftName: string;
  homeField: string | null;
  role: "member" | "instructor";
  otherPerson: string | null;
  purpose: string | null;
  url: string;
};

export function buildBookingFeed(input: { clubName: string; personName: string; domain: string; bookings: FeedBooking[] }): string {
  const calendar = ical({
    name: `${input.clubName} bookings — ${input.personName}`,
    prodId: { company: "Hangarline", product: "bookings", language: "EN" },
    ttl: 15 * 60,
  });
  for (const b of input.bookings) {
    const who = b.otherPerson ? (b.role === "instructor" ? ` with ${b.otherPerson} (instructing)` : ` with ${b.otherPerson}`) : "";
    calendar.createEvent({
      id: `${b.id}@${input.domain}`,
      start: b.startsAt,
      end: b.endsAt,
      stamp: b.updatedAt,
      created: b.createdAt,
      lastModified: b.updatedAt,
      summary: `${b.registration} ${b.aircraftName}${who}`,
      description: [b.purpose, `Booking in ${input.clubName}. Preflight the aircraft and check its status before flight.`, b.url].filter(Boolean).join("\n"),
      location: b.homeField,
      url: b.url,
      status: b.status === "cancelled" ? ICalEventStatus.CANCELLED : ICalEventStatus.CONFIRMED,
    });
  }
  return calendar.toString();
}
