"use server";
import { claimBookingWriteLock, updateBookingRow } from "@/db/queries/bookings";
import { getAircraft } from "@/db/queries/fleet";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { isoDateInTimeZone } from "@/lib/dates";
import { recordFlight, type RecordedFlight } from "@/db/queries/flight-record";
import { formatMoney } from "@/lib/money";
import { writeAudit } from "@/lib/server/audit";
import { flightSheetSchema } from "@/lib/validation/bookings";
import { loadBookingForParty } from "./booking-access";
import { asFlightActionError } from "./flight-entry";

// Closing the flight sheet, in one transaction: the flight through the one write path of a flight (recordFlight:
// meters, landings, fuel, oil, squawk, the aircraft's meters moved on, the charge posted to the
// member's account), then the booking closed. Meters that do not continue from the aircraft's
// last "in" reading are flagged on this flight and must be explained before it closes. A second
// submit finds the sheet closed and writes nothing: one flight, one charge.
export const closeFlightSheet = clubAction({
  schema: flightSheetSchema,
  permission: ["create", "Flight"],
  success: "Flight sheet closed.",
  run(tx, ctx, input) {
    claimBookingWriteLock(tx);
    const { club, user } = ctx;
    const booking = loadBookingForParty(tx, ctx, input.bookingId);
    if (booking.status === "checked_in") {
      return { message: "This flight sheet was already closed; nothing was logged or charged twice.", data: { flightId: booking.flightId, chargeMinor: null, continuity: null, alreadyClosed: true } };
    }
    if (booking.status !== "dispatched") throw new ActionError("Begin the flight first: confirm the preflight record, then fly, then close the flight sheet.", {}, "conflict");
    const plane = getAircraft(tx, club.id, booking.aircraftId);
    if (!plane) throw new ActionError("That aircraft was not found in this club.", {}, "not_found");
    const flownOn = isoDateInTimeZone(booking.dispatchedAt ?? booking.startsAt, club.timeZone);
    let entry: RecordedFlight;
    try {
      entry = recordFlight(tx, ctx, { plane, pilotId: booking.userId, recordedById: user.id, flownOn, readings: input, bookingId: booking.id, via: "flight sheet" });
    } catch (error) {
      asFlightActionError(error, "Flight sheet not closed");
    }
    const charge = entry.charge;
    const now = new Date();
    updateBookingRow(tx, club.id, booking.id, { status: "checked_in", checkedInAt: now, flightId: entry.flightId });
    writeAudit(tx, {
      clubId: club.id, actorId: user.id, action: "booking.flight.close", subjectType: "Booking", subjectId: booking.id,
      before: { status: booking.status, hobbs: plane.currentHobbs, tach: plane.currentTach },
      after: { status: "checked_in", flightId: entry.flightId, continuity: entry.continuity, meterExplanation: input.meterExplanation ?? null, chargeMinor: charge.netMinor, entryId: charge.entryId, chargedOn: entry.chargedOn },
    });
    const flag = entry.continuity === "ok" ? "" : ` The meters do not continue from the previous flight: flagged on this flight with your explanation, for maintenance and the treasurer (${entry.continuityText}).`;
    const charged = charge.entryId
      ? `${formatMoney(charge.netMinor, club.currency, club.locale)} charged to the account${entry.chargedOn !== flownOn ? ` on ${entry.chargedOn}, the first open day (${flownOn} is in a locked period)` : ""}`
      : "no charge posted: the aircraft has no hourly rate (the treasurer sees the flight as uncharged)";
    return {
      message: `Flight sheet closed: flight logged and ${charged}.${entry.squawkId ? " Your squawk is with maintenance." : ""}${flag}`,
      data: { flightId: entry.flightId as string | null, chargeMinor: charge.netMinor as number | null, continuity: entry.continuity as string | null, alreadyClosed: false },
      refresh: true,
    };
  },
});
