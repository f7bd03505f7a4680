import { daysBetween } from "@/lib/dates";
import { DayIndex } from "./match-index";
import type { BankLine } from "./types";

export type MatchBankLine = BankLine & { id?: string | number };

/**
 * A transaction in the club's books as it should reach the bank: amountMinor has the bank's
 * sign (deposits positive; cheques, refunds and fees negative). A card payment carries the
 * payoutId of the provider payout that delivers it and the fee the provider keeps from it.
 */
export type BookItem = {
  id: string | number;
  date: string;
  amountMinor: number;
  reference?: string;
  kind?: "payment" | "payout" | "cheque" | "fee" | "deposit" | "transfer" | "refund" | (string & {});
  payoutId?: string;
  feeMinor?: number;
};

export type MatchKind = "exact" | "reference" | "payout";

export type Match = { bankIndex: number; bankLineId?: string | number; bookIds: (string | number)[]; kind: MatchKind };

export type AutoMatchOptions = {
  /** Days either side of the book date for a match on amount alone (default 3). */
  windowDays?: number;
  /** Days either side when the references agree too (default 60: a cheque clears weeks after it is written). */
  referenceWindowDays?: number;
  /** Days a payout may arrive after its last card payment (default 10). */
  payoutWindowDays?: number;
};

export type AutoMatchResult = {
  matches: Match[];
  /** Indexes into bankLines, ascending. */
  unmatchedBank: number[];
  /** Ids of book items in their input order. */
  unmatchedBook: (string | number)[];
};

type Group = { payoutId: string; members: number[]; netMinor: number; lastDay: number };

const EPOCH = "1970-01-01";

/** Cheque "001042" and "1042" are the same cheque; case and spacing never matter. */
export function normalizeReference(reference: string | undefined): string | undefined {
  const r = reference?.trim().replace(/\s+/g, " ").toUpperCase();
  if (!r) return undefined;
  return /^\d+$/.test(r) ? r.replace(/^0+(?=\d)/, "") : r;
}

function buildGroups(book: readonly BookItem[], days: number[]): Map<string, Group> {
  const groups = new Map<string, Group>();
  book.forEach((item, i) => {
    if (item.payoutId === undefined || item.kind === "payout") return;
    const g = groups.get(item.payoutId) ?? { payoutId: item.payoutId, members: [], netMinor: 0, lastDay: -Infinity };
    g.members.push(i);
    g.netMinor += item.amountMinor - (item.feeMinor ?? 0);
    g.lastDay = Math.max(g.lastDay, days[i] ?? 0);
    groups.set(item.payoutId, g);
  });
  return groups;
}

/**
 * Proposes matches between statement lines and book items, one-to-one, in three passes over
 * the bank lines in date order (then input order), so the same input always gives the same
 * answer:
 * 1. reference: same amount and the same reference (normalized), nearest date within
 *    referenceWindowDays; a bank reference equal to a payoutId takes that payout's payments.
 *    A matching reference beats a nearer date.
 * 2. exact: same amount, nearest book date within ±windowDays (ties: the earlier book date).
 * 3. payout: one bank line ↔ all card payments of one payoutId, when Σ(amount − fee) equals
 *    the line (payouts arrive net of fees), from windowDays before the last payment to
 *    payoutWindowDays after it.
 * Items with a payoutId (other than kind "payout") only ever match as their whole group.
 * Candidates are indexed by amount and day (no bank line is compared with every book item).
 */
