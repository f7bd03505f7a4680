// Bank reconciliation against the books: which bank-account postings and card payouts a
// statement line is, and the period report (standard accounting practice: adjusted bank
// balance = statement + deposits in transit − outstanding cheques = adjusted book balance).
import "server-only";
import { and, eq, inArray, isNull, lte, ne, notExists, sql } from "drizzle-orm";
import { bankLines, bankStatements, cardPayouts, journalEntries, journalLines, paymentRefunds, payments, reconciliationMatches } from "@/db/schema";
import { addDays, type IsoDate } from "@/lib/dates";
import { autoMatch, reconciliationSummary, type BookItem, type ReconciliationSummary } from "@/lib/reconcile";
import { accountId, type DbLike } from "@/db/queries/money-accounts";
import { LedgerError } from "@/lib/money/errors";
import { lockedThrough, openPostingDate, postEntries, postEntry } from "@/db/queries/money-post-entry";
import { firstOpenDay, lockedPeriodNote } from "@/lib/money/open-period";

export type BookLineItem = { id: string; journalLineId: string; entryId: string; date: IsoDate; amountMinor: number; memo: string; reference: string | null; kind: string };
export type PayoutItem = { id: string; cardPayoutId: string; payoutId: string; date: IsoDate; amountMinor: number; feeMinor: number; carried: number };

const LATE_BOOKING_DAYS = 10;

/** Bank-account postings not yet matched to any bank line, dated on or before `through` (the opening balance aside). */
export function unmatchedBookLines(tx: DbLike, clubId: string, through: IsoDate): BookLineItem[] {
  const bank = accountId(tx, clubId, "bank");
  return tx
    .select({ journalLineId: journalLines.id, entryId: journalEntries.id, date: journalEntries.entryDate, memo: journalEntries.memo, reference: journalEntries.reference, kind: journalEntries.kind, debit: journalLines.debitMinor, credit: journalLines.creditMinor })
    .from(journalLines)
    .innerJoin(journalEntries, eq(journalEntries.id, journalLines.entryId))
    .where(
      and(
        eq(journalLines.clubId, clubId),
        eq(journalLines.accountId, bank),
        lte(journalEntries.entryDate, through),
        ne(journalEntries.kind, "opening"),
        notExists(tx.select({ one: sql`1` }).from(reconciliationMatches).where(eq(reconciliationMatches.journalLineId, journalLines.id))),
      ),
    )
    .orderBy(journalEntries.entryDate)
    .all()
    .map((r) => ({ id: `line:${r.journalLineId}`, journalLineId: r.journalLineId, entryId: r.entryId, date: r.date, amountMinor: r.debit - r.credit, memo: r.memo, reference: r.reference, kind: r.kind }));
}

/** Provider payouts that have not reached the bank account in the books yet. */
export function openPayouts(tx: DbLike, clubId: string): PayoutItem[] {
  const rows = tx.select().from(cardPayouts).where(and(eq(cardPayouts.clubId, clubId), isNull(cardPayouts.receivedEntryId))).all();
  if (rows.length === 0) return [];
  const counts = tx
    .select({ payoutId: payments.payoutId, n: sql<number>`count(*)` })
    .from(payments)
    .where(and(eq(payments.clubId, clubId), inArray(payments.payoutId, rows.map((r) => r.payoutId))))
    .groupBy(payments.payoutId)
    .all();
  const count = new Map(counts.map((c) => [c.payoutId, Number(c.n)]));
  return rows.map((r) => ({ id: `payout:${r.id}`, cardPayoutId: r.id, payoutId: r.payoutId, date: r.arrivalOn, amountMinor: r.netMinor, feeMinor: r.feeMinor, carried: count.get(r.payoutId) ?? 0 }));
}

