"use server";
import { z } from "zod";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { storeStatement } from "@/db/queries/money-reconcile-import";
import { autoMatchStatement } from "@/db/queries/money-reconcile-match";
import { parseStatementFile, type CsvMapping, type StatementAccount } from "@/lib/reconcile";
import { writeAudit } from "@/lib/server/audit";
import { bankImportSchema, type BankImportInput } from "@/lib/validation/money";
import { minorOf } from "./amounts";
import { ledger } from "./ledger-errors";

/** What a refused import hands the form: the accounts an OFX file holds, to choose from. */
export type BankImportAnswer = { accounts: StatementAccount[] };

const MAX_BYTES = 5 * 1024 * 1024;

const schema = bankImportSchema.and(z.object({ file: z.instanceof(File, { error: "Choose the statement file (CSV or OFX)." }) }));

function mappingOf(input: BankImportInput): CsvMapping {
  const m: CsvMapping = { date: input.dateColumn ?? "", sign: input.sign, dateFormat: input.dateFormat, delimiter: input.delimiter === "tab" ? "\t" : input.delimiter, decimalComma: input.decimalComma };
  if (input.amountColumn) m.amount = input.amountColumn;
  if (input.debitColumn) m.debit = input.debitColumn;
  if (input.creditColumn) m.credit = input.creditColumn;
  if (input.descriptionColumn) m.description = input.descriptionColumn.split("+").map((s) => s.trim()).filter(Boolean);
  if (input.referenceColumn) m.reference = input.referenceColumn;
  if (input.currencyColumn) m.currency = input.currencyColumn;
  return m;
}

export const importBankStatement = clubAction({
  schema,
  permission: ["reconcile", "Reconciliation"],
  success: "Statement imported.",
  async prepare(_ctx, input): Promise<{ text: string; name: string }> {
    const file = input.file;
    if (file.size === 0) throw new ActionError("Some fields need attention; nothing was saved.", { file: ["The file is empty."] });
    if (file.size > MAX_BYTES) throw new ActionError("Some fields need attention; nothing was saved.", { file: ["The file is larger than 5 MB; export one month at a time."] });
    const text = new TextDecoder("utf-8", { fatal: false }).decode(await file.arrayBuffer());
    if (text.includes("\u0000")) throw new ActionError("Some fields need attention; nothing was saved.", { file: ["That is not a text file; export the statement as CSV or OFX."] });
    return { text, name: (file.name || "statement").slice(0, 200) };
  },
  run(tx, ctx, input, prepared) {
    const mapping = input.format === "csv" ? mappingOf(input) : undefined;
    const parsed = parseStatementFile({ format: input.format, text: prepared.text, mapping, currency: ctx.club.currency, account: input.account });
    if (!parsed.ok && parsed.accounts && parsed.accounts.length > 1) {
      // Never the first account alone: the treasurer chooses, and the file stays chosen in the form.
      const said = parsed.errors[0] ?? "Choose the account to import.";
      const message = said.includes("Nothing was imported") ? said : `${said} Nothing was imported.`;
      throw new ActionError(message, { account: [said] }, "invalid", { accounts: parsed.accounts } satisfies BankImportAnswer);
    }
    if (!parsed.ok) {
      // A currency other than the club's is said as such, naming both currencies.
      const currency = parsed.errors.find((e) => e.includes("the club's books are in"));
      const message = currency ? (currency.includes("Nothing was imported") ? currency : `${currency}. Nothing was imported.`) : "The file could not be read; nothing was imported.";
      throw new ActionError(message, { file: parsed.errors });
    }
    const typed = input.closingBalance ? minorOf(input.closingBalance, ctx.club.currency, "closingBalance") : null;
    const closing = typed ?? parsed.closingBalanceMinor;
    if (closing === null) throw new ActionError("Some fields need attention; nothing was saved.", { closingBalance: ["The file gives no closing balance; enter the one printed on the statement."] });
    const stored = ledger(() =>
      storeStatement(tx, { clubId: ctx.club.id, userId: ctx.user.id, currency: ctx.club.currency, format: input.format, fileName: prepared.name, text: prepared.text, mapping, parsed, closingBalanceMinor: closing, periodStart: input.periodStart, periodEnd: input.periodEnd }),
    );
    const auto = ledger(() => autoMatchStatement(tx, { clubId: ctx.club.id, userId: ctx.user.id }, stored.statementId));
    writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "money.bank.import", subjectType: "BankStatement", subjectId: stored.statementId, after: { fileName: prepared.name, format: input.format, account: parsed.account?.maskedId, imported: stored.imported, skipped: stored.skipped, matched: auto.matched } });
    return {
      message: `${parsed.account ? `Account ${parsed.account.maskedId}: ` : ""}${stored.imported} lines imported${stored.skipped ? `, ${stored.skipped} already known and skipped` : ""}; ${auto.matched} matched automatically.`,
      redirectTo: `/clubs/${ctx.club.slug}/money/reconciliation/${stored.statementId}`,
    };
  },
});
