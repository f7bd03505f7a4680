import type { PeriodReport } from "@/db/queries/money-reconcile-match";
import { formatMoney } from "@/lib/money";
import { Day } from "@/components/ui/day";

type Report = Pick<PeriodReport, "statementBalanceMinor" | "bookBalanceMinor" | "depositsInTransitMinor" | "outstandingChequesMinor" | "bankChargesMinor" | "bankCreditsMinor" | "adjustedBankBalanceMinor" | "adjustedBookBalanceMinor" | "differenceMinor" | "agrees" | "periodEnd" | "depositsInTransit" | "outstandingCheques" | "bankItemsNotInBooks">;

function Row({ label, minor, currency, locale, strong = false }: { label: string; minor: number; currency: string; locale?: string; strong?: boolean }) {
  return (
    <div className={`flex justify-between gap-3 py-1 ${strong ? "border-t border-sand-300 font-bold" : ""}`}>
      <dt>{label}</dt>
      <dd className="font-mono tabular">{formatMoney(minor, currency, locale)}</dd>
    </div>
  );
}

/**
 * The bank reconciliation at the statement's last day (standard accounting practice):
 * statement + deposits in transit − outstanding cheques = book + bank credits − bank charges.
 */
export function PeriodReportPanel({ report: r, currency, locale }: { report: Report; currency: string; locale?: string }) {
  return (
    <section className="card" aria-labelledby="report-h">
      <h2 id="report-h" className="mb-2 text-lg font-bold">Reconciliation at <Day date={r.periodEnd} locale={locale} /></h2>
      <dl className="text-sm">
        <Row label="Balance on the statement" minor={r.statementBalanceMinor} currency={currency} locale={locale} />
        <Row label="+ Deposits in transit" minor={r.depositsInTransitMinor} currency={currency} locale={locale} />
        <Row label="− Outstanding cheques" minor={r.outstandingChequesMinor} currency={currency} locale={locale} />
        <Row label="Adjusted bank balance" minor={r.adjustedBankBalanceMinor} currency={currency} locale={locale} strong />
      </dl>
      <dl className="mt-3 text-sm">
        <Row label="Bank account in the books" minor={r.bookBalanceMinor} currency={currency} locale={locale} />
        <Row label="+ Bank credits not in the books" minor={r.bankCreditsMinor} currency={currency} locale={locale} />
        <Row label="− Bank charges not in the books" minor={r.bankChargesMinor} currency={currency} locale={locale} />
        <Row label="Adjusted book balance" minor={r.adjustedBookBalanceMinor} currency={currency} locale={locale} strong />
      </dl>
      <p role="status" className={`mt-3 rounded px-3 py-2 text-sm font-bold ${r.agrees ? "bg-go-100 text-go-800" : "bg-stop-100 text-stop-800"}`}>
        <span aria-hidden="true">{r.agrees ? "✓ " : "▲ "}</span>
        {r.agrees ? "The two sides agree." : `Difference: ${formatMoney(r.differenceMinor, currency, locale)}`}
      </p>
      {[
        { title: "Deposits in transit", items: r.depositsInTransit.map((d) => ({ id: d.id, date: d.date, text: d.memo, amount: d.amountMinor })) },
        { title: "Outstanding cheques", items: r.outstandingCheques.map((d) => ({ id: d.id, date: d.date, text: d.memo, amount: d.amountMinor })) },
        { title: "On the statement, not in the books", items: r.bankItemsNotInBooks.map((d) => ({ id: d.id, date: d.date, text: d.description, amount: d.amountMinor })) },
      ].map((group) =>
        group.items.length ? (
          <div key={group.title} className="mt-3">
            <h3 className="text-sm font-bold">{group.title}</h3>
            <ul className="text-sm text-ink-700">
              {group.items.map((i) => <li key={i.id} className="flex justify-between gap-2"><span className="min-w-0 break-words">{i.date} · {i.text}</span><span className="font-mono tabular">{formatMoney(i.amount, currency, locale)}</span></li>)}
            </ul>
          </div>
        ) : null,
      )}
    </section>
  );
}
