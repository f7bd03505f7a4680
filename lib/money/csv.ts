// CSV for the treasurer's exports, written by the csv-stringify library (RFC 4180: fields with
// a comma, quote or line break quoted, quotes doubled, CRLF record ends). A text cell that a
// spreadsheet would run as a formula (starting with = + - @, tab or carriage return) gets a
// leading apostrophe — the OWASP "CSV injection" advice (common practice) — unless it is a
// plain number such as "-152.00", which a spreadsheet reads as the number it is.
import { stringify } from "csv-stringify/sync";

const FORMULA_START = /^[=+\-@\t\r]/;
const PLAIN_NUMBER = /^-?\d+(\.\d+)?$/;

export type CsvCell = string | number | null | undefined;

export function guardCsvCell(value: CsvCell): string {
  if (value === null || value === undefined) return "";
  const text = String(value);
  return FORMULA_START.test(text) && !PLAIN_NUMBER.test(text) ? `'${text}` : text;
}

export function writeCsv(header: readonly string[], rows: readonly (readonly CsvCell[])[]): string {
  return stringify([header.map(guardCsvCell), ...rows.map((r) => r.map(guardCsvCell))], { record_delimiter: "\r\n", quoted_match: /[\r\n]/ });
}
