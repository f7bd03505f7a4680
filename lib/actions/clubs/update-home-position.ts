"use server";
import { eq } from "drizzle-orm";
import { clubs } from "@/db/schema";
import { clubAction } from "@/lib/actions/create-action";
import { writeAudit } from "@/lib/server/audit";
import { homePositionSchema } from "@/lib/validation/club-settings";

/** The home field's position: where sunrise and sunset, and so night for 61.57(b), are computed. */
export const updateHomePosition = clubAction({
  schema: homePositionSchema,
  permission: ["update", "ClubSettings"],
  success: "Home field position saved.",
  run(tx, { club, user }, input) {
    const before = { homeLatitude: club.settings.homeLatitude ?? null, homeLongitude: club.settings.homeLongitude ?? null };
    const after = { homeLatitude: input.homeLatitude, homeLongitude: input.homeLongitude };
    tx.update(clubs).set({ settings: { ...club.settings, ...after }, updatedAt: new Date() }).where(eq(clubs.id, club.id)).run();
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "club.settings.update", subjectType: "Club", subjectId: club.id, before, after });
    return {
      message: after.homeLatitude === null ? "Home field position cleared: night is unknown until it is entered again." : `Home field position saved: ${after.homeLatitude}, ${after.homeLongitude}. Night is now computed from sunrise and sunset there.`,
      refresh: true,
    };
  },
});
