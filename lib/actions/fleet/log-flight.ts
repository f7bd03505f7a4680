"use server";
import { and, eq } from "drizzle-orm";
import { memberships } from "@/db/schema";
import { getAircraft } from "@/db/queries/fleet";
import { openFlightBooking, recordFlight, type RecordedFlight } from "@/db/queries/flight-record";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { asFlightActionError } from "@/lib/actions/bookings/flight-entry";
import { isoDateInTimeZone } from "@/lib/dates";
import { formatMoney } from "@/lib/money";
import { writeAudit } from "@/lib/server/audit";
import { logFlightSchema } from "@/lib/validation/fleet";
import { can } from "@/permissions";

// A flight entered without a booking goes through the same write path as a booking's flight sheet
// (recordFlight in db/queries/flight-record.ts): one transaction writes the flight, its
// continuity flag, the aircraft's meters, the squawk and the pilot's charge at the aircraft's
// rate. A flight that belongs to a booking still out is refused here: its flight sheet is closed on the
// booking, so it is logged and charged once.
export const logFlight = clubAction({
  schema: logFlightSchema,
  permission: ["create", "Flight"],
  success: "Flight logged.",
  run(tx, ctx, input) {
    const { club, user, ability } = ctx;
    const plane = getAircraft(tx, club.id, input.aircraftId);
    if (!plane || plane.retiredAt) throw new ActionError("That aircraft was not found in this club.", {}, "not_found");
    const pilotId = input.pilotId ?? user.id;
    if (pilotId !== user.id) {
      if (!can(ability, "update", "Flight")) throw new ActionError("You can log only your own flights.", { pilotId: ["Only instructors and maintenance log flights for others."] }, "forbidden");
      const pilot = tx.select({ id: memberships.id }).from(memberships).where(and(eq(memberships.clubId, club.id), eq(memberships.userId, pilotId), eq(memberships.status, "active"))).get();
      if (!pilot) throw new ActionError("Some fields need attention; nothing was saved.", { pilotId: ["That pilot is not an active member of this club."] });
    }
    if (input.flownOn > isoDateInTimeZone(new Date(), club.timeZone)) {
      throw new ActionError("Some fields need attention; nothing was saved.", { flownOn: ["The date cannot be in the future."] });
    }
    if (openFlightBooking(tx, club.id, plane.id, pilotId)) {
      throw new ActionError("This aircraft is out on a booking of this pilot: close the booking's flight sheet instead, so the flight is logged and charged once. Nothing was saved.", {}, "conflict");
    }

    let entry: RecordedFlight;
    try {
      entry = recordFlight(tx, ctx, { plane, pilotId, recordedById: user.id, flownOn: input.flownOn, readings: input, via: "flight log" });
    } catch (error) {
      asFlightActionError(error, "Not logged");
    }
    const charge = entry.charge;
    writeAudit(tx, {
      clubId: club.id, actorId: user.id, action: "flight.log", subjectType: "Flight", subjectId: entry.flightId,
      after: { pilotId, continuity: entry.continuity, meterExplanation: input.meterExplanation ?? null, chargeMinor: charge.netMinor, entryId: charge.entryId, chargedOn: entry.chargedOn },
    });

    const flagged = entry.continuity !== "ok";
    const charged = charge.entryId
      ? ` ${formatMoney(charge.netMinor, club.currency, club.locale)} charged to the pilot's account${entry.chargedOn !== input.flownOn ? ` on ${entry.chargedOn}, the first open day (${input.flownOn} is in a locked period)` : ""}.`
      : " No charge posted: the aircraft has no hourly rate (the treasurer sees the flight as uncharged).";
    return {
      message: flagged
        ? `Flight logged, and flagged for maintenance and the treasurer: ${entry.continuityText}.${charged}`
        : `Flight logged; the meters continue from the previous flight.${charged}`,
      data: { flightId: entry.flightId, continuity: entry.continuity, chargeMinor: charge.netMinor, entryId: charge.entryId },
      refresh: true,
    };
  },
});
