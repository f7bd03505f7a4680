// Money benchmarks: reconciling 10,000 bank lines against 10,000 book items (target < 1 s) and a
// billing run for 2,000 members (target < 5 s). Prints medians; never fails.
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { openDatabase, type Db } from "@/db/client";
import { migrateDatabase } from "@/db/migrate";
import { clubs, duesPlans, memberDues, memberships, users } from "@/db/schema";
import { addDays } from "@/lib/dates";
import { accountId, memberAccountId } from "@/db/queries/money-accounts";
import { parseStatementFile } from "@/lib/reconcile";
import { storeStatement } from "@/db/queries/money-reconcile-import";
import { runBillingPeriod } from "@/db/queries/money-billing-run";
import { recordCardPayment, recordPayoutShare } from "@/db/queries/money-card-payments";
import { postEntry } from "@/db/queries/money-post-entry";
import { autoMatchStatement } from "@/db/queries/money-reconcile-match";
import { autoMatch, type BookItem, type MatchBankLine } from "@/lib/reconcile";
import { defaultClubSettings } from "@/lib/validation/club-settings";
import type { BenchResult, BenchTools } from "./run";

const fee = (amount: number) => Math.floor((amount * 29 + 500) / 1000) + 30;
const day = (i: number) => addDays("2026-01-01", i % 28);

/** 8,000 single items (half with cheque numbers), 2,000 card payments in 100 payouts, 1,900 bank-only lines. */
function reconcileData(): { bank: MatchBankLine[]; book: BookItem[] } {
  const book: BookItem[] = [];
  const bank: MatchBankLine[] = [];
  for (let i = 0; i < 8000; i++) {
    const amount = 1000 + ((i * 7919) % 50000);
    const reference = i % 2 ? String(100000 + i) : undefined;
    book.push({ id: `b${i}`, date: day(i), amountMinor: amount, reference, kind: reference ? "cheque" : "deposit" });
    bank.push({ id: `l${i}`, date: addDays(day(i), i % 3), amountMinor: amount, description: "DEPOSIT", reference });
  }
  for (let p = 0; p < 100; p++) {
    let net = 0;
    for (let k = 0; k < 20; k++) {
      const amount = 2000 + ((p * 20 + k) * 373) % 20000;
      book.push({ id: `c${p}-${k}`, date: day(p), amountMinor: amount, feeMinor: fee(amount), payoutId: `po_${p}`, kind: "payment" });
      net += amount - fee(amount);
    }
    bank.push({ id: `p${p}`, date: addDays(day(p), 2), amountMinor: net, description: "CARD PAYOUT", reference: `po_${p}` });
  }
  for (let i = 0; i < 1900; i++) bank.push({ id: `x${i}`, date: day(i), amountMinor: -(100 + i), description: "BANK FEE" });
  return { bank, book };
}

function freshDb(name: string): { db: Db; file: string } {
  const file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), "hangarline-bench-")), `${name}.db`);
  const db = openDatabase(file);
  migrateDatabase(db);
  return { db, file };
}

function makeClub(db: Db, members: number): { clubId: string; userIds: string[] } {
  return db.transaction((tx) => {
    const clubId = tx.insert(clubs).values({ slug: `bench-${members}`, name: "Bench Flying Club", timeZone: "UTC", currency: "USD", unitSystem: "imperial", settings: defaultClubSettings() }).returning({ id: clubs.id }).all()[0]!.id;
    const rows = Array.from({ length: members }, (_, i) => ({ email: `bench${i}@members.invalid`, name: `Bench Member ${i}` }));
    const userIds: string[] = [];
    for (let i = 0; i < rows.length; i += 200) userIds.push(...tx.insert(users).values(rows.slice(i, i + 200)).returning({ id: users.id }).all().map((u) => u.id));
    for (let i = 0; i < userIds.length; i += 200) tx.insert(memberships).values(userIds.slice(i, i + 200).map((userId) => ({ clubId, userId, roles: ["member" as const], joinedOn: "2025-01-01" }))).run();
    return { clubId, userIds };
  });
}