/** The card payments and refunds each open payout carries, as autoMatch book items. */
function payoutBookItems(tx: DbLike, clubId: string, open: PayoutItem[]): BookItem[] {
  if (open.length === 0) return [];
  const ids = open.map((p) => p.payoutId);
  const pays = tx.select().from(payments).where(and(eq(payments.clubId, clubId), inArray(payments.payoutId, ids))).all();
  const refunds = tx
    .select({ id: paymentRefunds.id, payoutId: paymentRefunds.payoutId, amount: paymentRefunds.amountMinor, date: journalEntries.entryDate })
    .from(paymentRefunds)
    .innerJoin(journalEntries, eq(journalEntries.id, paymentRefunds.journalEntryId))
    .where(and(eq(paymentRefunds.clubId, clubId), inArray(paymentRefunds.payoutId, ids)))
    .all();
  return [
    ...pays.map((p) => ({ id: `pay:${p.id}`, date: p.receivedOn ?? "1970-01-01", amountMinor: p.amountMinor, feeMinor: p.feeMinor, payoutId: p.payoutId ?? undefined, kind: "payment" })),
    ...refunds.map((r) => ({ id: `ref:${r.id}`, date: r.date, amountMinor: -r.amount, feeMinor: 0, payoutId: r.payoutId ?? undefined, kind: "refund" })),
  ];
}

function bankJournalLineOf(tx: DbLike, clubId: string, entryId: string): string {
  const bank = accountId(tx, clubId, "bank");
  const row = tx.select({ id: journalLines.id }).from(journalLines).where(and(eq(journalLines.clubId, clubId), eq(journalLines.entryId, entryId), eq(journalLines.accountId, bank))).get();
  if (!row) throw new LedgerError("The entry does not touch the bank account.", "invalid");
  return row.id;
}

type Actor = { clubId: string; userId: string | null };
type BankLineRow = typeof bankLines.$inferSelect;

export function getOpenBankLine(tx: DbLike, clubId: string, bankLineId: string): BankLineRow {
  const line = tx.select().from(bankLines).where(and(eq(bankLines.clubId, clubId), eq(bankLines.id, bankLineId))).get();
  if (!line) throw new LedgerError("That bank line was not found in this club.", "not-found", "bankLineId");
  const matched = tx.select({ id: reconciliationMatches.id }).from(reconciliationMatches).where(and(eq(reconciliationMatches.clubId, clubId), eq(reconciliationMatches.bankLineId, line.id))).get();
  if (matched) throw new LedgerError("That bank line is already matched; undo the match first.", "invalid", "bankLineId");
  if (line.ignored) throw new LedgerError("That bank line is set aside; bring it back first.", "invalid", "bankLineId");
  return line;
}

/** Posts the transfer of a payout from card clearing into the bank, and matches it to the line. */
export function matchPayout(tx: DbLike, a: Actor, line: BankLineRow, cardPayoutId: string, kind: "payout" | "manual"): void {
  const payout = tx.select().from(cardPayouts).where(and(eq(cardPayouts.clubId, a.clubId), eq(cardPayouts.id, cardPayoutId), isNull(cardPayouts.receivedEntryId))).get();
  if (!payout) throw new LedgerError("That payout is not waiting for the bank any more.", "not-found", "bookIds");
  const open = openPostingDate(tx, a.clubId, line.postedOn);
  const { entryId } = postEntry(tx, a.clubId, {
    date: open.postOn,
    kind: "payout-received",
    memo: `Card payout ${payout.payoutId} reached the bank${lockedPeriodNote(open)}`,
    lines: [
      { accountId: accountId(tx, a.clubId, "bank"), debitMinor: payout.netMinor },
      { accountId: accountId(tx, a.clubId, "card-clearing"), creditMinor: payout.netMinor },
    ],
    sourceType: "card-payout",
    sourceId: payout.payoutId,
    reference: payout.payoutId,
    createdById: a.userId,
  });
  tx.update(cardPayouts).set({ receivedEntryId: entryId }).where(and(eq(cardPayouts.clubId, a.clubId), eq(cardPayouts.id, payout.id))).run();
  tx.insert(reconciliationMatches).values({ clubId: a.clubId, bankLineId: line.id, journalLineId: bankJournalLineOf(tx, a.clubId, entryId), kind, createdEntryId: entryId, matchedById: a.userId }).run();
}

