"use server";
import { and, eq } from "drizzle-orm";
import { aircraft, meterConversions } from "@/db/schema";
import { findAircraftByRegistration, getAircraft } from "@/db/queries/fleet";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { writeAudit } from "@/lib/server/audit";
import { can } from "@/permissions";
import { IMAGE_TYPES } from "@/lib/storage";
import { updateAircraftSchema } from "@/lib/validation/fleet";
import { aircraftValues } from "./aircraft-values";
import { checkFiles, discardStored, insertUploadRows, storeFiles, withStoredFiles } from "./files";

// Meter corrections go through here too, with the before/after in the audit log; the flight
// log is the normal way the meters move.
//
// Meter provenance (issue 11):
// - Switching "Inspections count by" needs the conversion reading: the reading on the new meter
//   at the switch, typed again beside the current reading as a deliberate check. It is kept as
//   a meter_conversions row (no completion: nothing was inspected), with the old meter's reading
//   at the same moment. It does not translate old completions by itself: Hobbs and tach run at
//   different rates, so each hours-based item stays "Status unknown" until maintenance records
//   where its last completion stands on the new meter (recordMeterConversion) or a new one.
// - Lowering a current reading takes the maintenance role (the right to record inspections)
//   and a reason; it is audited on its own with the reason. Raising stays an ordinary edit.

const METER_WORD = { hobbs: "Hobbs", tach: "tach" } as const;
const READING_TOLERANCE = 0.05;

function lowered(before: number | null, after: number): boolean {
  return before !== null && after < before - 0.005;
}
export const updateAircraft = clubAction({
  schema: updateAircraftSchema,
  permission: ["update", "Aircraft"],
  success: "Aircraft record saved.",
  async prepare({ db, club }, input) {
    if (!getAircraft(db, club.id, input.aircraftId)) throw new ActionError("That aircraft was not found in this club.", {}, "not_found");
    return storeFiles(await checkFiles(input.photo, IMAGE_TYPES, "photo"));
  },
  discard: discardStored,
  run(tx, ctx, input, stored) {
    const { club, user } = ctx;
    return withStoredFiles(stored, () => {
      const current = getAircraft(tx, club.id, input.aircraftId);
      if (!current) throw new ActionError("That aircraft was not found in this club.", {}, "not_found");
      const clash = findAircraftByRegistration(tx, club.id, input.registration);
      if (clash && clash.id !== current.id) throw new ActionError(`${input.registration} is already on the club's fleet.`, { registration: ["Already on the fleet."] }, "conflict");
      const errors: Record<string, string[]> = {};
      const switching = input.maintenanceMeter !== current.maintenanceMeter;
      const newMeterReading = input.maintenanceMeter === "hobbs" ? input.currentHobbs : input.currentTach;
      const oldMeterReading = current.maintenanceMeter === "hobbs" ? input.currentHobbs : input.currentTach;
      if (switching) {
        const word = METER_WORD[input.maintenanceMeter];
        if (input.conversionReading === null) {
          errors.conversionReading = [`Switching inspections to the ${word} needs the ${word} reading at the switch. Read it off the aircraft and enter it here.`];
        } else if (Math.abs(input.conversionReading - newMeterReading) > READING_TOLERANCE) {
          errors.conversionReading = [`The conversion reading must be the current ${word} entered above (${newMeterReading.toFixed(1)}); check both.`];
        }
      }
      const lowerings = (["currentHobbs", "currentTach"] as const).filter((field) => lowered(current[field], input[field]));
      if (lowerings.length) {
        const mayLower = can(ctx.ability, "record", "Inspection");
        for (const field of lowerings) {
          const word = field === "currentHobbs" ? "Hobbs" : "tach";
          if (!mayLower) errors[field] = [`Only maintenance may lower the ${word} (from ${current[field]!.toFixed(1)}); flights move the meters.`];
        }
        if (mayLower && input.readingChangeReason === null) errors.readingChangeReason = ["Say why the reading goes down (e.g. meter replaced, typing error); it is kept in the audit log."];
      }
      if (Object.keys(errors).length) throw new ActionError(lowerings.length && !can(ctx.ability, "record", "Inspection") ? "Only maintenance may lower a meter reading; nothing was saved." : "Some fields need attention; nothing was saved.", errors);

      const values = aircraftValues(club, input);
      const [photoId] = insertUploadRows(tx, { clubId: club.id, subjectType: "Aircraft", subjectId: current.id, uploadedById: user.id }, stored);
      tx.update(aircraft)
        .set({ ...values, ...(photoId ? { photoUploadId: photoId } : {}) })
        .where(and(eq(aircraft.clubId, club.id), eq(aircraft.id, current.id)))
        .run();
      const before = Object.fromEntries(Object.keys(values).map((k) => [k, current[k as keyof typeof current]]));
      if (switching) {
        const [conversion] = tx
          .insert(meterConversions)
          .values({ clubId: club.id, aircraftId: current.id, completionId: null, fromMeter: current.maintenanceMeter, fromReading: oldMeterReading, toMeter: input.maintenanceMeter, toReading: newMeterReading, note: input.readingChangeReason, recordedById: user.id })
          .returning({ id: meterConversions.id })
          .all();
        writeAudit(tx, { clubId: club.id, actorId: user.id, action: "aircraft.meter.switch", subjectType: "Aircraft", subjectId: current.id, before: { maintenanceMeter: current.maintenanceMeter }, after: { maintenanceMeter: input.maintenanceMeter, conversionId: conversion!.id, [current.maintenanceMeter]: oldMeterReading, [input.maintenanceMeter]: newMeterReading } });
      }
      for (const field of lowerings) {
        writeAudit(tx, { clubId: club.id, actorId: user.id, action: "aircraft.meter.lower", subjectType: "Aircraft", subjectId: current.id, before: { [field]: current[field] }, after: { [field]: input[field], reason: input.readingChangeReason } });
      }
      writeAudit(tx, { clubId: club.id, actorId: user.id, action: "aircraft.update", subjectType: "Aircraft", subjectId: current.id, before, after: { ...values, ...(photoId ? { photoUploadId: photoId } : {}) } });
      const message = switching
        ? `Aircraft record saved. Inspections now count by the ${METER_WORD[input.maintenanceMeter]}; hours-based items show "Status unknown" until maintenance records their last completion on the ${METER_WORD[input.maintenanceMeter]}.`
        : undefined;
      return { message, refresh: true };
    });
  },
});
