import { StatusBadge } from "@/components/ui/status-badge";
import type { AircraftStatus } from "@/lib/airworthiness";
import { hourMarks, layoutDay, type DayBounds } from "@/lib/bookings/grid";
import { BOOKING_STATUS_MARK, BOOKING_STATUS_WORDS, clockTime, dayHeading } from "./booking-words";
import type { BookingStatus } from "@/db/schema";

// The fleet sheet: one card per day; in it each aircraft is a row with a 24-hour track on
// which its bookings sit as blocks, and below the tracks the same bookings as a plain list,
// which is what a phone reader (and a screen reader) follows. Plain anchors, not next/link: a
// busy week has well over a thousand blocks, and prefetching each would cost more than it saves.

export type SheetBooking = { id: string; aircraftId: string; startsAt: number; endsAt: number; status: BookingStatus; registration: string; who: string; mine: boolean };
export type SheetAircraft = { id: string; registration: string };

export function FleetDays({ days, aircraft, bookings, slug, timeZone }: { days: DayBounds[]; aircraft: SheetAircraft[]; bookings: SheetBooking[]; slug: string; timeZone: string }) {
  const base = `/clubs/${slug}/bookings`;
  // Each booking's clock times once, however many days and places show it.
  const times = new Map(bookings.map((b) => [b.id, `${clockTime(b.startsAt, timeZone)}–${clockTime(b.endsAt, timeZone)}`]));
  return (
    <div className="grid gap-4 xl:grid-cols-2">
      {days.map((day) => {
        const layout = layoutDay(bookings, day);
        const marks = hourMarks(day, timeZone);
        const todays = bookings.filter((b) => b.endsAt > day.start && b.startsAt < day.end).sort((a, b) => a.startsAt - b.startsAt);
        const headingId = `day-${day.date}`;
        // The hour lines are the track's background, one gradient stop per mark: a busy week
        // has hundreds of tracks, and an element per line would dominate the page.
        const trackStyle = {
          backgroundImage: marks
            .filter((m) => m.left > 0)
            .map((m) => `linear-gradient(to right, transparent calc(${m.left}% - 0.5px), #d9d4c5 calc(${m.left}% - 0.5px), #d9d4c5 calc(${m.left}% + 0.5px), transparent calc(${m.left}% + 0.5px))`)
            .join(", "),
        };
        return (
          <section key={day.date} className="card min-w-0" aria-labelledby={headingId} data-day={day.date}>
            <h2 id={headingId} className="mb-3 flex flex-wrap items-baseline justify-between gap-2 text-lg font-bold">
              <span>{dayHeading(day.date)}</span>
              <span className="text-sm font-normal text-ink-500">{todays.length === 0 ? "No bookings" : `${todays.length} booking${todays.length === 1 ? "" : "s"}`}</span>
            </h2>
            <div aria-hidden="true" className="relative ml-24 h-4 text-xs text-ink-500">
              {marks.map((m) => (
                <span key={m.label} className="absolute -translate-x-1/2 tabular" style={{ left: `${m.left}%` }}>{m.label.slice(0, 2)}</span>
              ))}
            </div>
            <ul className="space-y-1" aria-label={`Aircraft on ${dayHeading(day.date)}`}>
              {aircraft.map((a) => (
                <li key={a.id} className="flex items-center gap-2">
                  <a href={`${base}/new?aircraft=${a.id}&date=${day.date}`} className="w-22 shrink-0 text-sm font-bold" title={`Book ${a.registration} on ${dayHeading(day.date)}`}>
                    {a.registration}
                  </a>
                  <div className="relative h-8 min-w-0 flex-1 rounded bg-sand-100 ring-1 ring-sand-300" style={trackStyle}>
                    {(layout.get(a.id) ?? []).map((s) => (
                      <a
                        key={s.booking.id}
                        href={`${base}/${s.booking.id}`}
                        aria-label={`${s.booking.registration} ${times.get(s.booking.id)}, ${s.booking.who}, ${BOOKING_STATUS_WORDS[s.booking.status]}`}
                        className={`absolute inset-y-1 overflow-hidden rounded px-1 text-xs leading-6 no-underline ${s.booking.mine ? "bg-fin-600 text-white" : "border border-fin-600 bg-white text-fin-700"} ${s.fromEarlier ? "rounded-l-none" : ""} ${s.intoLater ? "rounded-r-none" : ""}`}
                        style={{ left: `${s.left}%`, width: `${s.width}%` }}
                      >
                        {/* The link's aria-label says it all; the text is the sighted reader's short form. */}
                        {`${BOOKING_STATUS_MARK[s.booking.status]} ${s.booking.who}`}
                      </a>
                    ))}
                  </div>
                </li>
              ))}
            </ul>
            {todays.length ? (
              <ol className="mt-3 divide-y divide-sand-200 border-t border-sand-200 text-sm" aria-label={`Bookings on ${dayHeading(day.date)}`}>
                {todays.map((b) => (
                  <li key={b.id} className="py-1.5">
                    <a href={`${base}/${b.id}`} className="tabular font-bold">{`${times.get(b.id)} ${b.registration}`}</a>{` ${b.who}${b.mine ? " (you)" : ""} · ${BOOKING_STATUS_MARK[b.status]} ${BOOKING_STATUS_WORDS[b.status]}`}
                  </li>
                ))}
              </ol>
            ) : null}
          </section>
        );
      })}
      <aside className="text-sm text-ink-500 xl:col-span-2" aria-label="How to read the sheet">
        Filled blocks are your bookings; outlined blocks are other members&apos;. {Object.entries(BOOKING_STATUS_WORDS).map(([k, w]) => `${BOOKING_STATUS_MARK[k as BookingStatus]} ${w}`).join(" · ")}. Times are the club&apos;s ({timeZone}).
      </aside>
    </div>
  );
}

export function FleetStatusList({ aircraft }: { aircraft: (SheetAircraft & { status: AircraftStatus })[] }) {
  return (
    <ul className="flex flex-wrap gap-2" aria-label="Aircraft status">
      {aircraft.map((a) => (
        <li key={a.id} className="flex items-center gap-1.5 text-sm"><strong>{a.registration}</strong> <StatusBadge status={a.status} /></li>
      ))}
    </ul>
  );
}
