// Bank statement import, correction and removal: the one write path of a statement and its
// lines. The file is read by lib/reconcile (parseStatementFile); lines the club already has are
// skipped; a statement can be corrected or removed until its period is locked.
import "server-only";
import { and, countDistinct, eq, inArray } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { bankLines, bankStatements, reconciliationMatches, reconciliationPeriods } from "@/db/schema";
import { LedgerError } from "@/lib/money/errors";
import { lockedThrough } from "@/db/queries/money-post-entry";
import { dedupeKeys, type CsvMapping, type ParsedStatement } from "@/lib/reconcile";

type DbLike = Db | Tx;

export type ImportInput = {
  clubId: string;
  userId: string | null;
  currency: string;
  format: "csv" | "ofx";
  fileName: string;
  text: string;
  mapping?: CsvMapping;
  parsed: Extract<ParsedStatement, { ok: true }>;
  closingBalanceMinor: number;
  periodStart?: string;
  periodEnd?: string;
};

/** Writes the statement and its new lines; returns the statement id and what was skipped. */
export function storeStatement(tx: DbLike, input: ImportInput): { statementId: string; imported: number; skipped: number } {
  const periodStart = input.periodStart || input.parsed.periodStart;
  const periodEnd = input.periodEnd || input.parsed.periodEnd;
  if (!periodStart || !periodEnd) throw new LedgerError("The statement holds no lines; give its period.", "invalid", "periodEnd");
  if (periodStart > periodEnd) throw new LedgerError("The period ends before it starts.", "invalid", "periodEnd");
  const keys = dedupeKeys(input.parsed.lines, input.parsed.accountId);
  const [statement] = tx
    .insert(bankStatements)
    .values({ clubId: input.clubId, format: input.format, fileName: input.fileName, mapping: input.mapping ?? null, sourceText: input.text, periodStart, periodEnd, closingBalanceMinor: input.closingBalanceMinor, currency: input.currency, lineCount: 0, importedById: input.userId })
    .returning({ id: bankStatements.id })
    .all();
  const rows = input.parsed.lines.map((l, i) => ({ clubId: input.clubId, statementId: statement!.id, lineNo: i + 1, postedOn: l.date, amountMinor: l.amountMinor, description: l.description, reference: l.reference ?? null, dedupeKey: keys[i]! }));
  let imported = 0;
  for (let i = 0; i < rows.length; i += 400) imported += tx.insert(bankLines).values(rows.slice(i, i + 400)).onConflictDoNothing().run().changes;
  const skipped = rows.length - imported;
  tx.update(bankStatements).set({ lineCount: imported, skippedCount: skipped }).where(and(eq(bankStatements.clubId, input.clubId), eq(bankStatements.id, statement!.id))).run();
  return { statementId: statement!.id, imported, skipped };
}

type StatementRow = typeof bankStatements.$inferSelect;

/** The statement, refused once its period is locked (its own lock, or the books locked into its period). */
function getEditableStatement(tx: DbLike, clubId: string, statementId: string, doing: string): StatementRow {
  const st = tx.select().from(bankStatements).where(and(eq(bankStatements.clubId, clubId), eq(bankStatements.id, statementId))).get();
  if (!st) throw new LedgerError("That statement was not found in this club.", "not-found", "statementId");
  const own = tx.select({ end: reconciliationPeriods.periodEnd }).from(reconciliationPeriods).where(and(eq(reconciliationPeriods.clubId, clubId), eq(reconciliationPeriods.statementId, st.id))).get();
  const through = lockedThrough(tx, clubId);
  if (own || (through && through >= st.periodStart)) {
    throw new LedgerError(`The statement ${st.periodStart} to ${st.periodEnd} is in a reconciled, locked period (the books are locked through ${own?.end ?? through}); it can no longer be ${doing}.`, "locked", "statementId");
  }
  return st;
}

export type StatementCorrection = { before: { closingBalanceMinor: number }; after: { closingBalanceMinor: number } };

/** Corrects a mistyped closing balance; refused once the statement's period is locked. */
export function correctStatementBalance(tx: DbLike, clubId: string, statementId: string, closingBalanceMinor: number): StatementCorrection {
  const st = getEditableStatement(tx, clubId, statementId, "corrected");
  if (st.closingBalanceMinor === closingBalanceMinor) throw new LedgerError("That is the closing balance the statement already has.", "invalid", "closingBalance");
  tx.update(bankStatements).set({ closingBalanceMinor, updatedAt: new Date() }).where(and(eq(bankStatements.clubId, clubId), eq(bankStatements.id, st.id))).run();
  return { before: { closingBalanceMinor: st.closingBalanceMinor }, after: { closingBalanceMinor } };
}

export type StatementRemoval = { periodStart: string; periodEnd: string; fileName: string; format: string; closingBalanceMinor: number; linesRemoved: number };

/**
 * Removes an imported statement and its lines (set-aside lines too), so the file can be
 * imported again. Refused while any line is matched (undo those matches first: a match may
 * have posted to the books) and once its period is locked.
 */
export function removeStatement(tx: DbLike, clubId: string, statementId: string): StatementRemoval {
  const st = getEditableStatement(tx, clubId, statementId, "removed");
  const lineIds = tx.select({ id: bankLines.id }).from(bankLines).where(and(eq(bankLines.clubId, clubId), eq(bankLines.statementId, st.id))).all().map((l) => l.id);
  const matched = tx
    .select({ n: countDistinct(reconciliationMatches.bankLineId) })
    .from(reconciliationMatches)
    .innerJoin(bankLines, eq(bankLines.id, reconciliationMatches.bankLineId))
    .where(and(eq(reconciliationMatches.clubId, clubId), eq(bankLines.statementId, st.id)))
    .get()!.n;
  if (matched > 0) {
    throw new LedgerError(`${matched} line${matched === 1 ? " of this statement is" : "s of this statement are"} matched to the books; undo ${matched === 1 ? "that match" : "those matches"} first (a match may have posted an entry), then remove the statement.`, "invalid", "statementId");
  }
  for (let i = 0; i < lineIds.length; i += 500) tx.delete(bankLines).where(and(eq(bankLines.clubId, clubId), inArray(bankLines.id, lineIds.slice(i, i + 500)))).run();
  tx.delete(bankStatements).where(and(eq(bankStatements.clubId, clubId), eq(bankStatements.id, st.id))).run();
  return { periodStart: st.periodStart, periodEnd: st.periodEnd, fileName: st.fileName, format: st.format, closingBalanceMinor: st.closingBalanceMinor, linesRemoved: lineIds.length };
}
