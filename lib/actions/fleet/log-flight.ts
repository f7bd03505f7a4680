"use server";
import { and, eq } from "drizzle-orm";
import { aircraft, flights, memberships, squawks } from "@/db/schema";
import { getAircraft } from "@/db/queries/fleet";
import { findNeighbourFlights } from "@/db/queries/fleet-flights";
import { recordSquawkEvent } from "@/db/queries/fleet-squawks";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { roundHours } from "@/lib/airworthiness";
import { isoDateInTimeZone } from "@/lib/dates";
import { advanceMeters, checkBetween } from "@/lib/fleet/continuity";
import { logFlightSchema } from "@/lib/validation/fleet";
import { can } from "@/permissions";

// One transaction: the flight, its continuity flag, the aircraft's current meters (which the
// flight line reads instead of the flights) and, when one was found, the squawk.
export const logFlight = clubAction({
  schema: logFlightSchema,
  permission: ["create", "Flight"],
  success: "Flight logged.",
  run(tx, { club, user, ability }, input) {
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

    const { previous, following } = findNeighbourFlights(tx, club.id, plane.id, input.hobbsOut);
    // The aircraft's first logged flight continues from the meters on its record.
    const before = previous ?? (plane.currentHobbs !== null && plane.currentTach !== null && !following ? { hobbsIn: plane.currentHobbs, tachIn: plane.currentTach } : null);
    const continuity = checkBetween(before, input, following ?? null);
    const metric = club.unitSystem === "metric";
    const [row] = tx
      .insert(flights)
      .values({
        clubId: club.id,
        aircraftId: plane.id,
        pilotId,
        flownOn: input.flownOn,
        hobbsOut: input.hobbsOut,
        hobbsIn: input.hobbsIn,
        tachOut: input.tachOut,
        tachIn: input.tachIn,
        dayLandings: input.dayLandings,
        dayFullStopLandings: input.dayFullStopLandings,
        nightFullStopLandings: input.nightFullStopLandings,
        fuelAdded: input.fuelAdded,
        oilAdded: input.oilAdded,
        fuelUnit: metric ? "l" : "gal",
        oilUnit: metric ? "l" : "qt",
        notes: input.notes,
        continuity: continuity.status,
        continuityText: continuity.issues.length ? continuity.issues.map((i) => i.text).join("; ") : null,
        recordedById: user.id,
      })
      .returning({ id: flights.id })
      .all();

    const meters = advanceMeters({ hobbs: plane.currentHobbs, tach: plane.currentTach }, input);
    const tachAdded = roundHours(meters.tach - (plane.currentTach ?? meters.tach));
    tx.update(aircraft)
      .set({
        currentHobbs: meters.hobbs,
        currentTach: meters.tach,
        ...(plane.engineTimeSinceOverhaul !== null && tachAdded > 0 ? { engineTimeSinceOverhaul: roundHours(plane.engineTimeSinceOverhaul + tachAdded) } : {}),
      })
      .where(and(eq(aircraft.clubId, club.id), eq(aircraft.id, plane.id)))
      .run();

    if (input.squawk) {
      const [sq] = tx
        .insert(squawks)
        .values({ clubId: club.id, aircraftId: plane.id, flightId: row!.id, reportedById: user.id, description: input.squawk, foundDuring: "flight" })
        .returning({ id: squawks.id })
        .all();
      recordSquawkEvent(tx, { clubId: club.id, squawkId: sq!.id, kind: "reported", actorId: user.id, toTriage: "untriaged", note: "Reported with the flight log." });
    }

    const flagged = continuity.status !== "ok";
    return {
      message: flagged
        ? `Flight logged, and flagged for maintenance: ${continuity.issues.map((i) => i.text).join("; ")}.`
        : "Flight logged; the meters continue from the previous flight.",
      data: { flightId: row!.id, continuity: continuity.status },
      refresh: true,
    };
  },
});
