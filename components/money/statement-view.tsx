import { scrollArea } from "@/components/ui/scroll-area";
import type { StatementFigures } from "@/lib/money/statement-lines";
import { DEFAULT_LOCALE } from "@/lib/money/format";
import { formatDate } from "@/lib/dates";
import { Money } from "./money-text";

/** A month's statement: brought forward, each line with the running balance, the totals. */
export function StatementView({ figures, currency, locale, title }: { figures: StatementFigures & { balanceNowMinor: number }; currency: string; locale?: string; title: string }) {
  const f = figures;
  const day = (d: string) => formatDate(d, locale ?? DEFAULT_LOCALE);
  return (
    <section className="card" aria-label={title}>
      <div className="overflow-x-auto" {...scrollArea("Statement")}>
        <table className="w-full min-w-[36rem] text-left text-sm">
          <caption className="mb-2 text-left text-ink-700">{title}: {day(f.periodStart)} to {day(f.periodEnd)}</caption>
          <thead className="bg-sand-200">
            <tr>
              <th scope="col" className="px-3 py-2">Date</th>
              <th scope="col" className="px-3 py-2">Description</th>
              <th scope="col" className="px-3 py-2 text-right">Charge</th>
              <th scope="col" className="px-3 py-2 text-right">Credit</th>
              <th scope="col" className="px-3 py-2 text-right">Balance</th>
            </tr>
          </thead>
          <tbody>
            <tr className="border-t border-sand-200">
              <td className="px-3 py-2 tabular whitespace-nowrap"><time dateTime={f.periodStart}>{day(f.periodStart)}</time></td>
              <td className="px-3 py-2">Brought forward</td>
              <td /><td />
              <td className="px-3 py-2 text-right"><Money minor={f.openingMinor} currency={currency} locale={locale} /></td>
            </tr>
            {f.lines.map((l) => (
              <tr key={l.entryId + l.balanceMinor} className="border-t border-sand-200">
                <td className="px-3 py-2 tabular whitespace-nowrap"><time dateTime={l.date}>{day(l.date)}</time></td>
                <td className="px-3 py-2">{l.memo}</td>
                <td className="px-3 py-2 text-right">{l.chargeMinor ? <Money minor={l.chargeMinor} currency={currency} locale={locale} /> : null}</td>
                <td className="px-3 py-2 text-right">{l.creditMinor ? <Money minor={l.creditMinor} currency={currency} locale={locale} /> : null}</td>
                <td className="px-3 py-2 text-right"><Money minor={l.balanceMinor} currency={currency} locale={locale} /></td>
              </tr>
            ))}
            {f.lines.length === 0 ? <tr><td colSpan={5} className="px-3 py-4 text-center text-ink-500">No charges or payments in this month.</td></tr> : null}
          </tbody>
          <tfoot>
            <tr className="border-t-2 border-sand-300 font-bold">
              <td className="px-3 py-2" colSpan={2}>This month</td>
              <td className="px-3 py-2 text-right"><Money minor={f.chargesMinor} currency={currency} locale={locale} /></td>
              <td className="px-3 py-2 text-right"><Money minor={f.creditsMinor} currency={currency} locale={locale} /></td>
              <td className="px-3 py-2 text-right"><Money minor={f.closingMinor} currency={currency} locale={locale} /></td>
            </tr>
          </tfoot>
        </table>
      </div>
      <p className="mt-3 text-sm text-ink-700">Balance today: <strong><Money minor={f.balanceNowMinor} currency={currency} locale={locale} /></strong>. A positive balance is owed to the club.</p>
    </section>
  );
}
