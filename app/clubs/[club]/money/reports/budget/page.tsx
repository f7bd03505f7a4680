import type { Metadata } from "next";
import Link from "next/link";
import { BudgetGrid } from "@/components/money/budget-grid";
import { BudgetTable } from "@/components/money/budget-table";
import { MoneyNav } from "@/components/money/money-nav";
import { ReportTabs } from "@/components/money/report-views";
import { PageHeader } from "@/components/ui/page-header";
import { budgetAccounts, budgetCells } from "@/db/queries/money-budget";
import { reportPostings } from "@/db/queries/money-reports";
import { saveBudgetAction } from "@/lib/actions/money/save-budget";
import { clubToday } from "@/lib/money/settings";
import { currencyExponent, formatMoney, minorToDecimalString } from "@/lib/money";
import { MONTH_SHORT, budgetVsActual } from "@/lib/money/budget";
import { authorizePage } from "@/lib/server/authorize";
import { can } from "@/permissions";

export const metadata: Metadata = { title: "Budget against actual" };

const one = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

export default async function BudgetPage({ params, searchParams }: { params: Promise<{ club: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { club: slug } = await params;
  const { db, club, ability } = await authorizePage(slug, ["read", "Ledger"]);
  const query = await searchParams;
  const today = clubToday(club);
  const askedYear = Number(one(query.year));
  const year = Number.isInteger(askedYear) && askedYear >= 1900 && askedYear <= 2200 ? askedYear : Number(today.slice(0, 4));
  const askedMonth = Number(one(query.month));
  const month = Number.isInteger(askedMonth) && askedMonth >= 1 && askedMonth <= 12 ? askedMonth : year === Number(today.slice(0, 4)) ? Number(today.slice(5, 7)) : 12;
  const mm = String(month).padStart(2, "0");
  const accounts = budgetAccounts(db, club.id);
  const cells = budgetCells(db, club.id, year);
  const postings = reportPostings(db, club.id, { to: `${year}-12-31`, withoutYearEndClose: true });
  const monthReport = budgetVsActual(postings, cells, accounts, { from: `${year}-${mm}`, to: `${year}-${mm}` });
  const ytdReport = budgetVsActual(postings, cells, accounts, { from: `${year}-01`, to: `${year}-${mm}` });
  const canEdit = can(ability, "create", "Ledger");
  const exp = currencyExponent(club.currency);
  const base = `/clubs/${club.slug}/money/reports/budget`;
  const monthName = `${MONTH_SHORT[month - 1]} ${year}`;
  const rows = accounts.map((a) => {
    const mine = cells.filter((c) => c.accountCode === a.code);
    const byMonth = new Map(mine.map((c) => [c.month.slice(5, 7), c.amountMinor]));
    return {
      ...a,
      cells: MONTH_SHORT.map((_, i) => {
        const v = byMonth.get(String(i + 1).padStart(2, "0"));
        return v ? minorToDecimalString(v, exp) : "";
      }),
      annual: formatMoney(mine.reduce((s, c) => s + c.amountMinor, 0), club.currency),
    };
  });
  return (
    <>
      <PageHeader title="Budget against actual" lead="Each income and expense account's budget for the month and the year so far, beside what was posted. Income above budget and expenses below it are favourable." />
      <MoneyNav slug={club.slug} ability={ability} current={`/clubs/${club.slug}/money/reports/profit-and-loss`} />
      <ReportTabs slug={club.slug} current="budget" />
      <nav aria-label="Year and month" className="card mb-6 text-sm">
        <p className="mb-2 flex flex-wrap items-center gap-3 font-bold">
          <Link href={`${base}?year=${year - 1}&month=${mm}`}>‹ {year - 1}</Link>
          <span>{year}</span>
          <Link href={`${base}?year=${year + 1}&month=${mm}`}>{year + 1} ›</Link>
        </p>
        <ul className="flex flex-wrap gap-x-3 gap-y-1">
          {MONTH_SHORT.map((m, i) => (
            <li key={m}>
              <Link href={`${base}?year=${year}&month=${String(i + 1).padStart(2, "0")}`} aria-current={i + 1 === month ? "page" : undefined} className={i + 1 === month ? "font-bold" : undefined}>{m}</Link>
            </li>
          ))}
        </ul>
      </nav>
      <BudgetTable caption={`${monthName}: budget against actual`} report={monthReport} currency={club.currency} locale={club.locale} />
      <BudgetTable caption={`Year to date, Jan to ${monthName}`} report={ytdReport} currency={club.currency} locale={club.locale} />
      <section aria-labelledby="grid-h" className="mb-8">
        <h2 id="grid-h" className="mb-2 text-lg font-bold">Budget for {year}</h2>
        {canEdit ? (
          <BudgetGrid action={saveBudgetAction} slug={club.slug} year={year} currency={club.currency} rows={rows} />
        ) : (
          <p className="text-ink-700">Only a treasurer sets the budget. Its figures are in the tables above.</p>
        )}
      </section>
    </>
  );
}