/** The same shape of data, in the books of a temporary database, imported as one statement. */
function reconcileInDb(): { run: () => void; cleanup: () => void } {
  const { db, file } = freshDb("reconcile");
  const { clubId, userIds } = makeClub(db, 1);
  const member = userIds[0]!;
  const { bank } = reconcileData();
  db.transaction((tx) => {
    const bankAccount = accountId(tx, clubId, "bank");
    const memberAccount = memberAccountId(tx, clubId, member);
    for (let i = 0; i < 8000; i++) {
      const amount = 1000 + ((i * 7919) % 50000);
      postEntry(tx, clubId, { date: day(i), kind: "manual-payment", memo: "Cheque", reference: i % 2 ? String(100000 + i) : null, lines: [{ accountId: bankAccount, debitMinor: amount }, { accountId: memberAccount, creditMinor: amount }] });
    }
    for (let p = 0; p < 100; p++) {
      const charges = [];
      for (let k = 0; k < 20; k++) {
        const amount = 2000 + ((p * 20 + k) * 373) % 20000;
        const n = p * 20 + k;
        recordCardPayment(tx, { clubId, memberUserId: member, paymentId: null, checkoutSessionId: `cs_${n}`, paymentIntentId: `pi_${n}`, chargeId: `ch_${n}`, status: "succeeded", amountMinor: amount, feeMinor: fee(amount), currency: "usd", paidAt: new Date(`${day(p)}T12:00:00Z`), lastError: null });
        charges.push({ chargeId: `ch_${n}`, netMinor: amount - fee(amount), feeMinor: fee(amount) });
      }
      recordPayoutShare(tx, { clubId, payoutId: `po_${p}`, arrivalOn: addDays(day(p), 2), currency: "usd", charges, refunds: [] });
    }
  });
  const csv = ["Date,Description,Amount,Reference", ...bank.map((l) => `${l.date},${l.description},${(l.amountMinor / 100).toFixed(2)},${l.reference ?? ""}`)].join("\n");
  return {
    run: () => {
      try {
        db.transaction((tx) => {
          const parsed = parseStatementFile({ format: "csv", text: csv, currency: "USD", mapping: { date: "Date", description: "Description", amount: "Amount", reference: "Reference" } });
          if (!parsed.ok) throw new Error(parsed.errors.join("; "));
          const { statementId } = storeStatement(tx, { clubId, userId: null, currency: "USD", format: "csv", fileName: "bench.csv", text: csv, parsed, closingBalanceMinor: 0 });
          autoMatchStatement(tx, { clubId, userId: null }, statementId);
          tx.rollback();
        });
      } catch (error) {
        if (!(error instanceof Error && error.message === "Rollback")) throw error;
      }
    },
    cleanup: () => {
      db.$client.close();
      fs.rmSync(path.dirname(file), { recursive: true, force: true });
    },
  };
}

function billingInDb(members: number): { run: () => void; cleanup: () => void } {
  const { db, file } = freshDb("billing");
  const { clubId, userIds } = makeClub(db, members);
  db.transaction((tx) => {
    const planId = tx.insert(duesPlans).values({ clubId, name: "Full member, monthly", period: "monthly", category: "full", amountMinor: 9500, currency: "USD" }).returning({ id: duesPlans.id }).all()[0]!.id;
    for (let i = 0; i < userIds.length; i += 200) {
      // Every tenth member joined in the billed month, so their dues are prorated.
      tx.insert(memberDues).values(userIds.slice(i, i + 200).map((memberUserId, k) => ({ clubId, memberUserId, planId, category: "full" as const, startsOn: (i + k) % 10 === 0 ? "2026-03-16" : "2025-01-01" }))).run();
    }
    runBillingPeriod(tx, { club: { id: clubId } }, { month: "2026-02", runDate: "2026-02-01" });
  });
  return {
    run: () => {
      try {
        db.transaction((tx) => {
          runBillingPeriod(tx, { club: { id: clubId } }, { month: "2026-03", runDate: "2026-03-01" });
          tx.rollback();
        });
      } catch (error) {
        if (!(error instanceof Error && error.message === "Rollback")) throw error;
      }
    },
    cleanup: () => {
      db.$client.close();
      fs.rmSync(path.dirname(file), { recursive: true, force: true });
    },
  };
}

async function ownMeasure(name: string, fn: () => unknown, opts: { samples?: number; warmup?: number; note?: string } = {}): Promise<BenchResult> {
  for (let i = 0; i < (opts.warmup ?? 1); i++) await fn();
  const samplesMs: number[] = [];
  for (let i = 0; i < (opts.samples ?? 5); i++) {
    const t = performance.now();
    await fn();
    samplesMs.push(performance.now() - t);
  }
  return { name, samplesMs, note: opts.note };
}

const medianOf = (v: number[]) => {
  const s = [...v].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
};

/** Run by tests/bench/run.ts (which prints the results), or on its own (then it prints them). */
export async function run(tools?: BenchTools): Promise<BenchResult[]> {
  const measure = tools?.measure ?? ownMeasure;
  const results: BenchResult[] = [];
  const { bank, book } = reconcileData();
  results.push(await measure("reconcile: autoMatch 10,000 bank lines × 10,000 book items", () => autoMatch(bank, book), { samples: 9, warmup: 2, note: "target < 1 s; 8,000 singles (half by cheque number), 100 payouts of 20 card payments net of fees, 1,900 bank-only lines" }));
  const rec = reconcileInDb();
  try {
    results.push(await measure("reconcile: import CSV + store + autoMatch + write matches (SQLite)", rec.run, { samples: 5, warmup: 1, note: "the same 10,000 lines against 10,000 book items, rolled back after each sample" }));
  } finally {
    rec.cleanup();
  }
  const bill = billingInDb(2000);
  try {
    results.push(await measure("billing run: 2,000 members (dues, late fees, statements, e-mails)", bill.run, { samples: 5, warmup: 1, note: "target < 5 s; one transaction, rolled back after each sample" }));
  } finally {
    bill.cleanup();
  }
  if (!tools) for (const r of results) console.log(`${r.name.padEnd(72)} median ${medianOf(r.samplesMs).toFixed(1)} ms (n=${r.samplesMs.length})`);
  return results;
}

if (process.argv[1] && path.resolve(process.argv[1]) === path.resolve(new URL(import.meta.url).pathname)) await run();
