import { NextResponse } from "next/server";
import { journalLinesForExport, listJournal } from "@/db/queries/money-ledger";
import { minorToDecimalString, currencyExponent } from "@/lib/money";
import { writeCsv } from "@/lib/csv";
import { apiError, withClub } from "@/lib/server/api";
import { isoDateField } from "@/lib/validation/money";
import { can } from "@/permissions";

export const dynamic = "force-dynamic";

/** The club's journal as JSON, or every line as CSV with ?format=csv (needs "export"). */
export async function GET(req: Request, { params }: { params: Promise<{ club: string }> }) {
  const { club } = await params;
  const url = new URL(req.url);
  return withClub(club, ["read", "Ledger"], (ctx) => {
    const range: { from?: string; to?: string } = {};
    for (const key of ["from", "to"] as const) {
      const v = url.searchParams.get(key);
      if (!v) continue;
      const parsed = isoDateField(key === "from" ? "the first date" : "the last date").safeParse(v);
      if (!parsed.success) return apiError("invalid", "Dates are YYYY-MM-DD.", { [key]: parsed.error.issues.map((i) => i.message) });
      range[key] = parsed.data;
    }
    const format = url.searchParams.get("format") ?? "json";
    if (format !== "json" && format !== "csv") return apiError("invalid", "Check the query.", { format: ["format is json or csv."] });
    if (format !== "csv") return NextResponse.json({ currency: ctx.club.currency, entries: listJournal(ctx.db, ctx.club.id, range) });
    if (!can(ctx.ability, "export", "Ledger")) return apiError("forbidden", "Only a treasurer or club admin can export the journal.");
    const exp = currencyExponent(ctx.club.currency);
    const rows = journalLinesForExport(ctx.db, ctx.club.id, range);
    const csv = writeCsv(
      ["Date", "Entry", "Kind", "Memo", "Reference", "Account code", "Account", "Debit", "Credit", "Currency"],
      rows.map((r) => [{ day: r.date }, r.entryId, r.kind, r.memo, r.reference ?? "", r.accountCode, r.account, r.debitMinor ? { decimal: minorToDecimalString(r.debitMinor, exp) } : "", r.creditMinor ? { decimal: minorToDecimalString(r.creditMinor, exp) } : "", r.currency]),
      { locale: ctx.club.locale },
    );
    return new Response(csv, { headers: { "Content-Type": "text/csv; charset=utf-8", "Content-Disposition": `attachment; filename="journal-${ctx.club.slug}.csv"` } });
  });
}
