import "server-only";
import { and, desc, eq, inArray, sql } from "drizzle-orm";
import type { Db } from "@/db/client";
import { bankLines, bankStatements, journalEntries, journalLines, reconciliationMatches, reconciliationPeriods } from "@/db/schema";
import { addDays } from "@/lib/dates";
import { lockedThrough } from "@/db/queries/money-post-entry";
import { bookableAccounts } from "./money-chart";
import { openPayouts, periodReport, unmatchedBookLines } from "./money-reconcile-match";

export function listBankStatements(db: Db, clubId: string) {
  const rows = db.select().from(bankStatements).where(eq(bankStatements.clubId, clubId)).orderBy(desc(bankStatements.periodEnd), desc(bankStatements.createdAt)).all();
  const locked = new Map(db.select({ statementId: reconciliationPeriods.statementId, at: reconciliationPeriods.createdAt }).from(reconciliationPeriods).where(eq(reconciliationPeriods.clubId, clubId)).all().map((p) => [p.statementId, p.at]));
  const matched = new Map(
    db
      .select({ statementId: bankLines.statementId, n: sql<number>`count(distinct ${bankLines.id})` })
      .from(bankLines)
      .innerJoin(reconciliationMatches, eq(reconciliationMatches.bankLineId, bankLines.id))
      .where(eq(bankLines.clubId, clubId))
      .groupBy(bankLines.statementId)
      .all()
      .map((r) => [r.statementId, Number(r.n)]),
  );
  return rows.map((s) => ({ ...s, lockedAt: locked.get(s.id) ?? null, matchedCount: matched.get(s.id) ?? 0 }));
}

export type WorkspaceLine = {
  id: string;
  lineNo: number;
  date: string;
  amountMinor: number;
  description: string;
  reference: string | null;
  ignored: boolean;
  match: { kind: string; items: { journalLineId: string; entryId: string; date: string; memo: string; amountMinor: number }[] } | null;
};

/** Everything the reconciliation workspace shows for one statement. */
export function getReconciliationWorkspace(db: Db, clubId: string, statementId: string) {
  const statement = db.select().from(bankStatements).where(and(eq(bankStatements.clubId, clubId), eq(bankStatements.id, statementId))).get();
  if (!statement) return null;
  const lines = db.select().from(bankLines).where(and(eq(bankLines.clubId, clubId), eq(bankLines.statementId, statementId))).orderBy(bankLines.lineNo).all();
  const ids = lines.map((l) => l.id);
  const matches = ids.length
    ? db
        .select({ bankLineId: reconciliationMatches.bankLineId, kind: reconciliationMatches.kind, journalLineId: journalLines.id, entryId: journalEntries.id, date: journalEntries.entryDate, memo: journalEntries.memo, debit: journalLines.debitMinor, credit: journalLines.creditMinor })
        .from(reconciliationMatches)
        .innerJoin(journalLines, eq(journalLines.id, reconciliationMatches.journalLineId))
        .innerJoin(journalEntries, eq(journalEntries.id, journalLines.entryId))
        .where(and(eq(reconciliationMatches.clubId, clubId), inArray(reconciliationMatches.bankLineId, ids)))
        .all()
    : [];
  const byLine = new Map<string, WorkspaceLine["match"]>();
  for (const m of matches) {
    const entry = byLine.get(m.bankLineId) ?? { kind: m.kind, items: [] };
    entry.items.push({ journalLineId: m.journalLineId, entryId: m.entryId, date: m.date, memo: m.memo, amountMinor: m.debit - m.credit });
    byLine.set(m.bankLineId, entry);
  }
  const period = db.select().from(reconciliationPeriods).where(and(eq(reconciliationPeriods.clubId, clubId), eq(reconciliationPeriods.statementId, statementId))).get() ?? null;
  return {
    statement: { ...statement, sourceText: undefined },
    lines: lines.map((l): WorkspaceLine => ({ id: l.id, lineNo: l.lineNo, date: l.postedOn, amountMinor: l.amountMinor, description: l.description, reference: l.reference, ignored: l.ignored, match: byLine.get(l.id) ?? null })),
    openBook: unmatchedBookLines(db, clubId, addDays(statement.periodEnd, 45)),
    openPayouts: openPayouts(db, clubId),
    report: periodReport(db, clubId, statementId),
    period,
    lockedThrough: lockedThrough(db, clubId),
    /** The chart accounts a bank item not in the books may be posted to (the treasurer chooses; no default). */
    bookableAccounts: bookableAccounts(db, clubId),
  };
}

export type ReconciliationWorkspace = NonNullable<ReturnType<typeof getReconciliationWorkspace>>;
