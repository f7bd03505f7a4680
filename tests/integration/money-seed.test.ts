// The whole demo seed: every journal entry in the database balances, the story the money pages
// tell holds (one member in arrears, a euro club, Cottonwood reconciled through the month before
// last), and last month's bank statement — as the bank would send it — reconciles.
import { and, eq, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { bankLines, clubs, journalEntries, journalLines, reconciliationPeriods, statements, users } from "@/db/schema";
import { seedFleet } from "@/db/seed/fleet";
import { seedFoundation } from "@/db/seed/foundation";
import { demoBankStatement, seedMoney } from "@/db/seed/money";
import { seedSafety } from "@/db/seed/safety";
import { isoDateInTimeZone } from "@/lib/dates";
import { membersInArrears } from "@/db/queries/money-arrears";
import { parseStatementFile } from "@/lib/reconcile";
import { storeStatement } from "@/db/queries/money-reconcile-import";
import { monthOf, monthRange, shiftMonthKey } from "@/lib/money/months";
import { autoMatchStatement } from "@/db/queries/money-reconcile-match";
import { bookBankLine, lockPeriod } from "@/db/queries/money-reconcile-edits";
import { db } from "./helpers";

let seconds = 0;
beforeAll(async () => {
  // The same order as seedDemo (db/seed/index.ts), timing the money part on its own.
  const foundation = await seedFoundation(db());
  seedFleet(db(), foundation);
  seedSafety(db(), foundation);
  const start = performance.now();
  seedMoney(db(), foundation);
  seconds = (performance.now() - start) / 1000;
});

const clubOf = (slug: string) => db().select().from(clubs).where(eq(clubs.slug, slug)).get()!;

describe("the seeded books", () => {
  it("seeds quickly and every entry in the database balances with two lines or more", () => {
    // Target 3 s on an idle machine (about 0.9 s measured); parallel test files on two cores can double it.
    expect(seconds).toBeLessThan(6);
    const bad = db().select({ e: journalLines.entryId }).from(journalLines).groupBy(journalLines.entryId).having(sql`sum(${journalLines.debitMinor}) <> sum(${journalLines.creditMinor}) or count(*) < 2`).all();
    expect(bad).toEqual([]);
    expect(Number(db().select({ n: sql<number>`count(*)` }).from(journalEntries).get()!.n)).toBeGreaterThan(300);
  });

  it("has exactly one member in arrears, in Reedwater", () => {
    const inArrears = db().select().from(clubs).all().flatMap((c) => [...membersInArrears(db(), c.id, isoDateInTimeZone(new Date(), c.timeZone)).keys()]);
    const emails = inArrears.map((id) => db().select().from(users).where(eq(users.id, id)).get()!.email);
    expect(emails).toEqual(["pilot2@hangarline.test"]);
  });

  it("keeps the euro club's books in euros and issues statements", () => {
    const silberau = clubOf("aeroclub-silberau");
    const currencies = db().selectDistinct({ c: journalLines.currency }).from(journalLines).where(eq(journalLines.clubId, silberau.id)).all();
    expect(currencies).toEqual([{ c: "EUR" }]);
    expect(db().select().from(statements).where(eq(statements.clubId, silberau.id)).all().length).toBeGreaterThan(3);
  });

  it("has Cottonwood locked through the month before last; last month's statement reconciles", () => {
    const cw = clubOf("cottonwood-flyers");
    const today = isoDateInTimeZone(new Date(), cw.timeZone);
    const locked = db().select().from(reconciliationPeriods).where(eq(reconciliationPeriods.clubId, cw.id)).all();
    expect(locked.map((p) => p.periodEnd).sort().at(-1)).toBe(monthRange(shiftMonthKey(monthOf(today), -2)).end);
    const month = shiftMonthKey(monthOf(today), -1);
    const st = demoBankStatement(db(), cw.id, month);
    const parsed = parseStatementFile({ format: "csv", text: st.csv, currency: "USD", mapping: { date: "Date", description: "Description", amount: "Amount", reference: "Reference" } });
    if (!parsed.ok) throw new Error(parsed.errors.join("; "));
    db().transaction((tx) => {
      const actor = { clubId: cw.id, userId: null, currency: "USD" };
      const { statementId } = storeStatement(tx, { clubId: cw.id, userId: null, currency: "USD", format: "csv", fileName: "demo.csv", text: st.csv, parsed, closingBalanceMinor: st.closingMinor, periodStart: st.periodStart, periodEnd: st.periodEnd });
      autoMatchStatement(tx, actor, statementId);
      const fee = tx.select().from(journalEntries).where(and(eq(journalEntries.clubId, cw.id), eq(journalEntries.kind, "bank-item"))).all().length;
      const feeLine = parsed.lines.findIndex((l) => l.description === "ACCOUNT MAINTENANCE FEE");
      const line = tx.select().from(bankLines).where(and(eq(bankLines.statementId, statementId), eq(bankLines.lineNo, feeLine + 1))).get();
      bookBankLine(tx, actor, line!.id, "bank-fees", "Bank account fee");
      expect(tx.select().from(journalEntries).where(and(eq(journalEntries.clubId, cw.id), eq(journalEntries.kind, "bank-item"))).all().length).toBe(fee + 1);
      const report = lockPeriod(tx, actor, statementId);
      expect(report).toMatchObject({ agrees: true, differenceMinor: 0 });
      // One cheque was banked on the month's last day: a deposit in transit.
      expect(report.depositsInTransit.length).toBeGreaterThanOrEqual(1);
    });
  });
});
