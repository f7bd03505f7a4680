import "server-only";
import { and, asc, eq, lt, sql } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { journalEntries, ledgerAccounts, users, yearCloses, type YearCloseRow } from "@/db/schema";
import { accountId } from "@/db/queries/money-accounts";
import { postEntry } from "@/db/queries/money-post-entry";
import { balanceSheet } from "@/lib/money/reports";
import { RETAINED_FUNDS_CODE, yearCloseProblem, yearEndClosing } from "@/lib/money/year-end";
import { reportPostings } from "./money-reports";

// The year-end close: one entry dated the year's last day closing income and expense into
// retained funds (lib/money/year-end.ts has the rule), and the year locked (year_closes, read
// by lockedThrough). A year closes once: the rule refuses it and the unique index stops a race.

export type YearCloseListRow = YearCloseRow & { closedBy: string };

export function listYearCloses(db: Db | Tx, clubId: string): YearCloseListRow[] {
  return db
    .select({ c: yearCloses, closedBy: sql<string>`coalesce(${users.name}, ${users.email})` })
    .from(yearCloses)
    .innerJoin(users, eq(users.id, yearCloses.closedById))
    .where(eq(yearCloses.clubId, clubId))
    .orderBy(asc(yearCloses.year))
    .all()
    .map((r) => ({ ...r.c, closedBy: r.closedBy }));
}

/** The years before `year` that have any journal entry (the years that must be closed first). */
export function yearsWithPostingsBefore(db: Db | Tx, clubId: string, year: number): number[] {
  return db
    .selectDistinct({ y: sql<string>`substr(${journalEntries.entryDate}, 1, 4)` })
    .from(journalEntries)
    .where(and(eq(journalEntries.clubId, clubId), lt(journalEntries.entryDate, `${year}-01-01`)))
    .all()
    .map((r) => Number(r.y));
}

export type YearClosePreview = { year: number; date: string; netIncomeMinor: number; lines: { accountCode: string; accountName: string; debitMinor: number; creditMinor: number }[]; problem: string | null };

/** What closing `year` would post, and why it may not be closed (null when it may). */
export function previewYearClose(db: Db | Tx, clubId: string, year: number, today: string): YearClosePreview {
  const closing = yearEndClosing(reportPostings(db, clubId, { to: `${year}-12-31` }), year, RETAINED_FUNDS_CODE);
  const names = new Map(db.select({ code: ledgerAccounts.code, name: ledgerAccounts.name }).from(ledgerAccounts).where(eq(ledgerAccounts.clubId, clubId)).all().map((a) => [a.code, a.name]));
  return {
    year,
    date: closing.date,
    netIncomeMinor: closing.netIncomeMinor,
    lines: closing.lines.map((l) => ({ accountCode: l.accountCode, accountName: names.get(l.accountCode) ?? l.accountCode, debitMinor: l.debitMinor ?? 0, creditMinor: l.creditMinor ?? 0 })),
    problem: yearCloseProblem(year, today, listYearCloses(db, clubId).map((c) => c.year), yearsWithPostingsBefore(db, clubId, year)),
  };
}

export type YearCloseResult = { ok: true; close: YearCloseRow; lineCount: number } | { ok: false; message: string };

/** Closes `year`: posts the closing entry (if anything is to close) and locks the year. */
export function closeYear(tx: Tx, clubId: string, userId: string, year: number, today: string): YearCloseResult {
  const preview = previewYearClose(tx, clubId, year, today);
  if (preview.problem) return { ok: false, message: preview.problem };
  let entryId: string | null = null;
  if (preview.lines.length) {
    const ids = new Map(tx.select({ code: ledgerAccounts.code, id: ledgerAccounts.id }).from(ledgerAccounts).where(and(eq(ledgerAccounts.clubId, clubId), sql`${ledgerAccounts.memberUserId} is null`)).all().map((a) => [a.code, a.id]));
    ids.set(RETAINED_FUNDS_CODE, accountId(tx, clubId, RETAINED_FUNDS_CODE));
    entryId = postEntry(tx, clubId, {
      date: preview.date,
      kind: "year-end-close",
      memo: `Year-end close ${year}: income and expenses closed into retained funds`,
      lines: preview.lines.map((l) => ({ accountId: ids.get(l.accountCode)!, debitMinor: l.debitMinor || undefined, creditMinor: l.creditMinor || undefined })),
      sourceType: "year-close",
      sourceKey: `year-end-close:${year}`,
      createdById: userId,
    }).entryId;
  }
  const close = tx.insert(yearCloses).values({ clubId, year, closedThrough: preview.date, entryId, netIncomeMinor: preview.netIncomeMinor, closedById: userId }).returning().all()[0]!;
  // The close moves amounts within equity only; the balance sheet must still balance.
  const sheet = balanceSheet(reportPostings(tx, clubId, { to: preview.date }), preview.date);
  if (!sheet.balanced) throw new Error(`Balance sheet at ${preview.date} does not balance after the close`);
  return { ok: true, close, lineCount: preview.lines.length };
}
