import type { Metadata } from "next";
import { Suspense } from "react";
import { AccountView } from "@/components/money/account-view";
import { PayButton } from "@/components/money/pay-button";
import { PageHeader } from "@/components/ui/page-header";
import { getMemberAccount } from "@/db/queries/money-member-accounts";
import { formatMoney } from "@/lib/money";
import { clubToday } from "@/lib/money/settings";
import { authorizePage, ownRecord } from "@/lib/server/authorize";
import { canOn } from "@/permissions";

export const metadata: Metadata = { title: "My account" };

export default async function MyAccountPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club, user, ability } = await authorizePage(slug, ownRecord("read", "Account"));
  const data = getMemberAccount(db, club.id, user.id, clubToday(club));
  const canPay = canOn(ability, "pay", "Account", { userId: user.id }) && data.balanceMinor >= 50;
  return (
    <div className="max-w-4xl">
      <PageHeader title="My account" lead={`Your account with ${club.name}, in ${club.currency}.`} />
      <Suspense fallback={<div className="h-64 animate-pulse rounded bg-sand-200" />}>
        <AccountView
          data={data}
          currency={club.currency} locale={club.locale} timeZone={club.timeZone}
          slug={club.slug}
          userId={user.id}
          statementHref={(m) => `/clubs/${club.slug}/account/statements/${m}`}
          payButton={canPay ? <PayButton slug={club.slug} amountText={formatMoney(data.balanceMinor, club.currency, club.locale)} /> : <p className="text-ink-700">Nothing to pay right now.</p>}
        />
      </Suspense>
    </div>
  );
}
