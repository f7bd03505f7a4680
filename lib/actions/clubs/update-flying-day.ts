"use server";
import { eq } from "drizzle-orm";
import { clubs } from "@/db/schema";
import { clubAction } from "@/lib/actions/create-action";
import { writeAudit } from "@/lib/server/audit";
import { flyingDaySchema } from "@/lib/validation/club-settings";

/** The club's flying day (club time): the booking page lists each aircraft's free time inside it. */
export const updateFlyingDay = clubAction({
  schema: flyingDaySchema,
  permission: ["update", "ClubSettings"],
  success: "Flying day saved.",
  run(tx, { club, user }, input) {
    const before = { flyingDayOpens: club.settings.flyingDayOpens, flyingDayCloses: club.settings.flyingDayCloses };
    const after = { flyingDayOpens: input.flyingDayOpens, flyingDayCloses: input.flyingDayCloses };
    tx.update(clubs).set({ settings: { ...club.settings, ...after }, updatedAt: new Date() }).where(eq(clubs.id, club.id)).run();
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "club.settings.update", subjectType: "Club", subjectId: club.id, before, after });
    const overnight = after.flyingDayCloses < after.flyingDayOpens ? " (it closes after midnight)" : "";
    return { message: `Flying day saved: from ${after.flyingDayOpens} to ${after.flyingDayCloses} club time${overnight}. The booking page lists free time inside it.`, refresh: true };
  },
});
