import { CsvReadError, readCsvRecords, type CsvRecord } from "@/lib/csv/read";
import { ReconcileParseError } from "./errors";

export type { CsvRecord };

/**
 * The records of a bank's CSV file, read by the shared CSV reader (csv-parse, RFC 4180); a file
 * that is not readable CSV becomes a ReconcileParseError naming the line.
 */
export function splitCsvRecords(text: string, delimiter = ","): CsvRecord[] {
  try {
    return readCsvRecords(text, delimiter);
  } catch (error) {
    if (error instanceof CsvReadError) throw new ReconcileParseError(error.message, { row: error.line });
    throw error;
  }
}
