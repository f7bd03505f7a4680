"use server";
import { and, eq } from "drizzle-orm";
import { inspectionItems } from "@/db/schema";
import { getAircraft } from "@/db/queries/fleet";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { writeAudit } from "@/lib/server/audit";
import { createInspectionItemSchema } from "@/lib/validation/fleet";

function keyFor(origin: string, name: string): string {
  const slug = name.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 60);
  return `${origin === "directive" ? "ad" : "club"}-${slug || "item"}`;
}

export const createInspectionItem = clubAction({
  schema: createInspectionItemSchema,
  permission: ["create", "Inspection"],
  success: "Inspection item added. Record its last completion so the status can be computed.",
  run(tx, { club, user }, input) {
    const plane = getAircraft(tx, club.id, input.aircraftId);
    if (!plane) throw new ActionError("That aircraft was not found in this club.", {}, "not_found");
    const key = keyFor(input.origin, input.name);
    const clash = tx.select({ id: inspectionItems.id }).from(inspectionItems).where(and(eq(inspectionItems.aircraftId, plane.id), eq(inspectionItems.key, key))).get();
    if (clash) throw new ActionError("This aircraft already has an item with that name.", { name: ["Already on this aircraft: choose another name."] }, "conflict");
    const values = {
      clubId: club.id,
      aircraftId: plane.id,
      key,
      name: input.name,
      origin: input.origin,
      ruleKind: input.ruleKind,
      months: input.ruleKind === "calendar-months" || input.ruleKind === "months-or-hours" ? input.months : null,
      hours: input.ruleKind === "hours" || input.ruleKind === "months-or-hours" ? input.hours : null,
      days: input.ruleKind === "days" ? input.days : null,
      overrunHours: input.ruleKind === "hours" || input.ruleKind === "months-or-hours" ? input.overrunHours : null,
      required: input.required,
      ifrOnly: input.ifrOnly,
      source: input.source,
    };
    const [row] = tx.insert(inspectionItems).values(values).returning({ id: inspectionItems.id }).all();
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "inspection.item.create", subjectType: "InspectionItem", subjectId: row!.id, after: values });
    return { refresh: true };
  },
});
