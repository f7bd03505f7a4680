"use server";
import { and, eq } from "drizzle-orm";
import { memberships } from "@/db/schema";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { revokeSessions } from "@/lib/auth/sessions";
import { writeAudit } from "@/lib/server/audit";
import { changeRolesSchema } from "@/lib/validation/members";
import { assertAnotherActiveAdmin } from "./member-rules";

export const changeRoles = clubAction({
  schema: changeRolesSchema,
  permission: ["assignRoles", "Member"],
  success: "Roles saved.",
  run(tx, { club, user }, input) {
    const current = tx.select().from(memberships).where(and(eq(memberships.clubId, club.id), eq(memberships.id, input.membershipId))).get();
    if (!current) throw new ActionError("That member was not found in this club.", {}, "not_found");
    if (current.roles.includes("admin") && !input.roles.includes("admin") && current.status === "active") {
      assertAnotherActiveAdmin(tx, club.id, current.id);
    }
    revokeSessions(tx, current.userId); // the member signs in again under the new roles
    tx.update(memberships).set({ roles: input.roles }).where(and(eq(memberships.clubId, club.id), eq(memberships.id, current.id))).run();
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "member.roles.change", subjectType: "Membership", subjectId: current.id, before: { roles: current.roles }, after: { roles: input.roles } });
    return { refresh: true };
  },
});
