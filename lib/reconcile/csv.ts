import { splitCsvRecords, type CsvRecord } from "./csv-records";
import { ReconcileParseError } from "./errors";
import type { BankLine } from "./types";
import { parseAmountText, parseDateText, type DateFormat } from "./values";

/** A column by its header text (trimmed, case-insensitive) or by 0-based position. */
export type CsvColumnRef = string | number;

export type CsvMapping = {
  date: CsvColumnRef;
  /** Several columns (e.g. payee and memo) are joined with a space; absent → empty descriptions. */
  description?: CsvColumnRef | readonly CsvColumnRef[];
  reference?: CsvColumnRef;
  /** A column naming each row's currency (ISO 4217), when the bank's export has one. */
  currency?: CsvColumnRef;
  /** One signed amount column … */
  amount?: CsvColumnRef;
  /** … read with this convention (default "deposits-positive"). */
  sign?: "deposits-positive" | "deposits-negative";
  /** … or the bank's two columns: debit = money out, credit = money in (either may be blank). */
  debit?: CsvColumnRef;
  credit?: CsvColumnRef;
  dateFormat?: DateFormat;
  decimalComma?: boolean;
  /** Digits of the currency's minor unit, default 2. */
  exponent?: number;
  /** Field separator, default ","; European banks often use ";". */
  delimiter?: string;
  /** Whether the first record (after skipRows) names the columns; default true. */
  hasHeader?: boolean;
  /** Records of preamble (account name, period) before the header. */
  skipRows?: number;
};

export type CsvReport = { lines: BankLine[]; errors: ReconcileParseError[] };

type Resolved = { label: string; index: number };

function checkMapping(m: CsvMapping): void {
  const split = m.debit !== undefined || m.credit !== undefined;
  if ((m.amount === undefined) === !split) {
    throw new TypeError("CSV mapping needs either an amount column or debit/credit columns, not both");
  }
  if (m.sign !== undefined && m.sign !== "deposits-positive" && m.sign !== "deposits-negative") {
    throw new TypeError(`Unknown sign convention "${String(m.sign)}"`);
  }
}

function makeResolver(header: CsvRecord | undefined) {
  const names = header?.fields.map((f) => f.trim().toLowerCase()) ?? [];
  return (ref: CsvColumnRef): Resolved => {
    if (typeof ref === "number") {
      if (!Number.isInteger(ref) || ref < 0) throw new TypeError(`Column index must be an integer ≥ 0, got ${ref}`);
      return { label: String(ref), index: ref };
    }
    if (!header) throw new TypeError(`Column "${ref}" is named but the mapping says the file has no header`);
    const index = names.indexOf(ref.trim().toLowerCase());
    if (index < 0) {
      throw new ReconcileParseError(`no column named "${ref}" (found: ${header.fields.join(", ")})`, {
        row: header.line,
        column: ref,
      });
    }
    return { label: ref, index };
  };
}

function cellOf(record: CsvRecord, col: Resolved): string {
  const value = record.fields[col.index];
  if (value === undefined) {
    throw new ReconcileParseError(`the row has ${record.fields.length} fields, none at position ${col.index}`, {
      row: record.line,
      column: col.label,
    });
  }
  return value.trim();
}

function optionalCell(record: CsvRecord, col: Resolved | undefined): string {
  return col ? (record.fields[col.index] ?? "").trim() : "";
}

type Columns = {
  date: Resolved;
  description: Resolved[];
  reference?: Resolved;
  currency?: Resolved;
  amount?: Resolved;
  debit?: Resolved;
  credit?: Resolved;
};

