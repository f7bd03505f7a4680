// The booking page's day plan for one aircraft: the club's flying window for the day, what holds
// the aircraft inside it (bookings, maintenance blocks) and the free windows between, each free
// window split where night begins or ends. Intervals are half-open [start, end) in epoch ms, as
// bookings are (lib/bookings/overlap). Pure: instants in, intervals out.

import { addDays, type IsoDate } from "@/lib/dates";
import { localTimeToInstant } from "@/lib/fleet/time";

export type Span = { start: number; end: number };

/** Free time shorter than this is not offered (a booking is in quarter hours). */
export const MIN_FREE_MS = 30 * 60_000;
const QUARTER_MS = 15 * 60_000;

export const DEFAULT_FLYING_DAY = { opens: "07:00", closes: "21:00" } as const;

/**
 * The club's flying window on `date`, in club time. A closing time at or before the opening time
 * runs into the next day (a club open 18:00–02:00).
 */
export function flyingWindow(date: IsoDate, hours: { opens?: string | null; closes?: string | null }, timeZone: string): Span {
  const opens = hours.opens ?? DEFAULT_FLYING_DAY.opens;
  const closes = hours.closes ?? DEFAULT_FLYING_DAY.closes;
  const start = localTimeToInstant(`${date}T${opens}`, timeZone).getTime();
  const closeDate = closes <= opens ? addDays(date, 1) : date;
  return { start, end: localTimeToInstant(`${closeDate}T${closes}`, timeZone).getTime() };
}

/** Overlapping or touching spans joined, in start order. */
export function mergeSpans(spans: readonly Span[]): Span[] {
  const sorted = spans.filter((s) => s.end > s.start).map((s) => ({ start: s.start, end: s.end })).sort((a, b) => a.start - b.start);
  const out: Span[] = [];
  for (const s of sorted) {
    const last = out.at(-1);
    if (last && s.start <= last.end) last.end = Math.max(last.end, s.end);
    else out.push(s);
  }
  return out;
}

export function spansOverlap(a: Span, b: Span): boolean {
  return a.start < b.end && b.start < a.end;
}

/** The spans of `list` that overlap `wanted` (half-open: touching is not overlapping). */
export function overlapping<T extends Span>(wanted: Span, list: readonly T[]): T[] {
  return list.filter((s) => spansOverlap(wanted, s));
}

/** Whether the union of `windows` covers all of `wanted`. */
export function coveredBy(wanted: Span, windows: readonly Span[]): boolean {
  let reached = wanted.start;
  for (const w of mergeSpans(windows)) {
    if (w.start > reached) break;
    if (w.end > reached) reached = w.end;
    if (reached >= wanted.end) return true;
  }
  return reached >= wanted.end;
}

/** Rounds an instant up to the next quarter hour (free time is offered from a bookable minute). */
export function nextQuarter(ms: number): number {
  return Math.ceil(ms / QUARTER_MS) * QUARTER_MS;
}

/**
 * The free parts of `window` once `busy` is taken out, from `notBefore` on, each at least
 * `minMs` long.
 */
export function freeWindows(window: Span, busy: readonly Span[], opts: { notBefore?: number; minMs?: number } = {}): Span[] {
  const min = opts.minMs ?? MIN_FREE_MS;
  let cursor = Math.max(window.start, opts.notBefore !== undefined ? nextQuarter(opts.notBefore) : window.start);
  const out: Span[] = [];
  for (const b of mergeSpans(busy)) {
    if (b.end <= cursor) continue;
    if (b.start >= window.end) break;
    if (b.start - cursor >= min) out.push({ start: cursor, end: b.start });
    cursor = Math.max(cursor, b.end);
  }
  if (window.end - cursor >= min) out.push({ start: cursor, end: window.end });
  return out;
}

/** `span` cut where night begins or ends; each piece says whether it is night. */
export function splitByNight(span: Span, nights: readonly Span[]): (Span & { night: boolean })[] {
  const cuts = new Set<number>([span.start, span.end]);
  for (const n of nights) {
    if (n.start > span.start && n.start < span.end) cuts.add(n.start);
    if (n.end > span.start && n.end < span.end) cuts.add(n.end);
  }
  const points = [...cuts].sort((a, b) => a - b);
  const out: (Span & { night: boolean })[] = [];
  for (let i = 0; i < points.length - 1; i++) {
    const piece = { start: points[i]!, end: points[i + 1]! };
    const night = nights.some((n) => n.start <= piece.start && n.end >= piece.end);
    const last = out.at(-1);
    if (last && last.night === night) last.end = piece.end;
    else out.push({ ...piece, night });
  }
  return out;
}

export type PlanEntry<B, K> =
  | { kind: "booking"; start: number; end: number; booking: B }
  | { kind: "block"; start: number; end: number; block: K }
  | { kind: "free"; start: number; end: number; night: boolean };

/**
 * One aircraft's day: its bookings and blocks that touch the calendar day `day` (clipped to it;
 * a booking before the club opens is still shown), and the free windows inside the flying
 * window from `now` on, split at night, in time order.
 */
export function planDay<B extends Span, K extends Span>(input: { day?: Span; window: Span; bookings: readonly B[]; blocks: readonly K[]; nights: readonly Span[]; now: number; minFreeMs?: number }): PlanEntry<B, K>[] {
  const { window } = input;
  const day = input.day ?? window;
  const clip = (s: Span) => ({ start: Math.max(s.start, day.start), end: Math.min(s.end, day.end) });
  const entries: PlanEntry<B, K>[] = [
    ...overlapping(day, input.bookings).map((booking) => ({ kind: "booking" as const, ...clip(booking), booking })),
    ...overlapping(day, input.blocks).map((block) => ({ kind: "block" as const, ...clip(block), block })),
  ];
  const free = freeWindows(window, [...input.bookings, ...input.blocks], { notBefore: input.now, minMs: input.minFreeMs });
  for (const f of free) for (const piece of splitByNight(f, input.nights)) entries.push({ kind: "free", ...piece });
  const order = { block: 0, booking: 1, free: 2 };
  return entries.sort((a, b) => a.start - b.start || order[a.kind] - order[b.kind]);
}
