// CSV in and out, through the csv-parse / csv-stringify libraries (one reader, one writer).
export { csvDialect, guardCsvCell, writeCsv, type CsvCell, type CsvDay, type CsvDecimal, type CsvDialect } from "./write";
export { CsvReadError, readCsvRecords, type CsvRecord } from "./read";
