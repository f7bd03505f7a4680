import { NextResponse } from "next/server";
import { getBooking } from "@/db/queries/bookings";
import { visibleBookingWarnings } from "@/lib/bookings/warning-access";
import { apiError, withClub } from "@/lib/server/api";
import { isRecordId } from "@/lib/validation/primitives";

export const dynamic = "force-dynamic";

export async function GET(_request: Request, { params }: { params: Promise<{ club: string; bookingId: string }> }) {
  const { club: slug, bookingId } = await params;
  return withClub(slug, ["read", "Booking"], (ctx) => {
    if (!isRecordId(bookingId)) return apiError("not_found", "Not found.");
    const b = getBooking(ctx.db, ctx.club.id, bookingId);
    if (!b) return apiError("not_found", "Not found.");
    return NextResponse.json({
      data: {
        id: b.id, aircraftId: b.aircraftId, registration: b.registration, status: b.status,
        startsAt: b.startsAt.toISOString(), endsAt: b.endsAt.toISOString(),
        member: b.memberName ?? b.memberEmail, instructor: b.instructorName, lateCancel: b.lateCancel,
        acceptedWarnings: visibleBookingWarnings(ctx.ability, ctx.user.id, b), flightId: b.flightId,
      },
    });
  });
}
