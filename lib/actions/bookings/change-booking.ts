"use server";
import { clubAction } from "@/lib/actions/create-action";
import { describeLateCheck } from "@/lib/bookings/late-cancellation";
import { formatLocalTime } from "@/lib/fleet/time";
import { writeAudit } from "@/lib/server/audit";
import { changeBookingSchema } from "@/lib/validation/bookings";
import { changeBookingInTx } from "./booking-core";

// Who may change is checked inside (the member's own booking, or an instructor's).
export const changeBooking = clubAction({
  schema: changeBookingSchema,
  permission: ["create", "Booking"],
  success: "Booking changed.",
  run(tx, ctx, input) {
    const changed = changeBookingInTx(tx, ctx, input);
    const { club, user } = ctx;
    writeAudit(tx, {
      clubId: club.id,
      actorId: user.id,
      action: "booking.change",
      subjectType: "Booking",
      subjectId: changed.booking.id,
      before: { startsAt: changed.booking.startsAt.toISOString(), endsAt: changed.booking.endsAt.toISOString(), instructorId: changed.booking.instructorId },
      after: { startsAt: changed.window.startsAt.toISOString(), endsAt: changed.window.endsAt.toISOString(), instructorId: input.instructorId, late: changed.late.late },
    });
    const when = `${formatLocalTime(changed.window.startsAt, club.timeZone)} to ${formatLocalTime(changed.window.endsAt, club.timeZone)}`;
    const late = describeLateCheck(changed.late, club.settings.lateCancellationHours);
    return { message: `Booking moved to ${when}.${late ? ` ${late}` : ""}`, refresh: true };
  },
});
