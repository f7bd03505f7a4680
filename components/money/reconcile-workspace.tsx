"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { useQuery } from "@tanstack/react-query";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import type { ReconciliationWorkspace, WorkspaceLine } from "@/db/queries/money-reconcile";
import { bookLine, ignoreLine, lockReconciledPeriod, matchBankLine, runAutoMatch, unmatchLine } from "@/lib/actions/money/reconcile-lines";
import { daysBetween } from "@/lib/dates";
import { DEFAULT_LOCALE, formatMoney } from "@/lib/money";
import { ActionButton } from "./action-form";
import { PeriodReportPanel } from "./period-report";
import { formatDate } from "@/lib/dates";

type Data = ReconciliationWorkspace;
const KIND_WORDS: Record<string, string> = { exact: "same amount and date", reference: "same reference", payout: "card payout", manual: "matched by hand", booked: "posted from the statement" };

function MatchForm({ slug, line, data, currency, locale }: { slug: string; line: WorkspaceLine; data: Data; currency: string; locale?: string }) {
  const form = useFormAction(matchBankLine);
  const { state } = form;
  const candidates = [
    ...data.openBook.map((b) => ({ id: b.id, date: b.date, amountMinor: b.amountMinor, text: `${b.memo}${b.reference ? ` (${b.reference})` : ""}` })),
    ...data.openPayouts.map((p) => ({ id: p.id, date: p.date, amountMinor: p.amountMinor, text: `Card payout ${p.payoutId}: ${p.carried} payments, ${formatMoney(p.feeMinor, currency, locale)} fees` })),
  ]
    .filter((c) => Math.sign(c.amountMinor) === Math.sign(line.amountMinor))
    .sort((a, b) => Math.abs(daysBetween(a.date, line.date)) - Math.abs(daysBetween(b.date, line.date)))
    .slice(0, 15);
  return (
    <FormShell form={form} label={`Match line ${line.lineNo}`} className="mt-2">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="bankLineId" value={line.id} />
      {candidates.length === 0 ? <p className="text-sm text-ink-500">Nothing open in the books with this sign.</p> : (
        <fieldset>
          <legend className="field-label">Book items that make up {formatMoney(line.amountMinor, currency, locale)} (choose one or several)</legend>
          {candidates.map((c) => (
            <label key={c.id} className="flex items-start gap-2 py-1 text-sm">
              <input type="checkbox" name="bookIds[]" value={c.id} className="mt-1 size-4" />
              <span><span className="tabular">{formatDate(c.date, locale ?? DEFAULT_LOCALE)}</span> · {c.text} · <span className="font-mono tabular">{formatMoney(c.amountMinor, currency, locale)}</span></span>
            </label>
          ))}
        </fieldset>
      )}
      {state.fieldErrors.bookIds?.length ? <p className="field-error">{state.fieldErrors.bookIds.join(" ")}</p> : null}
      <div className="mt-2"><SubmitButton variant="secondary" pendingText="Matching…">Match</SubmitButton></div>
    </FormShell>
  );
}

const TYPE_GROUPS = { expense: "Expenses", income: "Income", liability: "Liabilities", asset: "Assets", equity: "Equity" } as const;

function BookForm({ slug, line, accounts }: { slug: string; line: WorkspaceLine; accounts: Data["bookableAccounts"] }) {
  const form = useFormAction(bookLine);
  const { state } = form;
  return (
    <FormShell form={form} label={`Book line ${line.lineNo}`} className="mt-2 grid gap-2 sm:grid-cols-[1fr_1fr_auto] sm:items-end" answer="none">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="bankLineId" value={line.id} />
      <label className="text-sm"><span className="field-label">Account</span>
        <select name="account" className="field-input" defaultValue="" aria-invalid={state.fieldErrors.account?.length ? true : undefined}>
          <option value="" disabled>Choose an account…</option>
          {(["expense", "income", "liability", "asset", "equity"] as const).map((type) => (
            <optgroup key={type} label={TYPE_GROUPS[type]}>
              {accounts.filter((a) => a.type === type).map((a) => <option key={a.code} value={a.code}>{a.name}</option>)}
            </optgroup>
          ))}
        </select>
        {state.fieldErrors.account?.length ? <span className="field-error block">{state.fieldErrors.account.join(" ")}</span> : null}
      </label>
      <label className="text-sm"><span className="field-label">Memo</span><input name="memo" className="field-input" defaultValue={line.description} /></label>
      <SubmitButton variant="secondary" pendingText="Posting…">Post to the books</SubmitButton>
      <div className="sm:col-span-3"><FormMessage state={state} answerCount={form.answerCount} /></div>
    </FormShell>
  );
}

