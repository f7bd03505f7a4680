import { describe, expect, it } from "vitest";
import { parseOfx, parseOfxDate, parseOfxStatement, parseOfxStatements, ReconcileParseError } from "@/lib/reconcile";

// Files are invented and laid out from memory of the OFX specification's structure:
// OFX 1.0.2 (SGML: header lines, data elements without end tags) and OFX 2.1.1 (XML with the
// <?OFX?> processing instruction). Both nest SIGNONMSGSRSV1, then BANKMSGSRSV1 › STMTTRNRS ›
// STMTRS › BANKTRANLIST › STMTTRN, with LEDGERBAL/AVAILBAL (BALAMT, DTASOF) after the list.
const OFX_102_SGML = [
  "OFXHEADER:100",
  "DATA:OFXSGML",
  "VERSION:102",
  "SECURITY:NONE",
  "ENCODING:USASCII",
  "CHARSET:1252",
  "COMPRESSION:NONE",
  "OLDFILEUID:NONE",
  "NEWFILEUID:NONE",
  "",
  "<OFX>",
  "<SIGNONMSGSRSV1><SONRS><STATUS><CODE>0<SEVERITY>INFO</STATUS>",
  "<DTSERVER>20250401120000<LANGUAGE>ENG</SONRS></SIGNONMSGSRSV1>",
  "<BANKMSGSRSV1>",
  "<STMTTRNRS>",
  "<TRNUID>1001",
  "<STATUS><CODE>0<SEVERITY>INFO</STATUS>",
  "<STMTRS>",
  "<CURDEF>USD",
  "<BANKACCTFROM><BANKID>000000000<ACCTID>0000123456<ACCTTYPE>CHECKING</BANKACCTFROM>",
  "<BANKTRANLIST>",
  "<DTSTART>20250301",
  "<DTEND>20250331",
  "<STMTTRN>",
  "<TRNTYPE>CHECK",
  "<DTPOSTED>20250304",
  "<TRNAMT>-480.00",
  "<FITID>2025030401",
  "<CHECKNUM>1042",
  "<NAME>CHEQUE 1042",
  "</STMTTRN>",
  "<STMTTRN>",
  "<TRNTYPE>CREDIT",
  "<DTPOSTED>20250305120000.000[-5:EST]",
  "<TRNAMT>139.89",
  "<FITID>2025030502",
  "<NAME>CARD PAYOUT",
  "<MEMO>po_0TEST &amp; fees",
  "</STMTTRN>",
  "<STMTTRN>",
  "<TRNTYPE>FEE",
  "<DTPOSTED>20250331",
  "<TRNAMT>-12.50",
  "<FITID>2025033103",
  "<NAME>MONTHLY SERVICE FEE",
  "</STMTTRN>",
  "</BANKTRANLIST>",
  "<LEDGERBAL><BALAMT>12345.67<DTASOF>20250331235959</LEDGERBAL>",
  "<AVAILBAL><BALAMT>12000.00<DTASOF>20250331</AVAILBAL>",
  "</STMTRS>",
  "</STMTTRNRS>",
  "</BANKMSGSRSV1>",
  "</OFX>",
].join("\r\n");

const OFX_211_XML = `<?xml version="1.0" encoding="UTF-8" standalone="no"?>
<?OFX OFXHEADER="200" VERSION="211" SECURITY="NONE" OLDFILEUID="NONE" NEWFILEUID="NONE"?>
<OFX>
  <SIGNONMSGSRSV1><SONRS><STATUS><CODE>0</CODE><SEVERITY>INFO</SEVERITY></STATUS>
    <DTSERVER>20250401120000.000[+1:CET]</DTSERVER><LANGUAGE>DEU</LANGUAGE></SONRS></SIGNONMSGSRSV1>
  <!-- a comment the reader must skip -->
  <BANKMSGSRSV1>
    <STMTTRNRS>
      <TRNUID>2001</TRNUID>
      <STATUS><CODE>0</CODE><SEVERITY>INFO</SEVERITY></STATUS>
      <STMTRS>
        <CURDEF>EUR</CURDEF>
        <BANKACCTFROM><BANKID>00000000</BANKID><ACCTID>0000000042</ACCTID><ACCTTYPE>CHECKING</ACCTTYPE></BANKACCTFROM>
        <BANKTRANLIST>
          <DTSTART>20250301</DTSTART><DTEND>20250331</DTEND>
          <STMTTRN>
            <TRNTYPE>DEBIT</TRNTYPE><DTPOSTED>20250304000000</DTPOSTED><TRNAMT>-1234.56</TRNAMT>
            <FITID>X-1</FITID><NAME>Fuel &lt;avgas&gt;</NAME><MEMO></MEMO>
          </STMTTRN>
          <STMTTRN>
            <TRNTYPE>CREDIT</TRNTYPE><DTPOSTED>20250305</DTPOSTED><TRNAMT>45,00</TRNAMT><FITID>X-2</FITID>
            <PAYEE><NAME>Member dues</NAME><ADDR1>1 Example Way</ADDR1><CITY>Nowhere</CITY><STATE>XX</STATE>
              <POSTALCODE>00000</POSTALCODE><PHONE>000-0000</PHONE></PAYEE>
            <MEMO>March</MEMO>
          </STMTTRN>
        </BANKTRANLIST>
        <LEDGERBAL><BALAMT>-250.10</BALAMT><DTASOF>20250331</DTASOF></LEDGERBAL>
      </STMTRS>
    </STMTTRNRS>
  </BANKMSGSRSV1>
</OFX>
`;

