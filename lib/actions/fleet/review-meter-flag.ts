"use server";
import { and, eq, isNull } from "drizzle-orm";
import { flights } from "@/db/schema";
import { getFlight } from "@/db/queries/fleet-flights";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { writeAudit } from "@/lib/server/audit";
import { reviewMeterFlagSchema } from "@/lib/validation/fleet";

// Maintenance looks at a gap or overlap and records what it found. The flag itself stays on
// the flight: the record shows that the meters did not continue, and who looked at it.
export const reviewMeterFlag = clubAction({
  schema: reviewMeterFlagSchema,
  permission: ["update", "Flight"],
  success: "Meter flag reviewed.",
  run(tx, { club, user }, input) {
    const flight = getFlight(tx, club.id, input.flightId);
    if (!flight) throw new ActionError("That flight was not found in this club.", {}, "not_found");
    if (flight.continuity === "ok") throw new ActionError("That flight has no meter flag.", {}, "conflict");
    const result = tx
      .update(flights)
      .set({ continuityReviewedAt: new Date(), continuityReviewedById: user.id, continuityReviewNote: input.note })
      .where(and(eq(flights.clubId, club.id), eq(flights.id, flight.id), isNull(flights.continuityReviewedAt)))
      .run();
    if (result.changes === 0) throw new ActionError("Someone already reviewed that flag.", {}, "conflict");
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "flight.meter.review", subjectType: "Flight", subjectId: flight.id, before: { continuity: flight.continuity, text: flight.continuityText }, after: { note: input.note } });
    return { refresh: true };
  },
});
