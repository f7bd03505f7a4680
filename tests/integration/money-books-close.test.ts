// The treasurer's books, parts 2 and 3: recurring bills entered once per period through the one
// bill path (pause, end), the budget grid and budget against actual, the year-end close (one
// entry on 31 December, the year locked, never closed twice, the balance sheet unchanged), and
// the reports as PDF.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { GET as reportsRoute } from "@/app/api/clubs/[club]/money/reports/route";
import { budgetAccounts, budgetCells } from "@/db/queries/money-budget";
import { reportPostings } from "@/db/queries/money-reports";
import { bills, budgets, journalEntries, recurringBills, yearCloses } from "@/db/schema";
import { closeYearAction } from "@/lib/actions/money/close-year";
import { createRecurringBillAction } from "@/lib/actions/money/create-recurring-bill";
import { enterBillAction } from "@/lib/actions/money/enter-bill";
import { produceDueBillsAction } from "@/lib/actions/money/produce-due-bills";
import { reverseJournalEntry } from "@/lib/actions/money/reverse-entry";
import { saveBudgetAction } from "@/lib/actions/money/save-budget";
import { setRecurringBillStatusAction } from "@/lib/actions/money/set-recurring-bill-status";
import { isoDateInTimeZone, startOfMonthAfter } from "@/lib/dates";
import { budgetVsActual } from "@/lib/money/budget";
import { balanceSheet } from "@/lib/money/reports";
import { EMPTY, clubBySlug, db, form, signInAs } from "./helpers";
import { callRoute } from "./fleet-helpers";
import { seedScenario } from "./bookings-helpers";

const SLUG = "reedwater";
const TREASURER = "treasurer@hangarline.test";
const ADMIN = "admin@hangarline.test";
const MEMBER = "member@hangarline.test";
const key = () => crypto.randomUUID();

