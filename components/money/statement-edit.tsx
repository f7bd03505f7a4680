"use client";
import { Field } from "@/components/ui/field";
import { FormShell } from "@/components/ui/form-shell";
import { SubmitButton } from "@/components/ui/submit-button";
import { useFormAction } from "@/components/ui/use-form-action";
import { correctBankStatement, removeBankStatement } from "@/lib/actions/money/bank-statement-edits";

/** Corrects a mistyped closing balance of an imported statement that is not locked yet. */
export function CorrectStatementForm({ slug, statementId, currency, closing }: { slug: string; statementId: string; currency: string; closing: string }) {
  const form = useFormAction(correctBankStatement, { keepValuesAfterOk: true });
  return (
    <FormShell form={form} label="Correct the closing balance">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="statementId" value={statementId} />
      <Field label={`Closing balance as printed on the statement (${currency})`} name="closingBalance" inputMode="decimal" defaultValue={closing} errors={form.state.fieldErrors.closingBalance} />
      <SubmitButton variant="secondary" pendingText="Correcting…">Correct closing balance</SubmitButton>
    </FormShell>
  );
}

/** Removes the statement and its lines (refused, with the reason, while a line is matched). */
export function RemoveStatementForm({ slug, statementId, lineCount, matchedCount }: { slug: string; statementId: string; lineCount: number; matchedCount: number }) {
  const form = useFormAction(removeBankStatement);
  return (
    <FormShell form={form} label="Remove the statement" confirm={`Remove this statement and its ${lineCount} line${lineCount === 1 ? "" : "s"}? The file can be imported again afterwards.`}>
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="statementId" value={statementId} />
      <p className="mb-2 text-sm text-ink-700">
        {matchedCount > 0
          ? `${matchedCount} of its lines ${matchedCount === 1 ? "is" : "are"} matched to the books: undo ${matchedCount === 1 ? "that match" : "those matches"} first, then remove the statement.`
          : "Removes the statement and its lines (set-aside lines too), for instance to import the right file instead."}
      </p>
      <SubmitButton variant="danger" pendingText="Removing…">Remove statement</SubmitButton>
    </FormShell>
  );
}
