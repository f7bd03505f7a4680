// A bank statement file read for import: every unreadable row reported at once, a currency
// other than the club's refused (the file's or a transaction's), and an OFX file holding
// several accounts never read as its first one alone: the treasurer chooses the account.
import { createHash } from "node:crypto";
import { endOfMonthAfter } from "@/lib/dates";
import { parseCsvReport, type CsvMapping } from "./csv";
import { ReconcileParseError } from "./errors";
import { parseOfxStatements, type OfxStatement } from "./ofx";

export type ParsedStatementLine = { date: string; amountMinor: number; description: string; reference?: string; fitId?: string };

/** One account found in an OFX file, as the import screen lists it (the account number masked). */
export type StatementAccount = {
  /** What the form sends back to choose it: its place in the file and the last digits. */
  key: string;
  maskedId: string;
  /** ACCTTYPE (CHECKING, SAVINGS, …), or "" when the file does not say (a card statement has none). */
  type: string;
  currency: string;
  transactions: number;
  firstDate: string | null;
  lastDate: string | null;
};

export type ParsedStatement =
  | { ok: true; lines: ParsedStatementLine[]; periodStart: string; periodEnd: string; closingBalanceMinor: number | null; accountId?: string; account?: StatementAccount }
  | { ok: false; errors: string[]; accounts?: StatementAccount[] };

export type StatementFileInput = {
  format: "csv" | "ofx";
  text: string;
  mapping?: CsvMapping;
  /** The club's currency (ISO 4217). */
  currency: string;
  /** For an OFX file with several accounts: the chosen account's key (StatementAccount.key). */
  account?: string;
};

/** "12345678" → "••••5678"; a short number keeps only its last character. */
export function maskAccountId(id: string | undefined): string {
  const text = (id ?? "").trim();
  if (text === "") return "(no account number)";
  const shown = text.length > 4 ? text.slice(-4) : text.slice(-1);
  return `••••${shown}`;
}

function accountOf(st: OfxStatement, index: number): StatementAccount {
  const dates = st.lines.map((l) => l.date).sort();
  const id = (st.accountId ?? "").trim();
  return {
    key: `${index + 1}-${id.slice(-4) || "none"}`,
    maskedId: maskAccountId(st.accountId),
    type: st.accountType ?? "",
    currency: (st.currency ?? "").toUpperCase(),
    transactions: st.lines.length,
    firstDate: st.start ?? dates[0] ?? null,
    lastDate: st.end ?? dates.at(-1) ?? null,
  };
}

/** "••••1234 CHECKING in USD, 12 transactions, 2026-04-01 to 2026-04-30" */
export function describeAccount(a: StatementAccount): string {
  const kind = a.type ? ` ${a.type.toLowerCase()}` : "";
  const range = a.firstDate && a.lastDate ? `, ${a.firstDate} to ${a.lastDate}` : "";
  return `${a.maskedId}${kind} in ${a.currency || "an unstated currency"}, ${a.transactions} transaction${a.transactions === 1 ? "" : "s"}${range}`;
}

function foreign(currency: string | undefined, club: string): boolean {
  return !!currency && currency.toUpperCase() !== club.toUpperCase();
}

function readOfx(input: StatementFileInput): ParsedStatement {
  const statements = parseOfxStatements(input.text);
  const accounts = statements.map(accountOf);
  let index = 0;
  if (statements.length > 1) {
    index = input.account ? accounts.findIndex((a) => a.key === input.account) : -1;
    if (index < 0) {
      const head = input.account ? "The chosen account is not in this file." : `This file holds ${statements.length} accounts; choose the one to import (one account per statement).`;
      return { ok: false, errors: [head, ...accounts.map(describeAccount)], accounts };
    }
  }
  const st = statements[index]!;
  const account = accounts[index]!;
  const club = input.currency.toUpperCase();
  if (foreign(st.currency, club)) {
    return { ok: false, errors: [`The statement for ${account.maskedId} is in ${st.currency!.toUpperCase()}; the club's books are in ${club}. Nothing was imported: import a statement in ${club}.`], ...(statements.length > 1 ? { accounts } : {}) };
  }
  const strangers = st.lines.filter((l) => foreign(l.currency, club));
  if (strangers.length) {
    const first = strangers[0]!;
    const others = strangers.length > 1 ? ` (and ${strangers.length - 1} more)` : "";
    return { ok: false, errors: [`The transaction of ${first.date} "${first.description}" is in ${first.currency}; the club's books are in ${club}${others}. Nothing was imported: ask the bank for the statement in ${club}, or enter the item by hand in ${club}.`] };
  }
  const dates = st.lines.map((l) => l.date).sort();
  return {
    ok: true,
    lines: st.lines.map((l) => ({ date: l.date, amountMinor: l.amountMinor, description: l.description, reference: l.reference, fitId: l.fitId })),
    periodStart: st.start ?? dates[0] ?? "",
    periodEnd: st.end ?? st.ledgerBalance?.asOf ?? dates.at(-1) ?? "",
    closingBalanceMinor: st.ledgerBalance?.amountMinor ?? null,
    accountId: st.accountId,
    account,
  };
}

function readCsv(input: StatementFileInput): ParsedStatement {
  if (!input.mapping) return { ok: false, errors: ["Say which columns hold the date and the amount."] };
  const report = parseCsvReport(input.text, input.mapping, { currency: input.currency });
  if (report.errors.length) {
    return { ok: false, errors: report.errors.slice(0, 20).map((e) => e.message).concat(report.errors.length > 20 ? [`… and ${report.errors.length - 20} more rows`] : []) };
  }
  const dates = report.lines.map((l) => l.date).sort();
  const first = dates[0] ?? "";
  const last = dates.at(-1) ?? "";
  // A CSV carries no period: lines all in one month are read as that month's statement.
  if (first && first.slice(0, 7) === last.slice(0, 7)) {
    const start = `${first.slice(0, 7)}-01`;
    return { ok: true, lines: report.lines, periodStart: start, periodEnd: endOfMonthAfter(start, 0), closingBalanceMinor: null };
  }
  return { ok: true, lines: report.lines, periodStart: first, periodEnd: last, closingBalanceMinor: null };
}

export function parseStatementFile(input: StatementFileInput): ParsedStatement {
  try {
    return input.format === "ofx" ? readOfx(input) : readCsv(input);
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
