// Bank reconciliation through its actions: CSV import with a column mapping (RFC 4180 file with a
// BOM), OFX 1.0.2 import (the OFX specification's SGML form), automatic and manual matching, a
// card payout net of fees, the period report (standard accounting practice: statement + deposits
// in transit − outstanding cheques = book + bank credits − bank charges) and the lock.
import { and, eq, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { bankLines, bankStatements, cardPayouts, journalEntries, reconciliationMatches, reconciliationPeriods, users } from "@/db/schema";
import { importBankStatement } from "@/lib/actions/money/import-bank-statement";
import { postAdjustment } from "@/lib/actions/money/post-adjustment";
import { bookLine, ignoreLine, lockReconciledPeriod, matchBankLine, unmatchLine } from "@/lib/actions/money/reconcile-lines";
import { recordManualPayment } from "@/lib/actions/money/record-manual-payment";
import { recordCardPayment, recordPayoutShare } from "@/db/queries/money-card-payments";
import { periodReport } from "@/db/queries/money-reconcile-match";
import { EMPTY, clubBySlug, db, expectRedirect, form, seedOnce, signInAs } from "./helpers";

const CLUB = "cottonwood-flyers";
const TREASURER = "cottonwood.admin@hangarline.test";
const uid = (email: string) => db().select().from(users).where(eq(users.email, email)).get()!.id;
const club = () => clubBySlug(CLUB);
const file = (text: string, name: string) => new File([text], name, { type: "text/plain" });
const lineByText = (statementId: string, text: string) => db().select().from(bankLines).where(and(eq(bankLines.statementId, statementId), sql`${bankLines.description} like ${`%${text}%`}`)).get()!;
const matchedKinds = (statementId: string) =>
  db().select({ kind: reconciliationMatches.kind, d: bankLines.description }).from(reconciliationMatches).innerJoin(bankLines, eq(bankLines.id, reconciliationMatches.bankLineId)).where(eq(bankLines.statementId, statementId)).all();

async function pay(email: string, amount: string, date: string, reference: string) {
  const state = await recordManualPayment(EMPTY, form({ club: CLUB, memberUserId: uid(email), method: "cheque", amount, receivedOn: date, reference }));
  expect(state.ok).toBe(true);
}

let march = "";

beforeAll(async () => {
  await seedOnce();
  signInAs(TREASURER);
  await pay("cottonwood.pilot@hangarline.test", "240.00", "2025-03-05", "1042");
  await pay("twoclubs@hangarline.test", "125.50", "2025-03-18", "1043");
  await pay("cottonwood.maint@hangarline.test", "80.00", "2025-03-24", "1044");
  await pay("cottonwood.pilot@hangarline.test", "60.00", "2025-03-24", "1045");
  await pay("twoclubs@hangarline.test", "99.00", "2025-03-31", "1046"); // banked on the last day: in transit
  // Card payments of March paid out on the 27th net of the provider's fee (2.9 % + 30, the fake's schedule):
  // 10,000 − 320 = 9,680 and 4,500 − 161 = 4,339 → 14,019 (our arithmetic)
  db().transaction((tx) => {
    const card = (n: number, amount: number, fee: number) =>
      recordCardPayment(tx, { clubId: club().id, memberUserId: uid("cottonwood.pilot@hangarline.test"), paymentId: null, checkoutSessionId: `cs_it_${n}`, paymentIntentId: `pi_it_${n}`, chargeId: `ch_it_${n}`, status: "succeeded", amountMinor: amount, feeMinor: fee, currency: "usd", paidAt: new Date(`2025-03-2${n}T15:00:00Z`), lastError: null });
    card(1, 10000, 320);
    card(2, 4500, 161);
    recordPayoutShare(tx, { clubId: club().id, payoutId: "po_it_0001", arrivalOn: "2025-03-27", currency: "usd", charges: [{ chargeId: "ch_it_1", netMinor: 9680, feeMinor: 320 }, { chargeId: "ch_it_2", netMinor: 4339, feeMinor: 161 }], refunds: [] });
  });
});

// The bank's export: semicolons, US dates, separate debit and credit columns, a BOM, a quoted
// description with the separator in it. Cheques 1044 and 1045 were banked as one deposit.
const CSV = [
  "\uFEFFPosted;Payee;Memo;Debit;Credit;Ref",
  '03/06/2025;DEPOSIT;"Cheque; member 1042";;240.00;1042',
  "03/19/2025;DEPOSIT;Cheque;;125.50;1043",
  "03/25/2025;DEPOSIT;Two cheques;;140.00;",
  "03/27/2025;CARD PROCESSOR;Payout;;140.19;PO_IT_0001",
  "03/31/2025;BANK;Account fee;8.00;;",
  "03/31/2025;BANK;Duplicate line sent by the bank;;0.01;",
].join("\r\n");

describe("importing and matching a statement", () => {
  it("refuses a CSV without its mapping or closing balance, field by field, writing nothing", async () => {
    signInAs(TREASURER);
    const state = await importBankStatement(EMPTY, form({ club: CLUB, format: "csv", file: file(CSV, "march.csv"), dateColumn: "", amountColumn: "" }));
    expect(state.ok).toBe(false);
    expect(Object.keys(state.fieldErrors).sort()).toEqual(["amountColumn", "closingBalance", "dateColumn"]);
    const bad = await importBankStatement(EMPTY, form({ club: CLUB, format: "csv", file: file(CSV, "march.csv"), dateColumn: "Posted", debitColumn: "Debit", creditColumn: "Credit", delimiter: ";", dateFormat: "ISO", closingBalance: "1.00" }));
    expect(bad.ok).toBe(false);
    expect(bad.fieldErrors.file?.length).toBe(6);
    expect(db().select().from(bankStatements).all()).toHaveLength(0);
  });

  it("imports with the mapping and matches by reference, amount and payout at once", async () => {
    signInAs(TREASURER);
    const to = await expectRedirect(() =>
      importBankStatement(EMPTY, form({ club: CLUB, format: "csv", file: file(CSV, "march.csv"), dateColumn: "Posted", debitColumn: "Debit", creditColumn: "Credit", descriptionColumn: "Payee + Memo", referenceColumn: "Ref", delimiter: ";", dateFormat: "MM/DD/YYYY", closingBalance: "637.70" })),
    );
    march = to.split("/reconciliation/")[1]!;
    expect(db().select().from(bankStatements).where(eq(bankStatements.id, march)).get()).toMatchObject({ periodStart: "2025-03-01", periodEnd: "2025-03-31", lineCount: 6, closingBalanceMinor: 63770 });
    expect(matchedKinds(march).map((m) => m.kind).sort()).toEqual(["payout", "reference", "reference"]);
    expect(lineByText(march, "Cheque; member").description).toBe("DEPOSIT Cheque; member 1042");
    // The payout is now in the bank: card clearing → bank for the net 14,019 (140.19).
    const received = db().select().from(cardPayouts).where(eq(cardPayouts.payoutId, "po_it_0001")).get()!;
    expect(received.receivedEntryId).not.toBeNull();
    expect(db().select().from(journalEntries).where(eq(journalEntries.id, received.receivedEntryId!)).get()).toMatchObject({ kind: "payout-received", entryDate: "2025-03-27" });
  });

  it("matches one bank line to two cheques by hand, and refuses a split that does not add up", async () => {
    signInAs(TREASURER);
    const line = lineByText(march, "Two cheques");
    const open = periodReport(db(), club().id, march).depositsInTransit;
    const c1044 = open.find((d) => d.reference === "1044")!;
    const c1045 = open.find((d) => d.reference === "1045")!;
    const c1046 = open.find((d) => d.reference === "1046")!;
    const wrong = await matchBankLine(EMPTY, form({ club: CLUB, bankLineId: line.id, bookIds: [c1044.id, c1046.id] }));
    expect(wrong.ok).toBe(false);
    expect(wrong.fieldErrors.bookIds?.[0]).toBe("The chosen items add up to $179.00, the bank line is $140.00.");
    expect((await matchBankLine(EMPTY, form({ club: CLUB, bankLineId: line.id, bookIds: [c1044.id, c1045.id] }))).ok).toBe(true);
  });

  it("reports what explains the difference, and will not lock with a bank fee unposted", async () => {
    signInAs(TREASURER);
    expect((await ignoreLine(EMPTY, form({ club: CLUB, bankLineId: lineByText(march, "Duplicate").id, ignored: "true" }))).ok).toBe(true);
    const report = periodReport(db(), club().id, march);
    // statement 240 + 125.50 + 140 + 140.19 − 8 + 0.01 = 637.70, + 99.00 in transit = 736.70;
    // books 240 + 125.50 + 80 + 60 + 99 + 140.19 = 744.69, − 8.00 fee not booked = 736.69;
    // the 0.01 line set aside is what is left: 736.70 − 736.69 = 0.01 (our arithmetic)
    expect(report).toMatchObject({ depositsInTransitMinor: 9900, outstandingChequesMinor: 0, bankChargesMinor: 800, bookBalanceMinor: 74469, adjustedBankBalanceMinor: 73670, adjustedBookBalanceMinor: 73669, agrees: false, differenceMinor: 1 });
    const refused = await lockReconciledPeriod(EMPTY, form({ club: CLUB, statementId: march }));
    expect(refused.ok).toBe(false);
    // Bring the 0.01 back and post it and the fee: then the sides agree with nothing unbooked.
    expect((await ignoreLine(EMPTY, form({ club: CLUB, bankLineId: lineByText(march, "Duplicate").id, ignored: "false" }))).ok).toBe(true);
    expect((await bookLine(EMPTY, form({ club: CLUB, bankLineId: lineByText(march, "Account fee").id, account: "bank-fees", memo: "March account fee" }))).ok).toBe(true);
    expect((await bookLine(EMPTY, form({ club: CLUB, bankLineId: lineByText(march, "Duplicate").id, account: "retained-funds", memo: "Bank correction" }))).ok).toBe(true);
    expect(periodReport(db(), club().id, march)).toMatchObject({ agrees: true, differenceMinor: 0, bankItemsNotInBooks: [] });
  });

  it("locks the period; back-dated adjustments are refused, money received posts after it, corrections are dated after it", async () => {
    signInAs(TREASURER);
    const locked = await lockReconciledPeriod(EMPTY, form({ club: CLUB, statementId: march }));
    expect(locked).toMatchObject({ ok: true });
    expect(db().select().from(reconciliationPeriods).all()).toHaveLength(1);
    const late = await postAdjustment(EMPTY, form({ club: CLUB, memberUserId: uid("twoclubs@hangarline.test"), direction: "charge", account: "flight-income", amount: "10", date: "2025-03-15", memo: "Back-dated" }));
    expect(late.ok).toBe(false);
    expect(late.fieldErrors.date?.[0]).toMatch(/locked through 2025-03-31/);
    // Money received is never refused: dated in the locked month, it posts on the first open day.
    const payment = await recordManualPayment(EMPTY, form({ club: CLUB, memberUserId: uid("twoclubs@hangarline.test"), method: "cash", amount: "5", receivedOn: "2025-03-31" }));
    expect(payment, payment.message).toMatchObject({ ok: true });
    expect(payment.message).toMatch(/2025-03-31 is in a locked period, so it was posted on 2025-04-01/);
    expect((await unmatchLine(EMPTY, form({ club: CLUB, bankLineId: lineByText(march, "Two cheques").id }))).ok).toBe(false);
    expect((await postAdjustment(EMPTY, form({ club: CLUB, memberUserId: uid("twoclubs@hangarline.test"), direction: "charge", account: "flight-income", amount: "10", date: "2025-04-01", memo: "After the lock" }))).ok).toBe(true);
  });

  it("skips lines already imported when the same file comes again", async () => {
    signInAs(TREASURER);
    const to = await expectRedirect(() =>
      importBankStatement(EMPTY, form({ club: CLUB, format: "csv", file: file(CSV, "march-again.csv"), dateColumn: "Posted", debitColumn: "Debit", creditColumn: "Credit", descriptionColumn: "Payee + Memo", referenceColumn: "Ref", delimiter: ";", dateFormat: "MM/DD/YYYY", closingBalance: "637.70" })),
    );
    expect(db().select().from(bankStatements).where(eq(bankStatements.id, to.split("/reconciliation/")[1]!)).get()).toMatchObject({ lineCount: 0, skippedCount: 6 });
  });
});

describe("OFX and who may reconcile", () => {
  const OFX = [
    "OFXHEADER:100", "DATA:OFXSGML", "VERSION:102", "SECURITY:NONE", "ENCODING:USASCII", "CHARSET:1252", "COMPRESSION:NONE", "OLDFILEUID:NONE", "NEWFILEUID:NONE", "",
    "<OFX><SIGNONMSGSRSV1><SONRS><STATUS><CODE>0<SEVERITY>INFO</STATUS><DTSERVER>20250501<LANGUAGE>ENG</SONRS></SIGNONMSGSRSV1>",
    "<BANKMSGSRSV1><STMTTRNRS><TRNUID>1<STATUS><CODE>0<SEVERITY>INFO</STATUS><STMTRS><CURDEF>USD",
    "<BANKACCTFROM><BANKID>000000000<ACCTID>0000042<ACCTTYPE>CHECKING</BANKACCTFROM>",
    "<BANKTRANLIST><DTSTART>20250401<DTEND>20250430",
    "<STMTTRN><TRNTYPE>DEP<DTPOSTED>20250401<TRNAMT>99.00<FITID>APR-1<CHECKNUM>1046<NAME>DEPOSIT</STMTTRN>",
    "</BANKTRANLIST><LEDGERBAL><BALAMT>736.70<DTASOF>20250430</LEDGERBAL></STMTRS></STMTTRNRS></BANKMSGSRSV1></OFX>",
  ].join("\r\n");

  it("imports an OFX statement with its ledger balance and clears last month's deposit in transit", async () => {
    signInAs(TREASURER);
    const to = await expectRedirect(() => importBankStatement(EMPTY, form({ club: CLUB, format: "ofx", file: file(OFX, "april.ofx") })));
    const april = to.split("/reconciliation/")[1]!;
    expect(db().select().from(bankStatements).where(eq(bankStatements.id, april)).get()).toMatchObject({ periodStart: "2025-04-01", periodEnd: "2025-04-30", closingBalanceMinor: 73670 });
    expect(matchedKinds(april).map((m) => m.kind)).toEqual(["reference"]);
    // Bank: 637.70 + 99.00 = 736.70. Books: 744.69 − 8.00 + 0.01 + 5.00 cash posted on 04-01 = 741.70
    // (the 10.00 charge is not the bank's); the 5.00 is not on the bank's statement yet: in transit (our arithmetic).
    expect(periodReport(db(), club().id, april)).toMatchObject({ statementBalanceMinor: 73670, bookBalanceMinor: 74170, depositsInTransitMinor: 500, agrees: true });
  });

  it("a member cannot import, and another club's statement is not found", async () => {
    signInAs("cottonwood.pilot@hangarline.test");
    const state = await importBankStatement(EMPTY, form({ club: CLUB, format: "ofx", file: file(OFX, "x.ofx") }));
    expect(state.message).toMatch(/treasurer/i);
    signInAs("treasurer@hangarline.test");
    const other = await lockReconciledPeriod(EMPTY, form({ club: "reedwater", statementId: march }));
    expect(other).toMatchObject({ ok: false, message: "That statement was not found in this club." });
    const undo = await unmatchLine(EMPTY, form({ club: "reedwater", bankLineId: lineByText(march, "Two cheques").id }));
    expect(undo.message).toBe("That bank line was not found in this club.");
  });
});
