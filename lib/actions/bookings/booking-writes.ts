import "server-only";
import type { Tx } from "@/db/client";
import type { BookingRow } from "@/db/schema";
import { getBookingRow, updateBookingRow } from "@/db/queries/bookings";
import { ActionError } from "@/lib/actions/action-state";
import { lateCancellation, type LateCheck } from "@/lib/bookings/late-cancellation";
import type { ClubContext } from "@/lib/server/club-context";
import { writeAudit } from "@/lib/server/audit";
import { canOn } from "@/permissions";
import type { changeBookingInTx } from "./booking-core";

// The one path that cancels a booking (with its late-cancellation check and its audit entry),
// and the audit entry of a change: used by the single-booking actions and by the weekly-series
// actions alike, inside the caller's one transaction.

type Ctx = Pick<ClubContext, "club" | "user" | "ability">;

export type CancelOutcome = { booking: BookingRow; already: boolean; late: LateCheck };

/** Who may cancel or change one booking: the member's own, or whoever may update anyone's. */
export function mayChangeBooking(ctx: Pick<ClubContext, "ability">, booking: Pick<BookingRow, "userId">): boolean {
  return canOn(ctx.ability, "update", "Booking", { userId: booking.userId });
}

export function cancelBookingInTx(tx: Tx, ctx: Ctx, bookingId: string, reason: string | null, now: Date = new Date(), audit: Record<string, unknown> = {}): CancelOutcome {
  const { club, user } = ctx;
  const booking = getBookingRow(tx, club.id, bookingId);
  if (!booking) throw new ActionError("That booking was not found in this club.", {}, "not_found");
  if (!mayChangeBooking(ctx, booking)) throw new ActionError("Only the member who booked, or an instructor, can cancel this booking.", {}, "forbidden");
  const late = lateCancellation(booking.startsAt, now, club.settings.lateCancellationHours);
  if (booking.status === "cancelled") return { booking, already: true, late: { late: false, hoursBefore: late.hoursBefore } };
  if (booking.status !== "reserved") throw new ActionError("The aircraft is already out on this booking; close its flight sheet instead of cancelling.", {}, "conflict");
  updateBookingRow(tx, club.id, booking.id, { status: "cancelled", cancelledAt: now, cancelledById: user.id, cancelReason: reason, lateCancel: booking.lateCancel || late.late });
  writeAudit(tx, {
    clubId: club.id,
    actorId: user.id,
    action: "booking.cancel",
    subjectType: "Booking",
    subjectId: booking.id,
    before: { status: booking.status },
    after: { status: "cancelled", reason, late: late.late, hoursBefore: Math.round(late.hoursBefore * 10) / 10, ...audit },
  });
  return { booking, already: false, late };
}

export function auditBookingChange(tx: Tx, ctx: Ctx, changed: ReturnType<typeof changeBookingInTx>, instructorId: string | null, audit: Record<string, unknown> = {}): void {
  writeAudit(tx, {
    clubId: ctx.club.id,
    actorId: ctx.user.id,
    action: "booking.change",
    subjectType: "Booking",
    subjectId: changed.booking.id,
    before: { startsAt: changed.booking.startsAt.toISOString(), endsAt: changed.booking.endsAt.toISOString(), instructorId: changed.booking.instructorId },
    after: { startsAt: changed.window.startsAt.toISOString(), endsAt: changed.window.endsAt.toISOString(), instructorId, late: changed.late.late, ...audit },
  });
}