function readAmount(record: CsvRecord, cols: Columns, m: CsvMapping): number {
  const options = { decimalComma: m.decimalComma ?? false, exponent: m.exponent ?? 2 };
  const read = (col: Resolved, text: string) => {
    try {
      return parseAmountText(text, options);
    } catch (e) {
      throw new ReconcileParseError((e as Error).message, { row: record.line, column: col.label });
    }
  };
  if (cols.amount) {
    const value = read(cols.amount, cellOf(record, cols.amount));
    return m.sign === "deposits-negative" && value !== 0 ? -value : value;
  }
  const debitText = optionalCell(record, cols.debit);
  const creditText = optionalCell(record, cols.credit);
  if (debitText === "" && creditText === "") {
    const label = [cols.debit?.label, cols.credit?.label].filter(Boolean).join("/");
    throw new ReconcileParseError("no amount in the debit or credit column", { row: record.line, column: label });
  }
  // Banks write both columns as positive numbers, some with a minus on debits: the column,
  // not the sign, says which way the money went.
  const out = cols.debit && debitText !== "" ? Math.abs(read(cols.debit, debitText)) : 0;
  const into = cols.credit && creditText !== "" ? Math.abs(read(cols.credit, creditText)) : 0;
  return into - out;
}

function readRecord(record: CsvRecord, cols: Columns, m: CsvMapping, expected: string | undefined): BankLine {
  const currency = optionalCell(record, cols.currency).toUpperCase();
  if (expected && currency && currency !== expected.toUpperCase()) {
    throw new ReconcileParseError(`the row is in ${currency}; the club's books are in ${expected.toUpperCase()}`, { row: record.line, column: cols.currency!.label });
  }
  let date: string;
  try {
    date = parseDateText(cellOf(record, cols.date), m.dateFormat ?? "ISO");
  } catch (e) {
    if (e instanceof ReconcileParseError) throw e;
    throw new ReconcileParseError((e as Error).message, { row: record.line, column: cols.date.label });
  }
  const amountMinor = readAmount(record, cols, m);
  const description = cols.description
    .map((c) => optionalCell(record, c))
    .filter((s) => s !== "")
    .join(" ");
  const reference = optionalCell(record, cols.reference);
  return reference === "" ? { date, amountMinor, description } : { date, amountMinor, description, reference };
}

/**
 * Reads every data row, collecting one error per unreadable row instead of stopping, so the
 * import screen can list them all. Rows whose fields are all blank are skipped. With
 * `opts.currency` (the club's), a row whose mapped currency column names another is refused.
 */
export function parseCsvReport(text: string, mapping: CsvMapping, opts: { currency?: string } = {}): CsvReport {
  checkMapping(mapping);
  const records = splitCsvRecords(text, mapping.delimiter ?? ",").slice(mapping.skipRows ?? 0);
  const hasHeader = mapping.hasHeader ?? true;
  const header = hasHeader ? records[0] : undefined;
  if (records.length === 0) return { lines: [], errors: [] };
  const resolve = makeResolver(header);
  const d = mapping.description;
  const descriptionRefs = d === undefined ? [] : Array.isArray(d) ? d : [d];
  const optional = (ref: CsvColumnRef | undefined) => (ref === undefined ? undefined : resolve(ref));
  const cols: Columns = {
    date: resolve(mapping.date),
    description: (descriptionRefs as readonly CsvColumnRef[]).map(resolve),
    reference: optional(mapping.reference),
    currency: optional(mapping.currency),
    amount: optional(mapping.amount),
    debit: optional(mapping.debit),
    credit: optional(mapping.credit),
  };
  const lines: BankLine[] = [];
  const errors: ReconcileParseError[] = [];
  for (const record of hasHeader ? records.slice(1) : records) {
    if (record.fields.every((f) => f.trim() === "")) continue;
    try {
      lines.push(readRecord(record, cols, mapping, opts.currency));
    } catch (e) {
      if (!(e instanceof ReconcileParseError)) throw e;
      errors.push(e);
    }
  }
  return { lines, errors };
}

/**
 * Parses a bank statement CSV into bank lines, deposits positive. Throws the first row's
 * ReconcileParseError (with its row and column) when any row cannot be read: a statement
 * imported with rows missing would never reconcile.
 */
export function parseCsv(text: string, mapping: CsvMapping): BankLine[] {
  const { lines, errors } = parseCsvReport(text, mapping);
  const first = errors[0];
  if (first) {
    if (errors.length > 1) first.message += ` (and ${errors.length - 1} more unreadable rows)`;
    throw first;
  }
  return lines;
}
