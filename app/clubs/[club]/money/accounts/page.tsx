import type { Metadata } from "next";
import { ActionButton, ActionForm } from "@/components/money/action-form";
import { MoneyNav } from "@/components/money/money-nav";
import { PageHeader } from "@/components/ui/page-header";
import { listChart } from "@/db/queries/money-chart";
import { createChartAccountAction } from "@/lib/actions/money/create-chart-account";
import { deleteChartAccountAction } from "@/lib/actions/money/delete-chart-account";
import { updateChartAccountAction } from "@/lib/actions/money/update-chart-account";
import { authorizePage } from "@/lib/server/authorize";
import { can } from "@/permissions";

export const metadata: Metadata = { title: "Chart of accounts" };

const TYPE_OPTIONS = [
  { value: "expense", label: "Expense" },
  { value: "income", label: "Income" },
  { value: "asset", label: "Asset" },
  { value: "liability", label: "Liability" },
  { value: "equity", label: "Equity" },
];
const TYPE_WORDS: Record<string, string> = { asset: "Assets", liability: "Liabilities", equity: "Equity", income: "Income", expense: "Expenses" };

export default async function ChartPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club, ability } = await authorizePage(slug, ["read", "Ledger"]);
  const canEdit = can(ability, "create", "Ledger");
  const chart = listChart(db, club.id);
  const parentOptions = [{ value: "", label: "None (top level)" }, ...chart.filter((a) => a.code !== "member-receivables").map((a) => ({ value: a.code, label: `${a.code} · ${a.name}` }))];
  return (
    <>
      <PageHeader title="Chart of accounts" lead="The accounts the club's books are kept in. Accounts with postings keep their code and type and cannot be deleted; the application's own accounts (bank, member receivables and the like) can only be renamed." />
      <MoneyNav slug={club.slug} ability={ability} current={`/clubs/${club.slug}/money/accounts`} />
      {(["asset", "liability", "equity", "income", "expense"] as const).map((type) => (
        <section key={type} className="mb-6" aria-labelledby={`t-${type}`}>
          <h2 id={`t-${type}`} className="mb-2 text-lg font-bold">{TYPE_WORDS[type]}</h2>
          <ul className="grid gap-2">
            {chart.filter((a) => a.type === type).map((a) => (
              <li key={a.id} className="card py-2">
                <div className="flex flex-wrap items-baseline justify-between gap-2">
                  <span>
                    <span className="font-mono text-ink-500">{a.code}</span> · <span className="font-bold">{a.name}</span>
                    {a.parentCode ? <span className="text-sm text-ink-700"> · under {a.parentCode}</span> : null}
                  </span>
                  <span className="text-sm text-ink-700">
                    {a.system ? <><span aria-hidden="true">◆ </span>Used by the application · </> : null}
                    {a.inUse ? <><span aria-hidden="true">■ </span>In use: {a.lineCount} postings</> : <><span aria-hidden="true">□ </span>No postings</>}
                  </span>
                </div>
                {canEdit ? (
                  <details className="mt-1">
                    <summary className="cursor-pointer text-sm font-bold text-fin-600">Edit {a.code}…</summary>
                    <div className="mt-2 max-w-2xl">
                      <ActionForm
                        action={updateChartAccountAction}
                        slug={club.slug}
                        label={`Edit account ${a.code}`}
                        submitLabel="Save account"
                        grid
                        hidden={{ accountId: a.id }}
                        fields={[
                          { name: "code", label: "Code", defaultValue: a.code, hint: a.system || a.inUse ? "Fixed: the account has postings or is used by the application." : undefined },
                          { name: "name", label: "Name", defaultValue: a.name },
                          { name: "type", label: "Type", type: "select", options: TYPE_OPTIONS, defaultValue: a.type },
                          { name: "parentCode", label: "Under (parent)", type: "select", options: parentOptions.filter((o) => o.value !== a.code), defaultValue: a.parentCode ?? "" },
                        ]}
                      />
                      {!a.system && !a.inUse ? (
                        <ActionButton action={deleteChartAccountAction} slug={club.slug} hidden={{ accountId: a.id }} label={`Delete ${a.code}`} variant="danger" confirm={`Delete the account ${a.code} · ${a.name}?`} />
                      ) : null}
                    </div>
                  </details>
                ) : null}
              </li>
            ))}
          </ul>
        </section>
      ))}
      {canEdit ? (
        <section className="card max-w-2xl" aria-labelledby="new-acct-h">
          <h2 id="new-acct-h" className="mb-3 text-lg font-bold">Add an account</h2>
          <ActionForm
            action={createChartAccountAction}
            slug={club.slug}
            label="Add an account"
            submitLabel="Add account"
            grid
            fields={[
              { name: "code", label: "Code", placeholder: "annual-inspection", hint: "Lower-case letters, digits and hyphens." },
              { name: "name", label: "Name", placeholder: "Annual inspection" },
              { name: "type", label: "Type", type: "select", options: TYPE_OPTIONS },
              { name: "parentCode", label: "Under (parent)", type: "select", options: parentOptions },
            ]}
          />
        </section>
      ) : null}
    </>
  );
}
