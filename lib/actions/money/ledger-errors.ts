import { ActionError } from "@/lib/actions/action-state";
import { isLedgerError } from "@/lib/money/errors";

/** Runs ledger work; a refusal by the ledger becomes the action's message (and field error). */
export function ledger<T>(work: () => T): T {
  try {
    return work();
  } catch (error) {
    if (!isLedgerError(error)) throw error;
    const code = error.code === "not-found" ? "not_found" : error.code === "locked" || error.code === "already-reversed" ? "conflict" : "invalid";
    throw new ActionError(error.message, error.field ? { [error.field]: [error.message] } : {}, code);
  }
}
