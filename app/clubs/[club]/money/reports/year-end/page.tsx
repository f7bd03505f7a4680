import type { Metadata } from "next";
import { Day } from "@/components/ui/day";
import Link from "next/link";
import { ActionForm } from "@/components/money/action-form";
import { MoneyNav } from "@/components/money/money-nav";
import { Money } from "@/components/money/money-text";
import { ReportTabs } from "@/components/money/report-views";
import { PageHeader } from "@/components/ui/page-header";
import { listYearCloses, previewYearClose } from "@/db/queries/money-year-end";
import { closeYearAction } from "@/lib/actions/money/close-year";
import { clubToday } from "@/lib/money/settings";
import { authorizePage } from "@/lib/server/authorize";
import { can } from "@/permissions";

export const metadata: Metadata = { title: "Year-end close" };

export default async function YearEndPage({ params, searchParams }: { params: Promise<{ club: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { club: slug } = await params;
  const { db, club, ability } = await authorizePage(slug, ["read", "Ledger"]);
  const query = await searchParams;
  const today = clubToday(club);
  const closes = listYearCloses(db, club.id);
  const lastYear = Number(today.slice(0, 4)) - 1;
  const asked = Number(Array.isArray(query.year) ? query.year[0] : query.year);
  const year = Number.isInteger(asked) && asked >= 1900 && asked <= 2200 ? asked : lastYear;
  const preview = previewYearClose(db, club.id, year, today);
  const closed = closes.find((c) => c.year === year);
  const base = `/clubs/${club.slug}/money/reports/year-end`;
  const canClose = can(ability, "create", "Ledger");
  return (
    <>
      <PageHeader
        title="Year-end close"
        lead="After a year ends, its income and expense accounts are closed into retained funds by one entry dated 31 December, and the year is locked: nothing can be dated on or before that day again. The balance sheet does not change."
      />
      <MoneyNav slug={club.slug} ability={ability} current={`/clubs/${club.slug}/money/reports/profit-and-loss`} />
      <ReportTabs slug={club.slug} current="year-end" />
      <section aria-labelledby="closed-h" className="mb-6">
        <h2 id="closed-h" className="mb-2 text-lg font-bold">Closed years</h2>
        {closes.length === 0 ? (
          <p className="text-ink-700">No year has been closed yet.</p>
        ) : (
          <ul className="grid max-w-2xl gap-2">
            {closes.map((c) => (
              <li key={c.id} className="card flex flex-wrap items-baseline justify-between gap-2">
                <span><span aria-hidden="true">■ </span><span className="font-bold">{c.year}</span> closed through {c.closedThrough} by {c.closedBy}</span>
                <span className="text-sm">{c.netIncomeMinor >= 0 ? "Surplus" : "Deficit"} <Money minor={Math.abs(c.netIncomeMinor)} currency={club.currency} locale={club.locale} /></span>
              </li>
            ))}
          </ul>
        )}
      </section>
      <section aria-labelledby="preview-h" className="card mb-6 max-w-2xl">
        <h2 id="preview-h" className="mb-1 text-lg font-bold">{closed ? `${year} (closed)` : `Closing ${year}`}</h2>
        <p className="mb-3 flex flex-wrap gap-3 text-sm">
          <Link href={`${base}?year=${year - 1}`}>‹ {year - 1}</Link>
          <Link href={`${base}?year=${year + 1}`}>{year + 1} ›</Link>
        </p>
        {closed ? (
          <p className="text-sm text-ink-700">This year was closed; its entry is in the journal on {closed.closedThrough}. Its profit and loss is shown without the closing entry.</p>
        ) : (
          <>
            <table className="mb-3 w-full text-sm">
              <caption className="mb-1 text-left font-bold">The closing entry, dated <Day date={preview.date} locale={club.locale} /></caption>
              <thead>
                <tr className="text-left text-ink-700"><th scope="col">Account</th><th scope="col" className="text-right">Debit</th><th scope="col" className="text-right">Credit</th></tr>
              </thead>
              <tbody>
                {preview.lines.length === 0 ? (
                  <tr><td colSpan={3} className="py-1 text-ink-500">No income or expense to close; closing only locks the year.</td></tr>
                ) : (
                  preview.lines.map((l) => (
                    <tr key={l.accountCode} className="border-t border-sand-200">
                      <td className="py-1">{l.accountName}</td>
                      <td className="py-1 text-right">{l.debitMinor ? <Money minor={l.debitMinor} currency={club.currency} locale={club.locale} /> : null}</td>
                      <td className="py-1 text-right">{l.creditMinor ? <Money minor={l.creditMinor} currency={club.currency} locale={club.locale} /> : null}</td>
                    </tr>
                  ))
                )}
              </tbody>
            </table>
            <p className="mb-3 text-sm font-bold">{preview.netIncomeMinor >= 0 ? "Surplus" : "Deficit"} moved into retained funds: <Money minor={Math.abs(preview.netIncomeMinor)} currency={club.currency} locale={club.locale} /></p>
            {preview.problem ? <p className="mb-3 text-sm text-ink-700"><span aria-hidden="true">▲ </span>{preview.problem}</p> : null}
            {canClose && !preview.problem ? (
              <ActionForm action={closeYearAction} slug={club.slug} label={`Close ${year}`} submitLabel={`Close ${year} and lock it`} pendingText="Closing…" hidden={{ year: String(year) }} fields={[]} />
            ) : null}
            {!canClose ? <p className="text-sm text-ink-700">Only a treasurer closes the year.</p> : null}
          </>
        )}
      </section>
    </>
  );
}
