import "server-only";
import { and, asc, desc, eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { billingRuns, duesPlans, memberDues, memberships, moneySettings, rateProfiles, users } from "@/db/schema";

export function listDuesPlans(db: Db, clubId: string) {
  return db.select().from(duesPlans).where(eq(duesPlans.clubId, clubId)).orderBy(asc(duesPlans.name)).all();
}

/** Active members with the dues plan they pay (if any). */
export function listDuesAssignments(db: Db, clubId: string) {
  return db
    .select({ userId: users.id, name: users.name, email: users.email, roles: memberships.roles, joinedOn: memberships.joinedOn, planId: memberDues.planId, planName: duesPlans.name, startsOn: memberDues.startsOn, category: memberDues.category })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .leftJoin(memberDues, and(eq(memberDues.clubId, clubId), eq(memberDues.memberUserId, memberships.userId)))
    .leftJoin(duesPlans, and(eq(duesPlans.clubId, clubId), eq(duesPlans.id, memberDues.planId)))
    .where(and(eq(memberships.clubId, clubId), eq(memberships.status, "active")))
    .orderBy(asc(users.name))
    .all()
    .filter((m) => m.roles.includes("member"));
}

export function listBillingRuns(db: Db, clubId: string, limit = 24) {
  return db.select().from(billingRuns).where(eq(billingRuns.clubId, clubId)).orderBy(desc(billingRuns.periodStart)).limit(limit).all();
}

export function getMoneySettingsRow(db: Db, clubId: string) {
  return db.select().from(moneySettings).where(eq(moneySettings.clubId, clubId)).get() ?? null;
}

export function listRateProfiles(db: Db, clubId: string) {
  return db.select().from(rateProfiles).where(eq(rateProfiles.clubId, clubId)).orderBy(asc(rateProfiles.name)).all();
}
