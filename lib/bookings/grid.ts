// The fleet views: a day is one strip per aircraft on a 24-hour track; a week is seven such
// days. Days are the club's calendar days, so a day with a daylight-saving change is 23 or 25
// hours long and the track follows it. Pure: instants in, percentages out.

import { addDays, parseIsoDate, type IsoDate } from "@/lib/dates";
import { localTimeToInstant } from "@/lib/fleet/time";

export type GridBooking = { id: string; aircraftId: string; startsAt: number; endsAt: number };

export type Segment<B extends GridBooking = GridBooking> = {
  booking: B;
  /** Position on the day's track, 0–100. */
  left: number;
  width: number;
  /** The booking began on an earlier day / runs on past this one. */
  fromEarlier: boolean;
  intoLater: boolean;
};

export type DayBounds = { date: IsoDate; start: number; end: number };

export function dayBounds(date: IsoDate, timeZone: string): DayBounds {
  const start = localTimeToInstant(`${date}T00:00`, timeZone).getTime();
  const end = localTimeToInstant(`${addDays(date, 1)}T00:00`, timeZone).getTime();
  return { date, start, end };
}

/** Monday of the week holding `date` (ISO 8601 weeks start on Monday). */
export function weekStart(date: IsoDate): IsoDate {
  const { year, month, day } = parseIsoDate(date);
  const weekday = new Date(Date.UTC(year, month - 1, day)).getUTCDay(); // 0 = Sunday
  return addDays(date, -((weekday + 6) % 7));
}

export function weekDates(date: IsoDate): IsoDate[] {
  const monday = weekStart(date);
  return Array.from({ length: 7 }, (_, i) => addDays(monday, i));
}

/** Where each booking sits on one day's track, per aircraft, in start order. */
export function layoutDay<B extends GridBooking>(bookings: readonly B[], day: DayBounds): Map<string, Segment<B>[]> {
  const span = day.end - day.start;
  const out = new Map<string, Segment<B>[]>();
  const sorted = [...bookings].sort((a, b) => a.startsAt - b.startsAt);
  for (const b of sorted) {
    if (b.endsAt <= day.start || b.startsAt >= day.end) continue;
    const from = Math.max(b.startsAt, day.start);
    const to = Math.min(b.endsAt, day.end);
    const segment: Segment<B> = {
      booking: b,
      left: ((from - day.start) / span) * 100,
      width: Math.max(((to - from) / span) * 100, 0.5),
      fromEarlier: b.startsAt < day.start,
      intoLater: b.endsAt > day.end,
    };
    const list = out.get(b.aircraftId);
    if (list) list.push(segment);
    else out.set(b.aircraftId, [segment]);
  }
  return out;
}

/** Hour marks for the track (every `step` hours of local time), as positions 0–100. */
export function hourMarks(day: DayBounds, timeZone: string, step = 6): { label: string; left: number }[] {
  const marks: { label: string; left: number }[] = [];
  for (let h = 0; h < 24; h += step) {
    const at = localTimeToInstant(`${day.date}T${String(h).padStart(2, "0")}:00`, timeZone).getTime();
    marks.push({ label: `${String(h).padStart(2, "0")}:00`, left: ((at - day.start) / (day.end - day.start)) * 100 });
  }
  return marks;
}
