// What the club's bank would print for a month, derived from the books: every deposit and
// withdrawal on the bank account a day after it was booked, each card payout on its arrival
// date, and a monthly account fee the books do not have yet. The demo seed reconciles its
// past months with it, and the tests build the statement a treasurer would import.
import "server-only";
import { and, eq, notInArray } from "drizzle-orm";
import { cardPayouts, journalEntries, journalLines } from "@/db/schema";
import { addDays, type IsoDate } from "@/lib/dates";
import { minorToDecimalString } from "@/lib/money";
import { writeCsv } from "@/lib/csv";
import { accountId, type DbLike } from "@/db/queries/money-accounts";
import { monthRange } from "@/lib/money/months";

export type BankViewLine = { date: IsoDate; amountMinor: number; description: string; reference?: string };

export type BankView = { periodStart: IsoDate; periodEnd: IsoDate; openingMinor: number; closingMinor: number; lines: BankViewLine[] };

export type BankViewOptions = {
  /** The bank shows nothing after this day (today, for the current month). */
  through?: IsoDate;
  /** A fee the bank takes on the last day of each month. */
  monthlyFeeMinor?: number;
  /** Days between booking a deposit and the bank crediting it. */
  clearingDays?: number;
};

export function bankViewOf(tx: DbLike, clubId: string, month: string, opts: BankViewOptions = {}): BankView {
  const { start, end } = monthRange(month);
  const last = opts.through && opts.through < end ? opts.through : end;
  const bank = accountId(tx, clubId, "bank");
  const postings = tx
    .select({ date: journalEntries.entryDate, kind: journalEntries.kind, memo: journalEntries.memo, reference: journalEntries.reference, debit: journalLines.debitMinor, credit: journalLines.creditMinor })
    .from(journalLines)
    .innerJoin(journalEntries, eq(journalEntries.id, journalLines.entryId))
    .where(and(eq(journalLines.clubId, clubId), eq(journalLines.accountId, bank), notInArray(journalEntries.kind, ["payout-received", "bank-item"])))
    .all();
  let opening = 0;
  const all: BankViewLine[] = [];
  let first = start;
  for (const p of postings) {
    const amount = p.debit - p.credit;
    if (p.date < first) first = p.date;
    if (p.kind === "opening") {
      opening += amount;
      continue;
    }
    const description = amount > 0 ? `DEPOSIT ${p.memo.toUpperCase()}` : `CHEQUE PAID ${p.memo.toUpperCase()}`;
    all.push({ date: addDays(p.date, opts.clearingDays ?? 1), amountMinor: amount, description, reference: p.reference ?? undefined });
  }
  for (const po of tx.select().from(cardPayouts).where(eq(cardPayouts.clubId, clubId)).all()) {
    if (po.arrivalOn < first) first = po.arrivalOn;
    all.push({ date: po.arrivalOn, amountMinor: po.netMinor, description: "CARD PROCESSOR PAYOUT", reference: po.payoutId });
  }
  if (opts.monthlyFeeMinor) {
    for (let m = monthRange(first.slice(0, 7)); m.start <= end; m = monthRange(addDays(m.end, 1).slice(0, 7))) {
      all.push({ date: m.end, amountMinor: -opts.monthlyFeeMinor, description: "ACCOUNT MAINTENANCE FEE" });
    }
  }
  const lines: BankViewLine[] = [];
  for (const l of all) {
    if (l.date < start) opening += l.amountMinor;
    else if (l.date <= last) lines.push(l);
  }
  lines.sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : b.amountMinor - a.amountMinor));
  return { periodStart: start, periodEnd: end, openingMinor: opening, closingMinor: opening + lines.reduce((s, l) => s + l.amountMinor, 0), lines };
}

/** The view as the bank's CSV export: Date, Description, Amount (deposits positive), Reference. */
export function bankViewCsv(view: BankView, exponent = 2): string {
  return writeCsv(
    ["Date", "Description", "Amount", "Reference"],
    view.lines.map((l) => [l.date, l.description, minorToDecimalString(l.amountMinor, exponent), l.reference ?? ""]),
  );
}
