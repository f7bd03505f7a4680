import Link from "next/link";
import { Money } from "@/components/money/money-text";
import type { ReportLine } from "@/lib/money/reports";

const TYPE_WORDS: Record<ReportLine["type"], string> = { asset: "Assets", liability: "Liabilities", equity: "Equity", income: "Income", expense: "Expenses" };

/** The two reports' tabs, the period picker's quick choices and the CSV link. */
export function ReportTabs({ slug, current }: { slug: string; current: "profit-and-loss" | "balance-sheet" | "budget" | "year-end" }) {
  const base = `/clubs/${slug}/money`;
  const tabs = [
    { key: "profit-and-loss", href: `${base}/reports/profit-and-loss`, label: "Profit and loss" },
    { key: "balance-sheet", href: `${base}/reports/balance-sheet`, label: "Balance sheet" },
    { key: "budget", href: `${base}/reports/budget`, label: "Budget against actual" },
    { key: "year-end", href: `${base}/reports/year-end`, label: "Year-end close" },
  ];
  return (
    <nav aria-label="Reports" className="mb-4 flex flex-wrap gap-x-4 gap-y-1 text-sm font-bold">
      {tabs.map((t) => <Link key={t.key} href={t.href} aria-current={current === t.key ? "page" : undefined}>{t.label}</Link>)}
    </nav>
  );
}

/** The report's downloads: the same figures as a spreadsheet (CSV) and for print (PDF). */
export function ExportLinks({ csvHref, pdfHref }: { csvHref: string; pdfHref: string }) {
  const cls = "inline-flex min-h-11 items-center rounded border border-fin-600 bg-white px-4 font-bold";
  return (
    <span className="flex flex-wrap gap-2">
      <a className={cls} href={csvHref}>Download (CSV)</a>
      <a className={cls} href={pdfHref}>Download (PDF)</a>
    </span>
  );
}

/** A plain GET form: the period (or day) is in the address, so a report can be bookmarked and exported. */
export function PeriodPicker({ fields, presets, errors }: {
  fields: { name: string; label: string; value: string }[];
  presets: { label: string; href: string }[];
  errors: string[];
}) {
  return (
    <section className="card mb-6" aria-labelledby="period-h">
      <h2 id="period-h" className="mb-2 font-bold">Period</h2>
      {errors.length ? <p role="alert" className="field-error mb-2">{errors.join(" ")}</p> : null}
      <form method="get" className="flex flex-wrap items-end gap-3" aria-label="Choose the period">
        {fields.map((f) => (
          <div key={f.name}>
            <label htmlFor={`p-${f.name}`} className="field-label">{f.label}</label>
            <input id={`p-${f.name}`} type="date" name={f.name} defaultValue={f.value} className="field-input" />
          </div>
        ))}
        <button type="submit" className="min-h-11 rounded bg-fin-600 px-4 font-bold text-white">Show</button>
      </form>
      <p className="mt-2 flex flex-wrap gap-3 text-sm">
        {presets.map((p) => <Link key={p.label} href={p.href}>{p.label}</Link>)}
      </p>
    </section>
  );
}

export function ReportTable({ caption, lines, currency, locale, groups, totals }: {
  caption: string;
  lines: ReportLine[];
  currency: string; locale?: string;
  groups: ReportLine["type"][];
  totals: { label: string; minor: number; strong?: boolean }[];
}) {
  return (
    <table className="w-full max-w-2xl text-sm">
      <caption className="mb-2 text-left text-lg font-bold">{caption}</caption>
      {groups.map((type) => {
        const rows = lines.filter((l) => l.type === type);
        return (
          <tbody key={type}>
            <tr><th colSpan={3} scope="colgroup" className="pt-3 text-left">{TYPE_WORDS[type]}</th></tr>
            {rows.length === 0 ? (
              <tr><td colSpan={3} className="py-1 text-ink-500">None in this period.</td></tr>
            ) : (
              rows.map((l) => (
                <tr key={l.code} className="border-t border-sand-200">
                  <td className="py-1 font-mono text-ink-500">{l.code}</td>
                  <td className="py-1">{l.name}</td>
                  <td className="py-1 text-right"><Money minor={l.amountMinor} currency={currency} locale={locale} /></td>
                </tr>
              ))
            )}
          </tbody>
        );
      })}
      <tfoot>
        {totals.map((t) => (
          <tr key={t.label} className={`border-t border-sand-300 ${t.strong ? "font-bold" : ""}`}>
            <td />
            <td className="py-1">{t.label}</td>
            <td className="py-1 text-right"><Money minor={t.minor} currency={currency} locale={locale} /></td>
          </tr>
        ))}
      </tfoot>
    </table>
  );
}
