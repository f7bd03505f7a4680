// Booking windows are half-open intervals [start, end): a booking may begin at the very minute
// the previous one ends. Only active bookings (reserved, or flight begun) hold the aircraft.

export const ACTIVE_BOOKING_STATUSES = ["reserved", "dispatched"] as const;

/** The longest window a booking may hold (the database's CHECK has the same bound). */
export const MAX_BOOKING_HOURS = 14 * 24;
/** A booking may start a little in the past, so that "now" can still be booked. */
export const BOOKING_PAST_GRACE_MINUTES = 60;

export type TimeWindow = { startsAt: Date; endsAt: Date };

export function windowsOverlap(a: TimeWindow, b: TimeWindow): boolean {
  return a.startsAt.getTime() < b.endsAt.getTime() && b.startsAt.getTime() < a.endsAt.getTime();
}

export type HeldWindow = TimeWindow & { id: string; aircraftId: string; userId: string; instructorId: string | null; status: string };

export type Conflict = { kind: "aircraft" | "instructor" | "member"; booking: HeldWindow };

/**
 * What a requested window collides with: the aircraft already held, the instructor already
 * teaching or flying, or the member already booked elsewhere. `ignoreId` is the booking being
 * changed, which never collides with itself.
 */
export function findConflicts(
  wanted: TimeWindow & { aircraftId: string; userId: string; instructorId: string | null },
  held: readonly HeldWindow[],
  ignoreId?: string,
): Conflict[] {
  const out: Conflict[] = [];
  for (const b of held) {
    if (b.id === ignoreId) continue;
    if (!(ACTIVE_BOOKING_STATUSES as readonly string[]).includes(b.status)) continue;
    if (!windowsOverlap(wanted, b)) continue;
    const people = [b.userId, b.instructorId].filter(Boolean);
    if (b.aircraftId === wanted.aircraftId) out.push({ kind: "aircraft", booking: b });
    else if (wanted.instructorId && people.includes(wanted.instructorId)) out.push({ kind: "instructor", booking: b });
    else if (people.includes(wanted.userId)) out.push({ kind: "member", booking: b });
  }
  return out;
}

/** Problems with the window itself, keyed by form field, in plain words. */
export function checkWindow(window: TimeWindow, now: Date): Record<string, string[]> {
  const problems: Record<string, string[]> = {};
  const start = window.startsAt.getTime();
  const end = window.endsAt.getTime();
  if (!(end > start)) problems.endsAt = ["The end must be after the start."];
  else if (end - start > MAX_BOOKING_HOURS * 3_600_000) problems.endsAt = [`A booking can be at most ${MAX_BOOKING_HOURS / 24} days long.`];
  if (start < now.getTime() - BOOKING_PAST_GRACE_MINUTES * 60_000) problems.startsAt = ["The start is in the past."];
  return problems;
}
