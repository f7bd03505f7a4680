"use server";
import { and, eq } from "drizzle-orm";
import { aircraft } from "@/db/schema";
import { findAircraftByRegistration, getAircraft } from "@/db/queries/fleet";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { writeAudit } from "@/lib/server/audit";
import { IMAGE_TYPES } from "@/lib/storage";
import { updateAircraftSchema } from "@/lib/validation/fleet";
import { aircraftValues } from "./aircraft-values";
import { checkFiles, discardStored, insertUploadRows, storeFiles, withStoredFiles } from "./files";

// Meter corrections go through here too, with the before/after in the audit log; the flight
// log is the normal way the meters move.
export const updateAircraft = clubAction({
  schema: updateAircraftSchema,
  permission: ["update", "Aircraft"],
  success: "Aircraft record saved.",
  async prepare({ db, club }, input) {
    if (!getAircraft(db, club.id, input.aircraftId)) throw new ActionError("That aircraft was not found in this club.", {}, "not_found");
    return storeFiles(await checkFiles(input.photo, IMAGE_TYPES, "photo"));
  },
  discard: discardStored,
  run(tx, { club, user }, input, stored) {
    return withStoredFiles(stored, () => {
      const current = getAircraft(tx, club.id, input.aircraftId);
      if (!current) throw new ActionError("That aircraft was not found in this club.", {}, "not_found");
      const clash = findAircraftByRegistration(tx, club.id, input.registration);
      if (clash && clash.id !== current.id) throw new ActionError(`${input.registration} is already on the club's fleet.`, { registration: ["Already on the fleet."] }, "conflict");
      const values = aircraftValues(club, input);
      const [photoId] = insertUploadRows(tx, { clubId: club.id, subjectType: "Aircraft", subjectId: current.id, uploadedById: user.id }, stored);
      tx.update(aircraft)
        .set({ ...values, ...(photoId ? { photoUploadId: photoId } : {}) })
        .where(and(eq(aircraft.clubId, club.id), eq(aircraft.id, current.id)))
        .run();
      const before = Object.fromEntries(Object.keys(values).map((k) => [k, current[k as keyof typeof current]]));
      writeAudit(tx, { clubId: club.id, actorId: user.id, action: "aircraft.update", subjectType: "Aircraft", subjectId: current.id, before, after: { ...values, ...(photoId ? { photoUploadId: photoId } : {}) } });
      return { refresh: true };
    });
  },
});
