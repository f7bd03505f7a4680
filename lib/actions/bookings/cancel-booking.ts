"use server";
import { getBookingRow, updateBookingRow } from "@/db/queries/bookings";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { describeLateCheck, lateCancellation } from "@/lib/bookings/late-cancellation";
import { writeAudit } from "@/lib/server/audit";
import { cancelBookingSchema } from "@/lib/validation/bookings";
import { canOn } from "@/permissions";

export const cancelBooking = clubAction({
  schema: cancelBookingSchema,
  permission: ["create", "Booking"],
  success: "Booking cancelled.",
  run(tx, { club, user, ability }, input) {
    const booking = getBookingRow(tx, club.id, input.bookingId);
    if (!booking) throw new ActionError("That booking was not found in this club.", {}, "not_found");
    if (!canOn(ability, "update", "Booking", { userId: booking.userId })) throw new ActionError("Only the member who booked, or an instructor, can cancel this booking.", {}, "forbidden");
    if (booking.status === "cancelled") return { message: "This booking was already cancelled." };
    if (booking.status !== "reserved") throw new ActionError("The aircraft is already out on this booking; close its flight sheet instead of cancelling.", {}, "conflict");
    const now = new Date();
    const late = lateCancellation(booking.startsAt, now, club.settings.lateCancellationHours);
    updateBookingRow(tx, club.id, booking.id, { status: "cancelled", cancelledAt: now, cancelledById: user.id, cancelReason: input.reason, lateCancel: booking.lateCancel || late.late });
    writeAudit(tx, {
      clubId: club.id,
      actorId: user.id,
      action: "booking.cancel",
      subjectType: "Booking",
      subjectId: booking.id,
      before: { status: booking.status },
      after: { status: "cancelled", reason: input.reason, late: late.late, hoursBefore: Math.round(late.hoursBefore * 10) / 10 },
    });
    const note = describeLateCheck(late, club.settings.lateCancellationHours);
    return { message: `Booking cancelled; the aircraft is free again.${note ? ` ${note}` : ""}`, data: { late: late.late }, refresh: true };
  },
});
