import "server-only";
import { and, asc, eq, isNull, lte, sql } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { bills, clubs, ledgerAccounts, recurringBills, users, type RecurringBillRow } from "@/db/schema";
import { dueOccurrences, type Cadence } from "@/lib/money/recurring";
import { clubToday } from "@/lib/money/settings";
import { writeAudit } from "@/lib/server/audit";
import { logError } from "@/lib/server/log";
import { billCategories, enterBill, SCHEDULED_BILL_AUDIT } from "./money-bills";

// Recurring bills (insurance, hangar rent): the templates the treasurer keeps, and producing the
// bills that are due. Each bill goes through the one bill write path (enterBill), once per
// template and period: the period key is unique per template (bills_recurring_period) and the
// production skips a period already billed, so running it twice never doubles a bill. The
// treasurer's button and the scheduled tick both go through produceDueBills.

export type RecurringBillInput = { vendor: string; accountCode: string; amountMinor: number; reference: string | null; cadence: Cadence; firstOn: string; endsOn: string | null; dueDays: number };

export function createRecurringBill(tx: Tx, club: { id: string; currency: string }, userId: string, input: RecurringBillInput): RecurringBillRow | { refused: string; field: string } {
  if (!billCategories(tx, club.id).some((c) => c.code === input.accountCode)) return { refused: "Choose the category from the chart of accounts.", field: "accountCode" };
  return tx
    .insert(recurringBills)
    .values({
      clubId: club.id,
      vendor: input.vendor,
      accountCode: input.accountCode,
      amountMinor: input.amountMinor,
      currency: club.currency,
      reference: input.reference,
      cadence: input.cadence,
      anchorDay: Number(input.firstOn.slice(8, 10)),
      nextOn: input.firstOn,
      endsOn: input.endsOn,
      dueDays: input.dueDays,
      status: "active",
      createdById: userId,
    })
    .returning()
    .all()[0]!;
}

export function getRecurringBill(db: Db | Tx, clubId: string, id: string): RecurringBillRow | undefined {
  return db.select().from(recurringBills).where(and(eq(recurringBills.clubId, clubId), eq(recurringBills.id, id))).get();
}

/** Pause, resume or end a recurrence; an ended one stays ended. Returns false when nothing changed. */
export function setRecurringBillStatus(tx: Tx, clubId: string, id: string, status: "active" | "paused" | "ended"): boolean {
  return tx
    .update(recurringBills)
    .set({ status, updatedAt: new Date() })
    .where(and(eq(recurringBills.clubId, clubId), eq(recurringBills.id, id), sql`${recurringBills.status} <> 'ended'`, sql`${recurringBills.status} <> ${status}`))
    .run().changes === 1;
}

export type RecurringListRow = RecurringBillRow & { categoryName: string; createdBy: string; billCount: number; lastPeriod: string | null };

export function listRecurringBills(db: Db, clubId: string): RecurringListRow[] {
  return db
    .select({
      r: recurringBills,
      categoryName: sql<string>`coalesce(${ledgerAccounts.name}, ${recurringBills.accountCode})`,
      createdBy: sql<string>`coalesce(${users.name}, ${users.email})`,
      billCount: sql<number>`(select count(*) from bills b where b.club_id = ${recurringBills.clubId} and b.recurring_bill_id = ${recurringBills.id})`,
      lastPeriod: sql<string | null>`(select max(b.bill_date) from bills b where b.club_id = ${recurringBills.clubId} and b.recurring_bill_id = ${recurringBills.id})`,
    })
    .from(recurringBills)
    .innerJoin(users, eq(users.id, recurringBills.createdById))
    .leftJoin(ledgerAccounts, and(eq(ledgerAccounts.clubId, recurringBills.clubId), eq(ledgerAccounts.code, recurringBills.accountCode)))
    .where(eq(recurringBills.clubId, clubId))
    .orderBy(sql`case ${recurringBills.status} when 'active' then 0 when 'paused' then 1 else 2 end`, asc(recurringBills.nextOn))
    .limit(200)
    .all()
    .map((x) => ({ ...x.r, categoryName: x.categoryName, createdBy: x.createdBy, billCount: Number(x.billCount), lastPeriod: x.lastPeriod }));
}

export type ProducedBill = { billId: string; vendor: string; billDate: string; periodKey: string; amountMinor: number; status: string };

/**
 * The one write path for bills from recurring bills, used by the treasurer's "Enter the bills
 * due" and by the scheduled tick alike. Enters every bill that is due by `today` from the club's
 * active recurring bills (at most a year's worth per template per run), writes each bill's audit
 * entry, moves each template's next date on, and ends a template past its end date. A period
 * already billed is skipped, never billed again (checked here, and the unique index
 * bills_recurring_period stops a race; callers run this in a write-locked transaction).
 *
 * `userId` null: the scheduled run entered the bills, no person. The audit names no actor; the
 * bill's "entered by" (a person is required) is the officer who set the recurring bill up, so
 * the second-officer rule still keeps them from approving it alone.
 */
