"use server";
import { getAircraft } from "@/db/queries/fleet";
import { savePreflightTemplate } from "@/db/queries/tools-preflight";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { writeAudit } from "@/lib/server/audit";
import { preflightTemplateSchema } from "@/lib/validation/tools";

// The club edits each aircraft's checklist: documents aboard, the items by section, the fuel
// drain points and the oil minimum. Maintenance officers and admins keep it.
export const savePreflightTemplateAction = clubAction({
  schema: preflightTemplateSchema,
  permission: ["update", "Aircraft"],
  success: "Preflight checklist saved.",
  run(tx, { club, user }, input) {
    const plane = getAircraft(tx, club.id, input.aircraftId);
    if (!plane || plane.retiredAt) throw new ActionError("That aircraft was not found in this club.", {}, "not_found");
    // Documents are checked in the cabin when the checklist has one: one group fewer to tap.
    const cabin = input.checklist.find((i) => i.section.toLowerCase() === "cabin")?.section;
    const items = [
      ...input.documents.map((label) => ({ section: cabin ?? "Documents aboard", label, kind: "document" as const })),
      ...input.checklist.map((i) => ({ ...i, kind: "check" as const })),
    ];
    const templateId = savePreflightTemplate(tx, club.id, plane.id, { oilMinimum: input.oilMinimum, oilMaximum: input.oilMaximum, sumpPoints: input.sumpPoints, fuelTanks: input.fuelTanks, items, updatedById: user.id });
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "preflight.template.update", subjectType: "Aircraft", subjectId: plane.id, after: { templateId, items: items.length, oilMinimum: input.oilMinimum, sumpPoints: input.sumpPoints, fuelTanks: input.fuelTanks } });
    return { data: { templateId }, refresh: true };
  },
});
