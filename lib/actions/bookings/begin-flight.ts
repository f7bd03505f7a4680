"use server";
import { claimBookingWriteLock, updateBookingRow } from "@/db/queries/bookings";
import { getAircraftStatusEntry } from "@/db/queries/fleet-status";
import { getPreflightRecord } from "@/db/queries/tools-preflight";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { limitationTexts } from "@/lib/bookings/guards";
import { writeAudit } from "@/lib/server/audit";
import { beginFlightSchema } from "@/lib/validation/bookings";
import { loadBookingForParty } from "./booking-access";

// Begin flight: the member confirms the preflight record of this booking and takes the
// aircraft. A grounded aircraft never begins a flight, whatever the booking guards allowed when it was booked; findings and a
// status that cannot be computed ("Status unknown") need the member's explicit tick.
export const beginFlight = clubAction({
  schema: beginFlightSchema,
  permission: ["create", "Flight"],
  success: "Flight begun.",
  run(tx, ctx, input) {
    claimBookingWriteLock(tx);
    const { club, user, db } = ctx;
    const booking = loadBookingForParty(tx, ctx, input.bookingId);
    if (booking.status === "dispatched") return { message: "This flight has already begun." };
    if (booking.status !== "reserved") throw new ActionError(`This booking is ${booking.status === "checked_in" ? "flown and its flight sheet closed" : "cancelled"}; its flight cannot begin.`, {}, "conflict");
    const record = getPreflightRecord(tx, club.id, input.preflightRecordId);
    if (!record || record.bookingId !== booking.id) throw new ActionError("Record the preflight on this booking first.", { preflightRecordId: ["Choose this booking's preflight record."] }, "not_found");
    // Read through the context's connection: the same transaction, the flight line's own rules.
    const status = getAircraftStatusEntry(db, club, booking.aircraftId);
    if (!status) throw new ActionError("That aircraft was not found in this club.", {}, "not_found");
    if (status.status === "grounded") {
      throw new ActionError(`Flight not begun: the aircraft is grounded — ${status.reasons.filter((r) => r.grounding).map((r) => r.text).join("; ")}.`, {}, "conflict");
    }
    // Flyable with limits: the pilot reads each limitation again here, whatever was accepted
    // when booking (a limitation may have been added since), and ticks that they will fly
    // within it (14 CFR 91.213(d)(3)). Without the tick nothing is written.
    const limitations = limitationTexts(status.reasons);
    if (limitations.length && !input.acceptLimitations) {
      throw new ActionError(
        `Flight not begun: ${status.aircraft.registration} flies with limits. Read each limitation and tick that you will fly within it.`,
        { acceptLimitations: limitations },
      );
    }
    const concerns = [
      ...(record.outcome === "findings" ? record.items.filter((i) => i.result === "finding").map((i) => `Finding: ${i.label}${i.note ? ` — ${i.note}` : ""}`) : []),
      ...(record.outcome === "findings" && record.findingCount > record.items.filter((i) => i.result === "finding").length ? ["The record has fuel, sump or oil findings."] : []),
      ...(status.status === "unknown" ? [`Status unknown: ${status.reasons.filter((r) => !r.grounding).map((r) => r.text).join("; ")}`] : []),
    ];
    if (concerns.length && !input.acceptFindings) {
      throw new ActionError("Read what the preflight and the records show. Tick that you, as pilot in command, have dealt with each before flight.", { acceptFindings: concerns });
    }
    const now = new Date();
    updateBookingRow(tx, club.id, booking.id, { status: "dispatched", dispatchedAt: now, dispatchedById: user.id, preflightRecordId: record.id });
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "booking.flight.begin", subjectType: "Booking", subjectId: booking.id, before: { status: booking.status }, after: { status: "dispatched", preflightRecordId: record.id, accepted: concerns, limitationsAccepted: limitations } });
    return { message: `Flight begun: ${status.aircraft.registration} is out on your booking. Close the flight sheet when you are back.`, refresh: true };
  },
});
