"use server";
import { getAircraft } from "@/db/queries/fleet";
import { createSquawk } from "@/db/queries/fleet-squawks";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { kickOutbox } from "@/lib/email/runner";
import { toldText } from "@/lib/fleet/squawk-words";
import { IMAGE_TYPES } from "@/lib/storage";
import { reportSquawkSchema } from "@/lib/validation/fleet";
import { checkFiles, discardStored, insertUploadRows, storeFiles, withStoredFiles } from "./files";
import { alertPossiblyUnsafeSquawk } from "./squawk-alert";

// Any member may report; the squawk weighs on the status at once (untriaged is never flyable
// without a look, and "may affect airworthiness" grounds until maintenance triages it).
// "May make the aircraft unsafe" e-mails maintenance and the holders of upcoming bookings on
// the aircraft at once, through the outbox in this transaction. The answer says only what
// happened: who was e-mailed, or nothing beyond "Squawk reported".

export const reportSquawk = clubAction({
  schema: reportSquawkSchema,
  permission: ["create", "Squawk"],
  success: "Squawk reported.",
  after: () => kickOutbox(),
  async prepare({ db, club }, input) {
    if (!getAircraft(db, club.id, input.aircraftId)) throw new ActionError("That aircraft was not found in this club.", {}, "not_found");
    return storeFiles(await checkFiles(input.photos, IMAGE_TYPES, "photos"));
  },
  discard: discardStored,
  run(tx, { club, user }, input, stored) {
    return withStoredFiles(stored, () => {
      const plane = getAircraft(tx, club.id, input.aircraftId);
      if (!plane || plane.retiredAt) throw new ActionError("That aircraft was not found in this club.", {}, "not_found");
      const row = {
        id: createSquawk(tx, {
          clubId: club.id, aircraftId: plane.id, reportedById: user.id, description: input.description, foundDuring: input.foundDuring, suspectedGrounding: input.suspectedGrounding,
          note: input.suspectedGrounding ? "Reported as possibly affecting airworthiness." : null,
        }),
      };
      insertUploadRows(tx, { clubId: club.id, subjectType: "Squawk", subjectId: row.id, uploadedById: user.id }, stored);
      const { maintenance, booking } = input.suspectedGrounding
        ? alertPossiblyUnsafeSquawk(tx, club, plane, { id: row.id, description: input.description, foundDuring: input.foundDuring, reporter: { id: user.id, name: user.name ?? null } })
        : { maintenance: 0, booking: 0 };
      const told = toldText(maintenance, booking);
      // The form shows this answer in place, quoting what was reported and saying only who was
      // e-mailed (nobody unless it was marked as possibly unsafe); then the page's lists refresh.
      return {
        message: `Squawk reported: “${input.description}”.${told ? ` ${told[0]!.toUpperCase()}${told.slice(1)}.` : ""}`,
        data: { squawkId: row.id, emailed: { maintenance, booking } },
        refresh: true,
      };
    });
  },
});
