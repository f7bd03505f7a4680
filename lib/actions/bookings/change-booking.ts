"use server";
import { clubAction } from "@/lib/actions/create-action";
import { describeLateCheck } from "@/lib/bookings/late-cancellation";
import { formatLocalTime } from "@/lib/fleet/time";
import { changeBookingSchema } from "@/lib/validation/bookings";
import { changeBookingInTx } from "./booking-core";
import { auditBookingChange } from "./booking-writes";

// Who may change is checked inside (the member's own booking, or an instructor's).
export const changeBooking = clubAction({
  schema: changeBookingSchema,
  permission: ["create", "Booking"],
  success: "Booking changed.",
  run(tx, ctx, input) {
    const changed = changeBookingInTx(tx, ctx, input);
    const { club } = ctx;
    auditBookingChange(tx, ctx, changed, input.instructorId);
    const when = `${formatLocalTime(changed.window.startsAt, club.timeZone)} to ${formatLocalTime(changed.window.endsAt, club.timeZone)}`;
    const late = describeLateCheck(changed.late, club.settings.lateCancellationHours);
    return { message: `Booking moved to ${when}.${late ? ` ${late}` : ""}`, refresh: true };
  },
});
