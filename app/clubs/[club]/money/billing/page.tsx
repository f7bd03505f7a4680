import type { Metadata } from "next";
import { ActionForm } from "@/components/money/action-form";
import { DataTable } from "@/components/money/data-table";
import { MoneyNav } from "@/components/money/money-nav";
import { Money } from "@/components/money/money-text";
import { PageHeader } from "@/components/ui/page-header";
import { getMoneySettingsRow, listBillingRuns, listDuesAssignments, listDuesPlans } from "@/db/queries/money-billing";
import { DUES_PERIODS, MEMBER_CATEGORIES } from "@/db/schema/money";
import { assignDuesPlan } from "@/lib/actions/money/assign-dues-plan";
import { saveMoneySettings } from "@/lib/actions/money/save-rates";
import { saveDuesPlan } from "@/lib/actions/money/save-dues-plan";
import { currencyExponent, minorToDecimalString } from "@/lib/money";
import { monthLabel } from "@/lib/money/months";
import { DEFAULT_MONEY_SETTINGS, clubToday } from "@/lib/money/settings";
import { authorizePage } from "@/lib/server/authorize";
import { can } from "@/permissions";

export const metadata: Metadata = { title: "Dues and billing" };

const PERIOD_WORDS = { monthly: "Monthly", quarterly: "Quarterly", annual: "Annual" } as const;
const CATEGORY_WORDS = { full: "Full member", student: "Student", family: "Family", inactive: "Inactive" } as const;

