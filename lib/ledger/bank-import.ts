// Bank statement import: the file is read whole (every unreadable row reported at once,
// nothing written), lines the club already has are skipped, and the statement's closing
// balance comes from the file (OFX LEDGERBAL) or from the treasurer (CSV has none).
import { createHash } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { bankLines, bankStatements } from "@/db/schema";
import { parseCsvReport, parseOfxStatement, ReconcileParseError, type CsvMapping } from "@/lib/reconcile";
import type { DbLike } from "./accounts";
import { monthRange } from "./months";
import { LedgerError } from "./errors";

export type ParsedStatementLine = { date: string; amountMinor: number; description: string; reference?: string; fitId?: string };

export type ParsedStatement =
  | { ok: true; lines: ParsedStatementLine[]; periodStart: string; periodEnd: string; closingBalanceMinor: number | null; accountId?: string }
  | { ok: false; errors: string[] };

export function parseStatementFile(input: { format: "csv" | "ofx"; text: string; mapping?: CsvMapping; currency: string }): ParsedStatement {
  try {
    if (input.format === "ofx") {
      const st = parseOfxStatement(input.text);
      if (st.currency && st.currency.toUpperCase() !== input.currency.toUpperCase()) {
        return { ok: false, errors: [`The statement is in ${st.currency}; the club's books are in ${input.currency}.`] };
      }
      const dates = st.lines.map((l) => l.date).sort();
      return {
        ok: true,
        lines: st.lines.map((l) => ({ date: l.date, amountMinor: l.amountMinor, description: l.description, reference: l.reference, fitId: l.fitId })),
        periodStart: st.start ?? dates[0] ?? "",
        periodEnd: st.end ?? st.ledgerBalance?.asOf ?? dates.at(-1) ?? "",
        closingBalanceMinor: st.ledgerBalance?.amountMinor ?? null,
        accountId: st.accountId,
      };
    }
    if (!input.mapping) return { ok: false, errors: ["Say which columns hold the date and the amount."] };
    const report = parseCsvReport(input.text, input.mapping);
    if (report.errors.length) return { ok: false, errors: report.errors.slice(0, 20).map((e) => e.message).concat(report.errors.length > 20 ? [`… and ${report.errors.length - 20} more rows`] : []) };
    const dates = report.lines.map((l) => l.date).sort();
    const first = dates[0] ?? "";
    const last = dates.at(-1) ?? "";
    // A CSV carries no period: lines all in one month are read as that month's statement.
    if (first && first.slice(0, 7) === last.slice(0, 7)) {
      const month = monthRange(first.slice(0, 7));
      return { ok: true, lines: report.lines, periodStart: month.start, periodEnd: month.end, closingBalanceMinor: null };
    }
    return { ok: true, lines: report.lines, periodStart: first, periodEnd: last, closingBalanceMinor: null };
  } catch (error) {
    if (error instanceof ReconcileParseError || error instanceof TypeError) return { ok: false, errors: [error.message] };
    throw error;
  }
}

/**
 * A key that is the same each time the same bank line is imported: the bank's transaction id
 * when it gives one, otherwise a digest of the line and how many identical lines came before
 * it in the file (two equal card fees on one day are two lines).
 */
export function dedupeKeys(lines: readonly ParsedStatementLine[], account = ""): string[] {
  const seen = new Map<string, number>();
  return lines.map((l) => {
    if (l.fitId) return `fit:${account}:${l.fitId}`;
    const base = [l.date, l.amountMinor, l.description.trim().toLowerCase(), (l.reference ?? "").trim().toLowerCase()].join("|");
    const n = (seen.get(base) ?? 0) + 1;
    seen.set(base, n);
    return `sha:${createHash("sha256").update(`${base}#${n}`).digest("hex").slice(0, 32)}`;
  });
}

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
