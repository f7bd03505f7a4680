import { NextResponse } from "next/server";
import { listBookingsInRange } from "@/db/queries/bookings";
import { ActionError } from "@/lib/actions/action-state";
import { createBookingInTx } from "@/lib/actions/bookings/booking-core";
import { viewRange } from "@/lib/actions/bookings/range";
import { writeAudit } from "@/lib/server/audit";
import { apiError, withClub, zodToFields } from "@/lib/server/api";
import { idempotentJson } from "@/lib/server/idempotency";
import { bookingRangeSchema, createBookingSchema } from "@/lib/validation/bookings";

export const dynamic = "force-dynamic";

/** The fleet's bookings for a day or a week (club time), for views that refresh themselves. */
export async function GET(request: Request, { params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  return withClub(slug, ["read", "Booking"], (ctx) => {
    const url = new URL(request.url);
    const parsed = bookingRangeSchema.safeParse({ view: url.searchParams.get("view") ?? undefined, date: url.searchParams.get("date") ?? undefined });
    if (!parsed.success) return apiError("invalid", "Check the view and date.", zodToFields(parsed.error));
    const range = viewRange(ctx.club, parsed.data.view, parsed.data.date);
    const rows = listBookingsInRange(ctx.db, ctx.club.id, range.from, range.to);
    return NextResponse.json({
      data: {
        days: range.days.map((d) => d.date),
        bookings: rows.map((b) => ({
          id: b.id, aircraftId: b.aircraftId, registration: b.registration, status: b.status,
          startsAt: b.startsAt.toISOString(), endsAt: b.endsAt.toISOString(),
          member: b.memberName ?? b.memberEmail, instructor: b.instructorName, mine: b.userId === ctx.user.id || b.instructorId === ctx.user.id,
        })),
      },
    });
  });
}

/** Creates a booking from JSON: the same checks, in the same single transaction, as the form. */
export async function POST(request: Request, { params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  return withClub(slug, ["create", "Booking"], async (ctx) => {
    let body: unknown;
    try {
      body = await request.json();
    } catch {
      return apiError("invalid", "Send the booking as JSON.");
    }
    const parsed = createBookingSchema.safeParse(body);
    if (!parsed.success) return apiError("invalid", "Some fields need attention; nothing was saved.", zodToFields(parsed.error));
    try {
      // Once per Idempotency-Key header (optional): a retry answers the first 201 and writes nothing.
      return idempotentJson(request, { scope: ctx.club.id, actionName: "api:booking.create", actorUserId: ctx.user.id }, ctx.db, (tx) => {
        const made = createBookingInTx(tx, ctx, parsed.data);
        writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "booking.create", subjectType: "Booking", subjectId: made.bookingId, after: { via: "api", startsAt: made.window.startsAt.toISOString(), endsAt: made.window.endsAt.toISOString() } });
        return { status: 201, body: { data: { id: made.bookingId, warningsAccepted: made.acceptedWarnings } } };
      });
    } catch (error) {
      if (!(error instanceof ActionError)) throw error;
      if (error.code === "not_found") return apiError("not_found", error.message, error.fieldErrors);
      if (error.code === "forbidden") return apiError("forbidden", error.message, error.fieldErrors);
      if (error.code === "conflict") return apiError("conflict", error.message, error.fieldErrors);
      if (error.fieldErrors.refusals || error.fieldErrors.warnings) return apiError("unprocessable", error.message, error.fieldErrors);
      return apiError("invalid", error.message, error.fieldErrors);
    }
  });
}
