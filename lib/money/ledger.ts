// Double-entry rules. Each line moves money on one side of one account; an entry balances when
// its debits equal its credits. Posted entries are never edited: a mistake is undone by a
// reversing entry, so the journal always shows what happened and when.

export type AccountId = string | number;

export type JournalLine = {
  accountId: AccountId;
  debitMinor?: number;
  creditMinor?: number;
  memo?: string;
};

export type JournalEntry<L extends JournalLine = JournalLine> = {
  id?: string | number;
  date: string;
  memo?: string;
  lines: readonly L[];
  /** Set on a reversing entry: the entry it undoes. */
  reversesEntryId?: string | number;
};

export type LedgerProblemCode = "empty" | "invalid-amount" | "both-sides" | "no-amount" | "unbalanced";

export type LedgerProblem = {
  code: LedgerProblemCode;
  message: string;
  lineIndex?: number;
  /** Debits − credits, for "unbalanced". */
  differenceMinor?: number;
};

export class UnbalancedEntryError extends Error {
  readonly code: LedgerProblemCode;
  readonly lineIndex?: number;
  readonly differenceMinor?: number;
  constructor(problem: LedgerProblem) {
    super(problem.message);
    this.name = "UnbalancedEntryError";
    this.code = problem.code;
    if (problem.lineIndex !== undefined) this.lineIndex = problem.lineIndex;
    if (problem.differenceMinor !== undefined) this.differenceMinor = problem.differenceMinor;
  }
}

type LinesOrEntry = readonly JournalLine[] | { lines: readonly JournalLine[] };

function linesOf(input: LinesOrEntry): readonly JournalLine[] {
  return Array.isArray(input) ? input : (input as { lines: readonly JournalLine[] }).lines;
}

function validSide(value: number | undefined): boolean {
  return value === undefined || (Number.isSafeInteger(value) && value >= 0);
}

function checkLine(line: JournalLine, i: number): LedgerProblem | null {
  if (!validSide(line.debitMinor) || !validSide(line.creditMinor)) {
    return { code: "invalid-amount", lineIndex: i, message: `Line ${i + 1}: amounts must be whole minor units ≥ 0` };
  }
  const debit = line.debitMinor ?? 0;
  const credit = line.creditMinor ?? 0;
  if (debit > 0 && credit > 0) {
    return { code: "both-sides", lineIndex: i, message: `Line ${i + 1}: a line is either a debit or a credit, not both` };
  }
  if (debit === 0 && credit === 0) {
    return { code: "no-amount", lineIndex: i, message: `Line ${i + 1}: a line must move money` };
  }
  return null;
}

/** The first reason the lines cannot be posted, or null when they can. */
export function findEntryProblem(input: LinesOrEntry): LedgerProblem | null {
  const lines = linesOf(input);
  if (lines.length === 0) return { code: "empty", message: "An entry needs at least two lines" };
  for (const [i, line] of lines.entries()) {
    const problem = checkLine(line, i);
    if (problem) return problem;
  }
  const { debitMinor, creditMinor } = totalsOf(lines);
  if (debitMinor !== creditMinor) {
    const differenceMinor = debitMinor - creditMinor;
    return {
      code: "unbalanced",
      differenceMinor,
      message: `Entry does not balance: debits ${debitMinor} ≠ credits ${creditMinor} (difference ${differenceMinor})`,
    };
  }
  return null;
}

export function isBalanced(input: LinesOrEntry): boolean {
  return findEntryProblem(input) === null;
}

/** Throws UnbalancedEntryError unless the lines form a postable, balanced entry. */
export function assertBalanced(input: LinesOrEntry): void {
  const problem = findEntryProblem(input);
  if (problem) throw new UnbalancedEntryError(problem);
}

/** Debit-positive signed amount of a line. */
export function signedAmountOf(line: JournalLine): number {
  return (line.debitMinor ?? 0) - (line.creditMinor ?? 0);
}

export function totalsOf(lines: readonly JournalLine[]): { debitMinor: number; creditMinor: number } {
  let debitMinor = 0;
  let creditMinor = 0;
  for (const line of lines) {
    debitMinor += line.debitMinor ?? 0;
    creditMinor += line.creditMinor ?? 0;
  }
  return { debitMinor, creditMinor };
}

/** Debit-positive balance per account over any set of lines (one entry or a whole journal). */
export function balancesByAccount(lines: readonly JournalLine[]): Map<AccountId, number> {
  const balances = new Map<AccountId, number>();
  for (const line of lines) {
    balances.set(line.accountId, (balances.get(line.accountId) ?? 0) + signedAmountOf(line));
  }
  return balances;
}

function swapSides<L extends JournalLine>(line: L): L {
  const { debitMinor, creditMinor, ...rest } = line;
  const swapped: JournalLine = { ...rest };
  if (creditMinor) swapped.debitMinor = creditMinor;
  if (debitMinor) swapped.creditMinor = debitMinor;
  return swapped as L;
}

/**
 * The entry that undoes `entry`: every line on the opposite side, same accounts and amounts.
 * It gets no id of its own (the store assigns one) and points back at the original. `date`
 * defaults to the original's date; pass today's date when correcting a locked period.
 */
export function reversalOf<L extends JournalLine>(
  entry: JournalEntry<L>,
  overrides: { date?: string; memo?: string } = {},
): JournalEntry<L> {
  const label = entry.memo ?? (entry.id !== undefined ? `entry ${entry.id}` : "entry");
  const reversal: JournalEntry<L> = {
    date: overrides.date ?? entry.date,
    memo: overrides.memo ?? `Reversal of ${label}`,
    lines: entry.lines.map(swapSides),
  };
  if (entry.id !== undefined) reversal.reversesEntryId = entry.id;
  return reversal;
}
