import type { IsoDate } from "@/lib/dates";

export type StatementMovement = { entryId: string; date: IsoDate; memo: string; amountMinor: number; kind?: string };

export type StatementLine = { entryId: string; date: IsoDate; memo: string; kind?: string; chargeMinor: number; creditMinor: number; balanceMinor: number };

export type StatementFigures = {
  periodStart: IsoDate;
  periodEnd: IsoDate;
  openingMinor: number;
  chargesMinor: number;
  creditsMinor: number;
  closingMinor: number;
  lines: StatementLine[];
};

/**
 * A member's statement for one period: the balance brought forward (everything dated before
 * the first day), each movement of the period in date order with the running balance, and the
 * closing balance. opening + charges − credits = closing.
 */
export function statementFigures(movements: readonly StatementMovement[], periodStart: IsoDate, periodEnd: IsoDate): StatementFigures {
  let opening = 0;
  const inPeriod: StatementMovement[] = [];
  for (const m of movements) {
    if (m.date < periodStart) opening += m.amountMinor;
    else if (m.date <= periodEnd) inPeriod.push(m);
  }
  inPeriod.sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0));
  let balance = opening;
  let charges = 0;
  let credits = 0;
  const lines = inPeriod.map((m) => {
    balance += m.amountMinor;
    const chargeMinor = m.amountMinor > 0 ? m.amountMinor : 0;
    const creditMinor = m.amountMinor < 0 ? -m.amountMinor : 0;
    charges += chargeMinor;
    credits += creditMinor;
    return { entryId: m.entryId, date: m.date, memo: m.memo, kind: m.kind, chargeMinor, creditMinor, balanceMinor: balance };
  });
  return { periodStart, periodEnd, openingMinor: opening, chargesMinor: charges, creditsMinor: credits, closingMinor: balance, lines };
}
