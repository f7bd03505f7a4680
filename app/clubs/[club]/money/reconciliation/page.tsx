import { scrollArea } from "@/components/ui/scroll-area";
import type { Metadata } from "next";
import Link from "next/link";
import { BankImportForm } from "@/components/money/bank-import-form";
import { MoneyNav } from "@/components/money/money-nav";
import { Money } from "@/components/money/money-text";
import { PageHeader } from "@/components/ui/page-header";
import { listBankStatements } from "@/db/queries/money-reconcile";
import { lockedThrough } from "@/db/queries/money-post-entry";
import { explainDenied, can } from "@/permissions";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Bank reconciliation" };

export default async function ReconciliationPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club, ability } = await authorizePage(slug, ["read", "Reconciliation"]);
  const statements = listBankStatements(db, club.id);
  const locked = lockedThrough(db, club.id);
  const base = `/clubs/${club.slug}/money/reconciliation`;
  return (
    <>
      <PageHeader title="Bank reconciliation" lead={locked ? `The books are locked through ${locked}: nothing can be posted on or before that day.` : "No period is reconciled yet."} />
      <MoneyNav slug={club.slug} ability={ability} current={base} />
      <section aria-labelledby="st-h">
        <h2 id="st-h" className="mb-2 text-lg font-bold">Statements</h2>
        {statements.length === 0 ? <p className="text-ink-500">No bank statement imported yet.</p> : (
          <div className="overflow-x-auto rounded border border-sand-300 bg-white" {...scrollArea("Bank statements")}>
            <table className="w-full min-w-[40rem] text-left text-sm" aria-label="Bank statements">
              <thead className="bg-sand-200"><tr><th className="px-3 py-2">Period</th><th className="px-3 py-2">File</th><th className="px-3 py-2 text-right">Closing balance</th><th className="px-3 py-2">Lines matched</th><th className="px-3 py-2">State</th></tr></thead>
              <tbody>
                {statements.map((s) => (
                  <tr key={s.id} className="border-t border-sand-200">
                    <td className="px-3 py-2"><Link href={`${base}/${s.id}`}>{s.periodStart} to {s.periodEnd}</Link></td>
                    <td className="break-all px-3 py-2">{s.fileName} ({s.format.toUpperCase()})</td>
                    <td className="px-3 py-2 text-right"><Money minor={s.closingBalanceMinor} currency={club.currency} locale={club.locale} /></td>
                    <td className="px-3 py-2 tabular">{s.matchedCount} of {s.lineCount}</td>
                    <td className="px-3 py-2">{s.lockedAt ? <span><span aria-hidden="true">■ </span>Reconciled and locked</span> : <span><span aria-hidden="true">□ </span>Open</span>}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>
      <section className="card mt-8 max-w-3xl" aria-labelledby="imp-h">
        <h2 id="imp-h" className="mb-1 text-lg font-bold">Import a bank statement</h2>
        <p className="mb-3 text-sm text-ink-700">OFX files carry their own balance and period; when one holds several accounts you choose which to import. A file or line in a currency other than the club's ({club.currency}) is refused. For CSV, say which columns hold what (by header name), and enter the closing balance printed on the statement. Lines already imported are skipped, and matching runs straight away.</p>
        {can(ability, "reconcile", "Reconciliation") ? (
          <BankImportForm slug={club.slug} currency={club.currency} locale={club.locale} />
        ) : (
          <p className="text-sm text-ink-500">{explainDenied("reconcile", "Reconciliation")}</p>
        )}
      </section>
    </>
  );
}
