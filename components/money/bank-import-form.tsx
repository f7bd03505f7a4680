"use client";
import { FieldOf, type FieldSpec } from "@/components/money/action-form";
import { FormShell } from "@/components/ui/form-shell";
import { SubmitButton } from "@/components/ui/submit-button";
import { useFormAction } from "@/components/ui/use-form-action";
import { importBankStatement, type BankImportAnswer } from "@/lib/actions/money/import-bank-statement";
import { Day } from "@/components/ui/day";

function fieldsFor(currency: string): FieldSpec[] {
  return [
    { name: "file", label: "Statement file", type: "file", accept: ".csv,.ofx,.qfx,text/csv,application/x-ofx" },
    { name: "format", label: "Format", type: "select", options: [{ value: "csv", label: "CSV (spreadsheet export)" }, { value: "ofx", label: "OFX" }] },
    { name: "closingBalance", label: `Closing balance (${currency})`, inputMode: "decimal", hint: "As printed on the statement. Optional for OFX." },
    { name: "dateColumn", label: "Date column", defaultValue: "Date" },
    { name: "amountColumn", label: "Amount column", defaultValue: "Amount", hint: "Or leave empty and give debit and credit columns." },
    { name: "descriptionColumn", label: "Description column(s)", defaultValue: "Description", hint: "Join several with +, e.g. Payee + Memo." },
    { name: "referenceColumn", label: "Reference column", defaultValue: "Reference" },
    { name: "debitColumn", label: "Debit column (money out)" },
    { name: "creditColumn", label: "Credit column (money in)" },
    { name: "currencyColumn", label: "Currency column (optional)", hint: `Rows in a currency other than ${currency} are refused.` },
    { name: "sign", label: "The amount column shows deposits as", type: "select", options: [{ value: "deposits-positive", label: "Positive numbers" }, { value: "deposits-negative", label: "Negative numbers" }] },
    { name: "dateFormat", label: "Dates look like", type: "select", options: [{ value: "ISO", label: "2026-04-30" }, { value: "MM/DD/YYYY", label: "04/30/2026" }, { value: "DD/MM/YYYY", label: "30/04/2026" }, { value: "DD.MM.YYYY", label: "30.04.2026" }] },
    { name: "delimiter", label: "Separator", type: "select", options: [{ value: ",", label: "Comma" }, { value: ";", label: "Semicolon" }, { value: "tab", label: "Tab" }] },
    { name: "periodStart", label: "First day (optional)", type: "date" },
    { name: "periodEnd", label: "Last day (optional)", type: "date" },
    { name: "decimalComma", label: "Amounts use a decimal comma (12,50)", type: "checkbox" },
  ];
}

/**
 * The statement import. When an OFX file holds several accounts the answer lists them and the
 * treasurer chooses one (the file stays chosen); nothing is imported until then.
 */
export function BankImportForm({ slug, currency, locale }: { slug: string; currency: string; locale?: string }) {
  const form = useFormAction(importBankStatement);
  const { state } = form;
  const accounts = !state.ok ? ((state.data as BankImportAnswer | undefined)?.accounts ?? []) : [];
  const fields = fieldsFor(currency);
  const otherErrors = Object.entries(state.fieldErrors).filter(([k]) => k !== "account" && !fields.some((f) => f.name === k)).flatMap(([, v]) => v);
  return (
    <FormShell form={form} label="Import a bank statement">
      {otherErrors.length && !state.ok ? <p className="field-error mb-3">{otherErrors.join(" ")}</p> : null}
      <input type="hidden" name="club" value={slug} />
      {accounts.length > 1 ? (
        <fieldset className="mb-4 rounded border border-sand-300 bg-sand-100 p-3" aria-describedby="acct-help">
          <legend className="field-label px-1">Account to import</legend>
          <p id="acct-help" className="mb-2 text-sm text-ink-700">This file holds {accounts.length} accounts. Choose the one this club&apos;s bank account statement is for; the others are not imported.</p>
          {accounts.map((a) => (
            <label key={a.key} className="flex min-h-11 items-start gap-2 py-1 text-sm">
              <input type="radio" name="account" value={a.key} className="mt-1 size-5" />
              <span>
                <span className="font-mono font-bold">{a.maskedId}</span> · {a.type ? a.type.toLowerCase() : "type not given"} · {a.currency || "currency not given"} · {a.transactions} transaction{a.transactions === 1 ? "" : "s"}
                {a.firstDate && a.lastDate ? <> · <span className="tabular"><Day date={a.firstDate} locale={locale} /></span> to <span className="tabular"><Day date={a.lastDate} locale={locale} /></span></> : null}
              </span>
            </label>
          ))}
        </fieldset>
      ) : null}
      <div className="grid gap-x-4 sm:grid-cols-2">
        {fields.map((f) => (
          <FieldOf key={f.name} spec={f} errors={state.fieldErrors[f.name]} />
        ))}
      </div>
      <SubmitButton pendingText="Importing…">{accounts.length > 1 ? "Import the chosen account" : "Import and match"}</SubmitButton>
    </FormShell>
  );
}
