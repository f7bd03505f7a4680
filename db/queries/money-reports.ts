import "server-only";
import { and, eq, lte, ne, sql } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { journalEntries, journalLines, ledgerAccounts } from "@/db/schema";
import type { Posting } from "@/lib/money/reports";

/**
 * The club's journal as postings for the reports (lib/money/reports): one posting per day and
 * account, debits and credits summed, up to `to` when given. Each member's receivable account
 * is folded into "Member receivables" (its parent), as the chart shows it. For the profit and
 * loss (and budget against actual) pass `withoutYearEndClose`: a closed year's income and
 * expense are read without the entry that closed them into retained funds (standard practice).
 */
export function reportPostings(db: Db | Tx, clubId: string, opts: { to?: string; withoutYearEndClose?: boolean } = {}): Posting[] {
  const code = sql<string>`case when ${ledgerAccounts.memberUserId} is null then ${ledgerAccounts.code} else ${ledgerAccounts.parentCode} end`;
  const rows = db
    .select({
      date: journalEntries.entryDate,
      accountCode: code,
      accountName: sql<string>`case when ${ledgerAccounts.memberUserId} is null then ${ledgerAccounts.name} else 'Member receivables' end`,
      accountType: ledgerAccounts.type,
      debitMinor: sql<number>`sum(${journalLines.debitMinor})`,
      creditMinor: sql<number>`sum(${journalLines.creditMinor})`,
    })
    .from(journalLines)
    .innerJoin(journalEntries, and(eq(journalEntries.id, journalLines.entryId), eq(journalEntries.clubId, journalLines.clubId)))
    .innerJoin(ledgerAccounts, and(eq(ledgerAccounts.id, journalLines.accountId), eq(ledgerAccounts.clubId, journalLines.clubId)))
    .where(and(eq(journalLines.clubId, clubId), opts.to ? lte(journalEntries.entryDate, opts.to) : undefined, opts.withoutYearEndClose ? ne(journalEntries.kind, "year-end-close") : undefined))
    .groupBy(journalEntries.entryDate, code)
    .orderBy(journalEntries.entryDate)
    .all();
  return rows.map((r) => ({ ...r, debitMinor: Number(r.debitMinor), creditMinor: Number(r.creditMinor) }));
}
