// CSV export per RFC 4180: fields with commas, quotes or line breaks are quoted and quotes
// doubled; records end in CRLF. Formula prefixes are neutralised (OWASP CSV injection advice).
import { describe, expect, it } from "vitest";
import { toCsv } from "@/lib/ledger/csv-export";
import { splitCsvRecords } from "@/lib/reconcile";

describe("toCsv", () => {
  it("quotes what RFC 4180 requires and round-trips through the importer's reader", () => {
    const csv = toCsv(["Date", "Memo", "Amount"], [["2026-04-01", 'Flight "N0512L", 1.3 h', "-197.60"], ["2026-04-02", "two\nlines", 12]]);
    expect(csv).toBe('Date,Memo,Amount\r\n2026-04-01,"Flight ""N0512L"", 1.3 h",-197.60\r\n2026-04-02,"two\nlines",12\r\n');
    expect(splitCsvRecords(csv).map((r) => r.fields)).toEqual([["Date", "Memo", "Amount"], ["2026-04-01", 'Flight "N0512L", 1.3 h', "-197.60"], ["2026-04-02", "two\nlines", "12"]]);
  });
  it("stops a spreadsheet from running a memo as a formula, but leaves negative numbers alone", () => {
    expect(toCsv(["m"], [["=HYPERLINK(1)"], ["-12.50"], ["+1"], ["@x"]])).toBe("m\r\n'=HYPERLINK(1)\r\n-12.50\r\n'+1\r\n'@x\r\n");
  });
});
