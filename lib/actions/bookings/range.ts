import "server-only";
import type { Club } from "@/db/schema";
import { dayBounds, weekDates } from "@/lib/bookings/grid";
import { isoDateInTimeZone, type IsoDate } from "@/lib/dates";

/** The club-local days a fleet view shows, and the instants they span. */
export function viewRange(club: Pick<Club, "timeZone">, view: "day" | "week", date: IsoDate | undefined, now: Date = new Date()) {
  const anchor = date ?? isoDateInTimeZone(now, club.timeZone);
  const dates = view === "day" ? [anchor] : weekDates(anchor);
  const days = dates.map((d) => dayBounds(d, club.timeZone));
  return { anchor, days, from: new Date(days[0]!.start), to: new Date(days.at(-1)!.end) };
}
