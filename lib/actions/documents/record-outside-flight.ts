"use server";
import { outsideFlightEntries } from "@/db/schema";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { clubToday } from "@/lib/actions/safety/bulletin-publishing";
import { compareIsoDates } from "@/lib/dates";
import { canOn } from "@/permissions";
import { outsideFlightSchema } from "@/lib/validation/safety";

/** Landings flown outside the club's own log (another club, a rental) count toward currency. */
export const recordOutsideFlight = clubAction({
  schema: outsideFlightSchema,
  permission: (ability, _input, ctx) => canOn(ability, "create", "Currency", { userId: ctx.user.id }),
  // Entered by the member about themselves: a claim until an instructor or the safety officer
  // verifies it against the logbook (verifiedAt stays null here).
  success: "Flight added. It shows as claimed, and counts toward your currency once an instructor or the safety officer verifies it against your logbook.",
  run(tx, ctx, input) {
    if (compareIsoDates(input.flownOn, clubToday(ctx)) > 0) throw new ActionError("Some fields need attention; nothing was saved.", { flownOn: ["The date cannot be in the future."] });
    tx.insert(outsideFlightEntries)
      .values({
        clubId: ctx.club.id,
        userId: ctx.user.id,
        flownOn: input.flownOn,
        aircraftDescription: input.aircraftDescription,
        typeGroup: input.typeGroup ?? null,
        category: input.category,
        classRating: input.classRating,
        tailwheel: input.tailwheel,
        dayLandings: input.dayLandings,
        dayFullStopLandings: input.dayFullStopLandings,
        nightFullStopLandings: input.nightFullStopLandings,
        note: input.note ?? null,
      })
      .run();
    return { refresh: true };
  },
});
