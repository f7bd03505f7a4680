import { NextResponse } from "next/server";
import { reportPostings } from "@/db/queries/money-reports";
import { currencyExponent, minorToDecimalString } from "@/lib/money";
import { writeCsv } from "@/lib/csv";
import { paperSizeFor } from "@/lib/money/locale";
import { balanceSheet, balanceSheetLines, profitAndLoss } from "@/lib/money/reports";
import { clubToday } from "@/lib/money/settings";
import { renderReportPdf } from "@/lib/pdf/report-pdf";
import { apiError, withClub } from "@/lib/server/api";
import { reportAsOfSchema, reportPeriodSchema } from "@/lib/validation/money";
import { can } from "@/permissions";

export const dynamic = "force-dynamic";

const fieldErrors = (issues: { path: PropertyKey[]; message: string }[]) => {
  const out: Record<string, string[]> = {};
  for (const i of issues) (out[String(i.path[0] ?? "_form")] ??= []).push(i.message);
  return out;
};

/**
 * The treasurer's reports as JSON, or as CSV (?format=csv) or PDF (?format=pdf), both needing "export":
 * ?report=profit-and-loss&from=YYYY-MM-DD&to=YYYY-MM-DD or ?report=balance-sheet&asOf=YYYY-MM-DD.
 */
export async function GET(req: Request, { params }: { params: Promise<{ club: string }> }) {
  const { club } = await params;
  const url = new URL(req.url);
  return withClub(club, ["read", "Ledger"], async (ctx) => {
    const report = url.searchParams.get("report");
    const format = url.searchParams.get("format") ?? "json";
    if (format !== "json" && format !== "csv" && format !== "pdf") return apiError("invalid", "Check the query.", { format: ["format is json, csv or pdf."] });
    if (format !== "json" && !can(ctx.ability, "export", "Ledger")) return apiError("forbidden", "Only a treasurer or club admin can export the reports.");
    const exp = currencyExponent(ctx.club.currency);
    const amount = (minor: number) => ({ decimal: minorToDecimalString(minor, exp) });
    const csv = (name: string, body: string) => new Response(body, { headers: { "Content-Type": "text/csv; charset=utf-8", "Content-Disposition": `attachment; filename="${name}-${ctx.club.slug}.csv"` } });
    const pdf = async (name: string, render: Promise<Buffer>) =>
      new Response(new Uint8Array(await render), { headers: { "Content-Type": "application/pdf", "Content-Disposition": `attachment; filename="${name}-${ctx.club.slug}.pdf"`, "Cache-Control": "private, no-store" } });
    const paper = paperSizeFor(ctx.club.locale);
    const printed = clubToday(ctx.club);

    if (report === "profit-and-loss") {
      const parsed = reportPeriodSchema.safeParse({ from: url.searchParams.get("from") ?? undefined, to: url.searchParams.get("to") ?? undefined });
      if (!parsed.success) return apiError("invalid", "Give the period as from and to, YYYY-MM-DD.", fieldErrors(parsed.error.issues));
      const period = parsed.data;
      const pnl = profitAndLoss(reportPostings(ctx.db, ctx.club.id, { to: period.to, withoutYearEndClose: true }), period);
      if (format === "json") return NextResponse.json({ currency: ctx.club.currency, ...period, ...pnl });
      if (format === "pdf") {
        return pdf(`profit-and-loss-${period.from}-${period.to}`, renderReportPdf({
          clubName: ctx.club.name, title: "Profit and loss", subtitle: `${period.from} to ${period.to}, both days included`, currency: ctx.club.currency, paper, generatedOn: printed,
          sections: [
            { heading: "Income", lines: pnl.byAccount.filter((l) => l.type === "income"), empty: "No income in this period." },
            { heading: "Expenses", lines: pnl.byAccount.filter((l) => l.type === "expense"), empty: "No expenses in this period." },
          ],
          totals: [
            { label: "Total income", minor: pnl.incomeMinor },
            { label: "Total expenses", minor: pnl.expenseMinor },
            { label: pnl.netMinor >= 0 ? "Surplus for the period" : "Deficit for the period", minor: pnl.netMinor, strong: true },
          ],
          note: "Member charges count as income when charged, not when paid. A closed year is shown without its closing entry.",
        }));
      }
      return csv(`profit-and-loss-${period.from}-${period.to}`, writeCsv(
        ["Section", "Account code", "Account", `Amount (${ctx.club.currency})`],
        [
          ...pnl.byAccount.map((l) => [l.type === "income" ? "Income" : "Expense", l.code, l.name, amount(l.amountMinor)]),
          ["Total", "", "Total income", amount(pnl.incomeMinor)],
          ["Total", "", "Total expenses", amount(pnl.expenseMinor)],
          ["Total", "", "Net (income − expenses)", amount(pnl.netMinor)],
        ],
        { locale: ctx.club.locale },
      ));
    }
    if (report === "balance-sheet") {
      const parsed = reportAsOfSchema.safeParse({ asOf: url.searchParams.get("asOf") ?? undefined });
      if (!parsed.success) return apiError("invalid", "Give the day as asOf, YYYY-MM-DD.", fieldErrors(parsed.error.issues));
      const { asOf } = parsed.data;
      const postings = reportPostings(ctx.db, ctx.club.id, { to: asOf });
      const sheet = balanceSheet(postings, asOf);
      const lines = balanceSheetLines(postings, asOf);
      if (format === "json") return NextResponse.json({ currency: ctx.club.currency, asOf, ...sheet, lines });
      if (format === "pdf") {
        return pdf(`balance-sheet-${asOf}`, renderReportPdf({
          clubName: ctx.club.name, title: "Balance sheet", subtitle: `At the end of ${asOf}`, currency: ctx.club.currency, paper, generatedOn: printed,
          sections: [
            { heading: "Assets", lines: lines.filter((l) => l.type === "asset"), empty: "None." },
            { heading: "Liabilities", lines: lines.filter((l) => l.type === "liability"), empty: "None." },
            { heading: "Equity", lines: lines.filter((l) => l.type === "equity"), empty: "None." },
          ],
          totals: [
            { label: "Total assets", minor: sheet.assetsMinor, strong: true },
            { label: "Total liabilities", minor: sheet.liabilitiesMinor },
            { label: "Total equity", minor: sheet.equityMinor },
            { label: "Liabilities and equity", minor: sheet.liabilitiesMinor + sheet.equityMinor, strong: true },
          ],
          note: sheet.balanced ? "Balanced: assets = liabilities + equity. Equity includes the net income not yet closed into retained funds." : "NOT balanced: check the journal for an unbalanced entry.",
        }));
      }
      const section = { asset: "Assets", liability: "Liabilities", equity: "Equity", income: "Income", expense: "Expense" } as const;
      return csv(`balance-sheet-${asOf}`, writeCsv(
        ["Section", "Account code", "Account", `Amount (${ctx.club.currency})`],
        [
          ...lines.map((l) => [section[l.type], l.code, l.name, amount(l.amountMinor)]),
          ["Total", "", "Total assets", amount(sheet.assetsMinor)],
          ["Total", "", "Total liabilities", amount(sheet.liabilitiesMinor)],
          ["Total", "", "Total equity", amount(sheet.equityMinor)],
          ["Check", "", sheet.balanced ? "Balanced" : "NOT balanced", amount(sheet.assetsMinor - sheet.liabilitiesMinor - sheet.equityMinor)],
        ],
        { locale: ctx.club.locale },
      ));
    }
    return apiError("invalid", "Choose the report.", { report: ["report is profit-and-loss or balance-sheet."] });
  });
}
