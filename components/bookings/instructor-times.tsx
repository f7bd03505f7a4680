import type { Span } from "@/lib/bookings/schedule";
import { clockTime, dayHeading, localInputValue } from "./booking-words";

// Each instructor's available times in the days shown, in words. An instructor who keeps no list
// is booked as before (any time they are not already booked); one who keeps a list is bookable
// only inside it, and the booking form refuses anything else with their times.

export type InstructorTimes = { id: string; name: string; keepsList: boolean; windows: (Span & { id: string })[]; busy: Span[] };

export function InstructorTimesList({ instructors, timeZone }: { instructors: InstructorTimes[]; timeZone: string }) {
  if (!instructors.length) return null;
  const when = (s: Span) => `${dayHeading(localInputValue(s.start, timeZone).slice(0, 10))}, ${clockTime(s.start, timeZone)}–${clockTime(s.end, timeZone)}`;
  return (
    <section className="card" aria-labelledby="instructor-times-h">
      <h2 id="instructor-times-h" className="mb-1 text-lg font-bold">Instructors&apos; available times</h2>
      <p className="mb-2 text-sm text-ink-500">Choose the instructor on the booking form; a booking outside their times, or when they already fly, is refused with the reason.</p>
      <ul className="divide-y divide-sand-200 text-sm">
        {instructors.map((i) => (
          <li key={i.id} className="py-2">
            <strong>{i.name}</strong>
            {!i.keepsList ? (
              <p className="text-ink-500">Keeps no list of available times: bookable whenever not already flying.</p>
            ) : i.windows.length === 0 ? (
              <p className="text-ink-500">Not available in the days shown.</p>
            ) : (
              <ul className="mt-1 space-y-0.5">
                {i.windows.map((w) => (
                  <li key={w.id} className="tabular">{`Available ${when(w)}`}</li>
                ))}
              </ul>
            )}
            {i.busy.length ? <p className="text-ink-500">{`Already flying: ${i.busy.map(when).join("; ")}`}</p> : null}
          </li>
        ))}
      </ul>
    </section>
  );
}
