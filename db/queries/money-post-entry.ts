import "server-only";
import { and, eq, inArray, max } from "drizzle-orm";
import { clubs, journalEntries, journalLines, ledgerAccounts, reconciliationPeriods, yearCloses, type EntryKind } from "@/db/schema";
import { newId } from "@/db/schema/columns";
import { MAX_CALENDAR_YEAR, MIN_CALENDAR_YEAR, isIsoDateInRange, type IsoDate } from "@/lib/dates";
import { assertBalanced, reversalOf } from "@/lib/money";
import { firstOpenDay, type OpenPostingDate } from "@/lib/money/open-period";
import type { DbLike } from "./money-accounts";
import { LedgerError, PeriodLockedError } from "@/lib/money/errors";

export type PostLine = { accountId: string; debitMinor?: number; creditMinor?: number; memo?: string };

export type PostEntryInput = {
  date: IsoDate;
  kind: EntryKind;
  memo: string;
  lines: readonly PostLine[];
  memberUserId?: string | null;
  dueOn?: IsoDate | null;
  sourceType?: string;
  sourceId?: string;
  /** Posting twice with the same key posts once; the second call returns the first entry. */
  sourceKey?: string;
  reference?: string | null;
  reversesEntryId?: string;
  createdById?: string | null;
};

export type PostedEntry = { entryId: string; created: boolean };

/** The last day of the latest locked period (reconciled, or a closed year), or null when nothing is locked. */
export function lockedThrough(tx: DbLike, clubId: string): IsoDate | null {
  const row = tx
    .select({ end: max(reconciliationPeriods.periodEnd) })
    .from(reconciliationPeriods)
    .where(and(eq(reconciliationPeriods.clubId, clubId), eq(reconciliationPeriods.locked, true)))
    .get();
  const closed = tx.select({ end: max(yearCloses.closedThrough) }).from(yearCloses).where(eq(yearCloses.clubId, clubId)).get();
  const ends = [row?.end, closed?.end].filter((d): d is string => !!d).sort();
  return ends.at(-1) ?? null;
}

/**
 * The day to post money that has arrived (or left) on `date`: `date` itself, or the first open
 * day after the locked period when `date` is inside it (lib/money/open-period). Money that
 * moved is never refused because its day is locked; the entry's memo names the original day.
 */
export function openPostingDate(tx: DbLike, clubId: string, date: IsoDate): OpenPostingDate {
  return firstOpenDay(date, lockedThrough(tx, clubId));
}

/** Throws PeriodLockedError when `date` is inside a locked period. */
export function assertDateOpen(tx: DbLike, clubId: string, date: IsoDate): void {
  const through = lockedThrough(tx, clubId);
  if (through && date <= through) throw new PeriodLockedError(date, through);
}

/**
 * Posts one balanced entry in the club's currency. Refuses an unbalanced entry
 * (assertBalanced), a date inside a locked period, and accounts of another club. With a
 * sourceKey it is idempotent: a key already posted returns that entry and writes nothing.
 * Call it inside the caller's transaction.
 */
export function postEntry(tx: DbLike, clubId: string, entry: PostEntryInput): PostedEntry {
  return postEntries(tx, clubId, [entry])[0]!;
}

const chunks = <T,>(list: readonly T[], size: number): T[][] => Array.from({ length: Math.ceil(list.length / size) }, (_, i) => list.slice(i * size, i * size + size));

/**
 * postEntry for many entries at once (a billing run): the same checks, made once for the
 * batch, and multi-row inserts. All or nothing: one refused entry refuses the batch.
 */
