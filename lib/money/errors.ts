// Refusals of the ledger. Actions turn them into field messages (lib/actions/money/ledger-errors.ts);
// anything else calling the ledger (the flight sheet) can test `instanceof LedgerError`.

export type LedgerErrorCode = "locked" | "not-member" | "not-found" | "currency" | "invalid" | "already-reversed";

export class LedgerError extends Error {
  constructor(
    message: string,
    readonly code: LedgerErrorCode,
    /** The input field the refusal is about, when there is one ("date", "amount", …). */
    readonly field?: string,
  ) {
    super(message);
    this.name = "LedgerError";
  }
}

/** The entry's date falls on or before the end of a reconciled, locked period. */
export class PeriodLockedError extends LedgerError {
  constructor(
    readonly date: string,
    readonly lockedThrough: string,
  ) {
    super(`The books are locked through ${lockedThrough} (a reconciled period); ${date} cannot be posted. Date the correction after ${lockedThrough}.`, "locked", "date");
    this.name = "PeriodLockedError";
  }
}

export function isLedgerError(error: unknown): error is LedgerError {
  return error instanceof LedgerError;
}
