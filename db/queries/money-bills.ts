import "server-only";
import { and, asc, eq, inArray, isNull, sql } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { auditLog, bills, ledgerAccounts, moneySettings, uploads, users, type BillRow } from "@/db/schema";
import { accountId } from "@/db/queries/money-accounts";
import { openPostingDate, postEntry } from "@/db/queries/money-post-entry";
import { billEntryLines, billNeedsApproval, billPaymentLines } from "@/lib/money/bills";
import { lockedPeriodNote } from "@/lib/money/open-period";

// Bills: one write path per step (enter, approve, pay), each in the caller's transaction, each
// posting its one journal entry (lib/money/bills has the rules).

export function billApprovalOverMinor(db: Db | Tx, clubId: string): number {
  return db.select({ v: moneySettings.billApprovalOverMinor }).from(moneySettings).where(eq(moneySettings.clubId, clubId)).get()?.v ?? 50_000;
}

export function setBillApprovalOverMinor(tx: Tx, clubId: string, amountMinor: number): void {
  tx.insert(moneySettings).values({ clubId, billApprovalOverMinor: amountMinor }).onConflictDoUpdate({ target: moneySettings.clubId, set: { billApprovalOverMinor: amountMinor, updatedAt: new Date() } }).run();
}

/** Chart accounts a bill may be booked to: expenses first, then assets and liabilities (a loan repayment), never the bank or member accounts. */
export function billCategories(db: Db | Tx, clubId: string): { code: string; name: string; type: string }[] {
  return db
    .select({ code: ledgerAccounts.code, name: ledgerAccounts.name, type: ledgerAccounts.type })
    .from(ledgerAccounts)
    .where(and(eq(ledgerAccounts.clubId, clubId), isNull(ledgerAccounts.memberUserId), inArray(ledgerAccounts.type, ["expense", "asset", "liability"]), sql`${ledgerAccounts.code} not in ('bank', 'member-receivables', 'bills-payable', 'card-clearing')`))
    .orderBy(sql`case ${ledgerAccounts.type} when 'expense' then 0 when 'asset' then 1 else 2 end`, asc(ledgerAccounts.name))
    .all();
}

export type BillInput = { vendor: string; billDate: string; dueOn: string; accountCode: string; amountMinor: number; reference: string | null };

/**
 * A bill produced from a recurring bill: its template and period (one bill per pair, ever).
 * `bySchedule`: entered by the scheduled run, not by a person — its journal entry names no one.
 */
export type BillRecurrence = { recurringBillId: string; periodKey: string; bySchedule?: boolean };

export type BillRefusal = { refused: string; field?: string };

export function enterBill(tx: Tx, club: { id: string; currency: string }, userId: string, input: BillInput, recurrence?: BillRecurrence): BillRow | BillRefusal {
  const category = billCategories(tx, club.id).find((c) => c.code === input.accountCode);
  if (!category) return { refused: "Choose the category from the chart of accounts.", field: "accountCode" };
  const open = openPostingDate(tx, club.id, input.billDate);
  const lines = billEntryLines(input.accountCode, input.amountMinor).map((l) => ({ accountId: l.accountCode === "bills-payable" ? accountId(tx, club.id, "bills-payable") : ledgerId(tx, club.id, l.accountCode), debitMinor: l.debitMinor, creditMinor: l.creditMinor }));
  const { entryId } = postEntry(tx, club.id, {
    date: open.postOn,
    kind: "bill",
    memo: `Bill: ${input.vendor}${input.reference ? ` ${input.reference}` : ""}${lockedPeriodNote(open)}`,
    lines,
    sourceType: "bill",
    sourceKey: recurrence ? `bill-recurring:${recurrence.recurringBillId}:${recurrence.periodKey}` : undefined,
    reference: input.reference,
    createdById: recurrence?.bySchedule ? null : userId,
  });
  const status = billNeedsApproval(input.amountMinor, { approvalOverMinor: billApprovalOverMinor(tx, club.id) }) ? "awaiting_approval" : "approved";
  return tx.insert(bills).values({ clubId: club.id, ...input, currency: club.currency, status, enteredById: userId, entryId, recurringBillId: recurrence?.recurringBillId ?? null, periodKey: recurrence?.periodKey ?? null }).returning().all()[0]!;
}

function ledgerId(tx: Tx, clubId: string, code: string): string {
  return tx.select({ id: ledgerAccounts.id }).from(ledgerAccounts).where(and(eq(ledgerAccounts.clubId, clubId), eq(ledgerAccounts.code, code))).get()!.id;
}

