import "server-only";
import type { Tx } from "@/db/client";
import type { BookingRow } from "@/db/schema";
import { getBookingRow, listSeriesFrom } from "@/db/queries/bookings";
import { ActionError } from "@/lib/actions/action-state";
import { describeLateCheck } from "@/lib/bookings/late-cancellation";
import { isoDateInTimeZone } from "@/lib/dates";
import { formatDateWords } from "@/lib/dates/words";
import type { ClubContext } from "@/lib/server/club-context";
import type { MoveSeriesInput } from "@/lib/validation/bookings";
import { changeBookingInTx } from "./booking-core";
import { reasonOf } from "./booking-recurring";
import { auditBookingChange, cancelBookingInTx, mayChangeBooking } from "./booking-writes";

// A weekly series (the bookings one weekly submission made, sharing `series_id`): cancel or move
// one week and every later one together. Each week goes through the same path a single cancel or
// change takes (booking-writes.ts cancelBookingInTx, booking-core.ts changeBookingInTx), with its
// own permission check, inside the action's one transaction. A week that has started, begun or
// closed, or was cancelled, is never touched.

type Ctx = Pick<ClubContext, "club" | "user" | "ability">;

export type SeriesWeek = { bookingId: string; when: string };
export type SeriesRefusal = SeriesWeek & { reason: string };
export type SeriesCancelResult = { cancelled: (SeriesWeek & { late: string })[]; refused: SeriesRefusal[] };
export type SeriesMoveResult = { moved: (SeriesWeek & { late: string })[]; refused: SeriesRefusal[]; times: string };

/** The week's date in the club's words: "Tue 8 Dec 2026". */
function dayOf(ctx: Ctx, booking: Pick<BookingRow, "startsAt">): string {
  return formatDateWords(isoDateInTimeZone(booking.startsAt, ctx.club.timeZone));
}

function leftAlone(booking: BookingRow, now: Date): string | null {
  if (booking.status === "dispatched") return "The flight on this week has begun.";
  if (booking.status === "checked_in") return "This week's flight sheet is closed.";
  if (booking.startsAt.getTime() <= now.getTime()) return "This week's start has already passed.";
  return null;
}

/**
 * The series of `bookingId` from that week on: the weeks still reserved and yet to start, and the
 * later weeks left alone (begun, closed or past) with why. Cancelled weeks are left out.
 */
function seriesFrom(tx: Tx, ctx: Ctx, bookingId: string, now: Date, verb: string) {
  const anchor = getBookingRow(tx, ctx.club.id, bookingId);
  if (!anchor) throw new ActionError("That booking was not found in this club.", {}, "not_found");
  if (!mayChangeBooking(ctx, anchor)) throw new ActionError(`Only the member who booked, or an instructor, can ${verb} these weeks.`, {}, "forbidden");
  if (!anchor.seriesId) throw new ActionError("This booking was made on its own, not as part of a weekly series.", {}, "conflict");
  const open: BookingRow[] = [];
  const refused: SeriesRefusal[] = [];
  for (const week of listSeriesFrom(tx, ctx.club.id, anchor.seriesId, anchor.startsAt)) {
    if (week.status === "cancelled") continue;
    const why = leftAlone(week, now);
    if (why) refused.push({ bookingId: week.id, when: dayOf(ctx, week), reason: why });
    else if (!mayChangeBooking(ctx, week)) refused.push({ bookingId: week.id, when: dayOf(ctx, week), reason: `Only the member who booked, or an instructor, can ${verb} this week.` });
    else open.push(week);
  }
  return { anchor, seriesId: anchor.seriesId, open, refused };
}

export function cancelSeriesInTx(tx: Tx, ctx: Ctx, bookingId: string, reason: string | null, now: Date = new Date()): SeriesCancelResult {
  const { seriesId, open, refused } = seriesFrom(tx, ctx, bookingId, now, "cancel");
  const cancelled: SeriesCancelResult["cancelled"] = [];
  for (const week of open) {
    const done = cancelBookingInTx(tx, ctx, week.id, reason, now, { series: seriesId });
    if (done.already) continue;
    cancelled.push({ bookingId: week.id, when: dayOf(ctx, week), late: describeLateCheck(done.late, ctx.club.settings.lateCancellationHours) });
  }
  return { cancelled, refused };
}

export function moveSeriesInTx(tx: Tx, ctx: Ctx, input: MoveSeriesInput, now: Date = new Date()): SeriesMoveResult {
  const { seriesId, open, refused } = seriesFrom(tx, ctx, input.bookingId, now, "move");
  const moved: SeriesMoveResult["moved"] = [];
  const warnings = new Map<string, string>();
  for (const week of open) {
    const date = isoDateInTimeZone(week.startsAt, ctx.club.timeZone);
    const when = dayOf(ctx, week);
    try {
      const changed = changeBookingInTx(tx, ctx, { bookingId: week.id, startsAt: `${date}T${input.startTime}`, endsAt: `${date}T${input.endTime}`, instructorId: week.instructorId, acceptedGuards: input.acceptedGuards }, now);
      auditBookingChange(tx, ctx, changed, week.instructorId, { series: seriesId });
      moved.push({ bookingId: week.id, when, late: describeLateCheck(changed.late, ctx.club.settings.lateCancellationHours) });
    } catch (error) {
      if (!(error instanceof ActionError)) throw error;
      const pending = error.fieldErrors.warnings ?? [];
      if (pending.length && !(error.fieldErrors.refusals ?? []).length) {
        const guards = error.fieldErrors.warningGuards ?? [];
        pending.forEach((w, i) => warnings.set(guards[i] ?? w, w));
        continue;
      }
      refused.push({ bookingId: week.id, when, reason: reasonOf(error) });
    }
  }
  const times = `${input.startTime}–${input.endTime}`;
  const list = (rs: SeriesRefusal[]) => rs.map((r) => `${r.when} — ${r.reason}`).join(" ");
  if (warnings.size) {
    // As for a weekly booking: the warnings are read once for every week, and nothing moves until then.
    const note = refused.length ? ` These weeks cannot move: ${list(refused)}` : "";
    throw new ActionError(`Read the warnings below. Tick that you have read them to move the weeks anyway.${note}`, { warnings: [...warnings.values()], warningGuards: [...warnings.keys()] });
  }
  if (!moved.length && refused.length) {
    throw new ActionError(`Nothing moved: no week can take ${times}. ${list(refused)}`, { startTime: refused.map((r) => `${r.when}: ${r.reason}`) }, "conflict");
  }
  return { moved, refused, times };
}
