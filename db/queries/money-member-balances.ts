import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { journalEntries, journalLines, ledgerAccounts, memberships, users } from "@/db/schema";
import type { IsoDate } from "@/lib/dates";
import { RECEIVABLES, type DbLike } from "./money-accounts";
import { oldestOpenDueDate, openItemsOf, type OpenItems } from "@/lib/money/open-items";

export type MemberMovementRow = {
  memberUserId: string;
  entryId: string;
  date: IsoDate;
  dueOn: IsoDate | null;
  memo: string;
  kind: string;
  reversesEntryId: string | null;
  amountMinor: number;
};

/** Every movement on members' receivable accounts (one member, or all), debit-positive. */
export function memberMovements(tx: DbLike, clubId: string, memberUserId?: string): MemberMovementRow[] {
  const rows = tx
    .select({
      memberUserId: ledgerAccounts.memberUserId,
      entryId: journalEntries.id,
      date: journalEntries.entryDate,
      dueOn: journalEntries.dueOn,
      memo: journalEntries.memo,
      kind: journalEntries.kind,
      reversesEntryId: journalEntries.reversesEntryId,
      debit: journalLines.debitMinor,
      credit: journalLines.creditMinor,
    })
    .from(journalLines)
    .innerJoin(ledgerAccounts, eq(ledgerAccounts.id, journalLines.accountId))
    .innerJoin(journalEntries, eq(journalEntries.id, journalLines.entryId))
    .where(
      and(
        eq(journalLines.clubId, clubId),
        eq(ledgerAccounts.clubId, clubId),
        eq(ledgerAccounts.parentCode, RECEIVABLES),
        memberUserId ? eq(ledgerAccounts.memberUserId, memberUserId) : undefined,
      ),
    )
    .orderBy(journalEntries.entryDate, journalEntries.createdAt)
    .all();
  return rows.map((r) => ({
    memberUserId: r.memberUserId ?? "",
    entryId: r.entryId,
    date: r.date,
    dueOn: r.dueOn,
    memo: r.memo,
    kind: r.kind,
    reversesEntryId: r.reversesEntryId,
    amountMinor: r.debit - r.credit,
  }));
}

export type MemberPosition = OpenItems & { memberUserId: string; oldestDueDate: IsoDate | null };

/** Open items per member from all receivable movements (or those `keep` keeps), in one read. */
export function memberPositions(tx: DbLike, clubId: string, memberUserId?: string, keep: (m: MemberMovementRow) => boolean = () => true): Map<string, MemberPosition> {
  const byMember = new Map<string, MemberMovementRow[]>();
  for (const m of memberMovements(tx, clubId, memberUserId)) {
    if (!keep(m)) continue;
    const list = byMember.get(m.memberUserId);
    if (list) list.push(m);
    else byMember.set(m.memberUserId, [m]);
  }
  const out = new Map<string, MemberPosition>();
  for (const [userId, list] of byMember) {
    const open = openItemsOf(list.map((m) => ({ entryId: m.entryId, date: m.date, dueOn: m.dueOn, amountMinor: m.amountMinor, appliesToEntryId: m.reversesEntryId })));
    out.set(userId, { ...open, memberUserId: userId, oldestDueDate: oldestOpenDueDate(open) });
  }
  return out;
}

/** Member names and addresses for e-mails, by user id. */
export function memberContacts(tx: DbLike, clubId: string): Map<string, { name: string; email: string }> {
  const rows = tx.select({ userId: users.id, name: users.name, email: users.email }).from(memberships).innerJoin(users, eq(users.id, memberships.userId)).where(eq(memberships.clubId, clubId)).all();
  return new Map(rows.map((r) => [r.userId, { name: r.name ?? r.email, email: r.email }]));
}

/** One member's balance (debit-positive). */
export function memberBalance(tx: DbLike, clubId: string, memberUserId: string): number {
  const row = tx
    .select({ balance: sql<number>`coalesce(sum(${journalLines.debitMinor} - ${journalLines.creditMinor}), 0)` })
    .from(journalLines)
    .innerJoin(ledgerAccounts, eq(ledgerAccounts.id, journalLines.accountId))
    .where(and(eq(journalLines.clubId, clubId), eq(ledgerAccounts.clubId, clubId), eq(ledgerAccounts.memberUserId, memberUserId), eq(ledgerAccounts.parentCode, RECEIVABLES)))
    .get();
  return Number(row?.balance ?? 0);
}
