"use server";
import { claimBookingWriteLock, updateBookingRow } from "@/db/queries/bookings";
import { getAircraft } from "@/db/queries/fleet";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { isoDateInTimeZone } from "@/lib/dates";
import { isLedgerError } from "@/lib/ledger/errors";
import { postFlightCharge } from "@/lib/ledger/flight-charges";
import { formatMoney } from "@/lib/money";
import { writeAudit } from "@/lib/server/audit";
import { checkInSchema } from "@/lib/validation/bookings";
import { loadBookingForParty } from "./booking-access";
import { writeFlightEntry } from "./flight-entry";

// Check-in, in one transaction: the flight-log entry (meters, landings, fuel, oil, squawk), the
// aircraft's meters moved on, the flight charge posted to the member's account, the booking
// closed. A second submit finds the booking checked in and writes nothing: one flight, one charge.
export const checkInBooking = clubAction({
  schema: checkInSchema,
  permission: ["create", "Flight"],
  success: "Checked in.",
  run(tx, ctx, input) {
    claimBookingWriteLock(tx);
    const { club, user } = ctx;
    const booking = loadBookingForParty(tx, ctx, input.bookingId);
    if (booking.status === "checked_in") {
      return { message: "This booking was already checked in; nothing was logged or charged twice.", data: { flightId: booking.flightId, chargeMinor: null, continuity: null, alreadyCheckedIn: true } };
    }
    if (booking.status !== "dispatched") throw new ActionError("Dispatch the booking first: confirm the preflight record, then fly, then check in.", {}, "conflict");
    const plane = getAircraft(tx, club.id, booking.aircraftId);
    if (!plane) throw new ActionError("That aircraft was not found in this club.", {}, "not_found");
    const flownOn = isoDateInTimeZone(booking.dispatchedAt ?? booking.startsAt, club.timeZone);
    const entry = writeFlightEntry(tx, club, plane, { pilotId: booking.userId, recordedById: user.id }, flownOn, input);

    const [meterOut, meterIn] = plane.rateMeter === "tach" ? [input.tachOut, input.tachIn] : [input.hobbsOut, input.hobbsIn];
    let charge;
    try {
      charge = postFlightCharge(tx, ctx, { clubId: club.id, memberUserId: booking.userId, flightId: entry.flightId, meterOut, meterIn, ratePerHourMinor: plane.hourlyRateMinor, date: flownOn, aircraftLabel: plane.registration });
    } catch (error) {
      if (isLedgerError(error)) throw new ActionError(`Not checked in: ${error.message}`, { _form: [error.message] }, "conflict");
      throw error;
    }
    const now = new Date();
    updateBookingRow(tx, club.id, booking.id, { status: "checked_in", checkedInAt: now, flightId: entry.flightId });
    writeAudit(tx, {
      clubId: club.id, actorId: user.id, action: "booking.checkin", subjectType: "Booking", subjectId: booking.id,
      before: { status: booking.status, hobbs: plane.currentHobbs, tach: plane.currentTach },
      after: { status: "checked_in", flightId: entry.flightId, continuity: entry.continuity, chargeMinor: charge.netMinor, entryId: charge.entryId },
    });
    const flag = entry.continuity === "ok" ? "" : ` The meters do not continue from the previous flight and are flagged for maintenance: ${entry.continuityText}.`;
    return {
      message: `Checked in: flight logged and ${formatMoney(charge.netMinor, club.currency)} charged to the account.${entry.squawkId ? " Your squawk is with maintenance." : ""}${flag}`,
      data: { flightId: entry.flightId as string | null, chargeMinor: charge.netMinor as number | null, continuity: entry.continuity as string | null, alreadyCheckedIn: false },
      refresh: true,
    };
  },
});
