import type { Metadata } from "next";
import { dayText } from "@/components/ui/day";
import Link from "next/link";
import { ActionForm } from "@/components/money/action-form";
import { MoneyNav } from "@/components/money/money-nav";
import { Money } from "@/components/money/money-text";
import { PageHeader } from "@/components/ui/page-header";
import { billApprovalOverMinor, billCategories, listBills } from "@/db/queries/money-bills";
import { countDueRecurring } from "@/db/queries/money-recurring";
import { approveBillAction } from "@/lib/actions/money/approve-bill";
import { enterBillAction } from "@/lib/actions/money/enter-bill";
import { payBillAction } from "@/lib/actions/money/pay-bill";
import { saveBillApprovalAction } from "@/lib/actions/money/save-bill-approval";
import { clubToday } from "@/lib/money/settings";
import { formatMoney, minorToDecimalString, currencyExponent } from "@/lib/money";
import { authorizePage } from "@/lib/server/authorize";
import { can } from "@/permissions";
import { formatDate } from "@/lib/dates";

export const metadata: Metadata = { title: "Bills" };

const STATUS = {
  awaiting_approval: { shape: "▲", word: "Waiting for a second officer" },
  approved: { shape: "□", word: "To pay" },
  paid: { shape: "■", word: "Paid" },
} as const;