export function produceDueBills(tx: Tx, club: { id: string; currency: string }, userId: string | null, today: string): { produced: ProducedBill[]; skipped: number } {
  const templates = tx.select().from(recurringBills).where(and(eq(recurringBills.clubId, club.id), eq(recurringBills.status, "active"), lte(recurringBills.nextOn, today))).all();
  const produced: ProducedBill[] = [];
  let skipped = 0;
  for (const t of templates) {
    const { due, nextOn, ended } = dueOccurrences({ cadence: t.cadence, anchorDay: t.anchorDay, nextOn: t.nextOn, endsOn: t.endsOn, dueDays: t.dueDays }, today);
    let stoppedAt: string | null = null;
    for (const d of due) {
      const already = tx.select({ id: bills.id }).from(bills).where(and(eq(bills.clubId, club.id), eq(bills.recurringBillId, t.id), eq(bills.periodKey, d.periodKey))).get();
      if (already) {
        skipped++;
        continue;
      }
      const bill = enterBill(tx, club, userId ?? t.createdById, { vendor: t.vendor, billDate: d.billDate, dueOn: d.dueOn, accountCode: t.accountCode, amountMinor: t.amountMinor, reference: t.reference }, { recurringBillId: t.id, periodKey: d.periodKey, bySchedule: userId === null });
      if ("refused" in bill) {
        // The category left the chart: the template waits (paused) at this period rather than book elsewhere.
        stoppedAt = d.billDate;
        break;
      }
      const made = { billId: bill.id, vendor: bill.vendor, billDate: bill.billDate, periodKey: d.periodKey, amountMinor: bill.amountMinor, status: bill.status };
      produced.push(made);
      writeAudit(
        tx,
        userId
          ? { clubId: club.id, actorId: userId, action: "money.bill.enter", subjectType: "Bill", subjectId: bill.id, after: { ...made, recurring: true } }
          : { clubId: club.id, actorId: null, action: SCHEDULED_BILL_AUDIT, subjectType: "Bill", subjectId: bill.id, after: { ...made, recurring: true, setUpBy: t.createdById } },
      );
    }
    tx.update(recurringBills)
      .set(stoppedAt ? { nextOn: stoppedAt, status: "paused", updatedAt: new Date() } : { nextOn, status: ended ? "ended" : "active", updatedAt: new Date() })
      .where(and(eq(recurringBills.clubId, club.id), eq(recurringBills.id, t.id)))
      .run();
  }
  return { produced, skipped };
}

/** The audit action of a bill the scheduled run entered (no person did). */
export { SCHEDULED_BILL_AUDIT } from "./money-bills";

export type ScheduledBillsResult = { clubs: number; bills: number };

/**
 * The scheduled tick's part: every club's recurring bills due by the club's own day, entered
 * through produceDueBills with no person as the actor, one write-locked transaction per club.
 * Safe to run as often as wanted, twice at once, or beside the treasurer's button: a period is
 * billed once. A club whose bills cannot be entered (a ledger refusal) is logged and skipped.
 */
export function produceScheduledBills(db: Db, now: Date = new Date()): ScheduledBillsResult {
  const result: ScheduledBillsResult = { clubs: 0, bills: 0 };
  const withTemplates = db
    .selectDistinct({ id: clubs.id, currency: clubs.currency, timeZone: clubs.timeZone })
    .from(recurringBills)
    .innerJoin(clubs, eq(clubs.id, recurringBills.clubId))
    .where(and(eq(recurringBills.status, "active"), isNull(clubs.archivedAt)))
    .all();
  for (const club of withTemplates) {
    const today = clubToday(club, now);
    if (countDueRecurring(db, club.id, today) === 0) continue;
    try {
      const made = db.transaction((tx) => produceDueBills(tx, club, null, today).produced.length, { behavior: "immediate" });
      if (made > 0) {
        result.clubs++;
        result.bills += made;
      }
    } catch (error) {
      logError("money", "scheduled recurring bills failed", error, { clubId: club.id });
    }
  }
  return result;
}

/** How many active recurring bills have a bill due by `today` (for the bills page's prompt). */
export function countDueRecurring(db: Db, clubId: string, today: string): number {
  return db.select({ n: sql<number>`count(*)` }).from(recurringBills).where(and(eq(recurringBills.clubId, clubId), eq(recurringBills.status, "active"), lte(recurringBills.nextOn, today))).get()?.n ?? 0;
}
