import { scrollArea } from "@/components/ui/scroll-area";
import type { Metadata } from "next";
import { Suspense } from "react";
import { ActionForm } from "@/components/money/action-form";
import { DataTable } from "@/components/money/data-table";
import { MoneyNav } from "@/components/money/money-nav";
import { Money } from "@/components/money/money-text";
import { PageHeader } from "@/components/ui/page-header";
import { listMemberBalances } from "@/db/queries/money-member-accounts";
import { accountBalances, listJournal } from "@/db/queries/money-ledger";
import { postAdjustment } from "@/lib/actions/money/post-adjustment";
import { reverseJournalEntry } from "@/lib/actions/money/reverse-entry";
import { clubToday } from "@/lib/money/settings";
import { authorizePage } from "@/lib/server/authorize";
import { ENTRY_KINDS } from "@/db/schema/money";
import { can } from "@/permissions";

export const metadata: Metadata = { title: "Journal" };

const KIND_WORDS: Record<string, string> = {
  opening: "Opening balance", dues: "Dues", "late-fee": "Late fee", flight: "Flight", adjustment: "Adjustment", "card-payment": "Card payment",
  "card-refund": "Card refund", "manual-payment": "Cheque, cash or transfer", "payout-received": "Card payout", "bank-item": "Bank item", reversal: "Reversal", bill: "Bill", "bill-payment": "Bill paid", "year-end-close": "Year-end close",
};
const NOT_HERE = new Set(["card-payment", "card-refund", "payout-received"]);

export default async function JournalPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  // Checked here, not only in the layout: an RSC request can render this page without it.
  const { db, club, ability } = await authorizePage(slug, ["read", "Ledger"]);
  const canPost = can(ability, "create", "Ledger");
  const rows = listJournal(db, club.id).map((r) => ({
    ...r,
    kindLabel: KIND_WORDS[r.kind] ?? r.kind,
    state: r.reversed ? "Reversed" : r.reversesEntryId ? "Reversal" : "Posted",
    canReverse: canPost && !r.reversed && !r.reversesEntryId && !NOT_HERE.has(r.kind),
  }));
  const balances = accountBalances(db, club.id);
  // Only the names the adjustment form's select box needs, and only for those who may post.
  const members = canPost ? listMemberBalances(db, club.id, clubToday(club)).map((m) => ({ userId: m.userId, name: m.name })) : [];
  return (
    <>
      <PageHeader
        title="Journal"
        lead="Every posting, newest first. Entries are never edited: a correction is a reversing entry."
        actions={can(ability, "export", "Ledger") ? <a className="inline-flex min-h-11 items-center rounded border border-fin-600 bg-white px-4 font-bold" href={`/api/clubs/${club.slug}/money/journal?format=csv`}>Download every line (CSV)</a> : null}
      />
      <MoneyNav slug={club.slug} ability={ability} current={`/clubs/${club.slug}/money/journal`} />
      <Suspense fallback={<div className="h-64 animate-pulse rounded bg-sand-200" />}>
        <DataTable
          label="Journal entries"
          csvName={`journal-${club.slug}`}
          currency={club.currency} locale={club.locale}
          rows={rows}
          filter={{ key: "kind", label: "Kind", options: ENTRY_KINDS.map((k) => ({ value: k, label: KIND_WORDS[k] ?? k })) }}
          columns={[
            { key: "date", header: "Date", kind: "date" },
            { key: "kindLabel", header: "Kind" },
            { key: "memo", header: "Memo" },
            { key: "member", header: "Member" },
            { key: "accounts", header: "Accounts" },
            { key: "amountMinor", header: "Entry total", kind: "money" },
            { key: "reference", header: "Reference" },
            { key: "state", header: "State" },
          ]}
          rowAction={canPost ? { action: reverseJournalEntry, slug: club.slug, label: "Reverse", idKey: "entryId", fieldName: "entryId", showKey: "canReverse", confirm: "Post a reversing entry for this posting?" } : undefined}
        />
      </Suspense>
      <div className="mt-8 grid gap-6 lg:grid-cols-2">
        <section className="card" aria-labelledby="bal-h">
          <h2 id="bal-h" className="mb-3 text-lg font-bold">Account balances</h2>
          <div className="overflow-x-auto" {...scrollArea("Journal entry")}>
            <table className="w-full text-sm">
              <thead><tr className="text-left"><th className="py-1">Account</th><th className="py-1">Type</th><th className="py-1 text-right">Balance</th></tr></thead>
              <tbody>
                {balances.map((b) => (
                  <tr key={b.code} className="border-t border-sand-200">
                    <td className="py-1">{b.name}</td>
                    <td className="py-1 capitalize text-ink-700">{b.type}</td>
                    <td className="py-1 text-right"><Money minor={b.balanceMinor} currency={club.currency} locale={club.locale} /></td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </section>
        {canPost ? (
          <section className="card" aria-labelledby="adj-h">
            <h2 id="adj-h" className="mb-3 text-lg font-bold">Charge or credit a member</h2>
            <ActionForm
              action={postAdjustment}
              slug={club.slug}
              label="Charge or credit a member"
              submitLabel="Post"
              grid
              fields={[
                { name: "memberUserId", label: "Member", type: "select", options: members.map((m) => ({ value: m.userId, label: m.name })) },
                { name: "direction", label: "Charge or credit", type: "select", options: [{ value: "charge", label: "Charge (the member owes more)" }, { value: "credit", label: "Credit (the member owes less)" }] },
                { name: "account", label: "Against account", type: "select", options: [{ value: "flight-income", label: "Flight income" }, { value: "dues-income", label: "Dues income" }, { value: "late-fee-income", label: "Late fees" }, { value: "fuel-credits", label: "Fuel credits" }, { value: "refunds", label: "Refunds" }] },
                { name: "amount", label: `Amount (${club.currency})`, inputMode: "decimal", placeholder: "95.00" },
                { name: "date", label: "Date", type: "date", defaultValue: clubToday(club) },
                { name: "memo", label: "Shown on the statement as", placeholder: "Ferry flight N0534L" },
              ]}
            />
          </section>
        ) : null}
      </div>
    </>
  );
}
