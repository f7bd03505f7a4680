// Night as 14 CFR 61.57(b) counts it for carrying passengers: "the period beginning 1 hour
// after sunset and ending 1 hour before sunrise". Sunrise and sunset at the club's home field
// come from SunCalc (the sun's upper limb at the horizon, with refraction), a published
// algorithm; the air almanac may differ by a minute or two, which the hour's margin absorbs.

import { getTimes } from "suncalc";

export const NIGHT_OFFSET_MS = 60 * 60_000;
const DAY_MS = 86_400_000;

export type FieldPosition = { latitude: number; longitude: number };
export type NightInterval = { startsAt: Date; endsAt: Date };

/** Whether a position is usable: both numbers, inside the globe. */
export function isFieldPosition(p: { latitude?: number | null; longitude?: number | null } | null | undefined): p is FieldPosition {
  return (
    !!p &&
    typeof p.latitude === "number" && Number.isFinite(p.latitude) && Math.abs(p.latitude) <= 90 &&
    typeof p.longitude === "number" && Number.isFinite(p.longitude) && Math.abs(p.longitude) <= 180
  );
}

/**
 * The night periods (61.57(b) sense) that may touch [from, to]. Days on which the sun never
 * rises count as night the whole solar day; days on which it never sets have no night.
 */
export function nightIntervals(from: Date, to: Date, position: FieldPosition): NightInterval[] {
  const events: { at: number; kind: "rise" | "set" | "down" }[] = [];
  for (let t = from.getTime() - 2 * DAY_MS; t <= to.getTime() + 2 * DAY_MS; t += DAY_MS) {
    const times = getTimes(new Date(t), position.latitude, position.longitude);
    if (times.alwaysDown) {
      events.push({ at: times.solarNoon.getTime(), kind: "down" });
      continue;
    }
    if (times.sunrise) events.push({ at: times.sunrise.getTime(), kind: "rise" });
    if (times.sunset) events.push({ at: times.sunset.getTime(), kind: "set" });
  }
  // The same event can be reported from two neighbouring calls: keep one per minute.
  events.sort((a, b) => a.at - b.at);
  const unique = events.filter((e, i) => i === 0 || e.kind !== events[i - 1]!.kind || e.at - events[i - 1]!.at > 60_000);
  const out: NightInterval[] = [];
  for (let i = 0; i < unique.length; i++) {
    const e = unique[i]!;
    if (e.kind === "down") {
      out.push({ startsAt: new Date(e.at - DAY_MS / 2), endsAt: new Date(e.at + DAY_MS / 2) });
      continue;
    }
    if (e.kind !== "set") continue;
    const next = unique.slice(i + 1).find((n) => n.kind === "rise" || n.kind === "down");
    // No sunrise found in the window after this sunset: night runs on past the window's end.
    const riseAt = next ? (next.kind === "rise" ? next.at : next.at - DAY_MS / 2) : to.getTime() + DAY_MS + NIGHT_OFFSET_MS;
    const startsAt = e.at + NIGHT_OFFSET_MS;
    const endsAt = next && next.kind === "down" ? riseAt : riseAt - NIGHT_OFFSET_MS;
    if (endsAt > startsAt) out.push({ startsAt: new Date(startsAt), endsAt: new Date(endsAt) });
  }
  return out;
}

/**
 * Whether a booking [startsAt, endsAt) touches night at the field. `computed: false` when the
 * position is not recorded (or unusable): night cannot be computed, and the caller decides
 * what that means (the booking guard treats it as night when passengers are planned).
 */
export function bookingTouchesNight(
  window: { startsAt: Date; endsAt: Date },
  position: { latitude?: number | null; longitude?: number | null } | null | undefined,
): { night: boolean; computed: boolean } {
  if (!isFieldPosition(position)) return { night: false, computed: false };
  const start = window.startsAt.getTime();
  const end = window.endsAt.getTime();
  const night = nightIntervals(window.startsAt, window.endsAt, position).some((n) => start < n.endsAt.getTime() && end > n.startsAt.getTime());
  return { night, computed: true };
}
