import { describe, expect, it } from "vitest";
import { parseCsv, parseCsvReport, ReconcileParseError, type CsvMapping } from "@/lib/reconcile";

// Invented statements. CSV structure per RFC 4180; column layouts are common bank-export
// shapes (common practice), not any particular bank's.
const signed: CsvMapping = { date: "Date", description: "Description", reference: "Ref", amount: "Amount" };

function errorOf(fn: () => unknown): ReconcileParseError {
  try {
    fn();
  } catch (e) {
    if (e instanceof ReconcileParseError) return e;
    throw e;
  }
  throw new Error("expected a ReconcileParseError");
}

describe("parseCsv", () => {
  it("reads a signed amount column with quoting, a BOM, CRLF and trailing blank lines", () => {
    const text =
      "\uFEFFDate,Description,Ref,Amount\r\n" +
      '2025-03-03,"Dues, March",DUE-301,"1,250.00"\r\n' +
      '2025-03-04,"Cheque ""1042"" to hangar",001042,(480.00)\r\n' +
      '2025-03-05,"Deposit\r\nsecond line",,75.5\r\n' +
      "\r\n\r\n";
    expect(parseCsv(text, signed)).toEqual([
      { date: "2025-03-03", amountMinor: 125000, description: "Dues, March", reference: "DUE-301" },
      { date: "2025-03-04", amountMinor: -48000, description: 'Cheque "1042" to hangar', reference: "001042" },
      { date: "2025-03-05", amountMinor: 7550, description: "Deposit\nsecond line" }, // blank Ref → no reference; a line break inside quotes is read as LF
    ]);
  });
  it("matches header names without regard to case or padding, and columns by index", () => {
    const text = " DATE ,memo,AMOUNT\n2025-03-03,Fuel,-12.50\n";
    expect(parseCsv(text, { date: "date", description: "Memo", amount: "amount" })).toEqual([
      { date: "2025-03-03", amountMinor: -1250, description: "Fuel" },
    ]);
    expect(parseCsv("2025-03-03,Fuel,-12.50\n", { hasHeader: false, date: 0, description: 1, amount: 2 })).toEqual([
      { date: "2025-03-03", amountMinor: -1250, description: "Fuel" },
    ]);
  });
  it("flips the sign for banks that show deposits as negative", () => {
    const text = "Date,Description,Amount\n2025-03-03,Card payout,-139.89\n2025-03-04,Fee,5.00\n";
    const lines = parseCsv(text, { date: "Date", description: "Description", amount: "Amount", sign: "deposits-negative" });
    expect(lines.map((l) => l.amountMinor)).toEqual([13989, -500]);
  });
  it("reads separate debit and credit columns", () => {
    const text = "Posted,Payee,Memo,Debit,Credit\n03/03/2025,Hangar rent,March,480.00,\n03/04/2025,Member,Dues,,45.00\n";
    const mapping: CsvMapping = {
      date: "Posted",
      description: ["Payee", "Memo"],
      debit: "Debit",
      credit: "Credit",
      dateFormat: "MM/DD/YYYY",
    };
    expect(parseCsv(text, mapping)).toEqual([
      { date: "2025-03-03", amountMinor: -48000, description: "Hangar rent March" },
      { date: "2025-03-04", amountMinor: 4500, description: "Member Dues" },
    ]);
  });
  it("reads a European export: semicolons, DD.MM.YYYY and decimal commas", () => {
    const text = "Buchungstag;Text;Betrag\n04.03.2025;Treibstoff;-1.234,56\n05.03.2025;\"Beitrag; März\";45,00\n";
    const mapping: CsvMapping = {
      date: "Buchungstag",
      description: "Text",
      amount: "Betrag",
      delimiter: ";",
      dateFormat: "DD.MM.YYYY",
      decimalComma: true,
    };
    expect(parseCsv(text, mapping)).toEqual([
      { date: "2025-03-04", amountMinor: -123456, description: "Treibstoff" },
      { date: "2025-03-05", amountMinor: 4500, description: "Beitrag; März" },
    ]);
  });
  it("reads DD/MM/YYYY, a preamble and a zero-exponent currency", () => {
    const text = "Account 0000-000\nPeriod March\nDate,Details,Amount\n04/03/2025,Dues,\"4,500\"\n";
    const lines = parseCsv(text, {
      skipRows: 2,
      date: "Date",
      description: "Details",
      amount: "Amount",
      dateFormat: "DD/MM/YYYY",
      exponent: 0, // JPY: ISO 4217 exponent 0 (from memory)
    });
    expect(lines).toEqual([{ date: "2025-03-04", amountMinor: 4500, description: "Dues" }]);
  });
  it("names the row and column of an unreadable value", () => {
    const text = "Date,Description,Ref,Amount\n2025-03-03,ok,,1.00\n2025-02-30,bad date,,1.00\n";
    const e = errorOf(() => parseCsv(text, signed));
    expect(e.row).toBe(3);
    expect(e.column).toBe("Date");
    expect(e.message).toMatch(/Row 3, column Date/);
    const amount = errorOf(() => parseCsv("Date,Description,Ref,Amount\n2025-03-03,x,,12.345\n", signed));
    expect([amount.row, amount.column]).toEqual([2, "Amount"]);
  });
  it("reports every unreadable row when asked, and counts them in the thrown error", () => {
    const text = "Date,Description,Ref,Amount\nnope,a,,1\n2025-03-03,b,,2\n2025-03-04,c,,x\n";
    const report = parseCsvReport(text, signed);
    expect(report.lines).toEqual([{ date: "2025-03-03", amountMinor: 200, description: "b" }]);
    expect(report.errors.map((e) => [e.row, e.column])).toEqual([
      [2, "Date"],
      [4, "Amount"],
    ]);
    expect(() => parseCsv(text, signed)).toThrow(/and 1 more/);
  });
  it("refuses a mapping that names a missing column or mixes amount styles", () => {
    expect(errorOf(() => parseCsv("Date,Text,Amount\n", signed)).column).toBe("Description");
    expect(() => parseCsv("a\n", { date: 0, description: 1, amount: 2, debit: 3 })).toThrow(TypeError);
    expect(() => parseCsv("a\n", { date: 0, description: 1 })).toThrow(TypeError);
    expect(errorOf(() => parseCsv("Date,Description,Ref,Amount\n2025-03-03,short\n", signed)).row).toBe(2);
    expect(() => parseCsv("Date,Description,Debit,Credit\n2025-03-03,none,,\n", { date: "Date", description: "Description", debit: "Debit", credit: "Credit" })).toThrow(/no amount/);
  });
  it("leaves the description empty when no column is mapped", () => {
    expect(parseCsv("Date,Amount\n2025-03-03,1\n", { date: "Date", amount: "Amount", dateFormat: "YYYY-MM-DD" })).toEqual([
      { date: "2025-03-03", amountMinor: 100, description: "" },
    ]);
  });
  it("returns nothing for an empty file", () => {
    expect(parseCsv("", signed)).toEqual([]);
    expect(parseCsv("\uFEFF\r\n", signed)).toEqual([]);
  });
});