function LineRow({ slug, line, data, currency, locale, locked }: { slug: string; line: WorkspaceLine; data: Data; currency: string; locale?: string; locked: boolean }) {
  const status = line.match ? `Matched: ${KIND_WORDS[line.match.kind] ?? line.match.kind}` : line.ignored ? "Set aside" : "Open";
  const shape = line.match ? "■" : line.ignored ? "◇" : "□";
  return (
    <li className="border-t border-sand-200 py-3 first:border-t-0">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <span className="min-w-0"><span className="tabular">{formatDate(line.date, locale ?? DEFAULT_LOCALE)}</span> · <span className="break-words">{line.description}</span>{line.reference ? <span className="text-ink-500"> · {line.reference}</span> : null}</span>
        <span className="flex items-baseline gap-3"><span className="font-mono font-bold tabular">{formatMoney(line.amountMinor, currency, locale)}</span><span className="text-sm"><span aria-hidden="true">{shape} </span>{status}</span></span>
      </div>
      {line.match ? (
        <ul className="mt-1 text-sm text-ink-700">
          {line.match.items.map((i) => <li key={i.journalLineId}>↳ {formatDate(i.date, locale ?? DEFAULT_LOCALE)} · {i.memo} · <span className="font-mono tabular">{formatMoney(i.amountMinor, currency, locale)}</span></li>)}
        </ul>
      ) : null}
      {!locked ? (
        <div className="mt-2 flex flex-wrap gap-2">
          {line.match ? <ActionButton action={unmatchLine} slug={slug} hidden={{ bankLineId: line.id }} label="Undo match" /> : null}
          {line.ignored ? <ActionButton action={ignoreLine} slug={slug} hidden={{ bankLineId: line.id, ignored: "false" }} label="Bring back" /> : null}
          {!line.match && !line.ignored ? (
            <>
              <details className="w-full rounded border border-sand-300 bg-sand-50 p-2"><summary className="cursor-pointer text-sm font-bold text-fin-600">Match by hand…</summary><MatchForm slug={slug} line={line} data={data} currency={currency} locale={locale} /></details>
              <details className="w-full rounded border border-sand-300 bg-sand-50 p-2"><summary className="cursor-pointer text-sm font-bold text-fin-600">Not in the books: post it…</summary><BookForm slug={slug} line={line} accounts={data.bookableAccounts} /></details>
              <ActionButton action={ignoreLine} slug={slug} hidden={{ bankLineId: line.id, ignored: "true" }} label="Set aside" />
            </>
          ) : null}
        </div>
      ) : null}
    </li>
  );
}

/** The reconciliation of one statement; refreshes itself so payouts that arrive meanwhile show up. */
export function ReconcileWorkspace({ slug, currency, locale, initial, renderedAt }: { slug: string; currency: string; locale?: string; initial: Data; renderedAt: number }) {
  const id = initial.statement.id;
  const { data } = useQuery({
    queryKey: ["reconciliation", slug, id, renderedAt],
    queryFn: async () => {
      const res = await fetch(`/api/clubs/${slug}/money/reconciliation/${id}`, { cache: "no-store" });
      if (!res.ok) throw new Error(`Reconciliation ${res.status}`);
      return (await res.json()) as Data;
    },
    initialData: initial,
    refetchInterval: 15_000,
  });
  const locked = !!data.period || (!!data.lockedThrough && data.statement.periodEnd <= data.lockedThrough);
  const open = data.lines.filter((l) => !l.match && !l.ignored).length;
  return (
    <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,24rem)]">
      <section className="card min-w-0" aria-labelledby="lines-h">
        <div className="mb-2 flex flex-wrap items-center justify-between gap-2">
          <h2 id="lines-h" className="text-lg font-bold">Statement lines <span className="text-sm font-normal text-ink-700">({open} open of {data.lines.length})</span></h2>
          {!locked && open > 0 ? <ActionButton action={runAutoMatch} slug={slug} hidden={{ statementId: id }} label="Match automatically" pendingText="Matching…" /> : null}
        </div>
        <ul aria-label="Statement lines">
          {data.lines.map((l) => <LineRow key={l.id} slug={slug} line={l} data={data} currency={currency} locale={locale} locked={locked} />)}
        </ul>
      </section>
      <div className="grid min-w-0 grid-cols-1 content-start gap-4">
        <PeriodReportPanel report={data.report} currency={currency} locale={locale} />
        {data.period ? (
          <p role="status" className="rounded border border-go-600 bg-go-100 px-3 py-2 text-go-800"><span aria-hidden="true">■ </span>Reconciled and locked through {formatDate(data.period.periodEnd, locale ?? DEFAULT_LOCALE)}.</p>
        ) : locked ? (
          <p className="rounded border border-sand-500 bg-sand-50 px-3 py-2 text-sm">This statement lies inside a locked period.</p>
        ) : data.report.agrees && data.report.bankItemsNotInBooks.length > 0 ? (
          <p className="rounded border border-ask-600 bg-ask-100 px-3 py-2 text-sm text-ask-800"><span aria-hidden="true">◆ </span>The sides agree, but {data.report.bankItemsNotInBooks.length} statement line(s) are not in the books yet. Post them (&ldquo;Not in the books: post it&rdquo;) so the locked period shows them.</p>
        ) : data.report.agrees ? (
          <ActionButton action={lockReconciledPeriod} slug={slug} hidden={{ statementId: id }} label="Lock this period" variant="primary" pendingText="Locking…" confirm={`Lock the books through ${formatDate(data.statement.periodEnd, locale ?? DEFAULT_LOCALE)}? Nothing can be posted on or before that day afterwards.`} />
        ) : (
          <p className="rounded border border-ask-600 bg-ask-100 px-3 py-2 text-sm text-ask-800"><span aria-hidden="true">◆ </span>The two sides differ by {formatMoney(data.report.differenceMinor, currency, locale)}. Match, post or set aside lines until they agree; then the period can be locked.</p>
        )}
      </div>
    </div>
  );
}
