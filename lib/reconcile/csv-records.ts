import { ReconcileParseError } from "./errors";

/** One CSV record: its fields and the 1-based line of the file where it starts. */
export type CsvRecord = { fields: string[]; line: number };

type State = "start" | "unquoted" | "quoted" | "closed";

/**
 * Splits CSV text into records per RFC 4180: fields in double quotes may hold the delimiter,
 * CR/LF line breaks and doubled quotes (""), a record ends at CRLF, LF or a lone CR, a leading
 * UTF-8 byte-order mark is dropped and empty lines (including trailing ones) are skipped.
 * An unterminated quote, or text after a closing quote, is an error: guessing would shift
 * every following column.
 */
export function splitCsvRecords(text: string, delimiter = ","): CsvRecord[] {
  if (delimiter.length !== 1 || delimiter === '"' || delimiter === "\r" || delimiter === "\n") {
    throw new TypeError(`CSV delimiter must be one character other than a quote or line break, got "${delimiter}"`);
  }
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const records: CsvRecord[] = [];
  let fields: string[] = [];
  let field = "";
  let state: State = "start";
  let line = 1;
  let recordLine = 1;

  const endRecord = () => {
    const blank = fields.length === 0 && field === "" && state === "start";
    if (!blank) {
      fields.push(field);
      records.push({ fields, line: recordLine });
    }
    fields = [];
    field = "";
    state = "start";
  };

  for (let i = 0; i < body.length; i++) {
    const c = body.charAt(i);
    if (state === "quoted") {
      if (c === '"') {
        if (body.charAt(i + 1) === '"') {
          field += '"';
          i++;
        } else {
          state = "closed";
        }
        continue;
      }
      if (c === "\n" || (c === "\r" && body.charAt(i + 1) !== "\n")) line++;
      field += c;
      continue;
    }
    if (c === delimiter) {
      fields.push(field);
      field = "";
      state = "start";
      continue;
    }
    if (c === "\r" || c === "\n") {
      if (c === "\r" && body.charAt(i + 1) === "\n") i++;
      endRecord();
      line++;
      recordLine = line;
      continue;
    }
    if (state === "closed") {
      throw new ReconcileParseError(`unexpected "${c}" after a closing quote (field ${fields.length + 1})`, {
        row: recordLine,
      });
    }
    if (c === '"' && state === "start") {
      state = "quoted";
      continue;
    }
    field += c;
    state = "unquoted";
  }
  if (state === "quoted") {
    throw new ReconcileParseError(`a quoted field (field ${fields.length + 1}) is never closed`, { row: recordLine });
  }
  endRecord();
  return records;
}
