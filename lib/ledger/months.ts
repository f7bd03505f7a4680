// Temporary re-export for the lib/ledger files still being moved (bank import, bank view);
// the rules live in lib/money/months.ts. Delete once nothing imports this path.
export * from "@/lib/money/months";
