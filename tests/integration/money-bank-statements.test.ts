// Bank statements: an OFX file with two accounts (OFX 2.x specification: one STMTTRNRS per
// account in BANKMSGSRSV1), a currency other than the club's, and an imported statement corrected
// or removed until its period is locked. Files and figures are invented.
import { and, eq, inArray } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { auditLog, bankLines, bankStatements } from "@/db/schema";
import { correctBankStatement, removeBankStatement } from "@/lib/actions/money/bank-statement-edits";
import { importBankStatement, type BankImportAnswer } from "@/lib/actions/money/import-bank-statement";
import { bookLine, lockReconciledPeriod, unmatchLine } from "@/lib/actions/money/reconcile-lines";
import { ofxFile, twoAccounts } from "../fixtures/ofx-two-accounts";
import { EMPTY, clubBySlug, db, expectRedirect, form, seedOnce, signInAs } from "./helpers";

const CLUB = "cottonwood-flyers";
const TREASURER = "cottonwood.admin@hangarline.test";
const PILOT = "cottonwood.pilot@hangarline.test";
const club = () => clubBySlug(CLUB);
const ofx = (text: string, name = "bank.ofx") => new File([text], name, { type: "application/x-ofx" });
const statements = () => db().select().from(bankStatements).where(eq(bankStatements.clubId, club().id)).all();
const lines = (statementId: string) => db().select().from(bankLines).where(eq(bankLines.statementId, statementId)).orderBy(bankLines.lineNo).all();
const audits = (action: string) => db().select().from(auditLog).where(and(eq(auditLog.clubId, club().id), eq(auditLog.action, action))).all();
const key = (n: number) => `bank-statements-test-key-${String(n).padStart(4, "0")}`;
const TWO = ofxFile(twoAccounts("2026-04-01", "2026-04-30"));

async function importOfx(text: string, extra: Record<string, string> = {}): Promise<string> {
  const to = await expectRedirect(() => importBankStatement(EMPTY, form({ club: CLUB, format: "ofx", file: ofx(text), ...extra })));
  return to.split("/reconciliation/")[1]!;
}

beforeAll(async () => {
  await seedOnce();
});

describe("an OFX file holding two accounts", () => {
  it("imports nothing and answers with the accounts to choose from", async () => {
    signInAs(TREASURER);
    const state = await importBankStatement(EMPTY, form({ club: CLUB, format: "ofx", file: ofx(TWO) }));
    expect(state.ok).toBe(false);
    expect(state.message).toBe("This file holds 2 accounts; choose the one to import (one account per statement). Nothing was imported.");
    expect((state.data as BankImportAnswer).accounts.map((a) => [a.key, a.maskedId, a.type, a.currency, a.transactions, a.firstDate, a.lastDate])).toEqual([
      ["1-2333", "••••2333", "CHECKING", "USD", 3, "2026-04-01", "2026-04-30"],
      ["2-8777", "••••8777", "SAVINGS", "USD", 2, "2026-04-01", "2026-04-30"],
    ]);
    expect(state.fieldErrors.account?.length).toBe(1);
    expect(JSON.stringify(state)).not.toContain("000999888777");
    expect(statements()).toHaveLength(0);
    expect(audits("money.bank.import")).toHaveLength(0);
  });

  it("imports the chosen account once, whatever the number of presses (idempotency key)", async () => {
    signInAs(TREASURER);
    const fields = { club: CLUB, format: "ofx", account: "2-8777", idempotencyKey: key(1) };
    const first = await importBankStatement(EMPTY, form({ ...fields, file: ofx(TWO, "two.ofx") }));
    const again = await importBankStatement(EMPTY, form({ ...fields, file: ofx(TWO, "two.ofx") }));
    expect(first.ok).toBe(true);
    expect(first.message).toBe("Account ••••8777: 2 lines imported; 0 matched automatically.");
    expect(again).toEqual(first);
    const [st] = statements();
    expect(statements()).toHaveLength(1);
    expect(st!.closingBalanceMinor).toBe(902166); // the savings account's LEDGERBAL 9021.66
    expect(lines(st!.id).map((l) => l.description)).toEqual(["INTEREST PAID", "TRANSFER TO CHECKING"]);
    expect(audits("money.bank.import").map((a) => (a.after as { account: string }).account)).toEqual(["••••8777"]);
  });
});

