// Shared by the books tests: a reconciled, locked period made to order (the statement and its
// period row, as lockPeriod leaves them), so a test can date money inside it.
import { bankStatements, reconciliationPeriods } from "@/db/schema";
import { db } from "./helpers";

export function lockBooksThrough(clubId: string, periodStart: string, periodEnd: string): void {
  const [statement] = db()
    .insert(bankStatements)
    .values({ clubId, format: "csv", fileName: "locked-for-test.csv", periodStart, periodEnd, closingBalanceMinor: 0, currency: "USD", lineCount: 0 })
    .returning({ id: bankStatements.id })
    .all();
  db().insert(reconciliationPeriods).values({ clubId, statementId: statement!.id, periodStart, periodEnd, statementBalanceMinor: 0, bookBalanceMinor: 0, depositsInTransitMinor: 0, outstandingChequesMinor: 0, bankChargesMinor: 0, bankCreditsMinor: 0, locked: true }).run();
}
