import "server-only";
import { and, eq, isNull, sql } from "drizzle-orm";
import type { Db, Tx } from "@/db/client";
import { ledgerAccounts } from "@/db/schema";
import { ensureChart } from "@/db/queries/money-accounts";
import { chartChangeProblems, chartDeleteProblem, SYSTEM_ACCOUNT_CODES, type AccountType, type ChartAccountRow, type ChartChange } from "@/lib/money";

// The club's chart of accounts as the treasurer edits it: every account except the members'
// own receivable sub-accounts (one per member, opened by the ledger). The rules of a change
// are pure (chartChangeProblems / chartDeleteProblem in lib/money/chart.ts); this file reads
// and writes.

export type ChartListRow = ChartAccountRow & { id: string; inUse: boolean; lineCount: number; system: boolean };

const TYPE_ORDER: Record<AccountType, number> = { asset: 0, liability: 1, equity: 2, income: 3, expense: 4 };

export function listChart(db: Db | Tx, clubId: string): ChartListRow[] {
  ensureChart(db, clubId);
  const rows = db
    .select({
      id: ledgerAccounts.id, code: ledgerAccounts.code, name: ledgerAccounts.name, type: ledgerAccounts.type, parentCode: ledgerAccounts.parentCode,
      lineCount: sql<number>`(select count(*) from journal_lines l where l.account_id = "ledger_accounts"."id" and l.club_id = "ledger_accounts"."club_id")`,
      memberLines: sql<number>`case when "ledger_accounts"."code" = 'member-receivables' then (select count(*) from journal_lines l join ledger_accounts m on m.id = l.account_id where m.club_id = "ledger_accounts"."club_id" and m.member_user_id is not null) else 0 end`,
    })
    .from(ledgerAccounts)
    .where(and(eq(ledgerAccounts.clubId, clubId), isNull(ledgerAccounts.memberUserId)))
    .all();
  return rows
    .map((r) => {
      const lineCount = Number(r.lineCount) + Number(r.memberLines);
      return { id: r.id, code: r.code, name: r.name, type: r.type, parentCode: r.parentCode, lineCount, inUse: lineCount > 0, system: SYSTEM_ACCOUNT_CODES.has(r.code) };
    })
    .sort((a, b) => TYPE_ORDER[a.type] - TYPE_ORDER[b.type] || a.code.localeCompare(b.code));
}

/** Accounts an unknown bank line may be booked to: everything but the bank itself and member receivables. */
export function bookableAccounts(db: Db | Tx, clubId: string): { code: string; name: string; type: AccountType }[] {
  return listChart(db, clubId)
    .filter((a) => a.code !== "bank" && a.code !== "member-receivables")
    .map((a) => ({ code: a.code, name: a.name, type: a.type }));
}

export type ChartWrite = { ok: true; account: ChartListRow } | { ok: false; message: string; fieldErrors: Record<string, string[]>; code: "invalid" | "not_found" | "conflict" };

export function createChartAccount(tx: Tx, clubId: string, change: ChartChange): ChartWrite {
  const chart = listChart(tx, clubId);
  const problems = chartChangeProblems(change, null, chart);
  if (problems) return { ok: false, message: "Some fields need attention; nothing was saved.", fieldErrors: problems, code: "invalid" };
  tx.insert(ledgerAccounts).values({ clubId, code: change.code, name: change.name.trim(), type: change.type, parentCode: change.parentCode }).run();
  return { ok: true, account: listChart(tx, clubId).find((a) => a.code === change.code)! };
}

export function updateChartAccount(tx: Tx, clubId: string, accountId: string, change: ChartChange): ChartWrite & { before?: ChartListRow } {
  const chart = listChart(tx, clubId);
  const existing = chart.find((a) => a.id === accountId);
  if (!existing) return { ok: false, message: "That account was not found in this club's chart.", fieldErrors: {}, code: "not_found" };
  const problems = chartChangeProblems(change, existing, chart);
  if (problems) return { ok: false, message: "Some fields need attention; nothing was saved.", fieldErrors: problems, code: "invalid" };
  tx.update(ledgerAccounts)
    .set({ code: change.code, name: change.name.trim(), type: change.type, parentCode: change.parentCode })
    .where(and(eq(ledgerAccounts.clubId, clubId), eq(ledgerAccounts.id, accountId)))
    .run();
  if (change.code !== existing.code) {
    // Sub-accounts follow their parent's new code.
    tx.update(ledgerAccounts).set({ parentCode: change.code }).where(and(eq(ledgerAccounts.clubId, clubId), eq(ledgerAccounts.parentCode, existing.code), isNull(ledgerAccounts.memberUserId))).run();
  }
  return { ok: true, account: listChart(tx, clubId).find((a) => a.id === accountId)!, before: existing };
}

export function deleteChartAccount(tx: Tx, clubId: string, accountId: string): ChartWrite {
  const chart = listChart(tx, clubId);
  const existing = chart.find((a) => a.id === accountId);
  if (!existing) return { ok: false, message: "That account was not found in this club's chart.", fieldErrors: {}, code: "not_found" };
  const problem = chartDeleteProblem(existing, chart);
  if (problem) return { ok: false, message: problem, fieldErrors: {}, code: "conflict" };
  tx.delete(ledgerAccounts).where(and(eq(ledgerAccounts.clubId, clubId), eq(ledgerAccounts.id, accountId), isNull(ledgerAccounts.memberUserId))).run();
  return { ok: true, account: existing };
}
