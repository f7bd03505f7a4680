// The accounts every club starts with. Codes are our own; a club may add more. Member
// receivables are one sub-account per member under "member-receivables".

export type AccountType = "asset" | "liability" | "equity" | "income" | "expense";

export type ChartAccount = { code: string; name: string; type: AccountType };

export const DEFAULT_CHART: readonly ChartAccount[] = [
  { code: "bank", name: "Bank", type: "asset" },
  { code: "card-clearing", name: "Card clearing", type: "asset" },
  { code: "member-receivables", name: "Member receivables", type: "asset" },
  { code: "dues-income", name: "Dues income", type: "income" },
  { code: "flight-income", name: "Flight income", type: "income" },
  { code: "late-fee-income", name: "Late fees", type: "income" },
  { code: "fuel-credits", name: "Fuel credits", type: "expense" },
  { code: "processor-fees", name: "Card processing fees", type: "expense" },
  { code: "bank-fees", name: "Bank fees", type: "expense" },
  { code: "refunds", name: "Refunds", type: "expense" },
  { code: "member-credits", name: "Member prepayments", type: "liability" },
  { code: "retained-funds", name: "Retained funds", type: "equity" },
];

/** The codes the application posts to itself: never deleted, re-coded or re-typed. */
export const SYSTEM_ACCOUNT_CODES: ReadonlySet<string> = new Set(DEFAULT_CHART.map((a) => a.code));

/**
 * The categories a flying club keeps books in, given to a club with its first chart (the
 * treasurer may rename, regroup or delete them while unused, and add more). Common practice for
 * a small non-profit flying club; codes are our own.
 */
export const FLYING_CLUB_CHART: readonly ChartAccount[] = [
  { code: "aircraft-insurance", name: "Aircraft insurance", type: "expense" },
  { code: "hangar-tie-down", name: "Hangar and tie-down", type: "expense" },
  { code: "fuel-oil", name: "Fuel and oil", type: "expense" },
  { code: "maintenance", name: "Maintenance and inspections", type: "expense" },
  { code: "engine-reserve", name: "Engine reserve (set aside per hour)", type: "expense" },
  { code: "loan-interest", name: "Loan interest", type: "expense" },
  { code: "instruction-income", name: "Instruction", type: "income" },
  { code: "interest-income", name: "Bank interest", type: "income" },
  { code: "other-income", name: "Other income", type: "income" },
  { code: "bills-payable", name: "Bills to pay", type: "liability" },
  { code: "aircraft-loan", name: "Aircraft loan", type: "liability" },
  { code: "engine-reserve-fund", name: "Engine overhaul reserve", type: "liability" },
];

export type ChartAccountRow = ChartAccount & { parentCode: string | null };

export type ChartChange = {
  code: string;
  name: string;
  type: AccountType;
  parentCode: string | null;
};

const CODE = /^[a-z0-9][a-z0-9-]{1,39}$/;

/**
 * Why an account may not be created or changed as asked, per field, or null when it may.
 * `existing` is the account being edited (null for a new one); `inUse` says it has journal
 * lines. Rules: a code is lower-case letters, digits and hyphens, unique in the club; the
 * application's own accounts keep their code and type; an account in use keeps its code and
 * type (its history was posted under them); a parent is another account of the same type,
 * never the account itself or one of its own sub-accounts, and never a member's account.
 */
export function chartChangeProblems(
  change: ChartChange,
  existing: (ChartAccountRow & { inUse: boolean }) | null,
  chart: readonly ChartAccountRow[],
): Record<string, string[]> | null {
  const problems: Record<string, string[]> = {};
  const add = (field: string, message: string) => (problems[field] ??= []).push(message);
  if (!CODE.test(change.code)) add("code", "Use 2 to 40 lower-case letters, digits and hyphens, starting with a letter or digit (for example fuel-oil).");
  if (change.name.trim().length < 2 || change.name.length > 80) add("name", "Give the account a name of 2 to 80 characters.");
  const clash = chart.find((a) => a.code === change.code && a.code !== existing?.code);
  if (clash) add("code", `The code "${change.code}" is already used by "${clash.name}".`);
  if (existing) {
    const system = SYSTEM_ACCOUNT_CODES.has(existing.code);
    if (change.code !== existing.code && (system || existing.inUse)) add("code", system ? "This account is used by the application; its code cannot change." : "This account has postings; its code cannot change.");
    if (change.type !== existing.type && (system || existing.inUse)) add("type", system ? "This account is used by the application; its type cannot change." : "This account has postings; its type cannot change.");
  }
  if (change.parentCode) {
    const parent = chart.find((a) => a.code === change.parentCode);
    if (!parent) add("parentCode", "Choose a parent account from the chart, or none.");
    else if (parent.code === "member-receivables") add("parentCode", "Only members' own accounts sit under member receivables.");
    else if (parent.type !== change.type) add("parentCode", `A ${change.type} account can only sit under another ${change.type} account.`);
    else if (parent.code === existing?.code || parent.code === change.code) add("parentCode", "An account cannot be its own parent.");
    else if (existing && isBelow(parent.code, existing.code, chart)) add("parentCode", "That account is below this one; choose another parent.");
  }
  return Object.keys(problems).length ? problems : null;
}

function isBelow(code: string, ancestor: string, chart: readonly ChartAccountRow[]): boolean {
  let at = chart.find((a) => a.code === code);
  for (let hops = 0; at && hops < 50; hops++) {
    if (at.parentCode === ancestor) return true;
    at = at.parentCode ? chart.find((a) => a.code === at!.parentCode) : undefined;
  }
  return false;
}

/** Why an account may not be deleted, or null when it may. */
export function chartDeleteProblem(account: ChartAccountRow & { inUse: boolean }, chart: readonly ChartAccountRow[]): string | null {
  if (SYSTEM_ACCOUNT_CODES.has(account.code)) return "This account is used by the application and cannot be deleted.";
  if (account.inUse) return "This account has postings and cannot be deleted; rename it instead.";
  if (chart.some((a) => a.parentCode === account.code)) return "Other accounts sit under this one; move them first.";
  return null;
}

/** The side on which an account's balance normally sits (assets and expenses grow as debits). */
export function normalSideOf(type: AccountType): "debit" | "credit" {
  return type === "asset" || type === "expense" ? "debit" : "credit";
}

/** A debit-positive balance shown the way the account's owner reads it (income as positive). */
export function presentBalance(debitPositiveMinor: number, type: AccountType): number {
  const shown = normalSideOf(type) === "debit" ? debitPositiveMinor : -debitPositiveMinor;
  return shown === 0 ? 0 : shown;
}