export default async function BillsPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club, ability, user } = await authorizePage(slug, ["read", "Bill"]);
  const canEnter = can(ability, "create", "Bill");
  const canApprove = can(ability, "approve", "Bill");
  const today = clubToday(club);
  const threshold = billApprovalOverMinor(db, club.id);
  const list = listBills(db, club.id);
  const categories = canEnter ? billCategories(db, club.id) : [];
  const toApprove = list.filter((b) => b.status === "awaiting_approval" && b.enteredById !== user.id);
  const toPay = list.filter((b) => b.status === "approved");
  const dueRecurring = countDueRecurring(db, club.id, today);
  return (
    <>
      <PageHeader
        title="Bills"
        lead={`What the club owes its vendors. A bill is booked to its category when entered and paid from the bank; bills above ${formatMoney(threshold, club.currency, club.locale)} need a second officer's approval first.`}
        actions={<Link className="inline-flex min-h-11 items-center rounded border border-fin-600 bg-white px-4 font-bold" href={`/clubs/${club.slug}/money/bills/recurring`}>Recurring bills{dueRecurring ? ` (${dueRecurring} due)` : ""}</Link>}
      />
      <MoneyNav slug={club.slug} ability={ability} current={`/clubs/${club.slug}/money/bills`} />
      <section aria-labelledby="bills-h" className="mb-8">
        <h2 id="bills-h" className="mb-3 text-lg font-bold">Bills ({list.length})</h2>
        {list.length === 0 ? <p className="text-ink-700">No bills entered yet.</p> : (
          <ul className="grid gap-3">
            {list.map((b) => (
              <li key={b.id} className="card">
                <div className="flex flex-wrap items-baseline justify-between gap-2">
                  <span><span className="font-bold">{b.vendor}</span>{b.reference ? <span className="text-ink-700"> · {b.reference}</span> : null} · {b.categoryName}</span>
                  <span className="flex items-baseline gap-3"><Money minor={b.amountMinor} currency={club.currency} locale={club.locale} /><span className="text-sm font-bold"><span aria-hidden="true">{STATUS[b.status].shape} </span>{STATUS[b.status].word}</span></span>
                </div>
                <p className="text-sm text-ink-700">
                  {b.periodKey ? `Recurring, ${b.periodKey} · ` : ""}Dated {formatDate(b.billDate, club.locale)} · due {formatDate(b.dueOn, club.locale)}{b.status !== "paid" && b.dueOn < today ? <span className="font-bold text-stop-800"> (overdue)</span> : null} · entered by {b.enteredBy}
                  {b.approvedBy ? ` · approved by ${b.approvedBy}` : ""}{b.paidOn ? ` · paid ${dayText(b.paidOn, club.locale)}` : ""}
                </p>
                {b.attachments.length ? (
                  <p className="text-sm">Invoice: {b.attachments.map((f) => <a key={f.id} className="mr-2" href={`/api/clubs/${club.slug}/uploads/${f.id}`}>{f.name}</a>)}</p>
                ) : <p className="text-sm text-ink-500">No invoice attached.</p>}
                {b.status === "awaiting_approval" && b.enteredById === user.id ? <p className="text-sm text-ink-700">Another officer approves this bill.</p> : null}
              </li>
            ))}
          </ul>
        )}
      </section>
      {/* Approving and paying sit outside the list, so each form's answer stays on the page after the list changes. */}
      {canApprove && toApprove.length ? (
        <section className="card mb-8 max-w-2xl" aria-labelledby="approve-h">
          <h2 id="approve-h" className="mb-3 text-lg font-bold">Approve a bill</h2>
          <ActionForm action={approveBillAction} slug={club.slug} label="Approve a bill" submitLabel="Approve" fields={[{ name: "billId", label: "Bill", type: "select", options: toApprove.map((b) => ({ value: b.id, label: `${b.vendor} · ${formatMoney(b.amountMinor, club.currency, club.locale)} · due ${formatDate(b.dueOn, club.locale)}` })) }]} />
        </section>
      ) : null}
      {canEnter ? (
        <section className="card mb-8 max-w-2xl" aria-labelledby="pay-h">
          <h2 id="pay-h" className="mb-3 text-lg font-bold">Pay a bill from the bank</h2>
          {toPay.length === 0 ? <p className="text-sm text-ink-700">No approved bill is waiting to be paid.</p> : null}
          <ActionForm
            action={payBillAction}
            slug={club.slug}
            label="Pay a bill"
            submitLabel="Pay from the bank"
            grid
            fields={[
              { name: "billId", label: "Bill", type: "select", options: toPay.map((b) => ({ value: b.id, label: `${b.vendor} · ${formatMoney(b.amountMinor, club.currency, club.locale)} · due ${formatDate(b.dueOn, club.locale)}` })) },
              { name: "paidOn", label: "Paid on", type: "date", defaultValue: today },
            ]}
          />
        </section>
      ) : null}
      {canEnter ? (
        <section className="card mb-8 max-w-2xl" aria-labelledby="enter-h">
          <h2 id="enter-h" className="mb-3 text-lg font-bold">Enter a bill</h2>
          <ActionForm
            action={enterBillAction}
            slug={club.slug}
            label="Enter a bill"
            submitLabel="Enter bill"
            grid
            fields={[
              { name: "vendor", label: "Vendor", placeholder: "Harbour Field Hangars" },
              { name: "reference", label: "Invoice number (optional)" },
              { name: "billDate", label: "Bill date", type: "date", defaultValue: today },
              { name: "dueOn", label: "Due on", type: "date", defaultValue: today },
              { name: "accountCode", label: "Category", type: "select", options: [{ value: "", label: "Choose a category…" }, ...categories.map((c) => ({ value: c.code, label: c.name }))] },
              { name: "amount", label: `Amount (${club.currency})`, inputMode: "decimal", placeholder: "350.00" },
              { name: "attachment", label: "Invoice (PDF or photo, optional)", type: "file", accept: "application/pdf,image/jpeg,image/png,image/webp,image/heic" },
            ]}
          />
        </section>
      ) : null}
      {can(ability, "update", "ClubSettings") ? (
        <section className="card max-w-2xl" aria-labelledby="approval-h">
          <h2 id="approval-h" className="mb-1 text-lg font-bold">Second officer&apos;s approval</h2>
          <p className="mb-3 text-sm text-ink-700">Bills above this amount wait for a second officer (not the one who entered them) before they are paid. 0 means every bill.</p>
          <ActionForm action={saveBillApprovalAction} slug={club.slug} label="Approval amount" submitLabel="Save amount" fields={[{ name: "amount", label: `Amount (${club.currency})`, inputMode: "decimal", defaultValue: minorToDecimalString(threshold, currencyExponent(club.currency)) }]} />
        </section>
      ) : null}
    </>
  );
}
