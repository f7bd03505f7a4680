// The treasurer's hand work in the reconciliation workspace: match (one bank line to one or
// several book items — a split), book a bank item the books do not have yet, set a line aside,
// undo a match, and lock the period once it agrees.
import "server-only";
import { and, eq, inArray, isNull } from "drizzle-orm";
import { bankLines, bankStatements, cardPayouts, journalLines, ledgerAccounts, reconciliationMatches, reconciliationPeriods } from "@/db/schema";
import { formatMoney } from "@/lib/money";
import { accountId, RECEIVABLES, type DbLike } from "@/db/queries/money-accounts";
import { LedgerError } from "@/lib/money/errors";
import { assertDateOpen, postEntry, reverseEntry } from "@/db/queries/money-post-entry";
import { getOpenBankLine, matchPayout, openPayouts, periodReport, unmatchedBookLines, type PeriodReport } from "./money-reconcile-match";

type Actor = { clubId: string; userId: string | null; currency: string };

/** One bank line ↔ the chosen book items ("line:<id>" postings, "payout:<id>" payouts); they must add up. */
export function matchManually(tx: DbLike, a: Actor, bankLineId: string, bookIds: readonly string[]): void {
  const line = getOpenBankLine(tx, a.clubId, bankLineId);
  assertDateOpen(tx, a.clubId, line.postedOn);
  const wanted = new Set(bookIds);
  if (wanted.size === 0) throw new LedgerError("Choose at least one item from the books.", "invalid", "bookIds");
  const lines = unmatchedBookLines(tx, a.clubId, "9999-12-31").filter((b) => wanted.has(b.id));
  const payouts = openPayouts(tx, a.clubId).filter((p) => wanted.has(p.id));
  if (lines.length + payouts.length !== wanted.size) throw new LedgerError("One of the chosen items is not open in the books any more.", "not-found", "bookIds");
  const total = lines.reduce((s, l) => s + l.amountMinor, 0) + payouts.reduce((s, p) => s + p.amountMinor, 0);
  if (total !== line.amountMinor) {
    throw new LedgerError(`The chosen items add up to ${formatMoney(total, a.currency)}, the bank line is ${formatMoney(line.amountMinor, a.currency)}.`, "invalid", "bookIds");
  }
  for (const p of payouts) matchPayout(tx, a, line, p.cardPayoutId, "manual");
  if (lines.length) {
    tx.insert(reconciliationMatches).values(lines.map((l) => ({ clubId: a.clubId, bankLineId: line.id, journalLineId: l.journalLineId, kind: "manual" as const, matchedById: a.userId }))).run();
  }
}

/**
 * Posts a bank item the books lack (a bank fee, interest, a bill paid) against the chart account
 * the treasurer chose by its code, and matches it. Nothing is booked by default: the bank
 * account itself and member receivables are refused (a member's money is matched to the
 * member, never booked blind).
 */
export function bookBankLine(tx: DbLike, a: Actor, bankLineId: string, account: string, memo: string): string {
  const line = getOpenBankLine(tx, a.clubId, bankLineId);
  const bank = accountId(tx, a.clubId, "bank");
  if (account === "bank" || account === RECEIVABLES) throw new LedgerError("Choose the account the bank item belongs to: not the bank itself, nor member receivables (match a member's payment to the member instead).", "invalid", "account");
  const chosen = tx
    .select({ id: ledgerAccounts.id })
    .from(ledgerAccounts)
    .where(and(eq(ledgerAccounts.clubId, a.clubId), eq(ledgerAccounts.code, account), isNull(ledgerAccounts.memberUserId)))
    .get();
  if (!chosen) throw new LedgerError("That account is not in the club's chart of accounts.", "not-found", "account");
  const other = chosen.id;
  const amount = Math.abs(line.amountMinor);
  const { entryId } = postEntry(tx, a.clubId, {
    date: line.postedOn,
    kind: "bank-item",
    memo: memo || line.description || "Bank item",
    lines: line.amountMinor > 0 ? [{ accountId: bank, debitMinor: amount }, { accountId: other, creditMinor: amount }] : [{ accountId: other, debitMinor: amount }, { accountId: bank, creditMinor: amount }],
    sourceType: "bank-line",
    sourceId: line.id,
    reference: line.reference,
    createdById: a.userId,
  });
  const bankLine = tx.select({ id: journalLines.id }).from(journalLines).where(and(eq(journalLines.entryId, entryId), eq(journalLines.accountId, bank))).get();
  tx.insert(reconciliationMatches).values({ clubId: a.clubId, bankLineId: line.id, journalLineId: bankLine!.id, kind: "booked", createdEntryId: entryId, matchedById: a.userId }).run();
  return entryId;
}

