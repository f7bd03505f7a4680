"use server";
import { and, eq } from "drizzle-orm";
import { duesPlans, memberDues, memberships } from "@/db/schema";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { writeAudit } from "@/lib/server/audit";
import { assignDuesSchema } from "@/lib/validation/money";

export const assignDuesPlan = clubAction({
  schema: assignDuesSchema,
  permission: ["update", "Rates"],
  success: "Dues plan assigned.",
  run(tx, { club, user }, input) {
    const member = tx.select({ id: memberships.id }).from(memberships).where(and(eq(memberships.clubId, club.id), eq(memberships.userId, input.memberUserId))).get();
    if (!member) throw new ActionError("That member was not found in this club.", {}, "not_found");
    const before = tx.select().from(memberDues).where(and(eq(memberDues.clubId, club.id), eq(memberDues.memberUserId, input.memberUserId))).get();
    if (!input.planId) {
      if (before) tx.delete(memberDues).where(and(eq(memberDues.clubId, club.id), eq(memberDues.id, before.id))).run();
      writeAudit(tx, { clubId: club.id, actorId: user.id, action: "money.plan.assign", subjectType: "MemberDues", subjectId: input.memberUserId, before, after: null });
      return { message: "The member pays no dues plan now.", refresh: true };
    }
    const plan = tx.select().from(duesPlans).where(and(eq(duesPlans.clubId, club.id), eq(duesPlans.id, input.planId))).get();
    if (!plan) throw new ActionError("Some fields need attention; nothing was saved.", { planId: ["Choose a plan of this club."] });
    const values = { planId: plan.id, category: plan.category, startsOn: input.startsOn };
    if (before) tx.update(memberDues).set(values).where(and(eq(memberDues.clubId, club.id), eq(memberDues.id, before.id))).run();
    else tx.insert(memberDues).values({ clubId: club.id, memberUserId: input.memberUserId, ...values }).run();
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "money.plan.assign", subjectType: "MemberDues", subjectId: input.memberUserId, before, after: values });
    return { refresh: true };
  },
});
