import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Money } from "@/components/money/money-text";
import { PageHeader } from "@/components/ui/page-header";
import { getPaymentBySession } from "@/db/queries/money-payments";
import { memberBalance } from "@/db/queries/money-member-balances";
import { syncCheckoutSession } from "@/db/queries/money-checkout-sync";
import { authorizePage, ownRecord } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Payment" };
export const dynamic = "force-dynamic";

export default async function PaidPage({ params, searchParams }: { params: Promise<{ club: string }>; searchParams: Promise<{ session?: string }> }) {
  const { club: slug } = await params;
  const { session } = await searchParams;
  const { db, club, user } = await authorizePage(slug, ownRecord("read", "Account"));
  if (!session) notFound();
  let payment = getPaymentBySession(db, club.id, session);
  if (!payment || payment.memberUserId !== user.id) notFound();
  // Normally the signed webhook has already posted it; if it is late, ask the provider now.
  if (payment.status === "pending") {
    await syncCheckoutSession(db, club.id, session);
    payment = getPaymentBySession(db, club.id, session) ?? payment;
  }
  const balance = memberBalance(db, club.id, user.id);
  const done = payment.status === "succeeded" || payment.status === "partially_refunded" || payment.status === "refunded";
  return (
    <div className="max-w-2xl">
      <PageHeader title={done ? "Thank you: payment received" : "Payment not completed yet"} />
      <section className="card" role="status">
        {done ? (
          <p>We received <Money minor={payment.amountMinor} currency={club.currency} locale={club.locale} /> by card. A receipt is on its way by e-mail.</p>
        ) : (
          <p>The payment provider has not confirmed this payment yet{payment.lastError ? `: ${payment.lastError}` : ""}. If your card was charged it will appear on your account within minutes.</p>
        )}
        <p className="mt-3 text-lg">Your balance is now <strong data-testid="balance-after"><Money minor={balance} currency={club.currency} locale={club.locale} credit /></strong>.</p>
        <p className="mt-4"><Link href={`/clubs/${club.slug}/account`}>Back to my account</Link></p>
      </section>
    </div>
  );
}
