import { formatMoney } from "@/lib/money";

/** An amount in the club's currency, tabular; negative balances read as credits. */
export function Money({ minor, currency, locale, credit = false }: { minor: number; currency: string; locale?: string; credit?: boolean }) {
  const text = formatMoney(credit ? Math.abs(minor) : minor, currency, locale);
  return <span className="tabular font-mono whitespace-nowrap">{text}{credit && minor < 0 ? " credit" : ""}</span>;
}

/** The arrears flag: a word and a shape, never colour alone. */
export function ArrearsFlag({ inArrears }: { inArrears: boolean }) {
  if (!inArrears) return <span className="inline-flex items-center gap-1 text-ink-700"><span aria-hidden="true">○</span>Up to date</span>;
  return (
    <span className="inline-flex items-center gap-1 rounded border border-stop-600 bg-stop-100 px-1.5 font-bold text-stop-800">
      <span aria-hidden="true">▲</span>Overdue
    </span>
  );
}

export function balanceWords(minor: number): string {
  return minor > 0 ? "owed to the club" : minor < 0 ? "in your favour" : "settled";
}