describe("parseOfx — OFX 1.0.2 SGML", () => {
  it("reads STMTTRN elements that have no end tags", () => {
    expect(parseOfx(OFX_102_SGML)).toEqual([
      { date: "2025-03-04", amountMinor: -48000, description: "CHEQUE 1042", reference: "1042" }, // CHECKNUM
      { date: "2025-03-05", amountMinor: 13989, description: "CARD PAYOUT / po_0TEST & fees", reference: "2025030502" }, // FITID
      { date: "2025-03-31", amountMinor: -1250, description: "MONTHLY SERVICE FEE", reference: "2025033103" },
    ]);
  });
  it("exposes the statement, its account and its ledger balance", () => {
    const s = parseOfxStatement(OFX_102_SGML);
    expect(s).toMatchObject({
      version: "102",
      currency: "USD",
      bankId: "000000000",
      accountId: "0000123456",
      accountType: "CHECKING",
      start: "2025-03-01",
      end: "2025-03-31",
      ledgerBalance: { amountMinor: 1234567, asOf: "2025-03-31" }, // LEDGERBAL › BALAMT, DTASOF
      availableBalance: { amountMinor: 1200000, asOf: "2025-03-31" },
    });
    expect(s.lines[0]).toMatchObject({ fitId: "2025030401", type: "CHECK", checkNumber: "1042" });
  });
});

describe("parseOfx — OFX 2.1.1 XML", () => {
  it("reads closed elements, entities, empty elements, PAYEE names and a decimal comma", () => {
    expect(parseOfx(OFX_211_XML)).toEqual([
      { date: "2025-03-04", amountMinor: -123456, description: "Fuel <avgas>", reference: "X-1" },
      { date: "2025-03-05", amountMinor: 4500, description: "Member dues / March", reference: "X-2" },
    ]);
  });
  it("reads the version and a negative ledger balance", () => {
    const s = parseOfxStatement(OFX_211_XML);
    expect(s.version).toBe("211");
    expect(s.currency).toBe("EUR");
    expect(s.ledgerBalance).toEqual({ amountMinor: -25010, asOf: "2025-03-31" });
    expect(s.availableBalance).toBeUndefined();
  });
});

describe("credit-card statements and several statements per file", () => {
  it("reads CCSTMTRS in a zero-exponent currency next to a bank statement", () => {
    const cc = `OFXHEADER:100\nDATA:OFXSGML\nVERSION:102\n\n<OFX><CREDITCARDMSGSRSV1><CCSTMTTRNRS><TRNUID>1
<CCSTMTRS><CURDEF>JPY<CCACCTFROM><ACCTID>0000</CCACCTFROM><BANKTRANLIST><DTSTART>20250301<DTEND>20250331
<STMTTRN><TRNTYPE>DEBIT<DTPOSTED>20250302<TRNAMT>-4500<FITID>C1<NAME>Landing fee</STMTTRN>
</BANKTRANLIST><LEDGERBAL><BALAMT>-4500<DTASOF>20250331</LEDGERBAL></CCSTMTRS></CCSTMTTRNRS></CREDITCARDMSGSRSV1></OFX>`;
    const [s] = parseOfxStatements(cc);
    expect(s?.currency).toBe("JPY");
    expect(s?.lines[0]?.amountMinor).toBe(-4500); // JPY has exponent 0 (ISO 4217, from memory)
    expect(s?.ledgerBalance?.amountMinor).toBe(-4500);
  });
});

describe("parseOfxDate", () => {
  it("reads every datetime form the spec allows", () => {
    expect(parseOfxDate("20250304")).toBe("2025-03-04"); // YYYYMMDD
    expect(parseOfxDate("20250304101500")).toBe("2025-03-04"); // YYYYMMDDHHMMSS
    expect(parseOfxDate("20250304101500.123")).toBe("2025-03-04"); // .XXX milliseconds
    expect(parseOfxDate("20250304101500.123[-5:EST]")).toBe("2025-03-04"); // [gmt offset:tz name]
    expect(parseOfxDate("20250304[+5.30]")).toBe("2025-03-04");
    expect(() => parseOfxDate("20250230")).toThrow(); // no 30 February (Gregorian calendar)
    expect(() => parseOfxDate("2025-03-04")).toThrow();
  });
});

describe("errors", () => {
  it("refuses a file that is not OFX", () => {
    expect(() => parseOfx("Date,Amount\n2025-03-03,1.00\n")).toThrow(ReconcileParseError);
    expect(() => parseOfx("<OFX><SIGNONMSGSRSV1></SIGNONMSGSRSV1></OFX>")).toThrow(/no bank or card statement/);
  });
  it("names the line and element of a transaction it cannot read", () => {
    const broken = OFX_102_SGML.replace("<TRNAMT>139.89\r\n", "");
    try {
      parseOfx(broken);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(ReconcileParseError);
      expect((e as ReconcileParseError).column).toBe("TRNAMT");
      expect((e as ReconcileParseError).row).toBe(32); // the second <STMTTRN> starts on line 32
    }
    expect(() => parseOfx(OFX_102_SGML.replace("<TRNAMT>-12.50", "<TRNAMT>12.5.0"))).toThrow(/TRNAMT/);
  });
});
