import type { Metadata } from "next";
import { Day, dayText } from "@/components/ui/day";
import Link from "next/link";
import { notFound } from "next/navigation";
import { AccountView } from "@/components/money/account-view";
import { ActionForm } from "@/components/money/action-form";
import { MoneyNav } from "@/components/money/money-nav";
import { Money } from "@/components/money/money-text";
import { PageHeader } from "@/components/ui/page-header";
import { getMemberAccount, getMemberName } from "@/db/queries/money-member-accounts";
import { refundPayment } from "@/lib/actions/money/refund-payment";
import { minorToDecimalString, currencyExponent } from "@/lib/money";
import { clubToday } from "@/lib/money/settings";
import { authorizePage } from "@/lib/server/authorize";
import { can } from "@/permissions";

export const metadata: Metadata = { title: "Member account" };

export default async function MemberAccountPage({ params }: { params: Promise<{ club: string; userId: string }> }) {
  const { club: slug, userId } = await params;
  const { db, club, ability } = await authorizePage(slug, ["read", "Account", { userId }]);
  const member = getMemberName(db, club.id, userId);
  if (!member) notFound();
  const data = getMemberAccount(db, club.id, userId, clubToday(club));
  const refundable = data.payments.filter((p) => p.method === "card" && (p.status === "succeeded" || p.status === "partially_refunded"));
  const canRefund = can(ability, "refund", "Payment");
  const exp = currencyExponent(club.currency);
  return (
    <>
      <PageHeader title={member.name} lead={<><Link href={`/clubs/${club.slug}/money/balances`}>Member balances</Link> · {member.email}</>} />
      <MoneyNav slug={club.slug} ability={ability} />
      <AccountView data={data} currency={club.currency} locale={club.locale} timeZone={club.timeZone} slug={club.slug} userId={userId} statementHref={(m) => `/clubs/${club.slug}/money/members/${userId}/statements/${m}`} />
      {canRefund && refundable.length ? (
        <section className="mt-8" aria-labelledby="refund-h">
          <h2 id="refund-h" className="mb-2 text-lg font-bold">Refund a card payment</h2>
          <div className="grid gap-4 lg:grid-cols-2">
            {refundable.map((p) => (
              <div key={p.id} className="card">
                <p className="mb-3 text-sm"><Day date={p.receivedOn} locale={club.locale} /> · <Money minor={p.amountMinor} currency={club.currency} locale={club.locale} /> by card{p.refundedMinor ? <> · <Money minor={p.refundedMinor} currency={club.currency} locale={club.locale} /> refunded already</> : null}</p>
                <ActionForm
                  action={refundPayment}
                  slug={club.slug}
                  label={`Refund the payment of ${p.receivedOn ? dayText(p.receivedOn, club.locale) : "this payment"}`}
                  submitLabel="Refund to the card"
                  pendingText="Refunding…"
                  hidden={{ paymentId: p.id }}
                  fields={[
                    { name: "amount", label: `Amount (${club.currency})`, inputMode: "decimal", defaultValue: minorToDecimalString(p.amountMinor - p.refundedMinor, exp) },
                    { name: "treatment", label: "Afterwards", type: "select", options: [{ value: "reopen", label: "The member owes it again (payment undone)" }, { value: "absorb", label: "The club bears it (goodwill refund)" }] },
                  ]}
                />
              </div>
            ))}
          </div>
        </section>
      ) : null}
    </>
  );
}
