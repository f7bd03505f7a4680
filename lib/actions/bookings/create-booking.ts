"use server";
import { clubAction } from "@/lib/actions/create-action";
import { formatLocalTime } from "@/lib/fleet/time";
import { writeAudit } from "@/lib/server/audit";
import { createBookingSchema } from "@/lib/validation/bookings";
import { createBookingInTx } from "./booking-core";

export const createBooking = clubAction({
  schema: createBookingSchema,
  permission: ["create", "Booking"],
  success: "Booked.",
  run(tx, ctx, input) {
    const made = createBookingInTx(tx, ctx, input);
    const { club, user } = ctx;
    writeAudit(tx, {
      clubId: club.id,
      actorId: user.id,
      action: "booking.create",
      subjectType: "Booking",
      subjectId: made.bookingId,
      after: { aircraftId: made.plane.id, userId: made.member.id, instructorId: input.instructorId, startsAt: made.window.startsAt.toISOString(), endsAt: made.window.endsAt.toISOString(), acceptedWarnings: made.acceptedWarnings },
    });
    const when = `${formatLocalTime(made.window.startsAt, club.timeZone)} to ${formatLocalTime(made.window.endsAt, club.timeZone)}`;
    return {
      message: `${made.plane.registration} booked from ${when}.${made.acceptedWarnings.length ? " The warnings you read are kept with the booking." : ""}`,
      data: { bookingId: made.bookingId },
      // The form shows the answer, then opens the new booking's page.
      redirectTo: `/clubs/${club.slug}/bookings/${made.bookingId}`,
    };
  },
});