/** Undoes a line's match; entries the match itself posted are reversed, never deleted. */
export function undoMatch(tx: DbLike, a: Actor, bankLineId: string): number {
  const line = tx.select().from(bankLines).where(and(eq(bankLines.clubId, a.clubId), eq(bankLines.id, bankLineId))).get();
  if (!line) throw new LedgerError("That bank line was not found in this club.", "not-found", "bankLineId");
  assertDateOpen(tx, a.clubId, line.postedOn);
  const rows = tx.select().from(reconciliationMatches).where(and(eq(reconciliationMatches.clubId, a.clubId), eq(reconciliationMatches.bankLineId, line.id))).all();
  if (rows.length === 0) throw new LedgerError("That bank line is not matched.", "invalid", "bankLineId");
  tx.delete(reconciliationMatches).where(and(eq(reconciliationMatches.clubId, a.clubId), inArray(reconciliationMatches.id, rows.map((r) => r.id)))).run();
  for (const created of new Set(rows.map((r) => r.createdEntryId).filter((x): x is string => !!x))) {
    reverseEntry(tx, a.clubId, created, { date: line.postedOn, memo: "Match undone in reconciliation", createdById: a.userId });
    tx.update(cardPayouts).set({ receivedEntryId: null }).where(and(eq(cardPayouts.clubId, a.clubId), eq(cardPayouts.receivedEntryId, created))).run();
  }
  return rows.length;
}

/** Sets a line aside (a duplicate, a pair the bank netted out) or brings it back. */
export function setLineIgnored(tx: DbLike, a: Actor, bankLineId: string, ignored: boolean): void {
  const line = ignored ? getOpenBankLine(tx, a.clubId, bankLineId) : tx.select().from(bankLines).where(and(eq(bankLines.clubId, a.clubId), eq(bankLines.id, bankLineId))).get();
  if (!line) throw new LedgerError("That bank line was not found in this club.", "not-found", "bankLineId");
  assertDateOpen(tx, a.clubId, line.postedOn);
  tx.update(bankLines).set({ ignored }).where(and(eq(bankLines.clubId, a.clubId), eq(bankLines.id, line.id))).run();
}

/** Locks the statement's period when the adjusted balances agree; returns the report. */
export function lockPeriod(tx: DbLike, a: Actor, statementId: string): PeriodReport {
  const statement = tx.select().from(bankStatements).where(and(eq(bankStatements.clubId, a.clubId), eq(bankStatements.id, statementId))).get();
  if (!statement) throw new LedgerError("That statement was not found in this club.", "not-found");
  const already = tx.select({ id: reconciliationPeriods.id }).from(reconciliationPeriods).where(and(eq(reconciliationPeriods.clubId, a.clubId), eq(reconciliationPeriods.statementId, statementId))).get();
  if (already) throw new LedgerError("This period is already locked.", "locked");
  const report = periodReport(tx, a.clubId, statementId);
  if (!report.agrees) {
    throw new LedgerError(`The adjusted balances differ by ${formatMoney(report.differenceMinor, a.currency)}; match, book or set aside the remaining items first.`, "invalid");
  }
  // Bank charges and credits explain the difference, but once the period is locked they could
  // never be posted into it: they must be in the books first.
  const unbooked = report.bankItemsNotInBooks.length;
  if (unbooked > 0) {
    throw new LedgerError(`${unbooked} line${unbooked === 1 ? " is" : "s are"} on the statement but not in the books; post ${unbooked === 1 ? "it" : "them"} (or set aside) before locking.`, "invalid");
  }
  tx.insert(reconciliationPeriods)
    .values({
      clubId: a.clubId,
      statementId,
      periodStart: report.periodStart,
      periodEnd: report.periodEnd,
      statementBalanceMinor: report.statementBalanceMinor,
      bookBalanceMinor: report.bookBalanceMinor,
      depositsInTransitMinor: report.depositsInTransitMinor,
      outstandingChequesMinor: report.outstandingChequesMinor,
      bankChargesMinor: report.bankChargesMinor,
      bankCreditsMinor: report.bankCreditsMinor,
      lockedById: a.userId,
    })
    .run();
  return report;
}
