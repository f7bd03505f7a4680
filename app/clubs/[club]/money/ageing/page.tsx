import type { Metadata } from "next";
import { ActionButton } from "@/components/money/action-form";
import { DataTable } from "@/components/money/data-table";
import { MoneyNav } from "@/components/money/money-nav";
import { Money } from "@/components/money/money-text";
import { PageHeader } from "@/components/ui/page-header";
import { ageingByMember } from "@/db/queries/money-member-accounts";
import { sendReminders } from "@/lib/actions/money/send-dues-reminders";
import { AGEING_BUCKETS } from "@/lib/money";
import { clubToday } from "@/lib/money/settings";
import { can } from "@/permissions";
import { authorizePage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Receivables ageing" };

export default async function AgeingPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club, ability } = await authorizePage(slug, ["read", "Account", "all"]);
  const today = clubToday(club);
  const { rows, totals } = ageingByMember(db, club.id, today);
  return (
    <>
      <PageHeader title="Receivables ageing" lead={`What members owe on ${today}, by how many days past its due date each unpaid charge is.`} actions={can(ability, "create", "Ledger") ? <ActionButton action={sendReminders} slug={club.slug} label="E-mail dues reminders" pendingText="Queueing…" /> : null} />
      <MoneyNav slug={club.slug} ability={ability} current={`/clubs/${club.slug}/money/ageing`} />
      <section aria-label="Totals by age" className="mb-6 grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-6">
        {AGEING_BUCKETS.map((b) => (
          <div key={b.key} className="card">
            <span className="block text-sm text-ink-500">{b.label}</span>
            <span className="text-lg font-bold"><Money minor={totals[b.key]} currency={club.currency} locale={club.locale} /></span>
          </div>
        ))}
        <div className="card">
          <span className="block text-sm text-ink-500">Total</span>
          <span className="text-lg font-bold"><Money minor={totals.totalMinor} currency={club.currency} locale={club.locale} /></span>
        </div>
      </section>
      <DataTable
        label="Ageing by member"
        csvName={`ageing-${club.slug}-${today}`}
        currency={club.currency} locale={club.locale}
        rows={rows.map((r) => ({ ...r, href: `/clubs/${club.slug}/money/members/${r.userId}` }))}
        columns={[
          { key: "name", header: "Member", kind: "link", hrefKey: "href" },
          ...AGEING_BUCKETS.map((b) => ({ key: b.key, header: b.label, kind: "money" as const })),
          { key: "totalMinor", header: "Total", kind: "money" },
        ]}
      />
    </>
  );
}
