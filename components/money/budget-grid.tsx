"use client";
import { FormShell } from "@/components/ui/form-shell";
import { SubmitButton } from "@/components/ui/submit-button";
import { useFormAction } from "@/components/ui/use-form-action";
import { MONTH_SHORT } from "@/lib/money/budget";
import type { ServerAction } from "./action-form";


export type BudgetGridRow = { code: string; name: string; type: "income" | "expense"; cells: string[]; annual: string };

/**
 * The year's budget as a grid the treasurer types into: one row per income or expense account,
 * one cell per month (amounts in the club's currency, blank for none). One Save sends the whole
 * grid; a refused cell is marked and keeps what was typed.
 */
export function BudgetGrid({ action, slug, year, currency, rows }: { action: ServerAction; slug: string; year: number; currency: string; rows: BudgetGridRow[] }) {
  const form = useFormAction(action, { keepValuesAfterOk: true });
  const errors = form.state.fieldErrors;
  const groups = (["income", "expense"] as const).map((type) => ({ type, rows: rows.filter((r) => r.type === type) }));
  return (
    <FormShell form={form} label={`Budget for ${year}`}>
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="year" value={String(year)} />
      <div className="overflow-x-auto rounded border border-sand-300 bg-white">
        <table className="min-w-max text-sm">
          <caption className="sr-only">Budget for {year} by account and month, in {currency}</caption>
          <thead>
            <tr className="bg-sand-100">
              <th scope="col" className="sticky left-0 z-10 bg-sand-100 px-2 py-2 text-left">Account</th>
              {MONTH_SHORT.map((m) => <th key={m} scope="col" className="px-1 py-2 text-right">{m}</th>)}
              <th scope="col" className="px-2 py-2 text-right">Year</th>
            </tr>
          </thead>
          {groups.map((g) => (
            <tbody key={g.type}>
              <tr><th colSpan={14} scope="colgroup" className="sticky left-0 bg-white px-2 pt-3 text-left">{g.type === "income" ? "Income" : "Expenses"}</th></tr>
              {g.rows.map((r) => (
                <tr key={r.code} className="border-t border-sand-200">
                  <th scope="row" className="sticky left-0 z-10 max-w-40 bg-white px-2 py-1 text-left font-normal">{r.name}</th>
                  {r.cells.map((value, i) => {
                    const name = `b.${r.code}.${String(i + 1).padStart(2, "0")}`;
                    const err = errors[name];
                    return (
                      <td key={name} className="px-0.5 py-1">
                        <input
                          name={name}
                          defaultValue={value}
                          inputMode="decimal"
                          aria-label={`${r.name}, ${MONTH_SHORT[i]} ${year}`}
                          aria-invalid={err ? true : undefined}
                          title={err?.join(" ")}
                          className={`field-input w-24 px-1 text-right font-mono tabular ${err ? "border-stop-600 bg-stop-100" : ""}`}
                        />
                      </td>
                    );
                  })}
                  <td className="px-2 py-1 text-right font-mono tabular">{r.annual}</td>
                </tr>
              ))}
            </tbody>
          ))}
        </table>
      </div>
      {Object.keys(errors).length && !form.state.ok ? (
        <ul className="field-error mt-2 text-sm">{Object.entries(errors).map(([k, v]) => <li key={k}>{v.join(" ")}</li>)}</ul>
      ) : null}
      <p className="mt-2 text-sm text-ink-700">Amounts in {currency}; leave a month blank (or 0) for no budget. The year column shows the saved total.</p>
      <div className="mt-3"><SubmitButton pendingText="Saving…">Save budget</SubmitButton></div>
    </FormShell>
  );
}
