import type { Metadata } from "next";
import { dayText } from "@/components/ui/day";
import { MoneyNav } from "@/components/money/money-nav";
import { ExportLinks, PeriodPicker, ReportTable, ReportTabs } from "@/components/money/report-views";
import { PageHeader } from "@/components/ui/page-header";
import { reportPostings } from "@/db/queries/money-reports";
import { clubToday } from "@/lib/money/settings";
import { reportPresets } from "@/lib/money/report-periods";
import { profitAndLoss } from "@/lib/money/reports";
import { authorizePage } from "@/lib/server/authorize";
import { reportPeriodSchema } from "@/lib/validation/money";
import { can } from "@/permissions";

export const metadata: Metadata = { title: "Profit and loss" };

export default async function ProfitAndLossPage({ params, searchParams }: { params: Promise<{ club: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { club: slug } = await params;
  const { db, club, ability } = await authorizePage(slug, ["read", "Ledger"]);
  const query = await searchParams;
  const today = clubToday(club);
  const fallback = { from: `${today.slice(0, 4)}-01-01`, to: today };
  const asked = query.from !== undefined || query.to !== undefined;
  const parsed = reportPeriodSchema.safeParse({ from: query.from ?? fallback.from, to: query.to ?? fallback.to });
  const period = parsed.success ? parsed.data : fallback;
  const errors = asked && !parsed.success ? parsed.error.issues.map((i) => i.message) : [];
  const pnl = profitAndLoss(reportPostings(db, club.id, { to: period.to, withoutYearEndClose: true }), period);
  const base = `/clubs/${club.slug}/money/reports/profit-and-loss`;
  const csvHref = `/api/clubs/${club.slug}/money/reports?report=profit-and-loss&from=${period.from}&to=${period.to}&format=csv`;
  const pdfHref = csvHref.replace("format=csv", "format=pdf");
  return (
    <>
      <PageHeader
        title="Profit and loss"
        lead={`Income and expenses from ${dayText(period.from, club.locale)} to ${dayText(period.to, club.locale)}, both days included. Member charges count as income when charged, not when paid.`}
        actions={can(ability, "export", "Ledger") ? <ExportLinks csvHref={csvHref} pdfHref={pdfHref} /> : null}
      />
      <MoneyNav slug={club.slug} ability={ability} current={`/clubs/${club.slug}/money/reports/profit-and-loss`} />
      <ReportTabs slug={club.slug} current="profit-and-loss" />
      <PeriodPicker
        errors={errors}
        fields={[{ name: "from", label: "First day", value: period.from }, { name: "to", label: "Last day", value: period.to }]}
        presets={reportPresets(today).map((p) => ({ label: p.label, href: `${base}?from=${p.from}&to=${p.to}` }))}
      />
      <ReportTable
        caption={`Profit and loss, ${dayText(period.from, club.locale)} to ${dayText(period.to, club.locale)}`}
        lines={pnl.byAccount}
        currency={club.currency} locale={club.locale}
        groups={["income", "expense"]}
        totals={[
          { label: "Total income", minor: pnl.incomeMinor },
          { label: "Total expenses", minor: pnl.expenseMinor },
          { label: pnl.netMinor >= 0 ? "Surplus for the period" : "Deficit for the period", minor: pnl.netMinor, strong: true },
        ]}
      />
    </>
  );
}
