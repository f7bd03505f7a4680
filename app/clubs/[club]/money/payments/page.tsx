import type { Metadata } from "next";
import { DataTable } from "@/components/money/data-table";
import { MoneyNav } from "@/components/money/money-nav";
import { PageHeader } from "@/components/ui/page-header";
import { listPayments } from "@/db/queries/money-payments";
import { isoDateInTimeZone } from "@/lib/dates";
import { authorizePageAny } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Payments" };

const STATUS = { pending: "Waiting for the card", failed: "Declined", expired: "Not completed", succeeded: "Paid", partially_refunded: "Partly refunded", refunded: "Refunded" } as Record<string, string>;
const METHOD = { card: "Card", cheque: "Cheque", cash: "Cash", transfer: "Bank transfer" } as Record<string, string>;

export default async function PaymentsPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  // Every member's payments: the treasurer (read Payment) or whoever reads every account.
  const { db, club, ability } = await authorizePageAny(slug, ["read", "Payment"], ["read", "Account", "all"]);
  const rows = listPayments(db, club.id).map((p) => ({ ...p, href: `/clubs/${club.slug}/money/members/${p.memberUserId}`, statusWord: STATUS[p.status] ?? p.status, methodWord: METHOD[p.method] ?? p.method, date: p.receivedOn ?? isoDateInTimeZone(new Date(p.createdAt), club.timeZone), net: p.amountMinor - p.feeMinor }));
  return (
    <>
      <PageHeader title="Payments" lead="Card payments arrive through the payment provider's signed notices; cheques, cash and transfers are recorded by the treasurer. Refund a card payment from the member's page." />
      <MoneyNav slug={club.slug} ability={ability} current={`/clubs/${club.slug}/money/payments`} />
      <DataTable
        label="Payments"
        csvName={`payments-${club.slug}`}
        currency={club.currency} locale={club.locale}
        rows={rows}
        filter={{ key: "statusWord", label: "Status", options: Object.values(STATUS).map((s) => ({ value: s, label: s })) }}
        columns={[
          { key: "date", header: "Date", kind: "date" },
          { key: "member", header: "Member", kind: "link", hrefKey: "href" },
          { key: "methodWord", header: "Method" },
          { key: "amountMinor", header: "Amount", kind: "money" },
          { key: "feeMinor", header: "Fee", kind: "money" },
          { key: "refundedMinor", header: "Refunded", kind: "money" },
          { key: "statusWord", header: "Status" },
          { key: "payoutId", header: "Payout" },
          { key: "reference", header: "Reference" },
        ]}
      />
    </>
  );
}
