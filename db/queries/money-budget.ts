import "server-only";
import { and, asc, eq, inArray, isNull, like } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { budgets, ledgerAccounts } from "@/db/schema";
import type { BudgetAccount, BudgetCell } from "@/lib/money/budget";

// The club's budget: one amount per income or expense account per month. The comparison with
// actuals is pure (lib/money/budget.ts); this file reads and writes the cells.

/** Income and expense accounts of the chart (members' accounts are never budgeted), income first. */
export function budgetAccounts(db: Db | Tx, clubId: string): BudgetAccount[] {
  return db
    .select({ code: ledgerAccounts.code, name: ledgerAccounts.name, type: ledgerAccounts.type })
    .from(ledgerAccounts)
    .where(and(eq(ledgerAccounts.clubId, clubId), isNull(ledgerAccounts.memberUserId), inArray(ledgerAccounts.type, ["income", "expense"])))
    .orderBy(asc(ledgerAccounts.type), asc(ledgerAccounts.code))
    .all()
    .map((a) => ({ code: a.code, name: a.name, type: a.type as BudgetAccount["type"] }))
    .sort((a, b) => (a.type === b.type ? a.code.localeCompare(b.code) : a.type === "income" ? -1 : 1));
}

export function budgetCells(db: Db | Tx, clubId: string, year: number): BudgetCell[] {
  return db
    .select({ accountCode: budgets.accountCode, month: budgets.month, amountMinor: budgets.amountMinor })
    .from(budgets)
    .where(and(eq(budgets.clubId, clubId), like(budgets.month, `${year}-%`)))
    .all();
}

export type BudgetChange = { accountCode: string; month: string; amountMinor: number | null };

/**
 * Writes the changed cells of a year's budget (null or 0 clears a cell). Returns how many cells
 * changed; a cell given the amount it already has is not a change.
 */
export function saveBudgetCells(tx: Tx, club: { id: string; currency: string }, userId: string, changes: readonly BudgetChange[]): number {
  const now = new Date();
  let changed = 0;
  for (const c of changes) {
    const where = and(eq(budgets.clubId, club.id), eq(budgets.accountCode, c.accountCode), eq(budgets.month, c.month));
    const existing = tx.select({ amountMinor: budgets.amountMinor }).from(budgets).where(where).get();
    if (!c.amountMinor) {
      if (existing) changed += tx.delete(budgets).where(where).run().changes;
      continue;
    }
    if (existing?.amountMinor === c.amountMinor) continue;
    tx.insert(budgets)
      .values({ clubId: club.id, accountCode: c.accountCode, month: c.month, amountMinor: c.amountMinor, currency: club.currency, updatedById: userId })
      .onConflictDoUpdate({ target: [budgets.clubId, budgets.accountCode, budgets.month], set: { amountMinor: c.amountMinor, updatedById: userId, updatedAt: now } })
      .run();
    changed++;
  }
  return changed;
}