describe("the treasurer's books: recurring bills, budget, year-end close, PDF", () => {
  let today = "";
  let clubId = "";
  beforeAll(async () => {
    await seedScenario();
    const club = clubBySlug(SLUG);
    clubId = club.id;
    today = isoDateInTimeZone(new Date(), club.timeZone);
  }, 120_000);

  it("a recurring bill enters each due period once, through the one bill path; paused and ended ones enter nothing", async () => {
    signInAs(MEMBER);
    const firstOn = startOfMonthAfter(today, -2);
    const fields = { club: SLUG, vendor: "Cove Hangar Trust", reference: "LEASE-7", accountCode: "hangar-tie-down", amount: "450.00", cadence: "monthly", firstOn, endsOn: "", dueDays: "10" };
    expect((await createRecurringBillAction(EMPTY, form({ ...fields, idempotencyKey: key() }))).ok).toBe(false);
    expect(db().select().from(recurringBills).all()).toHaveLength(0);

    signInAs(TREASURER);
    const bad = await createRecurringBillAction(EMPTY, form({ ...fields, cadence: "weekly", endsOn: "2000-01-01", accountCode: "bank", idempotencyKey: key() }));
    expect(bad.ok).toBe(false);
    expect(Object.keys(bad.fieldErrors)).toEqual(expect.arrayContaining(["cadence"]));
    expect(db().select().from(recurringBills).all()).toHaveLength(0);

    const k = key();
    const saved = await createRecurringBillAction(EMPTY, form({ ...fields, idempotencyKey: k }));
    expect(saved, saved.message).toMatchObject({ ok: true });
    expect(await createRecurringBillAction(EMPTY, form({ ...fields, idempotencyKey: k }))).toEqual(saved);
    expect(db().select().from(recurringBills).all()).toHaveLength(1);
    const templateId = (saved.data as { recurringBillId: string }).recurringBillId;

    // Three months are due: the first of two months ago, of last month and of this month.
    const produced = await produceDueBillsAction(EMPTY, form({ club: SLUG, idempotencyKey: key() }));
    expect(produced, produced.message).toMatchObject({ ok: true, data: { produced: 3 } });
    expect(produced.message).toMatch(/^3 bills entered \(\$1,350\.00\): Cove Hangar Trust/);
    const made = db().select().from(bills).where(eq(bills.recurringBillId, templateId)).all();
    expect(made.map((b) => b.periodKey).sort()).toEqual([firstOn.slice(0, 7), startOfMonthAfter(today, -1).slice(0, 7), today.slice(0, 7)]);
    // Each through the one bill path: booked on its date, due ten days later, ready to pay under the approval amount.
    for (const b of made) {
      expect(b).toMatchObject({ amountMinor: 45_000, accountCode: "hangar-tie-down", status: "approved", reference: "LEASE-7" });
      expect(db().select().from(journalEntries).where(eq(journalEntries.id, b.entryId)).get()).toMatchObject({ kind: "bill", sourceKey: `bill-recurring:${templateId}:${b.periodKey}` });
    }

    // Running it again (a new submission, not a replay) enters nothing.
    const again = await produceDueBillsAction(EMPTY, form({ club: SLUG, idempotencyKey: key() }));
    expect(again, again.message).toMatchObject({ ok: true, data: { produced: 0 } });
    expect(db().select().from(bills).where(eq(bills.recurringBillId, templateId)).all()).toHaveLength(3);
    // And the database refuses a second bill for a period, whoever writes it.
    const one = made[0]!;
    expect(() => db().insert(bills).values({ ...one, id: crypto.randomUUID() }).run()).toThrow(/UNIQUE/);

    // Pause, resume, end.
    const paused = await setRecurringBillStatusAction(EMPTY, form({ club: SLUG, recurringBillId: templateId, status: "paused", idempotencyKey: key() }));
    expect(paused, paused.message).toMatchObject({ ok: true });
    expect((await setRecurringBillStatusAction(EMPTY, form({ club: SLUG, recurringBillId: templateId, status: "paused", idempotencyKey: key() }))).message).toMatch(/already paused/);
    db().update(recurringBills).set({ nextOn: today }).where(eq(recurringBills.id, templateId)).run(); // due again, but paused
    expect((await produceDueBillsAction(EMPTY, form({ club: SLUG, idempotencyKey: key() }))).data).toEqual({ produced: 0 });
    const ended = await setRecurringBillStatusAction(EMPTY, form({ club: SLUG, recurringBillId: templateId, status: "ended", idempotencyKey: key() }));
    expect(ended, ended.message).toMatchObject({ ok: true });
    expect((await setRecurringBillStatusAction(EMPTY, form({ club: SLUG, recurringBillId: templateId, status: "active", idempotencyKey: key() }))).message).toMatch(/has ended/);
    expect(db().select().from(recurringBills).where(eq(recurringBills.id, templateId)).get()?.status).toBe("ended");
  });

  it("the treasurer's budget grid saves whole or not at all, and budget against actual reads the postings", async () => {
    const year = Number(today.slice(0, 4));
    const mm = today.slice(5, 7);
    signInAs(ADMIN);
    expect((await saveBudgetAction(EMPTY, form({ club: SLUG, year: String(year), [`b.hangar-tie-down.${mm}`]: "500", idempotencyKey: key() }))).ok).toBe(false);
    signInAs(TREASURER);
    const bad = await saveBudgetAction(EMPTY, form({ club: SLUG, year: String(year), [`b.hangar-tie-down.${mm}`]: "500", "b.fuel-oil.01": "lots", "b.bank.01": "10", idempotencyKey: key() }));
    expect(bad.ok).toBe(false);
    expect(Object.keys(bad.fieldErrors).sort()).toEqual(["b.bank.01", "b.fuel-oil.01"]);
    expect(db().select().from(budgets).all()).toHaveLength(0);

    const k = key();
    const cells = { club: SLUG, year: String(year), [`b.hangar-tie-down.${mm}`]: "1,000.00", "b.fuel-oil.01": "250", "b.flight-income.01": "", idempotencyKey: k };
    const saved = await saveBudgetAction(EMPTY, form(cells));
    expect(saved, saved.message).toMatchObject({ ok: true, data: { changed: 2 } });
    expect(await saveBudgetAction(EMPTY, form(cells))).toEqual(saved);
    expect(budgetCells(db(), clubId, year).sort((a, b) => a.month.localeCompare(b.month))).toEqual(
      [{ accountCode: "fuel-oil", month: `${year}-01`, amountMinor: 25_000 }, { accountCode: "hangar-tie-down", month: `${year}-${mm}`, amountMinor: 100_000 }].sort((a, b) => a.month.localeCompare(b.month)),
    );
    // A blank cell clears it.
    expect((await saveBudgetAction(EMPTY, form({ club: SLUG, year: String(year), "b.fuel-oil.01": "", idempotencyKey: key() }))).data).toEqual({ changed: 1 });

    // This month's hangar bills (the recurring one's $450) against the $1,000 budget.
    const report = budgetVsActual(reportPostings(db(), clubId, { withoutYearEndClose: true }), budgetCells(db(), clubId, year), budgetAccounts(db(), clubId), { from: `${year}-${mm}`, to: `${year}-${mm}` });
    const hangar = report.lines.find((l) => l.code === "hangar-tie-down")!;
    expect(hangar.budgetMinor).toBe(100_000);
    expect(hangar.actualMinor).toBeGreaterThanOrEqual(45_000);
    expect(hangar.varianceMinor).toBe(100_000 - hangar.actualMinor);
  });

  it("closes last year once, in one entry on 31 December, locks it, and keeps the balance sheet as it was", async () => {
    const year = Number(today.slice(0, 4)) - 1;
    const yearEnd = `${year}-12-31`;
    signInAs(TREASURER);
    // An expense and some income in the year being closed.
    const bill = await enterBillAction(EMPTY, form({ club: SLUG, vendor: "Ridge Props Overhaul", billDate: `${year}-06-15`, dueOn: `${year}-07-15`, accountCode: "maintenance", amount: "320.00", idempotencyKey: key() }));
    expect(bill, bill.message).toMatchObject({ ok: true });
    const before = balanceSheet(reportPostings(db(), clubId, { to: yearEnd }), yearEnd);
    expect(before.balanced).toBe(true);

    expect((await closeYearAction(EMPTY, form({ club: SLUG, year: String(year + 1), idempotencyKey: key() }))).message).toMatch(/not over yet/);
    signInAs(ADMIN);
    expect((await closeYearAction(EMPTY, form({ club: SLUG, year: String(year), idempotencyKey: key() }))).ok).toBe(false);
    expect(db().select().from(yearCloses).all()).toHaveLength(0);

    signInAs(TREASURER);
    const k = key();
    const closed = await closeYearAction(EMPTY, form({ club: SLUG, year: String(year), idempotencyKey: k }));
    expect(closed, closed.message).toMatchObject({ ok: true });
    expect(closed.message).toMatch(new RegExp(`^${year} closed: (surplus|deficit) of \\$[\\d,]+\\.\\d{2} moved into retained funds on ${yearEnd}`));
    expect(await closeYearAction(EMPTY, form({ club: SLUG, year: String(year), idempotencyKey: k }))).toEqual(closed);
    const second = await closeYearAction(EMPTY, form({ club: SLUG, year: String(year), idempotencyKey: key() }));
    expect(second.ok).toBe(false);
    expect(second.message).toMatch(/already closed/);
    const rows = db().select().from(yearCloses).all();
    expect(rows).toHaveLength(1);
    const entry = db().select().from(journalEntries).where(and(eq(journalEntries.clubId, clubId), eq(journalEntries.kind, "year-end-close"))).all();
    expect(entry).toHaveLength(1);
    expect(entry[0]).toMatchObject({ entryDate: yearEnd, id: rows[0]!.entryId });
    // The closing entry is not reversed (that would reopen the year in the next one).
    const reversed = await reverseJournalEntry(EMPTY, form({ club: SLUG, entryId: entry[0]!.id, idempotencyKey: key() }));
    expect(reversed.ok).toBe(false);
    expect(reversed.message).toMatch(/not reversed/);

    // Income and expense stand at zero at the year's end; the balance sheet is unchanged and balanced.
    const postings = reportPostings(db(), clubId, { to: yearEnd });
    const perAccount = new Map<string, number>();
    for (const p of postings) if (p.accountType === "income" || p.accountType === "expense") perAccount.set(p.accountCode, (perAccount.get(p.accountCode) ?? 0) + p.debitMinor - p.creditMinor);
    expect([...perAccount.values()].every((v) => v === 0)).toBe(true);
    expect(balanceSheet(postings, yearEnd)).toEqual(before);
    expect(balanceSheet(reportPostings(db(), clubId), today).balanced).toBe(true);

    // The closed year's profit and loss is still readable (without the closing entry).
    const pnl = await callRoute(reportsRoute, `/api/clubs/${SLUG}/money/reports?report=profit-and-loss&from=${year}-01-01&to=${yearEnd}`, { club: SLUG });
    expect((pnl.body as { byAccount: { code: string; amountMinor: number }[] }).byAccount.find((l) => l.code === "maintenance")?.amountMinor).toBe(32_000);
    expect((pnl.body as { netMinor: number }).netMinor).toBe(rows[0]!.netIncomeMinor);

    // Locked: a bill dated in the closed year posts on the first open day, noting its date.
    const late = await enterBillAction(EMPTY, form({ club: SLUG, vendor: "Late Invoice Co", billDate: `${year}-11-20`, dueOn: `${year}-12-20`, accountCode: "maintenance", amount: "10.00", idempotencyKey: key() }));
    expect(late, late.message).toMatchObject({ ok: true });
    const lateBill = db().select().from(bills).where(eq(bills.vendor, "Late Invoice Co")).get()!;
    const lateEntry = db().select().from(journalEntries).where(eq(journalEntries.id, lateBill.entryId)).get()!;
    expect(lateEntry.entryDate).toBe(`${year + 1}-01-01`);
    expect(lateEntry.memo).toMatch(new RegExp(`dated ${year}-11-20, in a locked period`));
  });

  it("the reports download as PDF for the treasurer, not for a member", async () => {
    signInAs(TREASURER);
    const pdf = await callRoute(reportsRoute, `/api/clubs/${SLUG}/money/reports?report=profit-and-loss&from=${today.slice(0, 7)}-01&to=${today}&format=pdf`, { club: SLUG });
    expect(pdf.status).toBe(200);
    const bytes = Buffer.from(pdf.body as ArrayBuffer);
    expect(bytes.subarray(0, 5).toString()).toBe("%PDF-");
    // A US-dollar club without a locale prints on US Letter: 612 × 792 points (ANSI/ASME Y14.1).
    expect(bytes.toString("latin1")).toMatch(/\/MediaBox \[0 0 612 792\]/);
    const sheet = await callRoute(reportsRoute, `/api/clubs/${SLUG}/money/reports?report=balance-sheet&asOf=${today}&format=pdf`, { club: SLUG });
    expect(Buffer.from(sheet.body as ArrayBuffer).subarray(0, 5).toString()).toBe("%PDF-");
    signInAs(MEMBER);
    expect((await callRoute(reportsRoute, `/api/clubs/${SLUG}/money/reports?report=balance-sheet&asOf=${today}&format=pdf`, { club: SLUG })).status).toBeGreaterThanOrEqual(403);
  });
});
