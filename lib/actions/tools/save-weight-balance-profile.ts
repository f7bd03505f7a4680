"use server";
import { getAircraft } from "@/db/queries/fleet";
import { getWeightBalanceProfile, saveWeightBalanceProfile } from "@/db/queries/tools-wb";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { normalizeEnvelope } from "@/lib/performance";
import { writeAudit } from "@/lib/server/audit";
import { weightBalanceProfileSchema } from "@/lib/validation/tools";

// Maintenance and admins keep each aircraft's figures, in the club's unit system.
export const saveWeightBalanceProfileAction = clubAction({
  schema: weightBalanceProfileSchema,
  permission: ["update", "Aircraft"],
  success: "Weight and balance figures saved.",
  run(tx, { club, user }, input) {
    const plane = getAircraft(tx, club.id, input.aircraftId);
    if (!plane || plane.retiredAt) throw new ActionError("That aircraft was not found in this club.", {}, "not_found");
    try {
      normalizeEnvelope(input.envelopeNormal!);
      if (input.envelopeUtility) normalizeEnvelope(input.envelopeUtility);
    } catch (error) {
      throw new ActionError("Some fields need attention; nothing was saved.", { envelopeNormal: [error instanceof Error ? error.message : "The envelope is not a polygon."] });
    }
    const before = getWeightBalanceProfile(tx, club.id, plane.id);
    const values = {
      unitSystem: club.unitSystem,
      emptyWeight: input.emptyWeight,
      emptyArm: input.emptyArm,
      maxTakeoffWeight: input.maxTakeoffWeight,
      maxLandingWeight: input.maxLandingWeight,
      stations: input.stations,
      tanks: input.tanks,
      fuelKind: input.fuelKind,
      burnPerHour: input.burnPerHour,
      envelopeNormal: input.envelopeNormal!,
      envelopeUtility: input.envelopeUtility,
      source: input.source,
      updatedById: user.id,
    };
    const profileId = saveWeightBalanceProfile(tx, club.id, plane.id, values);
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "weight-balance.profile.update", subjectType: "Aircraft", subjectId: plane.id, before: before ?? null, after: values });
    return { data: { profileId }, refresh: true };
  },
});
