// The one CSV reader of the app (bank statements), through the csv-parse library: RFC 4180
// quoting (the delimiter, line breaks and doubled quotes inside double quotes), CRLF, LF or a
// lone CR between records, a leading UTF-8 byte-order mark dropped, blank lines skipped. Every
// line break is read as LF first (inside a quoted field too), so that the line numbers the
// library counts are the ones a text editor shows.
import { CsvError, parse } from "csv-parse/sync";

/** One CSV record: its fields and the 1-based line of the file where it starts. */
export type CsvRecord = { fields: string[]; line: number };

/** A file that is not readable CSV; `line` is where the trouble starts. */
export class CsvReadError extends Error {
  constructor(
    message: string,
    readonly line: number,
  ) {
    super(message);
    this.name = "CsvReadError";
  }
}

const LINE_BREAK = /\n/g;

/**
 * Splits CSV text into records. An unterminated quote or text after a closing quote is an
 * error (guessing would shift every following column), reported with its line.
 */
export function readCsvRecords(text: string, delimiter = ","): CsvRecord[] {
  if (delimiter.length !== 1 || delimiter === '"' || delimiter === "\r" || delimiter === "\n") {
    throw new TypeError(`CSV delimiter must be one character other than a quote or line break, got "${delimiter}"`);
  }
  let lastEnd = 0;
  try {
    const rows = parse(text.replace(/\r\n?/g, "\n"), {
      delimiter,
      bom: true,
      info: true,
      relax_column_count: true,
      skip_empty_lines: true,
      record_delimiter: "\n",
      on_record: (record, context) => {
        lastEnd = context.lines;
        return record;
      },
    }) as unknown as { record: string[]; info: { lines: number } }[];
    return rows.map(({ record, info }) => {
      // info.lines is the line the record ends on; line breaks inside its quoted fields move the start up.
      const inside = record.reduce((n, f) => n + (f.match(LINE_BREAK)?.length ?? 0), 0);
      return { fields: record, line: info.lines - inside };
    });
  } catch (error) {
    if (!(error instanceof CsvError)) throw error;
    if (error.code === "CSV_QUOTE_NOT_CLOSED") throw new CsvReadError("a quoted field is never closed", lastEnd + 1);
    if (error.code === "CSV_INVALID_CLOSING_QUOTE") throw new CsvReadError("unexpected text after a closing quote", Number(error.lines) || lastEnd + 1);
    throw new CsvReadError(error.message.replace(/ at line \d+.*$/, ""), Number((error as { lines?: number }).lines) || lastEnd + 1);
  }
}
