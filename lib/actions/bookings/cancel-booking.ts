"use server";
import { clubAction } from "@/lib/actions/create-action";
import { describeLateCheck } from "@/lib/bookings/late-cancellation";
import { cancelBookingSchema } from "@/lib/validation/bookings";
import { cancelBookingInTx } from "./booking-writes";

export const cancelBooking = clubAction({
  schema: cancelBookingSchema,
  permission: ["create", "Booking"],
  success: "Booking cancelled.",
  run(tx, ctx, input) {
    const done = cancelBookingInTx(tx, ctx, input.bookingId, input.reason);
    if (done.already) return { message: "This booking was already cancelled." };
    const note = describeLateCheck(done.late, ctx.club.settings.lateCancellationHours);
    return { message: `Booking cancelled; the aircraft is free again.${note ? ` ${note}` : ""}`, data: { late: done.late.late }, refresh: true };
  },
});
