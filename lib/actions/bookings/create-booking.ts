"use server";
import { clubAction } from "@/lib/actions/create-action";
import { formatLocalTime } from "@/lib/fleet/time";
import { writeAudit } from "@/lib/server/audit";
import { createBookingSchema } from "@/lib/validation/bookings";
import { createBookingInTx } from "./booking-core";
import { createRecurringInTx, type RecurringResult } from "./booking-recurring";

export type CreateBookingData = { bookingId?: string; booked?: RecurringResult["booked"]; refused?: RecurringResult["refused"] };

export const createBooking = clubAction({
  schema: createBookingSchema,
  permission: ["create", "Booking"],
  success: "Booked.",
  run(tx, ctx, input) {
    const { club, user } = ctx;
    if (input.repeatWeeks > 1) {
      const made = createRecurringInTx(tx, ctx, input);
      for (const b of made.booked) {
        writeAudit(tx, {
          clubId: club.id,
          actorId: user.id,
          action: "booking.create",
          subjectType: "Booking",
          subjectId: b.bookingId,
          after: { aircraftId: input.aircraftId, userId: made.memberId, instructorId: input.instructorId, startsAt: b.startsAt, endsAt: b.endsAt, weekly: input.repeatWeeks },
        });
      }
      const refused = made.refused.length ? ` Not booked: ${made.refused.map((r) => `${r.when} — ${r.reason}`).join(" ")}` : "";
      return {
        message: `${made.registration} booked ${made.booked.length} of ${input.repeatWeeks} weeks: ${made.booked.map((b) => b.when).join("; ")}.${refused}`,
        data: { booked: made.booked, refused: made.refused } as CreateBookingData,
        refresh: true,
      };
    }
    const made = createBookingInTx(tx, ctx, input);
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
      data: { bookingId: made.bookingId } as CreateBookingData,
      // The form shows the answer, then opens the new booking's page.
      redirectTo: `/clubs/${club.slug}/bookings/${made.bookingId}`,
    };
  },
});
