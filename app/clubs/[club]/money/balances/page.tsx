import type { Metadata } from "next";
import { Suspense } from "react";
import { ActionForm } from "@/components/money/action-form";
import { DataTable } from "@/components/money/data-table";
import { MoneyNav } from "@/components/money/money-nav";
import { PageHeader } from "@/components/ui/page-header";
import { listMemberBalances } from "@/db/queries/money-member-accounts";
import { recordManualPayment } from "@/lib/actions/money/record-manual-payment";
import { clubToday } from "@/lib/money/settings";
import { can } from "@/permissions";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Member balances" };

export default async function BalancesPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club, ability } = await authorizePage(slug, ["read", "Account", "all"]);
  const today = clubToday(club);
  const members = listMemberBalances(db, club.id, today);
  const rows = members.map((m) => ({ ...m, href: `/clubs/${club.slug}/money/members/${m.userId}`, arrearsWord: m.inArrears ? "Overdue" : "Up to date" }));
  return (
    <>
      <PageHeader title="Member balances" lead={`Positive balances are owed to the club. "Overdue" means a charge is still unpaid more than ${club.settings.lateFeeAfterDays} days after it fell due.`} />
      <MoneyNav slug={club.slug} ability={ability} current={`/clubs/${club.slug}/money/balances`} />
      <Suspense fallback={<div className="h-64 animate-pulse rounded bg-sand-200" />}>
        <DataTable
          label="Member balances"
          csvName={`balances-${club.slug}-${today}`}
          currency={club.currency} locale={club.locale}
          rows={rows}
          filter={{ key: "arrearsWord", label: "Standing", options: [{ value: "Overdue", label: "Overdue" }, { value: "Up to date", label: "Up to date" }] }}
          columns={[
            { key: "name", header: "Member", kind: "link", hrefKey: "href" },
            { key: "plan", header: "Dues plan" },
            { key: "balanceMinor", header: "Balance", kind: "money" },
            { key: "overdueMinor", header: "Overdue", kind: "money" },
            { key: "oldestDueDate", header: "Oldest due", kind: "date" },
            { key: "inArrears", header: "Standing", kind: "flag" },
          ]}
        />
      </Suspense>
      {can(ability, "create", "Payment") ? (
        <section className="card mt-8 max-w-2xl" aria-labelledby="manual-h">
          <h2 id="manual-h" className="mb-1 text-lg font-bold">Record a cheque, cash or bank transfer</h2>
          <p className="mb-3 text-sm text-ink-700">Posted to the bank account and the member&apos;s account; the member gets a receipt by e-mail.</p>
          <ActionForm
            action={recordManualPayment}
            slug={club.slug}
            label="Record a payment"
            submitLabel="Record payment"
            grid
            fields={[
              { name: "memberUserId", label: "Member", type: "select", options: members.map((m) => ({ value: m.userId, label: m.name })) },
              { name: "method", label: "Paid by", type: "select", options: [{ value: "cheque", label: "Cheque" }, { value: "transfer", label: "Bank transfer" }, { value: "cash", label: "Cash (banked)" }] },
              { name: "amount", label: `Amount (${club.currency})`, inputMode: "decimal", placeholder: "120.00" },
              { name: "receivedOn", label: "Received on", type: "date", defaultValue: today },
              { name: "reference", label: "Cheque number or reference (optional)" },
            ]}
          />
        </section>
      ) : null}
    </>
  );
}
