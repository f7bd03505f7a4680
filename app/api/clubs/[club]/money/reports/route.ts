import { NextResponse } from "next/server";
import { reportPostings } from "@/db/queries/money-reports";
import { currencyExponent, minorToDecimalString } from "@/lib/money";
import { writeCsv } from "@/lib/csv";
import { balanceSheet, balanceSheetLines, profitAndLoss } from "@/lib/money/reports";
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
 * The treasurer's reports as JSON, or as CSV with ?format=csv (needs "export"):
 * ?report=profit-and-loss&from=YYYY-MM-DD&to=YYYY-MM-DD or ?report=balance-sheet&asOf=YYYY-MM-DD.
 */
export async function GET(req: Request, { params }: { params: Promise<{ club: string }> }) {
  const { club } = await params;
  const url = new URL(req.url);
  return withClub(club, ["read", "Ledger"], (ctx) => {
    const report = url.searchParams.get("report");
    const format = url.searchParams.get("format") ?? "json";
    if (format !== "json" && format !== "csv") return apiError("invalid", "Check the query.", { format: ["format is json or csv."] });
    if (format === "csv" && !can(ctx.ability, "export", "Ledger")) return apiError("forbidden", "Only a treasurer or club admin can export the reports.");
    const exp = currencyExponent(ctx.club.currency);
    const amount = (minor: number) => minorToDecimalString(minor, exp);
    const csv = (name: string, body: string) => new Response(body, { headers: { "Content-Type": "text/csv; charset=utf-8", "Content-Disposition": `attachment; filename="${name}-${ctx.club.slug}.csv"` } });

    if (report === "profit-and-loss") {
      const parsed = reportPeriodSchema.safeParse({ from: url.searchParams.get("from") ?? undefined, to: url.searchParams.get("to") ?? undefined });
      if (!parsed.success) return apiError("invalid", "Give the period as from and to, YYYY-MM-DD.", fieldErrors(parsed.error.issues));
      const period = parsed.data;
      const pnl = profitAndLoss(reportPostings(ctx.db, ctx.club.id, { to: period.to }), period);
      if (format === "json") return NextResponse.json({ currency: ctx.club.currency, ...period, ...pnl });
      return csv(`profit-and-loss-${period.from}-${period.to}`, writeCsv(
        ["Section", "Account code", "Account", `Amount (${ctx.club.currency})`],
        [
          ...pnl.byAccount.map((l) => [l.type === "income" ? "Income" : "Expense", l.code, l.name, amount(l.amountMinor)]),
          ["Total", "", "Total income", amount(pnl.incomeMinor)],
          ["Total", "", "Total expenses", amount(pnl.expenseMinor)],
          ["Total", "", "Net (income − expenses)", amount(pnl.netMinor)],
        ],
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
      ));
    }
    return apiError("invalid", "Choose the report.", { report: ["report is profit-and-loss or balance-sheet."] });
  });
}
