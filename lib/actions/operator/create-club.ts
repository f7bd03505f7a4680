"use server";
import { eq } from "drizzle-orm";
import { clubs, operatorAssignments } from "@/db/schema";
import { userAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { kickOutbox } from "@/lib/email/runner";
import { writeAudit } from "@/lib/server/audit";
import { createClubSchema } from "@/lib/validation/clubs";
import { defaultClubSettings } from "@/lib/validation/club-settings";
import { defaultLocaleFor } from "@/lib/money/locale";
import { appointAdmin } from "./appoint-admin";

export const createClub = userAction({
  schema: createClubSchema,
  requireUser: true,
  permission: (user) => user?.platformRole === "operator",
  success: "Club created.",
  run(tx, user, input) {
    if (!user) throw new ActionError("Sign in again.");
    if (tx.select({ id: clubs.id }).from(clubs).where(eq(clubs.slug, input.slug)).get()) {
      throw new ActionError("That web address is taken.", { slug: ["Another club uses this address; choose another."] });
    }
    const [club] = tx
      .insert(clubs)
      .values({ name: input.name, slug: input.slug, timeZone: input.timeZone, currency: input.currency, locale: defaultLocaleFor(input.currency, input.timeZone), unitSystem: input.unitSystem, settings: defaultClubSettings() })
      .returning()
      .all();
    if (!club) throw new Error("Club insert returned no row");
    tx.insert(operatorAssignments).values({ userId: user.id, clubId: club.id }).run();
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "club.create", subjectType: "Club", subjectId: club.id, after: { name: club.name, slug: club.slug, timeZone: club.timeZone, currency: club.currency, unitSystem: club.unitSystem } });
    // Refuses the operator's own address; the thrown error rolls the whole club back.
    appointAdmin(tx, club, input.adminEmail, user);
    return {
      message: `Club created; ${input.adminEmail} has been invited as its admin and becomes one on accepting.`,
      refresh: true,
      data: { slug: club.slug },
    };
  },
  after: () => kickOutbox(),
});
