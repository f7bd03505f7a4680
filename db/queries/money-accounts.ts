import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { ledgerAccounts, memberships, users } from "@/db/schema";
import { DEFAULT_CHART, FLYING_CLUB_CHART } from "@/lib/money";
import { LedgerError } from "@/lib/money/errors";

export type DbLike = Db | Tx;

export const RECEIVABLES = "member-receivables";
export type ChartCode = (typeof DEFAULT_CHART)[number]["code"];

export function memberAccountCode(userId: string): string {
  return `${RECEIVABLES}:${userId}`;
}

/**
 * Gives the club the accounts the application posts to (codes it already has are left alone);
 * a club's first chart also gets the flying-club categories, which the treasurer may then
 * rename or delete while unused without their coming back.
 */
export function ensureChart(tx: DbLike, clubId: string): void {
  const first = !tx.select({ id: ledgerAccounts.id }).from(ledgerAccounts).where(eq(ledgerAccounts.clubId, clubId)).limit(1).get();
  tx.insert(ledgerAccounts)
    .values([...DEFAULT_CHART, ...(first ? FLYING_CLUB_CHART : [])].map((a) => ({ clubId, code: a.code, name: a.name, type: a.type })))
    .onConflictDoNothing()
    .run();
}

/** Account id by chart code ("bank", "dues-income", …), creating the chart on first use. */
export function accountId(tx: DbLike, clubId: string, code: ChartCode): string {
  const find = () => tx.select({ id: ledgerAccounts.id }).from(ledgerAccounts).where(and(eq(ledgerAccounts.clubId, clubId), eq(ledgerAccounts.code, code))).get();
  let row = find();
  if (!row) {
    ensureChart(tx, clubId);
    row = find();
  }
  if (!row) throw new LedgerError(`The chart of accounts has no "${code}" account.`, "not-found");
  return row.id;
}

/** Every chart account of the club by code, in one read. */
export function chartAccountIds(tx: DbLike, clubId: string): Map<string, string> {
  ensureChart(tx, clubId);
  const rows = tx.select({ id: ledgerAccounts.id, code: ledgerAccounts.code }).from(ledgerAccounts).where(eq(ledgerAccounts.clubId, clubId)).all();
  return new Map(rows.map((r) => [r.code, r.id]));
}

/**
 * The member's receivable account in this club, opened on first use. Only a person with a
 * membership of the club (active or not) can have one: money never lands on a stranger.
 */
export function memberAccountId(tx: DbLike, clubId: string, userId: string): string {
  return memberAccountIds(tx, clubId, [userId]).get(userId) as string;
}

export function memberAccountIds(tx: DbLike, clubId: string, userIds: readonly string[]): Map<string, string> {
  const wanted = [...new Set(userIds)];
  const out = new Map<string, string>();
  if (wanted.length === 0) return out;
  for (let i = 0; i < wanted.length; i += 500) {
    const slice = wanted.slice(i, i + 500);
    const rows = tx
      .select({ id: ledgerAccounts.id, userId: ledgerAccounts.memberUserId })
      .from(ledgerAccounts)
      .where(and(eq(ledgerAccounts.clubId, clubId), inArray(ledgerAccounts.memberUserId, slice)))
      .all();
    for (const r of rows) if (r.userId) out.set(r.userId, r.id);
  }
  const missing = wanted.filter((u) => !out.has(u));
  if (missing.length === 0) return out;
  ensureChart(tx, clubId);
  for (let i = 0; i < missing.length; i += 500) {
    const slice = missing.slice(i, i + 500);
    const people = tx
      .select({ userId: memberships.userId, name: users.name, email: users.email })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(and(eq(memberships.clubId, clubId), inArray(memberships.userId, slice)))
      .all();
    if (people.length !== slice.length) {
      throw new LedgerError("That person is not a member of this club, so nothing can be posted to their account.", "not-member", "memberUserId");
    }
    const inserted = tx
      .insert(ledgerAccounts)
      .values(people.map((p) => ({ clubId, code: memberAccountCode(p.userId), name: `Member account: ${p.name ?? p.email}`, type: "asset" as const, parentCode: RECEIVABLES, memberUserId: p.userId })))
      .returning({ id: ledgerAccounts.id, userId: ledgerAccounts.memberUserId })
      .all();
    for (const r of inserted) if (r.userId) out.set(r.userId, r.id);
  }
  return out;
}
