import "server-only";
import type { Tx } from "@/db/client";
import type { BookingRow } from "@/db/schema";
import { getBookingRow } from "@/db/queries/bookings";
import { ActionError } from "@/lib/actions/action-state";
import type { ClubContext } from "@/lib/server/club-context";
import { canOn } from "@/permissions";

/** The member of the booking, its instructor, or whoever may update anyone's booking. */
export function mayActOnBooking(ctx: Pick<ClubContext, "user" | "ability">, booking: Pick<BookingRow, "userId" | "instructorId">): boolean {
  return booking.userId === ctx.user.id || booking.instructorId === ctx.user.id || canOn(ctx.ability, "update", "Booking", { userId: booking.userId });
}

export function loadBookingForParty(tx: Tx, ctx: Pick<ClubContext, "club" | "user" | "ability">, bookingId: string): BookingRow {
  const booking = getBookingRow(tx, ctx.club.id, bookingId);
  if (!booking) throw new ActionError("That booking was not found in this club.", {}, "not_found");
  if (!mayActOnBooking(ctx, booking)) throw new ActionError("Only the member on this booking, its instructor, or an instructor of the club can do this.", {}, "forbidden");
  return booking;
}
