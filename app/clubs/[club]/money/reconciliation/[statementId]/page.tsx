import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { MoneyNav } from "@/components/money/money-nav";
import { ReconcileWorkspace } from "@/components/money/reconcile-workspace";
import { CorrectStatementForm, RemoveStatementForm } from "@/components/money/statement-edit";
import { PageHeader } from "@/components/ui/page-header";
import { getReconciliationWorkspace, type ReconciliationWorkspace } from "@/db/queries/money-reconcile";
import { currencyExponent as currencyExponentOf, minorToDecimalString } from "@/lib/money";
import { can } from "@/permissions";
import { authorizePage } from "@/lib/server/authorize";
import { formatDate } from "@/lib/dates";

export const metadata: Metadata = { title: "Reconcile a statement" };
export const dynamic = "force-dynamic";

export default async function StatementWorkspacePage({ params }: { params: Promise<{ club: string; statementId: string }> }) {
  const { club: slug, statementId } = await params;
  const { db, club, ability } = await authorizePage(slug, ["read", "Reconciliation"]);
  const workspace = getReconciliationWorkspace(db, club.id, statementId);
  if (!workspace) notFound();
  // The same plain JSON the live refresh fetches from the API.
  const initial = JSON.parse(JSON.stringify(workspace)) as ReconciliationWorkspace;
  const st = workspace.statement;
  const locked = workspace.period !== null || (workspace.lockedThrough !== null && workspace.lockedThrough >= st.periodStart);
  const matchedCount = workspace.lines.filter((l) => l.match).length;
  return (
    <>
      <PageHeader title={`Statement ${formatDate(st.periodStart, club.locale)} to ${formatDate(st.periodEnd, club.locale)}`} lead={<><Link href={`/clubs/${club.slug}/money/reconciliation`}>All statements</Link> · {st.fileName} · {st.lineCount} lines{st.skippedCount ? `, ${st.skippedCount} skipped as already imported` : ""}</>} />
      <MoneyNav slug={club.slug} ability={ability} />
      {can(ability, "reconcile", "Reconciliation") ? (
        <>
          <ReconcileWorkspace slug={club.slug} currency={club.currency} locale={club.locale} initial={initial} renderedAt={Date.now()} />
          <section className="card mt-8 max-w-3xl" aria-labelledby="edit-h">
            <h2 id="edit-h" className="mb-1 text-lg font-bold">Correct or remove this statement</h2>
            {locked ? (
              <p className="text-sm text-ink-700">
                <span aria-hidden="true">■ </span>This statement is in a reconciled, locked period (the books are locked through {formatDate((workspace.period?.periodEnd ?? workspace.lockedThrough)!, club.locale)}): it can no longer be corrected or removed.
              </p>
            ) : (
              <div className="grid gap-6 sm:grid-cols-2">
                <CorrectStatementForm slug={club.slug} statementId={st.id} currency={club.currency} closing={minorToDecimalString(st.closingBalanceMinor, currencyExponentOf(club.currency))} />
                <RemoveStatementForm slug={club.slug} statementId={st.id} lineCount={st.lineCount} matchedCount={matchedCount} />
              </div>
            )}
          </section>
        </>
      ) : (
        <p className="text-ink-700">Only a treasurer can match lines, lock the period, and correct or remove a statement.</p>
      )}
    </>
  );
}
