import type { Metadata } from "next";
import { dayText } from "@/components/ui/day";
import Link from "next/link";
import { ActionButton, ActionForm } from "@/components/money/action-form";
import { MoneyNav } from "@/components/money/money-nav";
import { Money } from "@/components/money/money-text";
import { PageHeader } from "@/components/ui/page-header";
import { billCategories } from "@/db/queries/money-bills";
import { countDueRecurring, listRecurringBills } from "@/db/queries/money-recurring";
import { createRecurringBillAction } from "@/lib/actions/money/create-recurring-bill";
import { produceDueBillsAction } from "@/lib/actions/money/produce-due-bills";
import { setRecurringBillStatusAction } from "@/lib/actions/money/set-recurring-bill-status";
import { clubToday } from "@/lib/money/settings";
import { CADENCE_WORDS } from "@/lib/money/recurring";
import { authorizePage } from "@/lib/server/authorize";
import { can } from "@/permissions";

export const metadata: Metadata = { title: "Recurring bills" };

const STATUS = {
  active: { shape: "●", word: "Running" },
  paused: { shape: "‖", word: "Paused" },
  ended: { shape: "■", word: "Ended" },
} as const;

export default async function RecurringBillsPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { db, club, ability } = await authorizePage(slug, ["read", "Bill"]);
  const canEdit = can(ability, "create", "Bill");
  const today = clubToday(club);
  const list = listRecurringBills(db, club.id);
  const due = countDueRecurring(db, club.id, today);
  const categories = canEdit ? billCategories(db, club.id) : [];
  return (
    <>
      <PageHeader
        title="Recurring bills"
        lead="Bills that come back — insurance, hangar rent, a loan. Each period's bill is entered once, when it is due, like any other bill: booked to its category, approved above the club's amount, paid from the bank."
        actions={<Link className="inline-flex min-h-11 items-center rounded border border-fin-600 bg-white px-4 font-bold" href={`/clubs/${club.slug}/money/bills`}>All bills</Link>}
      />
      <MoneyNav slug={club.slug} ability={ability} current={`/clubs/${club.slug}/money/bills`} />
      {canEdit ? (
        <section className="card mb-6 max-w-2xl" aria-labelledby="due-h">
          <h2 id="due-h" className="mb-1 text-lg font-bold">Bills due now</h2>
          <p className="mb-3 text-sm text-ink-700">
            {due === 0 ? `No recurring bill is due by ${today}.` : `${due} recurring bill${due === 1 ? " has" : "s have"} a bill due by ${today}.`} Entering them twice never doubles a bill: each period is entered once.
          </p>
          <ActionForm action={produceDueBillsAction} slug={club.slug} label="Enter due bills" submitLabel="Enter the bills due" pendingText="Entering…" fields={[]} />
        </section>
      ) : null}
      <section aria-labelledby="list-h" className="mb-8">
        <h2 id="list-h" className="mb-3 text-lg font-bold">Recurring bills ({list.length})</h2>
        {list.length === 0 ? <p className="text-ink-700">No recurring bills yet.</p> : (
          <ul className="grid gap-3">
            {list.map((r) => (
              <li key={r.id} className="card">
                <div className="flex flex-wrap items-baseline justify-between gap-2">
                  <span><span className="font-bold">{r.vendor}</span>{r.reference ? <span className="text-ink-700"> · {r.reference}</span> : null} · {r.categoryName}</span>
                  <span className="flex items-baseline gap-3"><Money minor={r.amountMinor} currency={club.currency} locale={club.locale} /><span className="text-sm font-bold"><span aria-hidden="true">{STATUS[r.status].shape} </span>{STATUS[r.status].word}</span></span>
                </div>
                <p className="text-sm text-ink-700">
                  {CADENCE_WORDS[r.cadence]}{r.status === "ended" ? "" : ` · next bill ${dayText(r.nextOn, club.locale)}`}{r.endsOn ? ` · last bill by ${dayText(r.endsOn, club.locale)}` : ""} · {r.dueDays === 0 ? "due on its date" : `due ${r.dueDays} days after its date`} · {r.billCount} bill{r.billCount === 1 ? "" : "s"} entered{r.lastPeriod ? `, the latest dated ${r.lastPeriod}` : ""}
                </p>
                {canEdit && r.status !== "ended" ? (
                  <div className="mt-2 flex flex-wrap gap-2">
                    {r.status === "active" ? (
                      <ActionButton action={setRecurringBillStatusAction} slug={club.slug} hidden={{ recurringBillId: r.id, status: "paused" }} label={`Pause ${r.vendor}`} pendingText="Pausing…" />
                    ) : (
                      <ActionButton action={setRecurringBillStatusAction} slug={club.slug} hidden={{ recurringBillId: r.id, status: "active" }} label={`Resume ${r.vendor}`} pendingText="Resuming…" />
                    )}
                    <ActionButton action={setRecurringBillStatusAction} slug={club.slug} hidden={{ recurringBillId: r.id, status: "ended" }} label={`End ${r.vendor}`} pendingText="Ending…" variant="danger" confirm={`End the recurring bill from ${r.vendor}? No more bills will be entered from it.`} />
                  </div>
                ) : null}
              </li>
            ))}
          </ul>
        )}
      </section>
      {canEdit ? (
        <section className="card mb-8 max-w-2xl" aria-labelledby="new-h">
          <h2 id="new-h" className="mb-3 text-lg font-bold">Add a recurring bill</h2>
          <ActionForm
            action={createRecurringBillAction}
            slug={club.slug}
            label="Add a recurring bill"
            submitLabel="Save recurring bill"
            grid
            fields={[
              { name: "vendor", label: "Vendor", placeholder: "Harbour Field Hangars" },
              { name: "reference", label: "Contract or policy number (optional)" },
              { name: "accountCode", label: "Category", type: "select", options: [{ value: "", label: "Choose a category…" }, ...categories.map((c) => ({ value: c.code, label: c.name }))] },
              { name: "amount", label: `Amount each time (${club.currency})`, inputMode: "decimal", placeholder: "450.00" },
              { name: "cadence", label: "How often", type: "select", options: [{ value: "monthly", label: CADENCE_WORDS.monthly }, { value: "quarterly", label: CADENCE_WORDS.quarterly }, { value: "yearly", label: CADENCE_WORDS.yearly }] },
              { name: "firstOn", label: "First bill's date", type: "date", defaultValue: today },
              { name: "endsOn", label: "Last bill by (optional)", type: "date" },
              { name: "dueDays", label: "Days to pay", inputMode: "numeric", defaultValue: "0", hint: "0: due on the bill's date." },
            ]}
          />
        </section>
      ) : null}
    </>
  );
}