export function autoMatch(
  bankLines: readonly MatchBankLine[],
  bookItems: readonly BookItem[],
  options: AutoMatchOptions = {},
): AutoMatchResult {
  const windowDays = options.windowDays ?? 3;
  const referenceWindow = options.referenceWindowDays ?? 60;
  const payoutWindow = options.payoutWindowDays ?? 10;
  const dayCache = new Map<string, number>();
  const dayOf = (date: string) => {
    // Statements repeat a few dozen dates thousands of times: read each one once.
    let day = dayCache.get(date);
    if (day === undefined) dayCache.set(date, (day = daysBetween(EPOCH, date)));
    return day;
  };
  const bankDays = bankLines.map((l) => dayOf(l.date));
  const bookDays = bookItems.map((b) => dayOf(b.date));
  const bookUsed = new Uint8Array(bookItems.length);
  const bankMatch: (Match | undefined)[] = new Array(bankLines.length);
  const groups = buildGroups(bookItems, bookDays);
  const groupList = [...groups.values()];
  const groupUsed = new Uint8Array(groupList.length);

  const singles = new DayIndex((i) => bookUsed[i] === 0);
  const byReference = new Map<string, number[]>();
  bookItems.forEach((item, i) => {
    if (item.payoutId !== undefined && item.kind !== "payout") return;
    singles.add(item.amountMinor, bookDays[i] ?? 0, i);
    const ref = normalizeReference(item.reference);
    if (ref === undefined) return;
    const key = `${item.amountMinor}|${ref}`;
    const list = byReference.get(key);
    if (list) list.push(i);
    else byReference.set(key, [i]);
  });
  const payouts = new DayIndex((g) => groupUsed[g] === 0);
  const groupByPayoutId = new Map<string, number>();
  groupList.forEach((g, gi) => {
    payouts.add(g.netMinor, g.lastDay, gi);
    const ref = normalizeReference(g.payoutId);
    if (ref !== undefined && !groupByPayoutId.has(ref)) groupByPayoutId.set(ref, gi);
  });

  const order = bankLines.map((_, i) => i).sort((a, b) => (bankDays[a] ?? 0) - (bankDays[b] ?? 0) || a - b);
  const record = (bankIndex: number, bookIndexes: number[], kind: MatchKind) => {
    for (const i of bookIndexes) bookUsed[i] = 1;
    const id = bankLines[bankIndex]?.id;
    const bookIds = bookIndexes.map((i) => bookItems[i]?.id as string | number);
    bankMatch[bankIndex] = id === undefined ? { bankIndex, bookIds, kind } : { bankIndex, bankLineId: id, bookIds, kind };
  };
  const takeGroup = (bankIndex: number, gi: number, kind: MatchKind) => {
    groupUsed[gi] = 1;
    record(bankIndex, groupList[gi]?.members ?? [], kind);
  };

  for (const bi of order) {
    const line = bankLines[bi] as MatchBankLine;
    const day = bankDays[bi] ?? 0;
    const ref = normalizeReference(line.reference);
    if (ref === undefined) continue;
    let best: number | undefined;
    let bestGap = Infinity;
    for (const i of byReference.get(`${line.amountMinor}|${ref}`) ?? []) {
      const gap = Math.abs((bookDays[i] ?? 0) - day);
      if (bookUsed[i] === 0 && gap <= referenceWindow && gap < bestGap) [best, bestGap] = [i, gap];
    }
    if (best !== undefined) {
      record(bi, [best], "reference");
      continue;
    }
    const gi = groupByPayoutId.get(ref);
    const g = gi === undefined ? undefined : groupList[gi];
    if (gi !== undefined && g && groupUsed[gi] === 0 && g.netMinor === line.amountMinor) {
      if (Math.abs(g.lastDay - day) <= referenceWindow) takeGroup(bi, gi, "payout");
    }
  }
  for (const bi of order) {
    if (bankMatch[bi]) continue;
    const amount = bankLines[bi]?.amountMinor ?? 0;
    const i = singles.nearest(amount, bankDays[bi] ?? 0, windowDays, windowDays);
    if (i !== undefined) record(bi, [i], "exact");
  }
  for (const bi of order) {
    if (bankMatch[bi]) continue;
    const amount = bankLines[bi]?.amountMinor ?? 0;
    const gi = payouts.nearest(amount, bankDays[bi] ?? 0, payoutWindow, windowDays);
    if (gi !== undefined) takeGroup(bi, gi, "payout");
  }

  const matches = bankMatch.filter((m): m is Match => m !== undefined);
  return {
    matches,
    unmatchedBank: bankLines.map((_, i) => i).filter((i) => !bankMatch[i]),
    unmatchedBook: bookItems.filter((_, i) => bookUsed[i] === 0).map((b) => b.id),
  };
}
