import "server-only";
// The billing run: dues for one month, late fees for members in arrears, and the previous
// month's statements with their e-mails. Every posting carries an idempotency key, so a second
// run of the same month posts nothing and sends nothing.
import { and, eq, sql } from "drizzle-orm";
import { billingRuns, clubs, duesPlans, memberDues, memberships } from "@/db/schema";
import { compareIsoDates, type IsoDate } from "@/lib/dates";
import { duesForMember, duesPeriod, lateFee } from "@/lib/money";
import { accountId, memberAccountIds, type DbLike } from "./money-accounts";
import { memberPositions } from "./money-member-balances";
import { LedgerError } from "@/lib/money/errors";
import { monthRange, shiftMonthKey } from "@/lib/money/months";
import { assertDateOpen, postEntries, type PostEntryInput } from "./money-post-entry";
import { getMoneySettings } from "./money-settings";
import { dueDateFor, lateFeePolicyOf } from "@/lib/money/settings";
import { issueStatements } from "./money-statements";

export type BillingRunResult = {
  runId: string;
  month: string;
  duesPosted: number;
  lateFeesPosted: number;
  totalMinor: number;
  statementsIssued: number;
  /** Postings skipped because an earlier run of this month made them. */
  alreadyPosted: number;
};

const clamp = (d: IsoDate, lo: IsoDate, hi: IsoDate) => (d < lo ? lo : d > hi ? hi : d);

export function runBillingPeriod(tx: DbLike, ctx: { club: { id: string }; user?: { id: string } | null }, input: { month: string; runDate: IsoDate }): BillingRunResult {
  const clubId = ctx.club.id;
  const { start, end } = monthRange(input.month);
  assertDateOpen(tx, clubId, start);
  const club = tx.select({ currency: clubs.currency }).from(clubs).where(eq(clubs.id, clubId)).get();
  if (!club) throw new LedgerError("That club was not found.", "not-found");
  const settings = getMoneySettings(tx, clubId);
  const policy = lateFeePolicyOf(settings);

  const people = tx
    .select({ userId: memberships.userId, roles: memberships.roles, planId: memberDues.planId, startsOn: memberDues.startsOn, period: duesPlans.period, amountMinor: duesPlans.amountMinor, planName: duesPlans.name, planActive: duesPlans.active })
    .from(memberships)
    .leftJoin(memberDues, and(eq(memberDues.clubId, clubId), eq(memberDues.memberUserId, memberships.userId)))
    .leftJoin(duesPlans, and(eq(duesPlans.clubId, clubId), eq(duesPlans.id, memberDues.planId)))
    .where(and(eq(memberships.clubId, clubId), eq(memberships.status, "active")))
    .all()
    .filter((p) => p.roles.includes("member"));
  // Late fees look at charges from before the month, as they stood on its first day (with every
  // payment so far): the month's own dues never make the same run charge a fee the second time.
  const overdue = memberPositions(tx, clubId, undefined, (m) => m.date < start || m.amountMinor < 0);
  const accounts = memberAccountIds(tx, clubId, people.filter((p) => p.planId || (overdue.get(p.userId)?.balanceMinor ?? 0) > 0).map((p) => p.userId));
  const duesIncome = accountId(tx, clubId, "dues-income");
  const lateIncome = accountId(tx, clubId, "late-fee-income");
  const result = { duesPosted: 0, lateFeesPosted: 0, totalMinor: 0, alreadyPosted: 0 };
  const feeDate = clamp(input.runDate, start, end);

  const batch: PostEntryInput[] = [];
  for (const p of people) {
    const account = accounts.get(p.userId);
    if (!account) continue;
    if (p.planId && p.period && p.amountMinor !== null && p.planActive && p.startsOn && compareIsoDates(p.startsOn, end) <= 0) {
      const range = duesPeriod(p.period, start);
      const joinedOn = p.startsOn > range.start ? p.startsOn : null;
      const amount = duesForMember({ plan: p.period, amountMinor: p.amountMinor, date: start, joinedOn });
      if (amount > 0) {
        const date = range.start > start ? range.start : start;
        batch.push({
          date,
          kind: "dues",
          memo: `Dues ${p.planName}, ${range.start} to ${range.end}${joinedOn ? ` (from ${joinedOn})` : ""}`,
          lines: [
            { accountId: account, debitMinor: amount },
            { accountId: duesIncome, creditMinor: amount },
          ],
          memberUserId: p.userId,
          dueOn: dueDateFor(date, settings),
          sourceType: "billing-run",
          sourceId: input.month,
          sourceKey: `dues:${range.start}:${p.userId}`,
          createdById: ctx.user?.id ?? null,
        });
      }
    }
    const position = overdue.get(p.userId);
    const fee = position ? lateFee(position.balanceMinor, position.oldestDueDate, start, settings.lateFeeAfterDays, policy) : 0;
    if (fee > 0) {
      batch.push({
        date: feeDate,
        kind: "late-fee",
        memo: `Late fee: balance overdue since ${position?.oldestDueDate}`,
        lines: [
          { accountId: account, debitMinor: fee },
          { accountId: lateIncome, creditMinor: fee },
        ],
        memberUserId: p.userId,
        dueOn: dueDateFor(feeDate, settings),
        sourceType: "billing-run",
        sourceId: input.month,
        sourceKey: `late-fee:${start}:${p.userId}`,
        createdById: ctx.user?.id ?? null,
      });
    }
  }
  postEntries(tx, clubId, batch).forEach((posted, i) => {
    const entry = batch[i]!;
    if (!posted.created) {
      result.alreadyPosted++;
      return;
    }
    if (entry.kind === "dues") result.duesPosted++;
    else result.lateFeesPosted++;
    result.totalMinor += entry.lines[0]!.debitMinor ?? 0;
  });

  const existing = tx.select().from(billingRuns).where(and(eq(billingRuns.clubId, clubId), eq(billingRuns.periodStart, start))).get();
  const runId = existing
    ? existing.id
    : tx.insert(billingRuns).values({ clubId, periodStart: start, periodEnd: end, runCount: 0, ranById: ctx.user?.id ?? null }).returning({ id: billingRuns.id }).all()[0]!.id;
  const issued = issueStatements(tx, clubId, { month: shiftMonthKey(input.month, -1), billingRunId: runId, memberUserIds: people.map((p) => p.userId) });
  tx.update(billingRuns)
    .set({
      runCount: sql`${billingRuns.runCount} + 1`,
      entriesPosted: sql`${billingRuns.entriesPosted} + ${result.duesPosted + result.lateFeesPosted}`,
      totalMinor: sql`${billingRuns.totalMinor} + ${result.totalMinor}`,
      statementsIssued: sql`${billingRuns.statementsIssued} + ${issued}`,
      ranById: ctx.user?.id ?? null,
    })
    .where(and(eq(billingRuns.clubId, clubId), eq(billingRuns.id, runId)))
    .run();
  return { runId, month: input.month, ...result, statementsIssued: issued };
}
