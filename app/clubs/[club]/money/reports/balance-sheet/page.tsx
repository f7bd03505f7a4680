import type { Metadata } from "next";
import { dayText } from "@/components/ui/day";
import { MoneyNav } from "@/components/money/money-nav";
import { ExportLinks, PeriodPicker, ReportTable, ReportTabs } from "@/components/money/report-views";
import { PageHeader } from "@/components/ui/page-header";
import { reportPostings } from "@/db/queries/money-reports";
import { clubToday } from "@/lib/money/settings";
import { reportPresets } from "@/lib/money/report-periods";
import { balanceSheet, balanceSheetLines } from "@/lib/money/reports";
import { formatMoney } from "@/lib/money";
import { authorizePage } from "@/lib/server/authorize";
import { reportAsOfSchema } from "@/lib/validation/money";
import { can } from "@/permissions";

export const metadata: Metadata = { title: "Balance sheet" };

export default async function BalanceSheetPage({ params, searchParams }: { params: Promise<{ club: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { club: slug } = await params;
  const { db, club, ability } = await authorizePage(slug, ["read", "Ledger"]);
  const query = await searchParams;
  const today = clubToday(club);
  const parsed = reportAsOfSchema.safeParse({ asOf: query.asOf ?? today });
  const asOf = parsed.success ? parsed.data.asOf : today;
  const errors = query.asOf !== undefined && !parsed.success ? parsed.error.issues.map((i) => i.message) : [];
  const postings = reportPostings(db, club.id, { to: asOf });
  const sheet = balanceSheet(postings, asOf);
  const lines = balanceSheetLines(postings, asOf);
  const base = `/clubs/${club.slug}/money/reports/balance-sheet`;
  const csvHref = `/api/clubs/${club.slug}/money/reports?report=balance-sheet&asOf=${asOf}&format=csv`;
  const pdfHref = csvHref.replace("format=csv", "format=pdf");
  return (
    <>
      <PageHeader
        title="Balance sheet"
        lead={`What the club owns and owes at the end of ${dayText(asOf, club.locale)}. Equity includes the net income not yet closed into retained funds.`}
        actions={can(ability, "export", "Ledger") ? <ExportLinks csvHref={csvHref} pdfHref={pdfHref} /> : null}
      />
      <MoneyNav slug={club.slug} ability={ability} current={`/clubs/${club.slug}/money/reports/profit-and-loss`} />
      <ReportTabs slug={club.slug} current="balance-sheet" />
      <PeriodPicker
        errors={errors}
        fields={[{ name: "asOf", label: "At the end of", value: asOf }]}
        presets={reportPresets(today).map((p) => ({ label: `End of ${p.label.toLowerCase()}`, href: `${base}?asOf=${p.to}` }))}
      />
      <p role="status" className={`mb-4 max-w-2xl rounded px-3 py-2 text-sm font-bold ${sheet.balanced ? "bg-go-100 text-go-800" : "bg-stop-100 text-stop-800"}`}>
        <span aria-hidden="true">{sheet.balanced ? "✓ " : "▲ "}</span>
        {sheet.balanced
          ? `Balanced: assets ${formatMoney(sheet.assetsMinor, club.currency, club.locale)} = liabilities ${formatMoney(sheet.liabilitiesMinor, club.currency, club.locale)} + equity ${formatMoney(sheet.equityMinor, club.currency, club.locale)}.`
          : `Not balanced: assets ${formatMoney(sheet.assetsMinor, club.currency, club.locale)} differ from liabilities + equity by ${formatMoney(sheet.assetsMinor - sheet.liabilitiesMinor - sheet.equityMinor, club.currency, club.locale)}. Check the journal for an unbalanced entry.`}
      </p>
      <ReportTable
        caption={`Balance sheet at ${dayText(asOf, club.locale)}`}
        lines={lines}
        currency={club.currency} locale={club.locale}
        groups={["asset", "liability", "equity"]}
        totals={[
          { label: "Total assets", minor: sheet.assetsMinor, strong: true },
          { label: "Total liabilities", minor: sheet.liabilitiesMinor },
          { label: "Total equity", minor: sheet.equityMinor },
          { label: "Liabilities and equity", minor: sheet.liabilitiesMinor + sheet.equityMinor, strong: true },
        ]}
      />
    </>
  );
}
