import { formatIsoDate, isIsoDateInRange } from "@/lib/dates";
import { currencyExponent } from "@/lib/money/format";
import { ReconcileParseError } from "./errors";
import { childOf, findAll, parseOfxTree, valueAt, type OfxNode } from "./ofx-tree";
import type { BankLine } from "./types";
import { parseAmountText } from "./values";

export type OfxStatementLine = BankLine & {
  /** The bank's unique id for the transaction (FITID): the key for skipping re-imports. */
  fitId?: string;
  /** TRNTYPE: CREDIT, DEBIT, CHECK, DEP, FEE, … */
  type?: string;
  checkNumber?: string;
  /**
   * <CURRENCY><CURSYM>: the amount is in this currency, not the statement's CURDEF (OFX 2.x
   * specification, STMTTRN's CURRENCY aggregate).
   */
  currency?: string;
  /** <ORIGCURRENCY><CURSYM>: the bank converted the amount into CURDEF from this currency. */
  originalCurrency?: string;
};

export type OfxBalance = { amountMinor: number; asOf: string };

export type OfxStatement = {
  /** From the file's header: "102" (1.0.2 SGML), "211" (2.1.1 XML) … */
  version?: string;
  currency?: string;
  bankId?: string;
  accountId?: string;
  accountType?: string;
  /** DTSTART / DTEND of the transaction list. */
  start?: string;
  end?: string;
  ledgerBalance?: OfxBalance;
  availableBalance?: OfxBalance;
  lines: OfxStatementLine[];
};

// YYYYMMDD[HHMM[SS[.XXX]]][ [gmt offset[:tz name]] ]
const OFX_DATE = /^(\d{4})(\d{2})(\d{2})(?:\d{4}(?:\d{2}(?:[.,]\d{1,3})?)?)?\s*(?:\[[+-]?\d+(?:\.\d+)?(?::[^\]]*)?\])?$/;

/**
 * The calendar date of an OFX date-time. The date is taken as written, in the offset the bank
 * wrote it in, because that is the posting date printed on the member's paper statement.
 */
export function parseOfxDate(text: string): string {
  const m = OFX_DATE.exec(text.trim());
  const iso = m ? formatIsoDate(Number(m[1]), Number(m[2]), Number(m[3])) : "";
  if (!m || !isIsoDateInRange(iso)) throw new Error(`"${text}" is not an OFX date (YYYYMMDD[HHMMSS[.XXX]][[offset:TZ]])`);
  return iso;
}

function exponentOf(currency: string | undefined): number {
  if (!currency) return 2;
  try {
    return currencyExponent(currency);
  } catch {
    return 2;
  }
}

function readAmount(text: string, exponent: number): number {
  // The spec lets a comma stand for the decimal point; no thousands separators are allowed.
  return parseAmountText(text, { exponent, decimalComma: text.includes(",") && !text.includes(".") });
}

function required(node: OfxNode, name: string): { value: string; node: OfxNode } {
  const child = childOf(node, name);
  if (child?.value === undefined || child.value === "") {
    throw new ReconcileParseError(`<${node.name}> has no <${name}>`, { row: node.line, column: name });
  }
  return { value: child.value, node: child };
}

function readField<T>(node: OfxNode, name: string, read: (v: string) => T): T {
  const { value, node: child } = required(node, name);
  try {
    return read(value);
  } catch (e) {
    throw new ReconcileParseError((e as Error).message, { row: child.line, column: name });
  }
}

