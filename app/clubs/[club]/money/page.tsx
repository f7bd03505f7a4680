import type { Metadata } from "next";
import { Day } from "@/components/ui/day";
import Link from "next/link";
import { ActionButton, ActionForm } from "@/components/money/action-form";
import { MoneyNav } from "@/components/money/money-nav";
import { Money } from "@/components/money/money-text";
import { PageHeader } from "@/components/ui/page-header";
import { listMemberBalances } from "@/db/queries/money-member-accounts";
import { listBillingRuns } from "@/db/queries/money-billing";
import { accountBalances, countEntries, unbalancedEntries } from "@/db/queries/money-ledger";
import { runBilling } from "@/lib/actions/money/run-billing";
import { sendReminders } from "@/lib/actions/money/send-dues-reminders";
import { monthLabel, monthOf, shiftMonthKey } from "@/lib/money/months";
import { lockedThrough } from "@/db/queries/money-post-entry";
import { clubToday } from "@/lib/money/settings";
import { authorizePage } from "@/lib/server/authorize";
import { explainDenied, can, canAll } from "@/permissions";

export const metadata: Metadata = { title: "Money" };

export default async function MoneyOverview({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  // Checked here, not only in the layout: an RSC request can render this page without it.
  const { db, club, ability } = await authorizePage(slug, ["read", "Ledger"]);
  const today = clubToday(club);
  const balances = accountBalances(db, club.id);
  const by = (code: string) => balances.find((b) => b.code === code)?.balanceMinor ?? 0;
  const members = canAll(ability, "read", "Account") ? listMemberBalances(db, club.id, today) : [];
  const owed = members.reduce((s, m) => s + Math.max(0, m.balanceMinor), 0);
  const arrears = members.filter((m) => m.inArrears);
  const problems = unbalancedEntries(db, club.id);
  const runs = listBillingRuns(db, club.id, 6);
  const locked = lockedThrough(db, club.id);
  const month = monthOf(today);
  const base = `/clubs/${club.slug}/money`;
  const canPost = can(ability, "create", "Ledger");
  const tiles = [
    { label: "Members owe the club", value: <Money minor={owed} currency={club.currency} locale={club.locale} />, href: `${base}/balances` },
    { label: "In the bank (books)", value: <Money minor={by("bank")} currency={club.currency} locale={club.locale} />, href: `${base}/reconciliation` },
    { label: "Card payments not yet paid out", value: <Money minor={by("card-clearing")} currency={club.currency} locale={club.locale} />, href: `${base}/payments` },
    { label: "Members overdue", value: <span className="tabular font-mono">{arrears.length}</span>, href: `${base}/ageing` },
  ];
  return (
    <>
      <PageHeader title="Money" lead={`${club.name}'s books in ${club.currency}. Today is ${today} in the club's time zone.`} />
      <MoneyNav slug={club.slug} ability={ability} current={base} />
      <section aria-label="At a glance" className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        {tiles.map((t) => (
          <Link key={t.label} href={t.href} className="card block text-ink-900 no-underline hover:border-fin-500">
            <span className="block text-sm text-ink-500">{t.label}</span>
            <span className="mt-1 block text-xl font-bold">{t.value}</span>
          </Link>
        ))}
      </section>
      <p role="status" className={`mt-4 rounded border px-3 py-2 text-sm ${problems.length ? "border-stop-600 bg-stop-100 text-stop-800" : "border-go-600 bg-go-100 text-go-800"}`}>
        <span aria-hidden="true">{problems.length ? "▲ " : "✓ "}</span>
        {problems.length ? `${problems.length} journal entries do not balance. This should never happen: stop posting and ask the club's administrator to contact Hangarline support.` : `All ${countEntries(db, club.id)} journal entries balance (debits equal credits).`}
        {locked ? ` The books are locked through ${locked} (reconciled).` : " No period is locked yet."}
      </p>
      <div className="mt-6 grid gap-6 lg:grid-cols-2">
        <section className="card" aria-labelledby="run-h">
          <h2 id="run-h" className="mb-1 text-lg font-bold">Billing run</h2>
          <p className="mb-3 text-sm text-ink-700">Posts the month&apos;s dues (prorated for members who joined during the period), late fees for members whose accounts are overdue, and e-mails the previous month&apos;s statements. Running a month again posts nothing twice.</p>
          {canPost ? (
            <ActionForm
              action={runBilling}
              slug={club.slug}
              label="Run billing"
              submitLabel="Run billing"
              pendingText="Billing…"
              fields={[{ name: "month", label: "Month to bill", type: "month", defaultValue: month, hint: `For example ${month} bills ${monthLabel(month, club.locale)} and sends the ${monthLabel(shiftMonthKey(month, -1), club.locale)} statements.` }]}
            />
          ) : (
            <p className="text-sm text-ink-500">{explainDenied("create", "Ledger")}</p>
          )}
          {runs.length ? (
            <ul className="mt-4 divide-y divide-sand-200 text-sm">
              {runs.map((r) => (
                <li key={r.id} className="flex flex-wrap justify-between gap-2 py-2">
                  <span>{monthLabel(r.periodStart.slice(0, 7), club.locale)}</span>
                  <span className="text-ink-700">{r.entriesPosted} postings · <Money minor={r.totalMinor} currency={club.currency} locale={club.locale} /> · {r.statementsIssued} statements · run {r.runCount}×</span>
                </li>
              ))}
            </ul>
          ) : null}
        </section>
        <section className="card" aria-labelledby="arrears-h">
          <h2 id="arrears-h" className="mb-1 text-lg font-bold">Overdue accounts</h2>
          {arrears.length === 0 ? <p className="text-ink-700">No account is overdue.</p> : (
            <ul className="mb-3 divide-y divide-sand-200 text-sm">
              {arrears.map((m) => (
                <li key={m.userId} className="flex flex-wrap justify-between gap-2 py-2">
                  <Link href={`${base}/members/${m.userId}`}>{m.name}</Link>
                  <span><Money minor={m.balanceMinor} currency={club.currency} locale={club.locale} /> · oldest due <Day date={m.oldestDueDate} locale={club.locale} /></span>
                </li>
              ))}
            </ul>
          )}
          {canPost ? <ActionButton action={sendReminders} slug={club.slug} label="E-mail dues reminders" pendingText="Queueing…" /> : null}
          <p className="mt-2 text-sm text-ink-500">Reminders go to every member with overdue charges, at most once a day each.</p>
        </section>
      </div>
    </>
  );
}
