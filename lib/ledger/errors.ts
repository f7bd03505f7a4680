// Temporary re-export for the lib/ledger files still being moved (bank import, reconciliation);
// the rules live in lib/money/errors.ts. Delete once nothing imports this path.
export * from "@/lib/money/errors";
