// Temporary re-export for the lib/ledger files still being moved (bank import, reconciliation);
// the code lives in db/queries/money-post-entry.ts. Delete once nothing imports this path.
export * from "@/db/queries/money-post-entry";
