"use server";
import { and, eq } from "drizzle-orm";
import { squawks } from "@/db/schema";
import { getSquawk, recordSquawkEvent } from "@/db/queries/fleet-squawks";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { isoDateInTimeZone } from "@/lib/dates";
import { writeAudit } from "@/lib/server/audit";
import { DOCUMENT_TYPES } from "@/lib/storage";
import { closeSquawkSchema } from "@/lib/validation/fleet";
import { checkFiles, discardStored, insertUploadRows, storeFiles, withStoredFiles } from "./files";

// Closing is the return to service: anything other than a plain note needs the mechanic's name
// and certificate number, as the logbook entry does.
export const closeSquawk = clubAction({
  schema: closeSquawkSchema,
  permission: ["close", "Squawk"],
  success: "Squawk closed with its return-to-service entry.",
  async prepare({ db, club }, input) {
    if (!getSquawk(db, club.id, input.squawkId)) throw new ActionError("That squawk was not found in this club.", {}, "not_found");
    return storeFiles(await checkFiles(input.document, DOCUMENT_TYPES, "document"));
  },
  discard: discardStored,
  run(tx, { club, user }, input, stored) {
    return withStoredFiles(stored, () => {
      const current = getSquawk(tx, club.id, input.squawkId);
      if (!current) throw new ActionError("That squawk was not found in this club.", {}, "not_found");
      if (current.status !== "open") throw new ActionError("That squawk is already closed.", {}, "conflict");
      const errors: Record<string, string[]> = {};
      if (current.triage !== "note") {
        if (!input.rtsMechanicName) errors.rtsMechanicName = ["Enter the name of the mechanic who returned it to service."];
        if (!input.rtsCertificate) errors.rtsCertificate = ["Enter the mechanic's certificate number."];
      }
      if (input.rtsOn > isoDateInTimeZone(new Date(), club.timeZone)) errors.rtsOn = ["The date cannot be in the future."];
      if (Object.keys(errors).length) throw new ActionError("Some fields need attention; nothing was saved.", errors);
      const change = {
        status: "closed" as const,
        repairNotes: input.repairNotes,
        rtsMechanicName: input.rtsMechanicName,
        rtsCertificate: input.rtsCertificate,
        rtsOn: input.rtsOn,
        closedAt: new Date(),
        closedById: user.id,
      };
      tx.update(squawks).set(change).where(and(eq(squawks.clubId, club.id), eq(squawks.id, current.id))).run();
      const who = input.rtsMechanicName ? ` ${current.triage === "note" ? "Closed" : "Returned to service"} by ${input.rtsMechanicName}, certificate ${input.rtsCertificate}, on ${input.rtsOn}.` : "";
      recordSquawkEvent(tx, { clubId: club.id, squawkId: current.id, kind: "closed", actorId: user.id, fromTriage: current.triage, toTriage: current.triage, note: `${input.repairNotes}${who}` });
      insertUploadRows(tx, { clubId: club.id, subjectType: "Squawk", subjectId: current.id, uploadedById: user.id }, stored);
      writeAudit(tx, { clubId: club.id, actorId: user.id, action: "squawk.close", subjectType: "Squawk", subjectId: current.id, before: { status: current.status, triage: current.triage }, after: { ...change, closedAt: change.closedAt.toISOString() } });
      return { refresh: true };
    });
  },
});
