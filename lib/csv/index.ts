// CSV in and out, through the csv-parse / csv-stringify libraries (one reader, one writer).
export { guardCsvCell, writeCsv, type CsvCell } from "./write";
export { CsvReadError, readCsvRecords, type CsvRecord } from "./read";
