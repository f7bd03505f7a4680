"use server";
import { settleMeterGap } from "@/db/queries/flight-record";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { writeAudit } from "@/lib/server/audit";
import { settleMeterGapSchema } from "@/lib/validation/money";

// The treasurer settles a flight whose meters did not continue: the pilot's explanation is
// their own word, so the flag leaves the treasurer's list only with the treasurer's note (the
// gap time charged by an adjustment, or the explanation accepted). The flag stays on the flight.
export const settleMeterGapAction = clubAction({
  schema: settleMeterGapSchema,
  permission: ["create", "Ledger"],
  success: "Meter gap settled.",
  run(tx, ctx, input) {
    const result = settleMeterGap(tx, ctx.club.id, input.flightId, ctx.user.id, input.note);
    if (result === "not-found") throw new ActionError("That flight was not found in this club.", {}, "not_found");
    if (result === "not-flagged") throw new ActionError("That flight's meters continue; there is nothing to settle.", {}, "conflict");
    if (result === "already") throw new ActionError("Someone already settled that flight.", {}, "conflict");
    writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "flight.meter.settle", subjectType: "Flight", subjectId: result.id, before: { continuity: result.continuity, text: result.continuityText, explanation: result.meterExplanation }, after: { note: input.note } });
    return { message: `Settled: the flight of ${result.flownOn} leaves the list of meter gaps.`, refresh: true };
  },
});
