import { describe, expect, it } from "vitest";
import { readCsvRecords } from "@/lib/csv";
import { ReconcileParseError, splitCsvRecords } from "@/lib/reconcile";

// RFC 4180 §2: records end at a line break; fields containing commas, quotes or line breaks
// are enclosed in double quotes; a quote inside a quoted field is written twice.
const fields = (text: string) => splitCsvRecords(text).map((r) => r.fields);

// The one CSV reader (lib/csv/read.ts, csv-parse), as the bank import calls it.
describe("splitCsvRecords (RFC 4180, read by csv-parse)", () => {
  it("reads quoted fields with commas, doubled quotes and line breaks", () => {
    expect(fields('a,"b,c","say ""hi"""\r\n')).toEqual([["a", "b,c", 'say "hi"']]); // RFC 4180 §2 rules 5–7
    expect(fields('1,"line one\r\nline two",x\r\n2,"lf\nonly",y')).toEqual([
      ["1", "line one\nline two", "x"], // RFC 4180 §2 rule 6: CRLF inside quotes is data (read as LF)
      ["2", "lf\nonly", "y"],
    ]);
  });
  it("accepts CRLF, LF and lone CR line ends and a missing final line break", () => {
    expect(fields("a,b\r\nc,d\ne,f\rg,h")).toEqual([
      ["a", "b"],
      ["c", "d"],
      ["e", "f"],
      ["g", "h"],
    ]);
  });
  it("drops a UTF-8 byte-order mark and blank lines, keeps empty fields", () => {
    expect(fields("\uFEFFDate,Amount\r\n2025-01-02,5\r\n\r\n\r\n")).toEqual([
      ["Date", "Amount"],
      ["2025-01-02", "5"],
    ]);
    expect(fields('a,,""\n')).toEqual([["a", "", ""]]);
  });
  it("numbers each record by the line where it starts", () => {
    const records = splitCsvRecords('h1,h2\n"multi\nline",1\n\nlast,2\n');
    expect(records.map((r) => r.line)).toEqual([1, 2, 5]); // line 4 is blank; the quoted field spans 2–3
  });
  it("refuses an unterminated quote or text after a closing quote, naming the row", () => {
    expect(() => splitCsvRecords('a,b\n"open,c\n')).toThrow(ReconcileParseError);
    try {
      splitCsvRecords('a,b\nc,"d"x\n');
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(ReconcileParseError);
      expect((e as ReconcileParseError).row).toBe(2);
    }
    try {
      splitCsvRecords('a,b\nc,d\n"open,e\nf\n');
      expect.unreachable();
    } catch (e) {
      expect((e as ReconcileParseError).row).toBe(3); // the record that opens the quote starts on line 3
    }
  });
  it("reads the reader's records directly, with the line each starts on", () => {
    expect(readCsvRecords('x;"y\r\nz"\r\n;\r\n', ";")).toEqual([
      { fields: ["x", "y\nz"], line: 1 }, // RFC 4180 §2.6 (a line break inside a field is read as LF)
      { fields: ["", ""], line: 3 }, // RFC 4180 §2.4: a record of empty fields is not a blank line
    ]);
    expect(() => readCsvRecords("a", '"')).toThrow(TypeError);
  });
  it("splits on another delimiter when asked", () => {
    expect(splitCsvRecords('01.02.2025;"A; B";-1.234,56', ";").map((r) => r.fields)).toEqual([
      ["01.02.2025", "A; B", "-1.234,56"],
    ]);
  });
});
