import "server-only";
import { and, desc, eq, gte, inArray, lte, sql } from "drizzle-orm";
import type { Db } from "@/db/client";
import { journalEntries, journalLines, ledgerAccounts, users } from "@/db/schema";
import { RECEIVABLES } from "@/db/queries/money-accounts";
import { presentBalance, type AccountType } from "@/lib/money";

export type JournalRow = {
  entryId: string;
  date: string;
  kind: string;
  memo: string;
  member: string | null;
  amountMinor: number;
  accounts: string;
  reference: string | null;
  reversesEntryId: string | null;
  reversed: boolean;
};

/** Journal entries, newest first, with their total and the accounts they touch. */
export function listJournal(db: Db, clubId: string, opts: { from?: string; to?: string; limit?: number } = {}): JournalRow[] {
  const entries = db
    .select({ id: journalEntries.id, date: journalEntries.entryDate, kind: journalEntries.kind, memo: journalEntries.memo, reference: journalEntries.reference, reversesEntryId: journalEntries.reversesEntryId, memberName: users.name, memberEmail: users.email })
    .from(journalEntries)
    .leftJoin(users, eq(users.id, journalEntries.memberUserId))
    .where(and(eq(journalEntries.clubId, clubId), opts.from ? gte(journalEntries.entryDate, opts.from) : undefined, opts.to ? lte(journalEntries.entryDate, opts.to) : undefined))
    .orderBy(desc(journalEntries.entryDate), desc(journalEntries.createdAt))
    .limit(opts.limit ?? 2000)
    .all();
  if (entries.length === 0) return [];
  const ids = entries.map((e) => e.id);
  const lines: { entryId: string; name: string; debit: number; parent: string | null }[] = [];
  for (let i = 0; i < ids.length; i += 500) {
    lines.push(
      ...db
        .select({ entryId: journalLines.entryId, name: ledgerAccounts.name, debit: journalLines.debitMinor, parent: ledgerAccounts.parentCode })
        .from(journalLines)
        .innerJoin(ledgerAccounts, eq(ledgerAccounts.id, journalLines.accountId))
        .where(and(eq(journalLines.clubId, clubId), inArray(journalLines.entryId, ids.slice(i, i + 500))))
        .orderBy(journalLines.lineNo)
        .all(),
    );
  }
  const byEntry = new Map<string, { total: number; names: Set<string> }>();
  for (const l of lines) {
    const e = byEntry.get(l.entryId) ?? { total: 0, names: new Set<string>() };
    e.total += l.debit;
    e.names.add(l.parent === RECEIVABLES ? "Member account" : l.name);
    byEntry.set(l.entryId, e);
  }
  const reversed = new Set(entries.map((e) => e.reversesEntryId).filter(Boolean));
  const reversalsOutside = db
    .select({ of: journalEntries.reversesEntryId })
    .from(journalEntries)
    .where(and(eq(journalEntries.clubId, clubId), inArray(journalEntries.reversesEntryId, ids.slice(0, 900))))
    .all();
  for (const r of reversalsOutside) if (r.of) reversed.add(r.of);
  return entries.map((e) => ({
    entryId: e.id,
    date: e.date,
    kind: e.kind,
    memo: e.memo,
    member: e.memberName ?? e.memberEmail ?? null,
    amountMinor: byEntry.get(e.id)?.total ?? 0,
    accounts: [...(byEntry.get(e.id)?.names ?? [])].join(" · "),
    reference: e.reference,
    reversesEntryId: e.reversesEntryId,
    reversed: reversed.has(e.id),
  }));
}

export type AccountBalanceRow = { code: string; name: string; type: AccountType; balanceMinor: number };

/** Each chart account's balance as its owner reads it; member accounts are summed into one line. */
export function accountBalances(db: Db, clubId: string, asOf?: string): AccountBalanceRow[] {
  const rows = db
    .select({
      code: sql<string>`case when ${ledgerAccounts.memberUserId} is null then ${ledgerAccounts.code} else ${ledgerAccounts.parentCode} end`,
      name: sql<string>`case when ${ledgerAccounts.memberUserId} is null then ${ledgerAccounts.name} else 'Member receivables' end`,
      type: ledgerAccounts.type,
      balance: sql<number>`coalesce(sum(${journalLines.debitMinor} - ${journalLines.creditMinor}), 0)`,
    })
    .from(ledgerAccounts)
    .leftJoin(
      journalLines,
      and(
        eq(journalLines.accountId, ledgerAccounts.id),
        eq(journalLines.clubId, clubId),
        asOf ? sql`exists (select 1 from ${journalEntries} e where e.id = ${journalLines.entryId} and e.entry_date <= ${asOf})` : undefined,
      ),
    )
    .where(eq(ledgerAccounts.clubId, clubId))
    .groupBy(sql`case when ${ledgerAccounts.memberUserId} is null then ${ledgerAccounts.code} else ${ledgerAccounts.parentCode} end`)
    .all();
  return rows
    .map((r) => ({ code: r.code, name: r.name, type: r.type, balanceMinor: presentBalance(Number(r.balance), r.type) }));
}

/** Entries whose debits and credits differ (there should never be any). */
export function unbalancedEntries(db: Db, clubId: string): { entryId: string; differenceMinor: number }[] {
  return db
    .select({ entryId: journalLines.entryId, differenceMinor: sql<number>`sum(${journalLines.debitMinor}) - sum(${journalLines.creditMinor})` })
    .from(journalLines)
    .where(eq(journalLines.clubId, clubId))
    .groupBy(journalLines.entryId)
    .having(sql`sum(${journalLines.debitMinor}) <> sum(${journalLines.creditMinor}) or count(*) < 2`)
    .all();
}

export function countEntries(db: Db, clubId: string): number {
  return Number(db.select({ n: sql<number>`count(*)` }).from(journalEntries).where(eq(journalEntries.clubId, clubId)).get()?.n ?? 0);
}

/** Every line of the journal in a date range, for the CSV export. */
export function journalLinesForExport(db: Db, clubId: string, opts: { from?: string; to?: string } = {}) {
  return db
    .select({ date: journalEntries.entryDate, entryId: journalEntries.id, kind: journalEntries.kind, memo: journalEntries.memo, reference: journalEntries.reference, account: ledgerAccounts.name, accountCode: ledgerAccounts.code, debitMinor: journalLines.debitMinor, creditMinor: journalLines.creditMinor, currency: journalLines.currency })
    .from(journalLines)
    .innerJoin(journalEntries, eq(journalEntries.id, journalLines.entryId))
    .innerJoin(ledgerAccounts, eq(ledgerAccounts.id, journalLines.accountId))
    .where(and(eq(journalLines.clubId, clubId), opts.from ? gte(journalEntries.entryDate, opts.from) : undefined, opts.to ? lte(journalEntries.entryDate, opts.to) : undefined))
    .orderBy(journalEntries.entryDate, journalEntries.createdAt, journalLines.lineNo)
    .all();
}
