// Reading a bank statement for import. CSV per RFC 4180 with a byte-order mark; OFX 1.0.2 (SGML)
// as the OFX specification lays it out (OFX header, <STMTRS>, <BANKTRANLIST>, <LEDGERBAL>).
import { describe, expect, it } from "vitest";
import { dedupeKeys, maskAccountId, parseStatementFile } from "@/lib/reconcile";
import { ofxFile, twoAccounts } from "../../fixtures/ofx-two-accounts";

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

// Several accounts in one file: OFX 2.x specification (BANKMSGSRSV1 may hold one STMTTRNRS per
// account; CURDEF is the statement's currency; STMTTRN's CURRENCY aggregate says the amount is in
// another currency, ORIGCURRENCY that the bank converted it into CURDEF). The file is invented.
describe("parseStatementFile: an OFX file with several accounts", () => {
  const text = ofxFile(twoAccounts("2026-04-01", "2026-04-30"));

  it("imports nothing until an account is chosen, listing each one masked with its type, currency, count and dates", () => {
    const r = parseStatementFile({ format: "ofx", text, currency: "USD" });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.accounts).toEqual([
      { key: "1-2333", maskedId: "••••2333", type: "CHECKING", currency: "USD", transactions: 3, firstDate: "2026-04-01", lastDate: "2026-04-30" }, // OFX 2.x: ACCTID, ACCTTYPE, CURDEF, DTSTART/DTEND
      { key: "2-8777", maskedId: "••••8777", type: "SAVINGS", currency: "USD", transactions: 2, firstDate: "2026-04-01", lastDate: "2026-04-30" },
    ]);
    expect(r.errors[0]).toBe("This file holds 2 accounts; choose the one to import (one account per statement).");
    expect(r.errors.slice(1)).toEqual(["••••2333 checking in USD, 3 transactions, 2026-04-01 to 2026-04-30", "••••8777 savings in USD, 2 transactions, 2026-04-01 to 2026-04-30"]);
    expect(JSON.stringify(r)).not.toContain("000111222333"); // the full account number never leaves the parser
  });

  it("reads only the chosen account, with its own ledger balance", () => {
    const r = parseStatementFile({ format: "ofx", text, currency: "USD", account: "2-8777" });
    expect(r).toMatchObject({ ok: true, periodStart: "2026-04-01", periodEnd: "2026-04-30", closingBalanceMinor: 902166, accountId: "000999888777" }); // LEDGERBAL 9021.66 → minor units
    if (r.ok) expect(r.lines.map((l) => [l.amountMinor, l.description])).toEqual([[311, "INTEREST PAID"], [-25009, "TRANSFER TO CHECKING"]]);
    const first = parseStatementFile({ format: "ofx", text, currency: "USD", account: "1-2333" });
    expect(first.ok && first.lines.length).toBe(3);
  });

  it("refuses a key that is not in the file and lists the accounts again", () => {
    const r = parseStatementFile({ format: "ofx", text, currency: "USD", account: "3-0000" });
    expect(r).toMatchObject({ ok: false, errors: ["The chosen account is not in this file.", expect.any(String), expect.any(String)] });
  });

  it("reads a one-account file without asking", () => {
    const [checking] = twoAccounts("2026-04-01", "2026-04-30");
    expect(parseStatementFile({ format: "ofx", text: ofxFile([checking!]), currency: "USD" })).toMatchObject({ ok: true, closingBalanceMinor: 148017, account: { maskedId: "••••2333" } });
  });

  it("masks account numbers down to their last four characters", () => {
    expect(maskAccountId("000999888777")).toBe("••••8777"); // common practice: last four digits shown
    expect(maskAccountId("123")).toBe("••••3");
    expect(maskAccountId(undefined)).toBe("(no account number)");
  });
});

describe("parseStatementFile: a currency other than the club's", () => {
  it("refuses the chosen account's statement in another currency, naming both", () => {
    const text = ofxFile(twoAccounts("2026-04-01", "2026-04-30", { savingsCurrency: "CAD" }));
    const r = parseStatementFile({ format: "ofx", text, currency: "USD", account: "2-8777" });
    expect(r).toMatchObject({ ok: false, errors: ["The statement for ••••8777 is in CAD; the club's books are in USD. Nothing was imported: import a statement in USD."] }); // OFX 2.x: CURDEF
  });

  it("refuses a transaction whose amount is in another currency (CURRENCY aggregate), naming both", () => {
    const [checking] = twoAccounts("2026-04-01", "2026-04-30", { txnCurrency: "EUR" });
    const r = parseStatementFile({ format: "ofx", text: ofxFile([checking!]), currency: "USD" });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors[0]).toBe('The transaction of 2026-04-30 "DEPOSIT MISC" is in EUR; the club\'s books are in USD. Nothing was imported: ask the bank for the statement in USD, or enter the item by hand in USD.'); // OFX 2.x: STMTTRN CURRENCY/CURSYM
  });

  it("takes a transaction the bank already converted (ORIGCURRENCY) at its amount in the statement's currency", () => {
    const [checking] = twoAccounts("2026-04-01", "2026-04-30");
    const text = ofxFile([checking!]).replace("<NAME>SERVICE CHARGE</NAME>", "<NAME>SERVICE CHARGE</NAME><ORIGCURRENCY><CURRATE>1.08</CURRATE><CURSYM>EUR</CURSYM></ORIGCURRENCY>");
    const r = parseStatementFile({ format: "ofx", text, currency: "USD" });
    expect(r.ok && r.lines[1]!.amountMinor).toBe(-1729); // OFX 2.x: ORIGCURRENCY — TRNAMT is in CURDEF
  });

  it("refuses CSV rows whose currency column names another currency, every row listed", () => {
    const text = "Date,Description,Amount,Currency\r\n2026-04-03,DEPOSIT,120.00,USD\r\n2026-04-04,CARD,-9.00,EUR\r\n2026-04-05,CARD,-3.00,eur\r\n"; // RFC 4180
    const r = parseStatementFile({ format: "csv", text, mapping: { ...mapping, reference: undefined, currency: "Currency" }, currency: "USD" });
    expect(r).toMatchObject({ ok: false, errors: ["Row 3, column Currency: the row is in EUR; the club's books are in USD", "Row 4, column Currency: the row is in EUR; the club's books are in USD"] });
  });
});
