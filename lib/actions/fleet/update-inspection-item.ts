"use server";
import { and, eq } from "drizzle-orm";
import { inspectionItems } from "@/db/schema";
import { getItem } from "@/db/queries/fleet";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { writeAudit } from "@/lib/server/audit";
import { updateInspectionItemSchema } from "@/lib/validation/fleet";

// Records cumulative use (ELT transmitter time, 14 CFR 91.207(c)) or retires a directive or
// club item that no longer applies. Regulation items are never retired: the aircraft's flags
// decide whether they apply. Nothing is deleted.
export const updateInspectionItem = clubAction({
  schema: updateInspectionItemSchema,
  permission: ["update", "Inspection"],
  success: "Inspection item saved.",
  run(tx, { club, user }, input) {
    const item = getItem(tx, club.id, input.itemId);
    if (!item || item.retiredAt) throw new ActionError("That inspection item was not found in this club.", {}, "not_found");
    if (input.retire && item.origin === "regulation") {
      throw new ActionError("A regulation item cannot be retired; change the aircraft's flags if it no longer applies.", { retire: ["Regulation items stay."] });
    }
    if (!input.retire && input.usageUsedHours === null) {
      throw new ActionError("Nothing to change.", { usageUsedHours: ["Enter the cumulative use, or choose to retire the item."] });
    }
    if (input.usageUsedHours !== null && item.usageLimitHours === null) {
      throw new ActionError("This item has no use limit to record against.", { usageUsedHours: ["Only items with a use limit take a use figure."] });
    }
    const change = {
      ...(input.usageUsedHours !== null ? { usageUsedHours: input.usageUsedHours } : {}),
      ...(input.retire ? { retiredAt: new Date() } : {}),
    };
    tx.update(inspectionItems).set(change).where(and(eq(inspectionItems.clubId, club.id), eq(inspectionItems.id, item.id))).run();
    writeAudit(tx, {
      clubId: club.id,
      actorId: user.id,
      action: "inspection.item.update",
      subjectType: "InspectionItem",
      subjectId: item.id,
      before: { usageUsedHours: item.usageUsedHours, retired: false },
      after: { usageUsedHours: input.usageUsedHours ?? item.usageUsedHours, retired: input.retire, note: input.note },
    });
    return { refresh: true };
  },
});
