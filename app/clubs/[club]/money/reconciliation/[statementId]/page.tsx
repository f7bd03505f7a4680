import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { MoneyNav } from "@/components/money/money-nav";
import { ReconcileWorkspace } from "@/components/money/reconcile-workspace";
import { PageHeader } from "@/components/ui/page-header";
import { getReconciliationWorkspace, type ReconciliationWorkspace } from "@/db/queries/money-reconcile";
import { can } from "@/permissions";
import { authorizePage } from "@/lib/server/authorize";

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
  return (
    <>
      <PageHeader title={`Statement ${st.periodStart} to ${st.periodEnd}`} lead={<><Link href={`/clubs/${club.slug}/money/reconciliation`}>All statements</Link> · {st.fileName} · {st.lineCount} lines{st.skippedCount ? `, ${st.skippedCount} skipped as already imported` : ""}</>} />
      <MoneyNav slug={club.slug} ability={ability} />
      {can(ability, "reconcile", "Reconciliation") ? (
        <ReconcileWorkspace slug={club.slug} currency={club.currency} locale={club.locale} initial={initial} renderedAt={Date.now()} />
      ) : (
        <p className="text-ink-700">Only a treasurer can match lines and lock the period.</p>
      )}
    </>
  );
}