export function getBill(db: Db | Tx, clubId: string, billId: string): BillRow | undefined {
  return db.select().from(bills).where(and(eq(bills.clubId, clubId), eq(bills.id, billId))).get();
}

export function approveBill(tx: Tx, clubId: string, billId: string, userId: string): boolean {
  return tx.update(bills).set({ status: "approved", approvedById: userId, approvedAt: new Date(), updatedAt: new Date() }).where(and(eq(bills.clubId, clubId), eq(bills.id, billId), eq(bills.status, "awaiting_approval"))).run().changes === 1;
}

/** Pays an approved bill from the bank on `paidOn`; the bank line is matched later in reconciliation. */
export function payBill(tx: Tx, clubId: string, bill: BillRow, userId: string, paidOn: string): string | null {
  const lines = billPaymentLines(bill.amountMinor).map((l) => ({ accountId: accountId(tx, clubId, l.accountCode as "bank" | "bills-payable"), debitMinor: l.debitMinor, creditMinor: l.creditMinor }));
  const { entryId } = postEntry(tx, clubId, {
    date: paidOn,
    kind: "bill-payment",
    memo: `Bill paid: ${bill.vendor}${bill.reference ? ` ${bill.reference}` : ""}`,
    lines,
    sourceType: "bill",
    sourceId: bill.id,
    sourceKey: `bill-payment:${bill.id}`,
    reference: bill.reference,
    createdById: userId,
  });
  const done = tx.update(bills).set({ status: "paid", paidOn, paidById: userId, paymentEntryId: entryId, updatedAt: new Date() }).where(and(eq(bills.clubId, clubId), eq(bills.id, bill.id), eq(bills.status, "approved"))).run();
  return done.changes === 1 ? entryId : null;
}

/** The audit action of a bill the scheduled run entered (no person): db/queries/money-recurring.ts. */
export const SCHEDULED_BILL_AUDIT = "money.bill.enter.scheduled";

export type BillListRow = BillRow & { enteredBy: string; approvedBy: string | null; categoryName: string; attachments: { id: string; name: string }[] };

export function listBills(db: Db, clubId: string): BillListRow[] {
  const rows = db
    .select({ bill: bills, enteredBy: sql<string>`coalesce(${users.name}, ${users.email})`, categoryName: ledgerAccounts.name })
    .from(bills)
    .innerJoin(users, eq(users.id, bills.enteredById))
    .leftJoin(ledgerAccounts, and(eq(ledgerAccounts.clubId, bills.clubId), eq(ledgerAccounts.code, bills.accountCode)))
    .where(eq(bills.clubId, clubId))
    .orderBy(sql`case ${bills.status} when 'awaiting_approval' then 0 when 'approved' then 1 else 2 end`, asc(bills.dueOn))
    .limit(500)
    .all();
  const ids = rows.map((r) => r.bill.id);
  const files = ids.length ? db.select({ id: uploads.id, subjectId: uploads.subjectId, name: uploads.originalName }).from(uploads).where(and(eq(uploads.clubId, clubId), eq(uploads.subjectType, "Bill"), inArray(uploads.subjectId, ids))).all() : [];
  // A bill the scheduled run entered names no person as its enterer, whoever set the recurring bill up.
  const byTick = new Set(
    ids.length ? db.select({ id: auditLog.subjectId }).from(auditLog).where(and(eq(auditLog.clubId, clubId), eq(auditLog.action, SCHEDULED_BILL_AUDIT), inArray(auditLog.subjectId, ids))).all().map((a) => a.id) : [],
  );
  const approvers = new Map(
    db.select({ id: users.id, name: sql<string>`coalesce(${users.name}, ${users.email})` }).from(users).where(inArray(users.id, rows.map((r) => r.bill.approvedById).filter((x): x is string => !!x).concat(["-"]))).all().map((u) => [u.id, u.name]),
  );
  return rows.map((r) => ({
    ...r.bill,
    enteredBy: byTick.has(r.bill.id) ? `the scheduled run (recurring bill set up by ${r.enteredBy})` : r.enteredBy,
    approvedBy: r.bill.approvedById ? approvers.get(r.bill.approvedById) ?? null : null,
    categoryName: r.categoryName ?? r.bill.accountCode,
    attachments: files.filter((f) => f.subjectId === r.bill.id).map((f) => ({ id: f.id, name: f.name })),
  }));
}
