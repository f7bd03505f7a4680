// Reading a bank statement for import. CSV per RFC 4180 with a byte-order mark; OFX 1.0.2 (SGML)
// as the OFX specification lays it out (OFX header, <STMTRS>, <BANKTRANLIST>, <LEDGERBAL>).
import { describe, expect, it } from "vitest";
import { dedupeKeys, parseStatementFile } from "@/lib/reconcile";

const mapping = { date: "Date", description: "Description", amount: "Amount", reference: "Reference" };

describe("parseStatementFile", () => {
  it("reads a CSV with a BOM and takes lines of one month as that month's statement", () => {
    const text = "\uFEFFDate,Description,Amount,Reference\r\n2026-04-03,\"DEPOSIT, CHEQUE 1042\",120.00,1042\r\n2026-04-30,ACCOUNT FEE,-8.00,\r\n";
    const r = parseStatementFile({ format: "csv", text, mapping, currency: "USD" });
    expect(r).toMatchObject({ ok: true, periodStart: "2026-04-01", periodEnd: "2026-04-30", closingBalanceMinor: null });
    if (r.ok) expect(r.lines).toEqual([{ date: "2026-04-03", amountMinor: 12000, description: "DEPOSIT, CHEQUE 1042", reference: "1042" }, { date: "2026-04-30", amountMinor: -800, description: "ACCOUNT FEE" }]);
  });
  it("lists every unreadable row instead of importing part of the file", () => {
    const r = parseStatementFile({ format: "csv", text: "Date,Description,Amount\n2026-04-31,x,1.00\n2026-04-02,y,abc\n", mapping: { date: "Date", amount: "Amount" }, currency: "USD" });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors).toHaveLength(2);
    expect(parseStatementFile({ format: "csv", text: "When,Amount\n2026-04-01,1\n", mapping, currency: "USD" })).toMatchObject({ ok: false });
  });
  it("reads an OFX 1.0.2 statement with its ledger balance and refuses another currency", () => {
    const ofx = [
      "OFXHEADER:100", "DATA:OFXSGML", "VERSION:102", "", "<OFX><BANKMSGSRSV1><STMTTRNRS><STMTRS><CURDEF>USD",
      "<BANKACCTFROM><BANKID>000000000<ACCTID>0001234<ACCTTYPE>CHECKING</BANKACCTFROM>",
      "<BANKTRANLIST><DTSTART>20260401<DTEND>20260430",
      "<STMTTRN><TRNTYPE>DEP<DTPOSTED>20260403<TRNAMT>120.00<FITID>A1<NAME>DEPOSIT</STMTTRN>",
      "<STMTTRN><TRNTYPE>FEE<DTPOSTED>20260430<TRNAMT>-8.00<FITID>A2<NAME>FEE</STMTTRN>",
      "</BANKTRANLIST><LEDGERBAL><BALAMT>4210.55<DTASOF>20260430</LEDGERBAL></STMTRS></STMTTRNRS></BANKMSGSRSV1></OFX>",
    ].join("\n");
    const r = parseStatementFile({ format: "ofx", text: ofx, currency: "USD" });
    expect(r).toMatchObject({ ok: true, periodStart: "2026-04-01", periodEnd: "2026-04-30", closingBalanceMinor: 421055, accountId: "0001234" });
    expect(parseStatementFile({ format: "ofx", text: ofx, currency: "EUR" })).toMatchObject({ ok: false });
  });
});

describe("dedupeKeys", () => {
  it("keeps two identical lines apart and gives a re-import the same keys", () => {
    const lines = [{ date: "2026-04-30", amountMinor: -800, description: "FEE" }, { date: "2026-04-30", amountMinor: -800, description: "FEE" }, { date: "2026-04-03", amountMinor: 100, description: "X", fitId: "A1" }];
    const keys = dedupeKeys(lines, "0001234");
    expect(new Set(keys).size).toBe(3);
    expect(keys[2]).toBe("fit:0001234:A1");
    expect(dedupeKeys(lines, "0001234")).toEqual(keys);
  });
});
