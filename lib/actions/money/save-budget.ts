"use server";
import { budgetAccounts, saveBudgetCells, type BudgetChange } from "@/db/queries/money-budget";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { toMinorUnits } from "@/lib/money";
import { writeAudit } from "@/lib/server/audit";
import { BUDGET_CELL, saveBudgetSchema } from "@/lib/validation/money";

const AMOUNT = /^\d{1,9}(\.\d{1,2})?$/;

// The treasurer's budget for a year: one amount per income or expense account per month, typed
// in the grid (blank or 0 clears a cell). Every cell is checked first; one bad cell saves nothing.
export const saveBudgetAction = clubAction({
  schema: saveBudgetSchema,
  permission: ["create", "Ledger"],
  success: "Budget saved.",
  run(tx, { club, user }, input) {
    const accounts = new Set(budgetAccounts(tx, club.id).map((a) => a.code));
    const changes: BudgetChange[] = [];
    const errors: Record<string, string[]> = {};
    for (const [name, raw] of Object.entries(input)) {
      if (name === "year" || name === "club" || typeof raw !== "string") continue;
      const cell = BUDGET_CELL.exec(name);
      if (!cell) continue;
      const [, code, mm] = cell as unknown as [string, string, string];
      if (!accounts.has(code)) {
        errors[name] = [`"${code}" is not an income or expense account of this club.`];
        continue;
      }
      const typed = raw.trim().replace(/,/g, "");
      if (typed === "") {
        changes.push({ accountCode: code, month: `${input.year}-${mm}`, amountMinor: null });
        continue;
      }
      if (!AMOUNT.test(typed)) {
        errors[name] = [`Enter ${code} for ${input.year}-${mm} as an amount, like 250 or 250.00 (blank for none).`];
        continue;
      }
      try {
        changes.push({ accountCode: code, month: `${input.year}-${mm}`, amountMinor: toMinorUnits(typed, club.currency) });
      } catch {
        errors[name] = [`That amount does not fit ${club.currency}.`];
      }
    }
    const bad = Object.keys(errors).length;
    if (bad) throw new ActionError(`${bad} cell${bad === 1 ? "" : "s"} need${bad === 1 ? "s" : ""} attention; nothing was saved.`, errors);
    const changed = saveBudgetCells(tx, club, user.id, changes);
    if (changed) writeAudit(tx, { clubId: club.id, actorId: user.id, action: "money.budget.save", subjectType: "Budget", subjectId: String(input.year), after: { year: input.year, changed } });
    return { message: changed ? `Budget for ${input.year} saved: ${changed} month${changed === 1 ? "" : "s"} changed.` : `Budget for ${input.year}: nothing changed.`, data: { changed }, refresh: changed > 0 };
  },
});
