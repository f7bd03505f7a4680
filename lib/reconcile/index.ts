// Bank statement import and reconciliation: pure parsing and matching, no I/O. The import
// screen, the reconciliation workspace and the benchmark all call these.
export type { BankLine } from "./types";
export { ReconcileParseError } from "./errors";
export { splitCsvRecords, type CsvRecord } from "./csv-records";
export { parseAmountText, parseDateText, type AmountOptions, type DateFormat } from "./values";
export { parseCsv, parseCsvReport, type CsvColumnRef, type CsvMapping, type CsvReport } from "./csv";
export {
  parseOfx,
  parseOfxDate,
  parseOfxStatement,
  parseOfxStatements,
  type OfxBalance,
  type OfxStatement,
  type OfxStatementLine,
} from "./ofx";
export {
  autoMatch,
  normalizeReference,
  type AutoMatchOptions,
  type AutoMatchResult,
  type BookItem,
  type Match,
  type MatchBankLine,
  type MatchKind,
} from "./match";
export {
  reconciliationSummary,
  type AmountLike,
  type AmountList,
  type ReconciliationInput,
  type ReconciliationSummary,
} from "./summary";
export {
  dedupeKeys,
  describeAccount,
  maskAccountId,
  parseStatementFile,
  type ParsedStatement,
  type ParsedStatementLine,
  type StatementAccount,
  type StatementFileInput,
} from "./statement-file";