export function postEntries(tx: DbLike, clubId: string, entries: readonly PostEntryInput[]): PostedEntry[] {
  const existing = new Map<string, string>();
  const keys = [...new Set(entries.map((e) => e.sourceKey).filter((k): k is string => !!k))];
  for (const slice of chunks(keys, 500)) {
    for (const row of tx.select({ id: journalEntries.id, key: journalEntries.sourceKey }).from(journalEntries).where(and(eq(journalEntries.clubId, clubId), inArray(journalEntries.sourceKey, slice))).all()) {
      if (row.key) existing.set(row.key, row.id);
    }
  }
  const results: PostedEntry[] = [];
  const fresh: { entry: PostEntryInput; id: string }[] = [];
  for (const entry of entries) {
    const known = entry.sourceKey ? existing.get(entry.sourceKey) : undefined;
    if (known) {
      results.push({ entryId: known, created: false });
      continue;
    }
    assertBalanced(entry.lines);
    // The journal is dated within the product's years (MIN_CALENDAR_YEAR..MAX_CALENDAR_YEAR), whoever posts.
    if (!isIsoDateInRange(entry.date)) throw new LedgerError(`"${entry.date}" is not a calendar date between ${MIN_CALENDAR_YEAR} and ${MAX_CALENDAR_YEAR}.`, "invalid", "date");
    if (entry.dueOn && !isIsoDateInRange(entry.dueOn)) throw new LedgerError(`"${entry.dueOn}" is not a calendar date between ${MIN_CALENDAR_YEAR} and ${MAX_CALENDAR_YEAR}.`, "invalid", "dueOn");
    const id = newId();
    if (entry.sourceKey) existing.set(entry.sourceKey, id);
    fresh.push({ entry, id });
    results.push({ entryId: id, created: true });
  }
  if (fresh.length === 0) return results;
  const through = lockedThrough(tx, clubId);
  // The year-end close is dated the year's last day, often after December's bank statement is
  // reconciled and locked; its own write path refuses a year already closed (closeYear).
  for (const { entry } of fresh) if (through && entry.date <= through && entry.kind !== "year-end-close") throw new PeriodLockedError(entry.date, through);
  const club = tx.select({ currency: clubs.currency }).from(clubs).where(eq(clubs.id, clubId)).get();
  if (!club) throw new LedgerError("That club was not found.", "not-found");
  const accountIds = [...new Set(fresh.flatMap(({ entry }) => entry.lines.map((l) => l.accountId)))];
  let known = 0;
  for (const slice of chunks(accountIds, 500)) known += tx.select({ id: ledgerAccounts.id }).from(ledgerAccounts).where(and(eq(ledgerAccounts.clubId, clubId), inArray(ledgerAccounts.id, slice))).all().length;
  if (known !== accountIds.length) throw new LedgerError("An account of the entry does not belong to this club.", "not-found");
  const rows = fresh.map(({ entry, id }) => ({
    id,
    clubId,
    entryDate: entry.date,
    kind: entry.kind,
    memo: entry.memo,
    currency: club.currency,
    memberUserId: entry.memberUserId ?? null,
    dueOn: entry.dueOn ?? null,
    sourceType: entry.sourceType ?? null,
    sourceId: entry.sourceId ?? null,
    sourceKey: entry.sourceKey ?? null,
    reference: entry.reference ?? null,
    reversesEntryId: entry.reversesEntryId ?? null,
    createdById: entry.createdById ?? null,
  }));
  for (const slice of chunks(rows, 50)) tx.insert(journalEntries).values(slice).run();
  const lines = fresh.flatMap(({ entry, id }) =>
    entry.lines.map((l, i) => ({ clubId, entryId: id, lineNo: i + 1, accountId: l.accountId, debitMinor: l.debitMinor ?? 0, creditMinor: l.creditMinor ?? 0, currency: club.currency, memo: l.memo ?? null })),
  );
  for (const slice of chunks(lines, 100)) tx.insert(journalLines).values(slice).run();
  return results;
}

export type ReverseOptions = { date?: IsoDate; memo?: string; createdById?: string | null; kind?: EntryKind };

/**
 * Posts the reversing entry of `entryId` (every line on the other side). Dated like the
 * original unless `date` is given; when the original sits in a locked period, pass today.
 * An entry is reversed at most once, and a reversal is never itself reversed.
 */
export function reverseEntry(tx: DbLike, clubId: string, entryId: string, opts: ReverseOptions = {}): PostedEntry {
  const original = tx.select().from(journalEntries).where(and(eq(journalEntries.clubId, clubId), eq(journalEntries.id, entryId))).get();
  if (!original) throw new LedgerError("That entry was not found in this club.", "not-found");
  if (original.reversesEntryId) throw new LedgerError("This entry is itself a reversal; post a new entry instead.", "already-reversed");
  const already = tx.select({ id: journalEntries.id }).from(journalEntries).where(and(eq(journalEntries.clubId, clubId), eq(journalEntries.reversesEntryId, entryId))).get();
  if (already) throw new LedgerError("This entry has already been reversed.", "already-reversed");
  const lines = tx.select().from(journalLines).where(and(eq(journalLines.clubId, clubId), eq(journalLines.entryId, entryId))).orderBy(journalLines.lineNo).all();
  const reversal = reversalOf(
    { id: original.id, date: original.entryDate, memo: original.memo, lines: lines.map((l) => ({ accountId: l.accountId, debitMinor: l.debitMinor, creditMinor: l.creditMinor, memo: l.memo ?? undefined })) },
    { date: opts.date, memo: opts.memo },
  );
  return postEntry(tx, clubId, {
    date: reversal.date,
    kind: opts.kind ?? "reversal",
    memo: reversal.memo ?? `Reversal of ${original.memo}`,
    lines: reversal.lines.map((l) => ({ accountId: String(l.accountId), debitMinor: l.debitMinor, creditMinor: l.creditMinor, memo: l.memo })),
    memberUserId: original.memberUserId,
    sourceType: original.sourceType ?? undefined,
    sourceId: original.sourceId ?? undefined,
    sourceKey: `reversal:${original.id}`,
    reference: original.reference,
    reversesEntryId: original.id,
    createdById: opts.createdById ?? null,
  });
}
