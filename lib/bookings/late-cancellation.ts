// The club's late-cancellation rule (club setting lateCancellationHours): giving back booked
// time less than N hours before the booking starts is "late". The flag is recorded on the
// booking for the officers; 0 hours means the club has no such rule.

export type LateCheck = { late: boolean; hoursBefore: number };

export function lateCancellation(startsAt: Date, at: Date, lateCancellationHours: number): LateCheck {
  if (!Number.isFinite(lateCancellationHours) || lateCancellationHours < 0) {
    throw new RangeError(`lateCancellationHours must be ≥ 0, got ${lateCancellationHours}`);
  }
  const hoursBefore = (startsAt.getTime() - at.getTime()) / 3_600_000;
  return { late: lateCancellationHours > 0 && hoursBefore < lateCancellationHours, hoursBefore };
}

/**
 * A change counts as a late cancellation when, inside the window, it gives back time that was
 * booked: the new window no longer covers the whole old one. Extending or moving earlier within
 * the old window's cover does not.
 */
export function lateChange(
  old: { startsAt: Date; endsAt: Date },
  next: { startsAt: Date; endsAt: Date },
  at: Date,
  lateCancellationHours: number,
): LateCheck {
  const check = lateCancellation(old.startsAt, at, lateCancellationHours);
  const covers = next.startsAt.getTime() <= old.startsAt.getTime() && next.endsAt.getTime() >= old.endsAt.getTime();
  return { late: check.late && !covers, hoursBefore: check.hoursBefore };
}

export function describeLateCheck(check: LateCheck, lateCancellationHours: number): string {
  if (!check.late) return "";
  const before = check.hoursBefore <= 0 ? "after the booking had started" : `${check.hoursBefore.toFixed(1)} h before the start`;
  return `Late cancellation: ${before}, inside the club's ${lateCancellationHours}-hour rule.`;
}
