import { SafetyCaution } from "@/components/ui/safety-caution";
import { StatusBadge, StatusShape } from "@/components/ui/status-badge";
import type { AircraftStatus } from "@/lib/airworthiness";
import { planDay, type Span } from "@/lib/bookings/schedule";
import type { ScheduleStatusNote } from "@/lib/bookings/status-note";
import { STATUS_WORDS } from "@/lib/fleet/status-words";
import type { BookingStatus } from "@/db/schema";
import { BOOKING_STATUS_MARK, BOOKING_STATUS_WORDS, clockTime, dayHeading, localInputValue } from "./booking-words";

// The booking page, organised by aircraft: each aircraft is a section with its status and, for
// each day shown, the club's flying day, then in time order who holds it (bookings), when
// maintenance has it (blocks) and the free time between, in words, each free window with a
// "Book" link that opens the booking form filled in. Plain anchors, not next/link: a two-week
// view has hundreds of links, and prefetching each would cost more than it saves.
// A grounded aircraft offers no "Book" link: its status word and grounding reasons stand in their
// place. An aircraft whose status is unknown keeps its links beside the missing record named and
// the airworthiness caution (scheduleStatusNote, lib/bookings/status-note.ts).

export type ScheduleBooking = Span & { id: string; aircraftId: string; status: BookingStatus; who: string; mine: boolean };
export type ScheduleBlock = Span & { id: string; aircraftId: string; reason: string };
export type ScheduleDay = { date: string; day: Span; window: Span; note: string };
export type ScheduleAircraft = { id: string; registration: string; name: string; status: AircraftStatus; note?: ScheduleStatusNote | null };

const TWO_HOURS = 2 * 3_600_000;
const ROW = "flex min-h-11 flex-wrap items-center gap-x-2 gap-y-1 py-1.5";

export function AircraftSchedule(props: {
  slug: string; timeZone: string; days: ScheduleDay[]; aircraft: ScheduleAircraft[]; bookings: ScheduleBooking[]; blocks: ScheduleBlock[];
  nights: Span[]; now: number; canBook: boolean;
}) {
  const { aircraft } = props;
  return (
    <div className="space-y-5">
      {aircraft.map((a) => (
        <AircraftCard key={a.id} {...props} plane={a} bookings={props.bookings.filter((b) => b.aircraftId === a.id)} blocks={props.blocks.filter((b) => b.aircraftId === a.id)} />
      ))}
    </div>
  );
}