/** Posts each payout's transfer into the bank in one batch; returns the match rows for them. */
function receivePayouts(tx: DbLike, a: Actor, received: { line: BankLineRow; payout: PayoutItem }[]): (typeof reconciliationMatches.$inferInsert)[] {
  if (received.length === 0) return [];
  const bank = accountId(tx, a.clubId, "bank");
  const clearing = accountId(tx, a.clubId, "card-clearing");
  const through = lockedThrough(tx, a.clubId);
  const posted = postEntries(
    tx,
    a.clubId,
    received.map(({ line, payout }) => {
      const open = firstOpenDay(line.postedOn, through);
      return {
        date: open.postOn,
        kind: "payout-received" as const,
        memo: `Card payout ${payout.payoutId} reached the bank${lockedPeriodNote(open)}`,
        lines: [{ accountId: bank, debitMinor: payout.amountMinor }, { accountId: clearing, creditMinor: payout.amountMinor }],
        sourceType: "card-payout",
        sourceId: payout.payoutId,
        reference: payout.payoutId,
        createdById: a.userId,
      };
    }),
  );
  const entryIds = posted.map((p) => p.entryId);
  const bankLineOf = new Map<string, string>();
  for (let i = 0; i < entryIds.length; i += 500) {
    for (const l of tx.select({ id: journalLines.id, entryId: journalLines.entryId }).from(journalLines).where(and(eq(journalLines.clubId, a.clubId), eq(journalLines.accountId, bank), inArray(journalLines.entryId, entryIds.slice(i, i + 500)))).all()) bankLineOf.set(l.entryId, l.id);
  }
  return received.map(({ line, payout }, i) => {
    const entryId = entryIds[i]!;
    tx.update(cardPayouts).set({ receivedEntryId: entryId }).where(and(eq(cardPayouts.clubId, a.clubId), eq(cardPayouts.id, payout.cardPayoutId))).run();
    return { clubId: a.clubId, bankLineId: line.id, journalLineId: bankLineOf.get(entryId)!, kind: "payout" as const, createdEntryId: entryId, matchedById: a.userId };
  });
}

/** Matches the statement's open lines automatically (amount, date window, reference, payouts). */
export function autoMatchStatement(tx: DbLike, a: Actor, statementId: string): { matched: number; unmatched: number } {
  const statement = tx.select().from(bankStatements).where(and(eq(bankStatements.clubId, a.clubId), eq(bankStatements.id, statementId))).get();
  if (!statement) throw new LedgerError("That statement was not found in this club.", "not-found");
  const open = tx
    .select()
    .from(bankLines)
    .where(
      and(
        eq(bankLines.clubId, a.clubId),
        eq(bankLines.statementId, statementId),
        eq(bankLines.ignored, false),
        notExists(tx.select({ one: sql`1` }).from(reconciliationMatches).where(eq(reconciliationMatches.bankLineId, bankLines.id))),
      ),
    )
    .orderBy(bankLines.lineNo)
    .all();
  // A reconciled, locked period keeps its matches as they were.
  const lockedEnd = lockedThrough(tx, a.clubId);
  if (lockedEnd) open.splice(0, open.length, ...open.filter((l) => l.postedOn > lockedEnd));
  const book = unmatchedBookLines(tx, a.clubId, addDays(statement.periodEnd, LATE_BOOKING_DAYS));
  const payouts = openPayouts(tx, a.clubId);
  const items: BookItem[] = [
    ...book.map((b) => ({ id: b.id, date: b.date, amountMinor: b.amountMinor, reference: b.reference ?? undefined, kind: b.kind })),
    ...payoutBookItems(tx, a.clubId, payouts),
  ];
  const result = autoMatch(open.map((l) => ({ id: l.id, date: l.postedOn, amountMinor: l.amountMinor, description: l.description, reference: l.reference ?? undefined })), items);
  const byPayoutId = new Map(payouts.map((p) => [p.payoutId, p]));
  const itemById = new Map(items.map((i) => [String(i.id), i]));
  const through = lockedEnd;
  const lineRows: (typeof reconciliationMatches.$inferInsert)[] = [];
  const received: { line: BankLineRow; payout: PayoutItem }[] = [];
  for (const m of result.matches) {
    const line = open[m.bankIndex]!;
    if (m.kind === "payout") {
      const payoutId = itemById.get(String(m.bookIds[0]))?.payoutId;
      const payout = payoutId ? byPayoutId.get(payoutId) : undefined;
      if (payout && (!through || line.postedOn > through)) received.push({ line, payout });
      continue;
    }
    for (const id of m.bookIds) lineRows.push({ clubId: a.clubId, bankLineId: line.id, journalLineId: String(id).slice("line:".length), kind: m.kind, matchedById: a.userId });
  }
  lineRows.push(...receivePayouts(tx, a, received));
  for (let i = 0; i < lineRows.length; i += 200) tx.insert(reconciliationMatches).values(lineRows.slice(i, i + 200)).run();
  const matched = result.matches.length;
  return { matched, unmatched: open.length - matched };
}