export default async function BillingPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  // Checked here, not only in the layout: an RSC request can render this page without it.
  const { db, club, ability } = await authorizePage(slug, ["read", "Ledger"]);
  const canEdit = can(ability, "update", "Rates");
  const plans = listDuesPlans(db, club.id);
  const assignments = listDuesAssignments(db, club.id);
  const runs = listBillingRuns(db, club.id);
  const settings = getMoneySettingsRow(db, club.id) ?? { ...DEFAULT_MONEY_SETTINGS };
  const exp = currencyExponent(club.currency);
  const major = (m: number) => minorToDecimalString(m, exp);
  const planFields = (p?: (typeof plans)[number]) => [
    { name: "name", label: "Name", defaultValue: p?.name, placeholder: "Full member, monthly" },
    { name: "period", label: "Billed", type: "select" as const, defaultValue: p?.period, options: DUES_PERIODS.map((v) => ({ value: v, label: PERIOD_WORDS[v] })) },
    { name: "category", label: "Member category", type: "select" as const, defaultValue: p?.category, options: MEMBER_CATEGORIES.map((v) => ({ value: v, label: CATEGORY_WORDS[v] })) },
    { name: "amount", label: `Amount per period (${club.currency})`, inputMode: "decimal" as const, defaultValue: p ? major(p.amountMinor) : undefined },
    { name: "active", label: "Billed in billing runs", type: "checkbox" as const, checked: p ? p.active : true },
  ];
  return (
    <>
      <PageHeader title="Dues and billing" lead="Dues plans, who pays which, and the club's payment terms and late fee." />
      <MoneyNav slug={club.slug} ability={ability} current={`/clubs/${club.slug}/money/billing`} />
      <section aria-labelledby="plans-h">
        <h2 id="plans-h" className="mb-2 text-lg font-bold">Dues plans</h2>
        <div className="grid items-start gap-4 lg:grid-cols-2">
          {plans.map((p) => (
            <details key={p.id} className="card">
              <summary className="cursor-pointer font-bold">
                {p.name} · {PERIOD_WORDS[p.period]} · <Money minor={p.amountMinor} currency={club.currency} locale={club.locale} />{p.active ? "" : " · not billed"}
              </summary>
              {canEdit ? <div className="mt-3"><ActionForm action={saveDuesPlan} slug={club.slug} label={`Edit ${p.name}`} submitLabel="Save plan" hidden={{ planId: p.id }} fields={planFields(p)} grid /></div> : null}
            </details>
          ))}
          {canEdit ? (
            <div className="card">
              <h3 className="mb-2 font-bold">New plan</h3>
              <ActionForm action={saveDuesPlan} slug={club.slug} label="New dues plan" submitLabel="Add plan" fields={planFields()} grid />
            </div>
          ) : null}
        </div>
      </section>
      <section className="mt-8" aria-labelledby="assign-h">
        <h2 id="assign-h" className="mb-2 text-lg font-bold">Who pays which plan</h2>
        <DataTable
          label="Dues assignments"
          prefix="d_"
          csvName={`dues-${club.slug}`}
          currency={club.currency} locale={club.locale}
          rows={assignments.map((a) => ({ name: a.name ?? a.email, plan: a.planName ?? "No plan", category: a.category ? CATEGORY_WORDS[a.category] : "—", startsOn: a.startsOn, joinedOn: a.joinedOn }))}
          columns={[
            { key: "name", header: "Member" },
            { key: "plan", header: "Plan" },
            { key: "category", header: "Category" },
            { key: "startsOn", header: "Pays from", kind: "date" },
            { key: "joinedOn", header: "Joined", kind: "date" },
          ]}
        />
        {canEdit ? (
          <div className="card mt-4 max-w-2xl">
            <h3 className="mb-2 font-bold">Assign a plan</h3>
            <ActionForm
              action={assignDuesPlan}
              slug={club.slug}
              label="Assign a dues plan"
              submitLabel="Assign"
              grid
              fields={[
                { name: "memberUserId", label: "Member", type: "select", options: assignments.map((a) => ({ value: a.userId, label: a.name ?? a.email })) },
                { name: "planId", label: "Plan", type: "select", options: [...plans.map((p) => ({ value: p.id, label: p.name })), { value: "", label: "No plan (stop billing dues)" }] },
                { name: "startsOn", label: "Pays from (prorated within the first period)", type: "date", defaultValue: clubToday(club) },
              ]}
            />
          </div>
        ) : null}
      </section>
      <div className="mt-8 grid gap-6 lg:grid-cols-2">
        <section className="card" aria-labelledby="runs-h">
          <h2 id="runs-h" className="mb-2 text-lg font-bold">Billing runs</h2>
          {runs.length === 0 ? <p className="text-ink-500">No billing run yet; run one from the Money overview.</p> : (
            <ul className="divide-y divide-sand-200 text-sm">
              {runs.map((r) => (
                <li key={r.id} className="flex flex-wrap justify-between gap-2 py-2">
                  <span>{monthLabel(r.periodStart.slice(0, 7), club.locale)}</span>
                  <span>{r.entriesPosted} postings, <Money minor={r.totalMinor} currency={club.currency} locale={club.locale} />, {r.statementsIssued} statements</span>
                </li>
              ))}
            </ul>
          )}
        </section>
        <section className="card" aria-labelledby="settings-h">
          <h2 id="settings-h" className="mb-2 text-lg font-bold">Terms, late fee and fuel credits</h2>
          {canEdit ? (
            <ActionForm
              action={saveMoneySettings}
              slug={club.slug}
              label="Money settings"
              submitLabel="Save settings"
              grid
              fields={[
                { name: "paymentTermsDays", label: "Charges fall due after (days)", inputMode: "numeric", defaultValue: String(settings.paymentTermsDays) },
                { name: "lateFeeFlat", label: `Late fee (${club.currency})`, inputMode: "decimal", defaultValue: major(settings.lateFeeFlatMinor), hint: `Charged once a billing run to members with a charge overdue more than ${club.settings.lateFeeAfterDays} days.` },
                { name: "lateFeePercent", label: "Plus % of the balance", inputMode: "decimal", defaultValue: String(settings.lateFeeBasisPoints / 100) },
                { name: "fuelCreditCap", label: `Most credited per ${club.unitSystem === "metric" ? "litre" : "gallon"} of fuel (${club.currency})`, inputMode: "decimal", defaultValue: major(settings.fuelCreditCapPerUnitMinor) },
              ]}
            />
          ) : <p className="text-sm text-ink-500">Terms: {settings.paymentTermsDays} days.</p>}
        </section>
      </div>
    </>
  );
}
