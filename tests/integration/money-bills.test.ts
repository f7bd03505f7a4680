// Bills from entry to payment: the invoice attached, booked to its category against "Bills to
// pay", a second officer's approval above the club's amount (never the one who entered it),
// paid from the bank once, open for reconciliation, and in the month's profit and loss.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { GET as reportsRoute } from "@/app/api/clubs/[club]/money/reports/route";
import { bills, journalEntries, journalLines, ledgerAccounts, uploads } from "@/db/schema";
import { approveBillAction } from "@/lib/actions/money/approve-bill";
import { enterBillAction } from "@/lib/actions/money/enter-bill";
import { payBillAction } from "@/lib/actions/money/pay-bill";
import { saveBillApprovalAction } from "@/lib/actions/money/save-bill-approval";
import { unmatchedBookLines } from "@/db/queries/money-reconcile-match";
import { isoDateInTimeZone } from "@/lib/dates";
import { EMPTY, clubBySlug, db, form, signInAs } from "./helpers";
import { callRoute, pngFile } from "./fleet-helpers";
import { seedScenario } from "./bookings-helpers";

const SLUG = "reedwater";
const TREASURER = "treasurer@hangarline.test";
const ADMIN = "admin@hangarline.test";
const key = () => crypto.randomUUID();

function linesOf(entryId: string) {
  return db().select({ code: ledgerAccounts.code, debit: journalLines.debitMinor, credit: journalLines.creditMinor }).from(journalLines).innerJoin(ledgerAccounts, eq(ledgerAccounts.id, journalLines.accountId)).where(eq(journalLines.entryId, entryId)).all();
}

describe("bills", () => {
  let today = "";
  beforeAll(async () => {
    await seedScenario();
    today = isoDateInTimeZone(new Date(), clubBySlug(SLUG).timeZone);
  });

  it("only an admin sets the approval amount; the treasurer cannot lower their own bar", async () => {
    signInAs(TREASURER);
    expect((await saveBillApprovalAction(EMPTY, form({ club: SLUG, amount: "1000000", idempotencyKey: key() }))).ok).toBe(false);
    signInAs(ADMIN);
    const saved = await saveBillApprovalAction(EMPTY, form({ club: SLUG, amount: "1000.00", idempotencyKey: key() }));
    expect(saved, saved.message).toMatchObject({ ok: true });
    expect(saved.message).toMatch(/above \$1,000\.00/);
  });

  it("a bill above the amount: entered with its invoice, approved by a second officer, paid once, in reconciliation and the profit and loss", async () => {
    signInAs(TREASURER);
    const club = clubBySlug(SLUG);
    const bad = await enterBillAction(EMPTY, form({ club: SLUG, vendor: "Harbour Field Underwriters", billDate: today, dueOn: "2000-01-01", accountCode: "", amount: "abc", idempotencyKey: key() }));
    expect(bad.ok).toBe(false);
    expect(Object.keys(bad.fieldErrors).sort()).toEqual(expect.arrayContaining(["amount", "dueOn"]));
    expect(db().select().from(bills).all()).toHaveLength(0);

    const fields = form({ club: SLUG, vendor: "Harbour Field Underwriters", reference: "INV-0193", billDate: today, dueOn: today, accountCode: "aircraft-insurance", amount: "4,800.00", idempotencyKey: key() });
    fields.append("attachment", pngFile("invoice.png"));
    const entered = await enterBillAction(EMPTY, fields);
    expect(entered, entered.message).toMatchObject({ ok: true, data: { status: "awaiting_approval" } });
    expect(entered.message).toMatch(/waits for a second officer/);
    const billId = (entered.data as { billId: string }).billId;
    const bill = db().select().from(bills).where(eq(bills.id, billId)).get()!;
    expect(bill).toMatchObject({ amountMinor: 480_000, accountCode: "aircraft-insurance", status: "awaiting_approval" });
    expect(db().select().from(uploads).where(and(eq(uploads.subjectType, "Bill"), eq(uploads.subjectId, billId))).all()).toHaveLength(1);
    // Booked when entered: the category debited, bills to pay credited (standard accounting practice).
    expect(linesOf(bill.entryId).sort((a, b) => a.code.localeCompare(b.code))).toEqual([
      { code: "aircraft-insurance", debit: 480_000, credit: 0 },
      { code: "bills-payable", debit: 0, credit: 480_000 },
    ]);

    // Not paid before approval, and not approved by the one who entered it.
    expect((await payBillAction(EMPTY, form({ club: SLUG, billId, paidOn: today, idempotencyKey: key() }))).message).toMatch(/waits for a second officer/);
    expect((await approveBillAction(EMPTY, form({ club: SLUG, billId, idempotencyKey: key() }))).message).toMatch(/not the person who entered it/);
    signInAs("member@hangarline.test");
    expect((await approveBillAction(EMPTY, form({ club: SLUG, billId, idempotencyKey: key() }))).ok).toBe(false);
    signInAs(ADMIN);
    const approved = await approveBillAction(EMPTY, form({ club: SLUG, billId, idempotencyKey: key() }));
    expect(approved, approved.message).toMatchObject({ ok: true });

    signInAs(TREASURER);
    const k = key();
    const paid = await payBillAction(EMPTY, form({ club: SLUG, billId, paidOn: today, idempotencyKey: k }));
    expect(paid, paid.message).toMatchObject({ ok: true });
    const entries = db().select().from(journalEntries).all().length;
    expect(await payBillAction(EMPTY, form({ club: SLUG, billId, paidOn: today, idempotencyKey: k }))).toEqual(paid);
    expect((await payBillAction(EMPTY, form({ club: SLUG, billId, paidOn: today, idempotencyKey: key() }))).message).toMatch(/already paid/);
    expect(db().select().from(journalEntries).all().length).toBe(entries);
    const after = db().select().from(bills).where(eq(bills.id, billId)).get()!;
    expect(linesOf(after.paymentEntryId!).sort((a, b) => a.code.localeCompare(b.code))).toEqual([
      { code: "bank", debit: 0, credit: 480_000 },
      { code: "bills-payable", debit: 480_000, credit: 0 },
    ]);
    // The payment waits in the books for its bank statement line.
    expect(unmatchedBookLines(db(), club.id, today).some((l) => l.amountMinor === -480_000 && l.memo.includes("Harbour Field Underwriters"))).toBe(true);
    // And the month's profit and loss shows the expense under its category.
    const month = `${today.slice(0, 7)}-01`;
    const pnl = await callRoute(reportsRoute, `/api/clubs/${SLUG}/money/reports?report=profit-and-loss&from=${month}&to=${today}`, { club: SLUG });
    expect((pnl.body as { byAccount: { code: string; amountMinor: number }[] }).byAccount.find((l) => l.code === "aircraft-insurance")?.amountMinor).toBe(480_000);
  });

  it("a bill at or below the amount is ready to pay at once", async () => {
    signInAs(TREASURER);
    const entered = await enterBillAction(EMPTY, form({ club: SLUG, vendor: "Tie-down Co-op", billDate: today, dueOn: today, accountCode: "hangar-tie-down", amount: "350", idempotencyKey: key() }));
    expect(entered, entered.message).toMatchObject({ ok: true, data: { status: "approved" } });
    const refused = await enterBillAction(EMPTY, form({ club: SLUG, vendor: "Nobody", billDate: today, dueOn: today, accountCode: "bank", amount: "10", idempotencyKey: key() }));
    expect(refused.fieldErrors.accountCode?.[0]).toMatch(/Choose the category/);
  });
});
