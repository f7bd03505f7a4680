import Link from "next/link";
import { formatDate, isoDateInTimeZone } from "@/lib/dates";
import { DEFAULT_LOCALE } from "@/lib/money/format";
import type { PaymentRow } from "@/db/schema";
import type { AccountActivityRow } from "@/db/queries/money-member-accounts";
import { monthLabel } from "@/lib/money/months";
import { DataTable } from "./data-table";
import { ArrearsFlag, Money, balanceWords } from "./money-text";

export type AccountViewData = {
  balanceMinor: number;
  overdueMinor: number;
  oldestDueDate: string | null;
  inArrears: boolean;
  activity: AccountActivityRow[];
  statementMonths: { month: string; issuedAt: Date | null }[];
  payments: PaymentRow[];
};

const STATUS_WORDS: Record<string, string> = { pending: "Waiting for the card", failed: "Declined", expired: "Not completed", succeeded: "Paid", partially_refunded: "Partly refunded", refunded: "Refunded" };
const METHOD_WORDS: Record<string, string> = { card: "Card", cheque: "Cheque", cash: "Cash", transfer: "Bank transfer" };

/** A member's account, for the member themself and for the treasurer looking at it. */
export function AccountView({ data, currency, locale, timeZone, slug, userId, statementHref, payButton }: { data: AccountViewData; currency: string; locale?: string; timeZone: string; slug: string; userId: string; statementHref: (month: string) => string; payButton?: React.ReactNode }) {
  return (
    <div className="grid grid-cols-1 gap-6">
      <section className="card" aria-labelledby="balance-h">
        <h2 id="balance-h" className="text-lg font-bold">Balance</h2>
        <p className="mt-1 text-3xl font-bold" data-testid="account-balance"><Money minor={data.balanceMinor} currency={currency} locale={locale} credit /></p>
        <p className="text-ink-700">{balanceWords(data.balanceMinor)}</p>
        {data.overdueMinor > 0 ? <p className="mt-1 text-sm text-ink-700">Overdue: <Money minor={data.overdueMinor} currency={currency} locale={locale} /> (oldest due {data.oldestDueDate ? formatDate(data.oldestDueDate, locale ?? DEFAULT_LOCALE) : "—"})</p> : null}
        <p className="mt-2"><ArrearsFlag inArrears={data.inArrears} /></p>
        {payButton ? <div className="mt-4">{payButton}</div> : null}
      </section>
      <section aria-labelledby="statements-h">
        <h2 id="statements-h" className="mb-2 text-lg font-bold">Statements</h2>
        {data.statementMonths.length === 0 ? <p className="text-ink-500">No statements yet.</p> : (
          <ul className="card divide-y divide-sand-200">
            {data.statementMonths.map((s) => (
              <li key={s.month} className="flex flex-wrap items-center justify-between gap-2 py-2">
                <Link href={statementHref(s.month)}>{monthLabel(s.month, locale)}</Link>
                <span className="flex flex-wrap items-center gap-3 text-sm text-ink-700">
                  {s.issuedAt ? `issued ${formatDate(isoDateInTimeZone(s.issuedAt, timeZone), locale ?? DEFAULT_LOCALE)}` : "month to date"}
                  <a href={`/api/clubs/${slug}/statements/${userId}/${s.month}`}>PDF<span className="sr-only"> for {monthLabel(s.month, locale)}</span></a>
                </span>
              </li>
            ))}
          </ul>
        )}
      </section>
      <section aria-labelledby="activity-h" className="min-w-0">
        <h2 id="activity-h" className="mb-2 text-lg font-bold">Activity</h2>
        <DataTable
          label="Account activity"
          prefix="a_"
          csvName="account-activity"
          currency={currency} locale={locale}
          pageSize={15}
          rows={data.activity.map((a) => ({ date: a.date, memo: a.memo, charge: a.amountMinor > 0 ? a.amountMinor : null, credit: a.amountMinor < 0 ? -a.amountMinor : null, dueOn: a.dueOn, bucket: a.bucket }))}
          columns={[
            { key: "date", header: "Date", kind: "date" },
            { key: "memo", header: "Description" },
            { key: "charge", header: "Charge", kind: "money" },
            { key: "credit", header: "Credit", kind: "money" },
            { key: "dueOn", header: "Due", kind: "date" },
            { key: "bucket", header: "Unpaid, age" },
          ]}
        />
      </section>
      <section aria-labelledby="payments-h">
        <h2 id="payments-h" className="mb-2 text-lg font-bold">Payments</h2>
        {data.payments.length === 0 ? <p className="text-ink-500">No payments yet.</p> : (
          <ul className="card divide-y divide-sand-200 text-sm">
            {data.payments.map((p) => (
              <li key={p.id} className="flex flex-wrap justify-between gap-2 py-2">
                <span>{formatDate(p.receivedOn ?? isoDateInTimeZone(p.createdAt, timeZone), locale ?? DEFAULT_LOCALE)} · {METHOD_WORDS[p.method]}{p.reference ? ` ${p.reference}` : ""}</span>
                <span><Money minor={p.amountMinor} currency={currency} locale={locale} /> · {STATUS_WORDS[p.status] ?? p.status}{p.refundedMinor ? <> (<Money minor={p.refundedMinor} currency={currency} locale={locale} /> refunded)</> : null}</span>
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
