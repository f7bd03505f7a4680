"use server";
import { squawks } from "@/db/schema";
import { getAircraft } from "@/db/queries/fleet";
import { recordSquawkEvent } from "@/db/queries/fleet-squawks";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { IMAGE_TYPES } from "@/lib/storage";
import { reportSquawkSchema } from "@/lib/validation/fleet";
import { checkFiles, discardStored, insertUploadRows, storeFiles, withStoredFiles } from "./files";

// Any member may report; the squawk weighs on the status at once (untriaged is never flyable
// without a look, and "may affect airworthiness" grounds until maintenance triages it).
export const reportSquawk = clubAction({
  schema: reportSquawkSchema,
  permission: ["create", "Squawk"],
  success: "Squawk reported.",
  async prepare({ db, club }, input) {
    if (!getAircraft(db, club.id, input.aircraftId)) throw new ActionError("That aircraft was not found in this club.", {}, "not_found");
    return storeFiles(await checkFiles(input.photos, IMAGE_TYPES, "photos"));
  },
  discard: discardStored,
  run(tx, { club, user }, input, stored) {
    return withStoredFiles(stored, () => {
      const plane = getAircraft(tx, club.id, input.aircraftId);
      if (!plane || plane.retiredAt) throw new ActionError("That aircraft was not found in this club.", {}, "not_found");
      const [row] = tx
        .insert(squawks)
        .values({ clubId: club.id, aircraftId: plane.id, reportedById: user.id, description: input.description, foundDuring: input.foundDuring, suspectedGrounding: input.suspectedGrounding })
        .returning({ id: squawks.id })
        .all();
      recordSquawkEvent(tx, { clubId: club.id, squawkId: row!.id, kind: "reported", actorId: user.id, toTriage: "untriaged", note: input.suspectedGrounding ? "Reported as possibly affecting airworthiness." : null });
      insertUploadRows(tx, { clubId: club.id, subjectType: "Squawk", subjectId: row!.id, uploadedById: user.id }, stored);
      // The form shows this answer in place (quoting what was reported), then the page's lists refresh.
      return { message: `Squawk reported: “${input.description}”.`, data: { squawkId: row!.id }, refresh: true };
    });
  },
});
