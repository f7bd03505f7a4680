"use server";
import { and, eq } from "drizzle-orm";
import { memberships } from "@/db/schema";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { revokeSessions } from "@/lib/auth/sessions";
import { writeAudit } from "@/lib/server/audit";
import { membershipStatusSchema } from "@/lib/validation/members";
import { assertAnotherActiveAdmin } from "./member-rules";

export const setMembershipStatus = clubAction({
  schema: membershipStatusSchema,
  permission: ["deactivate", "Member"],
  success: "Membership updated.",
  run(tx, { club, user }, input) {
    const current = tx.select().from(memberships).where(and(eq(memberships.clubId, club.id), eq(memberships.id, input.membershipId))).get();
    if (!current) throw new ActionError("That member was not found in this club.", {}, "not_found");
    if (current.status === input.status) return { message: "Nothing to change." };
    if (input.status === "inactive" && current.roles.includes("admin")) assertAnotherActiveAdmin(tx, club.id, current.id);
    tx.update(memberships)
      .set({ status: input.status, deactivatedAt: input.status === "inactive" ? new Date() : null })
      .where(and(eq(memberships.clubId, club.id), eq(memberships.id, current.id)))
      .run();
    if (input.status === "inactive") revokeSessions(tx, current.userId); // a deactivated member is signed out
    writeAudit(tx, {
      clubId: club.id,
      actorId: user.id,
      action: input.status === "inactive" ? "member.deactivate" : "member.reactivate",
      subjectType: "Membership",
      subjectId: current.id,
      before: { status: current.status },
      after: { status: input.status },
    });
    return { message: input.status === "inactive" ? "Member deactivated; their history is kept." : "Member reactivated.", refresh: true };
  },
});