function AircraftCard({ plane, slug, timeZone, days, bookings, blocks, nights, now, canBook }: {
  plane: ScheduleAircraft; slug: string; timeZone: string; days: ScheduleDay[]; bookings: ScheduleBooking[]; blocks: ScheduleBlock[]; nights: Span[]; now: number; canBook: boolean;
}) {
  const base = `/clubs/${slug}/bookings`;
  const note = plane.note;
  const bookable = canBook && (note?.bookable ?? true);
  const headingId = `aircraft-${plane.id}`;
  const time = (ms: number) => clockTime(ms, timeZone);
  const span = (s: Span, clipped: Span) => {
    // A booking that began on an earlier day, or runs on past this one, names that day.
    const from = s.start < clipped.start ? `${dayHeading(localInputValue(s.start, timeZone).slice(0, 10))} ${time(s.start)}` : time(s.start);
    const to = s.end > clipped.end ? `${dayHeading(localInputValue(s.end, timeZone).slice(0, 10))} ${time(s.end)}` : time(s.end);
    return `${from}–${to}`;
  };
  return (
    <section id={headingId} aria-labelledby={`${headingId}-h`} className="card min-w-0 scroll-mt-20" data-aircraft={plane.registration}>
      <header className="mb-2 flex flex-wrap items-center justify-between gap-2">
        <div className="flex min-w-0 flex-wrap items-center gap-2">
          <h2 id={`${headingId}-h`} className="text-xl font-bold">{plane.registration}</h2>
          <span className="text-sm text-ink-500">{plane.name}</span>
          <StatusBadge status={plane.status} />
        </div>
        {bookable ? (
          <a href={`${base}/new?aircraft=${plane.id}`} className="inline-flex min-h-11 items-center rounded px-3 font-bold text-fin-700 ring-1 ring-fin-600 hover:bg-sand-100">
            Book {plane.registration}
          </a>
        ) : null}
      </header>
      {note ? <StatusNote note={note} /> : null}
      <ol className="divide-y divide-sand-200" aria-label={`${plane.registration}, day by day`}>
        {days.map((d) => {
          const plan = planDay({ day: d.day, window: d.window, bookings, blocks, nights, now });
          return (
            <li key={d.date} className="py-2" data-day={d.date}>
              <h3 className="font-bold">{dayHeading(d.date)}</h3>
              <p className="text-sm text-ink-500">{d.note}</p>
              {plan.some((e) => e.kind === "free") ? null : <p className="py-1.5 text-sm text-ink-500">No free time left in the flying day.</p>}
              <ul className="text-sm" aria-label={`${plane.registration} on ${dayHeading(d.date)}`}>
                {plan.map((e) => {
                  if (e.kind === "booking") {
                    const b = e.booking;
                    return (
                      <li key={`b-${b.id}`} className={ROW}>
                        <a href={`${base}/${b.id}`} className="inline-flex min-h-11 items-center font-bold tabular">
                          {`${span(b, d.day)} · ${b.who}${b.mine ? " (you)" : ""}`}
                        </a>
                        <span className="text-ink-500">{`${BOOKING_STATUS_MARK[b.status]} ${BOOKING_STATUS_WORDS[b.status]}`}</span>
                      </li>
                    );
                  }
                  if (e.kind === "block") {
                    return (
                      <li key={`k-${e.block.id}`} className={`${ROW} rounded border-l-4 border-stop-600 bg-stop-100 px-2 text-stop-800`}>
                        <span className="font-bold tabular">{`■ ${span(e.block, d.day)} · Blocked for maintenance`}</span>
                        <span>{e.block.reason}</span>
                      </li>
                    );
                  }
                  const end = Math.min(e.end, e.start + TWO_HOURS);
                  const href = `${base}/new?aircraft=${plane.id}&start=${localInputValue(e.start, timeZone)}&end=${localInputValue(end, timeZone)}`;
                  const words = `Free ${time(e.start)}–${time(e.end)}${e.night ? " · night" : ""}`;
                  return (
                    <li key={`f-${e.start}`} className={`${ROW} justify-between`} data-free={e.night ? "night" : "day"}>
                      <span className={e.night ? "text-ink-700" : "text-go-800"}>{e.night ? "☾ " : "○ "}{words}</span>
                      {canBook && !bookable ? (
                        <span className="inline-flex min-h-11 items-center gap-1.5 font-bold text-plum-800 [--status-cut:#ffffff]">
                          <StatusShape status={plane.status} size={16} />
                          {`${STATUS_WORDS[plane.status]} — no booking`}
                        </span>
                      ) : null}
                      {bookable ? (
                        <a href={href} aria-label={`Book ${plane.registration} ${dayHeading(d.date)} from ${time(e.start)}`} className="inline-flex min-h-11 min-w-16 items-center justify-center rounded bg-fin-600 px-4 font-bold text-white no-underline hover:bg-fin-700">
                          Book
                        </a>
                      ) : null}
                    </li>
                  );
                })}
              </ul>
            </li>
          );
        })}
      </ol>
    </section>
  );
}

/** The status word with its mark and the reasons in words; the caution where the status is unknown.
 *  Outside the badge the grounded mark's cross is drawn white (--status-cut) so that it shows. */
function StatusNote({ note }: { note: ScheduleStatusNote }) {
  const word = STATUS_WORDS[note.status];
  const rest = note.text.startsWith(word) ? note.text.slice(word.length) : ` — ${note.text}`;
  const tone = note.status === "grounded" ? "border-plum-800 bg-plum-50 text-plum-800" : "border-dashed border-fog-600 bg-fog-50 text-fog-800";
  return (
    <div className="mb-2 space-y-2">
      <p className={`flex items-start gap-2 rounded border-l-4 px-3 py-2 text-sm ${tone}`} data-status-note={note.status}>
        <span className="mt-0.5 [--status-cut:#ffffff]"><StatusShape status={note.status} size={18} /></span>
        <span className="min-w-0 break-words"><strong>{word}</strong>{rest}</span>
      </p>
      {note.status === "unknown" ? <SafetyCaution compact /> : null}
    </div>
  );
}
