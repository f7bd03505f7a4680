"use server";
import { eq } from "drizzle-orm";
import { clubs } from "@/db/schema";
import { listOperatorClubIds } from "@/db/queries/clubs";
import { userAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { kickOutbox } from "@/lib/email/runner";
import { assignAdminSchema } from "@/lib/validation/clubs";
import { canAdministerClub } from "@/permissions";
import { appointAdmin } from "./appoint-admin";

export const assignClubAdmin = userAction({
  schema: assignAdminSchema,
  requireUser: true,
  permission: (user, input, db) =>
    Boolean(user) && canAdministerClub({ userId: user!.id, isOperator: user!.platformRole === "operator", clubIds: listOperatorClubIds(db, user!.id) }, input.clubId),
  success: "Invitation sent.",
  run(tx, user, input) {
    const club = tx.select().from(clubs).where(eq(clubs.id, input.clubId)).get();
    if (!club || !user) throw new ActionError("That club was not found.", {}, "not_found");
    appointAdmin(tx, club, input.adminEmail, user);
    return { message: `${input.adminEmail} has been invited as an admin of ${club.name}; they become one when they accept.`, refresh: true };
  },
  after: () => kickOutbox(),
});
