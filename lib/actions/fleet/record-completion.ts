"use server";
import { and, eq } from "drizzle-orm";
import { inspectionCompletions, inspectionItems } from "@/db/schema";
import { getAircraft, getItem } from "@/db/queries/fleet";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { isoDateInTimeZone } from "@/lib/dates";
import { maintenanceHours } from "@/lib/fleet/status-input";
import { writeAudit } from "@/lib/server/audit";
import { DOCUMENT_TYPES } from "@/lib/storage";
import { recordCompletionSchema } from "@/lib/validation/fleet";
import { checkFiles, discardStored, insertUploadRows, storeFiles, withStoredFiles } from "./files";

const HOURS_RULES = new Set(["hours", "months-or-hours"]);

export const recordCompletion = clubAction({
  schema: recordCompletionSchema,
  permission: ["record", "Inspection"],
  success: "Completion recorded.",
  async prepare({ db, club }, input) {
    if (!getItem(db, club.id, input.itemId)) throw new ActionError("That inspection item was not found in this club.", {}, "not_found");
    return storeFiles(await checkFiles(input.document, DOCUMENT_TYPES, "document"));
  },
  discard: discardStored,
  run(tx, { club, user }, input, stored) {
    return withStoredFiles(stored, () => {
      const item = getItem(tx, club.id, input.itemId);
      if (!item || item.retiredAt) throw new ActionError("That inspection item was not found in this club.", {}, "not_found");
      const plane = getAircraft(tx, club.id, item.aircraftId);
      if (!plane) throw new ActionError("That aircraft was not found in this club.", {}, "not_found");
      const errors: Record<string, string[]> = {};
      const today = isoDateInTimeZone(new Date(), club.timeZone);
      if (input.doneOn > today) errors.doneOn = ["The date cannot be in the future."];
      if (HOURS_RULES.has(item.ruleKind) && input.hours === null) errors.hours = [`Enter the ${plane.maintenanceMeter} reading when it was done: this item counts hours.`];
      const meter = maintenanceHours(plane);
      if (input.hours !== null && meter !== null && input.hours > meter + 0.05) errors.hours = [`That is past the aircraft's current ${plane.maintenanceMeter} (${meter.toFixed(1)}); check the reading.`];
      if (item.ruleKind === "fixed-date" && input.expiresOn === null) errors.expiresOn = ["Enter the date this completion expires (e.g. the battery's 50 % life date)."];
      if (input.expiresOn !== null && input.expiresOn <= input.doneOn) errors.expiresOn = ["The expiry must be after the date it was done."];
      if (Object.keys(errors).length) throw new ActionError("Some fields need attention; nothing was saved.", errors);

      const values = {
        clubId: club.id,
        aircraftId: plane.id,
        itemId: item.id,
        doneOn: input.doneOn,
        hours: input.hours,
        // Meter provenance: the reading is on the meter the aircraft's inspections count by now.
        meter: plane.maintenanceMeter,
        expiresOn: item.ruleKind === "fixed-date" ? input.expiresOn : null,
        mechanicName: input.mechanicName,
        mechanicCertificate: input.mechanicCertificate,
        notes: input.notes,
        recordedById: user.id,
      };
      const [row] = tx.insert(inspectionCompletions).values(values).returning({ id: inspectionCompletions.id }).all();
      // A new battery (or whatever the use limit counts) starts its use from zero.
      if (item.usageLimitHours !== null) {
        tx.update(inspectionItems).set({ usageUsedHours: 0 }).where(and(eq(inspectionItems.clubId, club.id), eq(inspectionItems.id, item.id))).run();
      }
      insertUploadRows(tx, { clubId: club.id, subjectType: "InspectionCompletion", subjectId: row!.id, uploadedById: user.id }, stored);
      writeAudit(tx, { clubId: club.id, actorId: user.id, action: "inspection.record", subjectType: "InspectionCompletion", subjectId: row!.id, after: { item: item.name, ...values } });
      return { refresh: true };
    });
  },
});