describe("a currency other than the club's", () => {
  it("refuses the statement, naming both currencies, and writes nothing", async () => {
    signInAs(TREASURER);
    const before = statements().length;
    const state = await importBankStatement(EMPTY, form({ club: CLUB, format: "ofx", file: ofx(ofxFile(twoAccounts("2026-05-01", "2026-05-31", { savingsCurrency: "CAD" }))), account: "2-8777" }));
    expect(state).toMatchObject({ ok: false, message: "The statement for ••••8777 is in CAD; the club's books are in USD. Nothing was imported: import a statement in USD." });
    const [checking] = twoAccounts("2026-05-01", "2026-05-31", { txnCurrency: "EUR" });
    const txn = await importBankStatement(EMPTY, form({ club: CLUB, format: "ofx", file: ofx(ofxFile([checking!])) }));
    expect(txn.ok).toBe(false);
    expect(txn.message).toMatch(/^The transaction of 2026-05-31 "DEPOSIT MISC" is in EUR; the club's books are in USD\./);
    const csv = await importBankStatement(EMPTY, form({ club: CLUB, format: "csv", file: new File(["Date,Description,Amount,Currency\r\n2026-05-03,CARD,-9.00,EUR\r\n"], "may.csv"), dateColumn: "Date", amountColumn: "Amount", descriptionColumn: "Description", currencyColumn: "Currency", closingBalance: "10.00" }));
    expect(csv).toMatchObject({ ok: false, message: "Row 2, column Currency: the row is in EUR; the club's books are in USD. Nothing was imported." });
    expect(statements()).toHaveLength(before);
  });
});

describe("correcting and removing an imported statement", () => {
  let statementId = "";
  beforeAll(async () => {
    signInAs(TREASURER);
    statementId = await importOfx(TWO, { account: "1-2333" });
  });

  it("only the treasurer's permission may correct or remove", async () => {
    signInAs(PILOT);
    expect((await correctBankStatement(EMPTY, form({ club: CLUB, statementId, closingBalance: "1.00" }))).ok).toBe(false);
    expect((await removeBankStatement(EMPTY, form({ club: CLUB, statementId }))).ok).toBe(false);
    expect((await importBankStatement(EMPTY, form({ club: CLUB, format: "ofx", file: ofx(TWO), account: "2-8777" }))).ok).toBe(false);
    expect(db().select().from(bankStatements).where(eq(bankStatements.id, statementId)).get()!.closingBalanceMinor).toBe(148017);
  });

  it("corrects a mistyped closing balance, with an audit entry before and after", async () => {
    signInAs(TREASURER);
    const state = await correctBankStatement(EMPTY, form({ club: CLUB, statementId, closingBalance: "1,408.17", idempotencyKey: key(2) }));
    expect(state).toMatchObject({ ok: true, message: "Closing balance corrected from $1,480.17 to $1,408.17.", refresh: true });
    expect(db().select().from(bankStatements).where(eq(bankStatements.id, statementId)).get()!.closingBalanceMinor).toBe(140817);
    const [entry] = audits("money.bank.correct");
    expect(entry).toMatchObject({ subjectId: statementId, before: { closingBalanceMinor: 148017 }, after: { closingBalanceMinor: 140817 } });
    const same = await correctBankStatement(EMPTY, form({ club: CLUB, statementId, closingBalance: "1408.17" }));
    expect(same).toMatchObject({ ok: false, message: "That is the closing balance the statement already has." });
    const bad = await correctBankStatement(EMPTY, form({ club: CLUB, statementId, closingBalance: "twelve" }));
    expect(bad.ok).toBe(false);
    expect(bad.fieldErrors.closingBalance?.[0]).toMatch(/like 4210.55/);
    expect(audits("money.bank.correct")).toHaveLength(1);
  });

  it("refuses to remove while a line is matched, saying what blocks it; removes once unmatched", async () => {
    signInAs(TREASURER);
    const fee = lines(statementId).find((l) => l.description === "SERVICE CHARGE")!;
    expect((await bookLine(EMPTY, form({ club: CLUB, bankLineId: fee.id, account: "bank-fees", memo: "Service charge" }))).ok).toBe(true);
    const blocked = await removeBankStatement(EMPTY, form({ club: CLUB, statementId }));
    expect(blocked).toMatchObject({ ok: false, message: "1 line of this statement is matched to the books; undo that match first (a match may have posted an entry), then remove the statement." });
    expect(statements().some((s) => s.id === statementId)).toBe(true);

    expect((await unmatchLine(EMPTY, form({ club: CLUB, bankLineId: fee.id }))).ok).toBe(true);
    const ids = lines(statementId).map((l) => l.id);
    const removed = await removeBankStatement(EMPTY, form({ club: CLUB, statementId, idempotencyKey: key(3) }));
    expect(removed).toMatchObject({ ok: true, message: "Statement 2026-04-01 to 2026-04-30 (bank.ofx) removed with its 3 lines; the file can be imported again.", redirectTo: `/clubs/${CLUB}/money/reconciliation` });
    expect(await removeBankStatement(EMPTY, form({ club: CLUB, statementId, idempotencyKey: key(3) }))).toEqual(removed); // answered once, landed once
    expect(statements().some((s) => s.id === statementId)).toBe(false);
    expect(db().select().from(bankLines).where(inArray(bankLines.id, ids)).all()).toHaveLength(0);
    expect(audits("money.bank.remove")).toMatchObject([{ subjectId: statementId, before: { fileName: "bank.ofx", closingBalanceMinor: 140817, linesRemoved: 3 } }]);

    // The same account imports again: its lines are no longer known.
    const again = await importOfx(TWO, { account: "1-2333" });
    expect(lines(again)).toHaveLength(3);
  });

  it("refuses to correct or remove once the period is locked", async () => {
    signInAs(TREASURER);
    // January 2025: one bank fee, posted from the statement, so the two sides agree and the period locks.
    const csv = "Date,Description,Amount\r\n2025-01-31,ACCOUNT FEE,-8.00\r\n";
    const to = await expectRedirect(() => importBankStatement(EMPTY, form({ club: CLUB, format: "csv", file: new File([csv], "jan.csv"), dateColumn: "Date", amountColumn: "Amount", descriptionColumn: "Description", referenceColumn: "", closingBalance: "-8.00" })));
    const jan = to.split("/reconciliation/")[1]!;
    expect((await bookLine(EMPTY, form({ club: CLUB, bankLineId: lines(jan)[0]!.id, account: "bank-fees" }))).ok).toBe(true);
    expect((await lockReconciledPeriod(EMPTY, form({ club: CLUB, statementId: jan }))).ok).toBe(true);

    const correct = await correctBankStatement(EMPTY, form({ club: CLUB, statementId: jan, closingBalance: "-9.00" }));
    expect(correct).toMatchObject({ ok: false, message: "The statement 2025-01-01 to 2025-01-31 is in a reconciled, locked period (the books are locked through 2025-01-31); it can no longer be corrected." });
    const remove = await removeBankStatement(EMPTY, form({ club: CLUB, statementId: jan }));
    expect(remove).toMatchObject({ ok: false, message: "The statement 2025-01-01 to 2025-01-31 is in a reconciled, locked period (the books are locked through 2025-01-31); it can no longer be removed." });
    expect(db().select().from(bankStatements).where(eq(bankStatements.id, jan)).get()!.closingBalanceMinor).toBe(-800);
    expect(audits("money.bank.remove")).toHaveLength(1);
  });

  it("answers a statement of another club like a missing one", async () => {
    signInAs("silberau.admin@hangarline.test");
    const [st] = statements();
    const state = await removeBankStatement(EMPTY, form({ club: "aeroclub-silberau", statementId: st!.id }));
    expect(state).toMatchObject({ ok: false, message: "That statement was not found in this club." });
  });
});