export type PeriodReport = ReconciliationSummary & {
  periodStart: IsoDate;
  periodEnd: IsoDate;
  depositsInTransit: BookLineItem[];
  outstandingCheques: BookLineItem[];
  bankItemsNotInBooks: { id: string; date: IsoDate; amountMinor: number; description: string }[];
};

/** The reconciliation of the bank account at the statement's closing date. */
export function periodReport(tx: DbLike, clubId: string, statementId: string): PeriodReport {
  const st = tx.select().from(bankStatements).where(and(eq(bankStatements.clubId, clubId), eq(bankStatements.id, statementId))).get();
  if (!st) throw new LedgerError("That statement was not found in this club.", "not-found");
  const end = st.periodEnd;
  const bank = accountId(tx, clubId, "bank");
  const book = tx
    .select({ journalLineId: journalLines.id, entryId: journalEntries.id, date: journalEntries.entryDate, memo: journalEntries.memo, reference: journalEntries.reference, kind: journalEntries.kind, debit: journalLines.debitMinor, credit: journalLines.creditMinor, clearedOn: bankLines.postedOn })
    .from(journalLines)
    .innerJoin(journalEntries, eq(journalEntries.id, journalLines.entryId))
    .leftJoin(reconciliationMatches, eq(reconciliationMatches.journalLineId, journalLines.id))
    .leftJoin(bankLines, eq(bankLines.id, reconciliationMatches.bankLineId))
    .where(and(eq(journalLines.clubId, clubId), eq(journalLines.accountId, bank), lte(journalEntries.entryDate, end)))
    .all();
  let bookBalance = 0;
  const uncleared: BookLineItem[] = [];
  for (const b of book) {
    const amount = b.debit - b.credit;
    bookBalance += amount;
    // The opening balance is the agreed starting point with the bank, not an item to clear.
    if (b.kind !== "opening" && (!b.clearedOn || b.clearedOn > end)) uncleared.push({ id: `line:${b.journalLineId}`, journalLineId: b.journalLineId, entryId: b.entryId, date: b.date, amountMinor: amount, memo: b.memo, reference: b.reference, kind: b.kind });
  }
  const lines = tx
    .select({ id: bankLines.id, date: bankLines.postedOn, amountMinor: bankLines.amountMinor, description: bankLines.description, bookedOn: journalEntries.entryDate })
    .from(bankLines)
    .leftJoin(reconciliationMatches, eq(reconciliationMatches.bankLineId, bankLines.id))
    .leftJoin(journalLines, eq(journalLines.id, reconciliationMatches.journalLineId))
    .leftJoin(journalEntries, eq(journalEntries.id, journalLines.entryId))
    .where(and(eq(bankLines.clubId, clubId), eq(bankLines.ignored, false), lte(bankLines.postedOn, end)))
    .all();
  const inBooks = new Set(lines.filter((l) => l.bookedOn && l.bookedOn <= end).map((l) => l.id));
  const seen = new Set<string>();
  const notInBooks = lines.filter((l) => !inBooks.has(l.id) && !seen.has(l.id) && seen.add(l.id)).map(({ id, date, amountMinor, description }) => ({ id, date, amountMinor, description }));
  const depositsInTransit = uncleared.filter((u) => u.amountMinor > 0);
  const outstandingCheques = uncleared.filter((u) => u.amountMinor < 0);
  const summary = reconciliationSummary({
    statementBalanceMinor: st.closingBalanceMinor,
    bookBalanceMinor: bookBalance,
    depositsInTransit,
    outstandingCheques,
    bankChargesNotInBooks: notInBooks.filter((l) => l.amountMinor < 0),
    bankCreditsNotInBooks: notInBooks.filter((l) => l.amountMinor > 0),
  });
  return { ...summary, periodStart: st.periodStart, periodEnd: end, depositsInTransit, outstandingCheques, bankItemsNotInBooks: notInBooks };
}
