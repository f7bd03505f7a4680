import type { IsoDate } from "@/lib/dates";

/** One movement on a member's account, debit-positive (a charge > 0, a payment or credit < 0). */
export type AccountMovement = {
  entryId: string;
  date: IsoDate;
  amountMinor: number;
  /** When a charge falls due; a charge without one is due on its date. */
  dueOn?: IsoDate | null;
  /** A credit that undoes a particular charge (a reversal) settles that charge first. */
  appliesToEntryId?: string | null;
};

export type OpenItem = { entryId: string; date: IsoDate; dueDate: IsoDate; originalMinor: number; openMinor: number };

export type OpenItems = { items: OpenItem[]; unappliedCreditMinor: number; balanceMinor: number };

/**
 * Which charges are still unpaid: credits settle the oldest charge first (by due date, then
 * date), a reversal settles the charge it reverses, and a credit larger than what is owed
 * waits for the next charge. Σ open − unapplied credit always equals the balance.
 */
export function openItemsOf(movements: readonly AccountMovement[]): OpenItems {
  const sorted = [...movements].sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0));
  const open: OpenItem[] = [];
  const byId = new Map<string, OpenItem>();
  let credit = 0;
  let balance = 0;
  const settle = (amount: number): number => {
    let left = amount;
    open.sort((a, b) => (a.dueDate < b.dueDate ? -1 : a.dueDate > b.dueDate ? 1 : a.date < b.date ? -1 : a.date > b.date ? 1 : 0));
    for (const item of open) {
      if (left === 0) break;
      const take = Math.min(item.openMinor, left);
      item.openMinor -= take;
      left -= take;
    }
    return left;
  };
  for (const m of sorted) {
    if (!Number.isSafeInteger(m.amountMinor)) throw new RangeError(`amountMinor must be whole minor units, got ${m.amountMinor}`);
    balance += m.amountMinor;
    if (m.amountMinor > 0) {
      const item: OpenItem = { entryId: m.entryId, date: m.date, dueDate: m.dueOn ?? m.date, originalMinor: m.amountMinor, openMinor: m.amountMinor };
      const used = Math.min(credit, item.openMinor);
      item.openMinor -= used;
      credit -= used;
      open.push(item);
      byId.set(item.entryId, item);
    } else if (m.amountMinor < 0) {
      let left = -m.amountMinor;
      const target = m.appliesToEntryId ? byId.get(m.appliesToEntryId) : undefined;
      if (target) {
        const take = Math.min(target.openMinor, left);
        target.openMinor -= take;
        left -= take;
      }
      credit += settle(left);
    }
  }
  return { items: open.filter((i) => i.openMinor > 0), unappliedCreditMinor: credit, balanceMinor: balance };
}

/** The oldest due date among unpaid charges, for the arrears check. */
export function oldestOpenDueDate(items: OpenItems): IsoDate | null {
  let oldest: IsoDate | null = null;
  for (const i of items.items) if (oldest === null || i.dueDate < oldest) oldest = i.dueDate;
  return oldest;
}
