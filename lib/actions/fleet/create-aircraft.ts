"use server";
import { aircraft, inspectionItems } from "@/db/schema";
import { findAircraftByRegistration } from "@/db/queries/fleet";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { writeAudit } from "@/lib/server/audit";
import { createAircraftSchema } from "@/lib/validation/fleet";
import { aircraftValues, defaultItemRows } from "./aircraft-values";

export const createAircraft = clubAction({
  schema: createAircraftSchema,
  permission: ["create", "Aircraft"],
  success: "Aircraft added with its default inspection items. Record their last completions next.",
  run(tx, { club, user }, input) {
    if (findAircraftByRegistration(tx, club.id, input.registration)) {
      throw new ActionError(`${input.registration} is already on the club's fleet.`, { registration: ["Already on the fleet."] }, "conflict");
    }
    const values = aircraftValues(club, input);
    const [row] = tx.insert(aircraft).values({ clubId: club.id, ...values }).returning({ id: aircraft.id }).all();
    const id = row!.id;
    tx.insert(inspectionItems).values(defaultItemRows(club, id)).run();
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "aircraft.create", subjectType: "Aircraft", subjectId: id, after: values });
    return { data: { aircraftId: id }, refresh: true, redirectTo: `/clubs/${club.slug}/aircraft/${id}` };
  },
});