function readTransaction(trn: OfxNode, defaultExponent: number): OfxStatementLine {
  // An amount in another currency is counted in that currency's minor unit.
  const own = valueAt(trn, "CURRENCY", "CURSYM");
  const exponent = own ? exponentOf(own) : defaultExponent;
  const date = readField(trn, "DTPOSTED", parseOfxDate);
  const amountMinor = readField(trn, "TRNAMT", (v) => readAmount(v, exponent));
  const name = valueAt(trn, "NAME") || valueAt(trn, "PAYEE", "NAME") || "";
  const memo = valueAt(trn, "MEMO") ?? "";
  const description = name && memo && memo !== name ? `${name} / ${memo}` : name || memo;
  const checkNumber = valueAt(trn, "CHECKNUM") || undefined;
  const fitId = valueAt(trn, "FITID") || undefined;
  const reference = checkNumber ?? (valueAt(trn, "REFNUM") || undefined) ?? fitId;
  const line: OfxStatementLine = { date, amountMinor, description };
  if (reference !== undefined) line.reference = reference;
  if (fitId !== undefined) line.fitId = fitId;
  const type = valueAt(trn, "TRNTYPE");
  if (type) line.type = type;
  if (checkNumber !== undefined) line.checkNumber = checkNumber;
  const currency = valueAt(trn, "CURRENCY", "CURSYM");
  if (currency) line.currency = currency.toUpperCase();
  const original = valueAt(trn, "ORIGCURRENCY", "CURSYM");
  if (original) line.originalCurrency = original.toUpperCase();
  return line;
}

function readBalance(stmt: OfxNode, name: string, exponent: number): OfxBalance | undefined {
  const node = childOf(stmt, name);
  if (!node) return undefined;
  return {
    amountMinor: readField(node, "BALAMT", (v) => readAmount(v, exponent)),
    asOf: readField(node, "DTASOF", parseOfxDate),
  };
}

function readStatement(stmt: OfxNode, version: string | undefined): OfxStatement {
  const currency = valueAt(stmt, "CURDEF");
  const exponent = exponentOf(currency);
  const account = childOf(stmt, "BANKACCTFROM") ?? childOf(stmt, "CCACCTFROM");
  const list = childOf(stmt, "BANKTRANLIST");
  const statement: OfxStatement = {
    lines: list ? findAll(list, "STMTTRN").map((t) => readTransaction(t, exponent)) : [],
  };
  const optional: [keyof OfxStatement, string | undefined][] = [
    ["version", version],
    ["currency", currency],
    ["bankId", valueAt(account, "BANKID")],
    ["accountId", valueAt(account, "ACCTID")],
    ["accountType", valueAt(account, "ACCTTYPE")],
  ];
  for (const [key, value] of optional) if (value) Object.assign(statement, { [key]: value });
  if (list && valueAt(list, "DTSTART")) statement.start = readField(list, "DTSTART", parseOfxDate);
  if (list && valueAt(list, "DTEND")) statement.end = readField(list, "DTEND", parseOfxDate);
  const ledger = readBalance(stmt, "LEDGERBAL", exponent);
  if (ledger) statement.ledgerBalance = ledger;
  const available = readBalance(stmt, "AVAILBAL", exponent);
  if (available) statement.availableBalance = available;
  return statement;
}

/** Every bank (STMTRS) and credit-card (CCSTMTRS) statement in an OFX 1.x or 2.x file. */
export function parseOfxStatements(text: string): OfxStatement[] {
  const { root, version } = parseOfxTree(text);
  const statements = findAll(root, "STMTRS", "CCSTMTRS");
  if (statements.length === 0) {
    throw new ReconcileParseError("the file holds no bank or card statement (<STMTRS> or <CCSTMTRS>)", {
      row: root.line,
    });
  }
  return statements.map((s) => readStatement(s, version));
}

/** The first statement of the file with its ledger balance (LEDGERBAL: BALAMT, DTASOF). */
export function parseOfxStatement(text: string): OfxStatement {
  const [first] = parseOfxStatements(text);
  if (!first) throw new ReconcileParseError("the file holds no statement", { row: 1 });
  return first;
}

/** The transactions (STMTTRN) of every statement in the file as bank lines, deposits positive. */
export function parseOfx(text: string): BankLine[] {
  return parseOfxStatements(text).flatMap((s) =>
    s.lines.map(({ date, amountMinor, description, reference }) =>
      reference === undefined ? { date, amountMinor, description } : { date, amountMinor, description, reference },
    ),
  );
}
