// The one CSV writer of the app (every export: journal, tables, reports, acknowledgements, the
// bank view), through the csv-stringify library: RFC 4180 fields (a comma, quote or line break
// quoted, quotes doubled), CRLF record ends.
//
// Spreadsheet formula injection: a text cell starting with = + - @, tab or carriage return is
// prefixed with an apostrophe, as the OWASP "CSV Injection" guidance advises, so a spreadsheet
// shows a member's memo instead of running it. A plain number ("-152.00") is left as the number
// it is; a number value is never text a spreadsheet could run.
import { stringify } from "csv-stringify/sync";

const FORMULA_START = /^[=+\-@\t\r]/;
const PLAIN_NUMBER = /^-?\d+(\.\d+)?$/;

const ISO_DAY = /^(\d{4})-(\d{2})-(\d{2})$/;

/** A decimal amount ("-152.00", from minorToDecimalString) written in the file's locale. */
export type CsvDecimal = { decimal: string };
/** A calendar day ("2026-04-01") written in the file's locale. */
export type CsvDay = { day: string };
export type CsvCell = string | number | null | undefined | CsvDecimal | CsvDay;

/**
 * How a file for one locale writes numbers, days and the field separator: the locale's decimal
 * mark, its numeric day order, and a semicolon between fields where the decimal mark is a comma
 * (a spreadsheet set to such a locale reads ";" as the separator, so "12,50" stays one number).
 * Without a locale: RFC 4180 commas, "." decimals and ISO 8601 days.
 */
export type CsvDialect = { delimiter: "," | ";"; decimalMark: string; day: (iso: string) => string };

const PLAIN: CsvDialect = { delimiter: ",", decimalMark: ".", day: (iso) => iso };

export function csvDialect(locale?: string): CsvDialect {
  if (!locale) return PLAIN;
  const decimalMark = new Intl.NumberFormat(locale).formatToParts(1.5).find((p) => p.type === "decimal")?.value ?? ".";
  const days = new Intl.DateTimeFormat(locale, { year: "numeric", month: "2-digit", day: "2-digit", timeZone: "UTC" });
  return {
    delimiter: decimalMark === "," ? ";" : ",",
    decimalMark,
    day: (iso) => {
      const m = ISO_DAY.exec(iso);
      return m ? days.format(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3]))) : iso;
    },
  };
}

/** The cell as text, guarded against formula injection. */
export function guardCsvCell(value: CsvCell, dialect: CsvDialect = PLAIN): string {
  if (value === null || value === undefined) return "";
  if (typeof value === "object") {
    if ("decimal" in value) return PLAIN_NUMBER.test(value.decimal) ? value.decimal.replace(".", dialect.decimalMark) : guardCsvCell(value.decimal, dialect);
    return guardCsvCell(dialect.day(value.day), dialect);
  }
  if (typeof value === "number") return String(value).replace(".", dialect.decimalMark);
  const text = String(value);
  return FORMULA_START.test(text) && !PLAIN_NUMBER.test(text) ? `'${text}` : text;
}

/**
 * A header and rows as one CSV document (CRLF record ends, a final CRLF). With `locale` (the
 * club's), amounts and days are written as that locale writes them (see csvDialect).
 */
export function writeCsv(header: readonly string[], rows: readonly (readonly CsvCell[])[], options: { locale?: string } = {}): string {
  const dialect = csvDialect(options.locale);
  const cell = (v: CsvCell) => guardCsvCell(v, dialect);
  return stringify([header.map(cell), ...rows.map((r) => r.map(cell))], { delimiter: dialect.delimiter, record_delimiter: "\r\n", quoted_match: /[\r\n]/ });
}
