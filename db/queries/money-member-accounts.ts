import "server-only";
import { and, desc, eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { duesPlans, memberDues, memberships, payments, statements, users } from "@/db/schema";
import type { IsoDate } from "@/lib/dates";
import { memberMovements, memberPositions } from "@/db/queries/money-member-balances";
import { monthOf } from "@/lib/money/months";
import { getMoneySettings } from "@/db/queries/money-settings";
import { ageReceivables, AGEING_BUCKETS, ageingBucketOf, daysPastDue, isInArrears, type AgeingBucketKey } from "@/lib/money";

export type MemberBalanceRow = {
  userId: string;
  name: string;
  email: string;
  status: "active" | "inactive";
  plan: string | null;
  balanceMinor: number;
  overdueMinor: number;
  oldestDueDate: IsoDate | null;
  inArrears: boolean;
};

/** Every member of the club with their balance and whether they are in arrears on `asOf`. */
export function listMemberBalances(db: Db, clubId: string, asOf: IsoDate): MemberBalanceRow[] {
  const grace = getMoneySettings(db, clubId).lateFeeAfterDays;
  const positions = memberPositions(db, clubId);
  const people = db
    .select({ userId: users.id, name: users.name, email: users.email, status: memberships.status, roles: memberships.roles, plan: duesPlans.name })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .leftJoin(memberDues, and(eq(memberDues.clubId, clubId), eq(memberDues.memberUserId, memberships.userId)))
    .leftJoin(duesPlans, and(eq(duesPlans.clubId, clubId), eq(duesPlans.id, memberDues.planId)))
    .where(eq(memberships.clubId, clubId))
    .orderBy(users.name)
    .all()
    .filter((p) => p.roles.includes("member") || positions.has(p.userId));
  return people.map((p) => {
    const pos = positions.get(p.userId);
    const balance = pos?.balanceMinor ?? 0;
    const overdue = pos ? Math.min(balance, pos.items.filter((i) => i.dueDate < asOf).reduce((s, i) => s + i.openMinor, 0)) : 0;
    return {
      userId: p.userId,
      name: p.name ?? p.email,
      email: p.email,
      status: p.status,
      plan: p.plan,
      balanceMinor: balance,
      overdueMinor: Math.max(0, overdue),
      oldestDueDate: pos?.oldestDueDate ?? null,
      inArrears: isInArrears(balance, pos?.oldestDueDate ?? null, asOf, grace),
    };
  });
}

export type AgeingRow = { userId: string; name: string; totalMinor: number } & Record<AgeingBucketKey, number>;

/** Receivables aged by days past due (current, 1–30, 31–60, 61–90, over 90), per member. */
export function ageingByMember(db: Db, clubId: string, asOf: IsoDate): { rows: AgeingRow[]; totals: Record<AgeingBucketKey, number> & { totalMinor: number } } {
  const names = new Map(db.select({ id: users.id, name: users.name, email: users.email }).from(memberships).innerJoin(users, eq(users.id, memberships.userId)).where(eq(memberships.clubId, clubId)).all().map((u) => [u.id, u.name ?? u.email]));
  const rows: AgeingRow[] = [];
  const all = [];
  for (const [userId, p] of memberPositions(db, clubId)) {
    const items = [...p.items.map((i) => ({ id: i.entryId, dueDate: i.dueDate, openMinor: i.openMinor })), ...(p.unappliedCreditMinor ? [{ id: `credit:${userId}`, dueDate: asOf, openMinor: -p.unappliedCreditMinor }] : [])];
    const report = ageReceivables(items, asOf);
    if (report.totalMinor === 0 && items.length === 0) continue;
    all.push(...items);
    const row = { userId, name: names.get(userId) ?? "Former member", totalMinor: report.totalMinor } as AgeingRow;
    for (const b of AGEING_BUCKETS) row[b.key] = report.buckets[b.key].totalMinor;
    rows.push(row);
  }
  const total = ageReceivables(all, asOf);
  const totals = { totalMinor: total.totalMinor } as Record<AgeingBucketKey, number> & { totalMinor: number };
  for (const b of AGEING_BUCKETS) totals[b.key] = total.buckets[b.key].totalMinor;
  rows.sort((a, b) => b.totalMinor - a.totalMinor);
  return { rows, totals };
}

export type AccountActivityRow = { entryId: string; date: IsoDate; memo: string; kind: string; amountMinor: number; dueOn: IsoDate | null; bucket: string | null };

/** A member's own account: balance, open items with their age, activity, statements, payments. */
export function getMemberAccount(db: Db, clubId: string, userId: string, asOf: IsoDate) {
  const grace = getMoneySettings(db, clubId).lateFeeAfterDays;
  const movements = memberMovements(db, clubId, userId);
  const position = memberPositions(db, clubId, userId).get(userId);
  const balanceMinor = position?.balanceMinor ?? 0;
  const openDue = new Map((position?.items ?? []).map((i) => [i.entryId, i]));
  const activity: AccountActivityRow[] = movements
    .map((m) => {
      const open = openDue.get(m.entryId);
      const label = open ? (AGEING_BUCKETS.find((b) => b.key === ageingBucketOf(daysPastDue(open.dueDate, asOf)))?.label ?? null) : null;
      return { entryId: m.entryId, date: m.date, memo: m.memo, kind: m.kind, amountMinor: m.amountMinor, dueOn: m.dueOn, bucket: label };
    })
    .reverse();
  const issued = db.select().from(statements).where(and(eq(statements.clubId, clubId), eq(statements.memberUserId, userId))).orderBy(desc(statements.periodStart)).all();
  const months = new Set<string>([...movements.map((m) => monthOf(m.date)), ...issued.map((s) => monthOf(s.periodStart))]);
  if (movements.length) months.add(monthOf(asOf));
  const statementMonths = [...months].sort().reverse().map((month) => ({ month, issuedAt: issued.find((s) => monthOf(s.periodStart) === month)?.createdAt ?? null }));
  const paymentRows = db.select().from(payments).where(and(eq(payments.clubId, clubId), eq(payments.memberUserId, userId))).orderBy(desc(payments.createdAt)).limit(50).all();
  return {
    balanceMinor,
    overdueMinor: Math.max(0, Math.min(balanceMinor, (position?.items ?? []).filter((i) => i.dueDate < asOf).reduce((s, i) => s + i.openMinor, 0))),
    oldestDueDate: position?.oldestDueDate ?? null,
    inArrears: isInArrears(balanceMinor, position?.oldestDueDate ?? null, asOf, grace),
    activity,
    statementMonths,
    payments: paymentRows,
  };
}

export function getMemberName(db: Db, clubId: string, userId: string): { name: string; email: string } | null {
  const row = db.select({ name: users.name, email: users.email }).from(memberships).innerJoin(users, eq(users.id, memberships.userId)).where(and(eq(memberships.clubId, clubId), eq(memberships.userId, userId))).get();
  return row ? { name: row.name ?? row.email, email: row.email } : null;
}
