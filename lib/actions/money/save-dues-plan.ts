"use server";
import { and, eq, ne } from "drizzle-orm";
import { duesPlans } from "@/db/schema";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { writeAudit } from "@/lib/server/audit";
import { duesPlanSchema } from "@/lib/validation/money";
import { minorOf } from "./amounts";

export const saveDuesPlan = clubAction({
  schema: duesPlanSchema,
  permission: ["update", "Rates"],
  success: "Dues plan saved.",
  run(tx, { club, user }, input) {
    const amountMinor = minorOf(input.amount, club.currency, "amount");
    const clash = tx.select({ id: duesPlans.id }).from(duesPlans).where(and(eq(duesPlans.clubId, club.id), eq(duesPlans.name, input.name), input.planId ? ne(duesPlans.id, input.planId) : undefined)).get();
    if (clash) throw new ActionError("Some fields need attention; nothing was saved.", { name: ["Another plan already has this name."] });
    const values = { name: input.name, period: input.period, category: input.category, amountMinor, active: input.active };
    let planId = input.planId;
    if (planId) {
      const before = tx.select().from(duesPlans).where(and(eq(duesPlans.clubId, club.id), eq(duesPlans.id, planId))).get();
      if (!before) throw new ActionError("That plan was not found in this club.", {}, "not_found");
      tx.update(duesPlans).set(values).where(and(eq(duesPlans.clubId, club.id), eq(duesPlans.id, planId))).run();
      writeAudit(tx, { clubId: club.id, actorId: user.id, action: "money.plan.save", subjectType: "DuesPlan", subjectId: planId, before, after: values });
    } else {
      planId = tx.insert(duesPlans).values({ clubId: club.id, currency: club.currency, ...values }).returning({ id: duesPlans.id }).all()[0]!.id;
      writeAudit(tx, { clubId: club.id, actorId: user.id, action: "money.plan.save", subjectType: "DuesPlan", subjectId: planId, after: values });
    }
    return { refresh: true };
  },
});
