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

export type CsvCell = string | number | null | undefined;

/** The cell as text, guarded against formula injection. */
export function guardCsvCell(value: CsvCell): string {
  if (value === null || value === undefined) return "";
  const text = String(value);
  if (typeof value === "number") return text;
  return FORMULA_START.test(text) && !PLAIN_NUMBER.test(text) ? `'${text}` : text;
}

/** A header and rows as one CSV document (CRLF record ends, a final CRLF). */
export function writeCsv(header: readonly string[], rows: readonly (readonly CsvCell[])[]): string {
  return stringify([header.map(guardCsvCell), ...rows.map((r) => r.map(guardCsvCell))], { record_delimiter: "\r\n", quoted_match: /[\r\n]/ });
}
