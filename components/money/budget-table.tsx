import { Money } from "@/components/money/money-text";
import { formatMoney } from "@/lib/money";
import type { BudgetLine, BudgetReport } from "@/lib/money/budget";

/** A variance with its word and shape, never colour alone: ▲ favourable, ▼ unfavourable, = on budget. */
export function Variance({ line, currency, locale }: { line: Pick<BudgetLine, "varianceMinor" | "variancePercent" | "favourable">; currency: string; locale?: string }) {
  const sign = line.varianceMinor > 0 ? "+" : line.varianceMinor < 0 ? "−" : "";
  const pct = line.variancePercent === null ? "no budget" : `${line.variancePercent > 0 ? "+" : line.variancePercent < 0 ? "−" : ""}${Math.abs(line.variancePercent).toFixed(1)} %`;
  const word = line.favourable === null ? "on budget" : line.favourable ? "favourable" : "unfavourable";
  const shape = line.favourable === null ? "=" : line.favourable ? "▲" : "▼";
  return (
    <span className={`whitespace-nowrap ${line.favourable === false ? "text-stop-800" : line.favourable ? "text-go-800" : "text-ink-700"}`}>
      <span className="font-mono tabular">{sign}{formatMoney(Math.abs(line.varianceMinor), currency, locale)}</span> <span className="font-mono tabular">({pct})</span>{" "}
      <span aria-hidden="true">{shape} </span>{word}
    </span>
  );
}

export function BudgetTable({ caption, report, currency, locale }: { caption: string; report: BudgetReport; currency: string; locale?: string }) {
  const groups = (["income", "expense"] as const).map((type) => ({ type, lines: report.lines.filter((l) => l.type === type) }));
  const netLine = { varianceMinor: report.net.varianceMinor, variancePercent: null, favourable: report.net.varianceMinor === 0 ? null : report.net.varianceMinor > 0 };
  return (
    <div className="mb-6 overflow-x-auto">
      <table className="w-full min-w-[40rem] max-w-4xl text-sm">
        <caption className="mb-2 text-left text-lg font-bold">{caption}</caption>
        <thead>
          <tr className="text-left text-ink-700">
            <th scope="col" className="py-1">Account</th>
            <th scope="col" className="py-1 text-right">Budget</th>
            <th scope="col" className="py-1 text-right">Actual</th>
            <th scope="col" className="py-1 pl-3">Variance</th>
          </tr>
        </thead>
        {groups.map((g) => (
          <tbody key={g.type}>
            <tr><th colSpan={4} scope="colgroup" className="pt-3 text-left">{g.type === "income" ? "Income" : "Expenses"}</th></tr>
            {g.lines.length === 0 ? (
              <tr><td colSpan={4} className="py-1 text-ink-500">No budget and nothing posted.</td></tr>
            ) : (
              g.lines.map((l) => (
                <tr key={l.code} className="border-t border-sand-200">
                  <td className="py-1">{l.name}</td>
                  <td className="py-1 text-right"><Money minor={l.budgetMinor} currency={currency} locale={locale} /></td>
                  <td className="py-1 text-right"><Money minor={l.actualMinor} currency={currency} locale={locale} /></td>
                  <td className="py-1 pl-3"><Variance line={l} currency={currency} locale={locale} /></td>
                </tr>
              ))
            )}
          </tbody>
        ))}
        <tfoot>
          <tr className="border-t border-sand-300"><td className="py-1">Total income</td><td className="py-1 text-right"><Money minor={report.income.budgetMinor} currency={currency} locale={locale} /></td><td className="py-1 text-right"><Money minor={report.income.actualMinor} currency={currency} locale={locale} /></td><td /></tr>
          <tr className="border-t border-sand-300"><td className="py-1">Total expenses</td><td className="py-1 text-right"><Money minor={report.expense.budgetMinor} currency={currency} locale={locale} /></td><td className="py-1 text-right"><Money minor={report.expense.actualMinor} currency={currency} locale={locale} /></td><td /></tr>
          <tr className="border-t border-sand-300 font-bold"><td className="py-1">Net (income − expenses)</td><td className="py-1 text-right"><Money minor={report.net.budgetMinor} currency={currency} locale={locale} /></td><td className="py-1 text-right"><Money minor={report.net.actualMinor} currency={currency} locale={locale} /></td><td className="py-1 pl-3"><Variance line={netLine} currency={currency} locale={locale} /></td></tr>
        </tfoot>
      </table>
    </div>
  );
}
