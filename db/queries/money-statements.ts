import "server-only";
import { eq } from "drizzle-orm";
import { clubs, statements } from "@/db/schema";
import { enqueueEmails, type EnqueueInput } from "@/lib/email/outbox";
import { moneyFormatter } from "@/lib/money/format";
import { appUrl } from "@/lib/server/urls";
import type { DbLike } from "./money-accounts";
import { memberContacts, memberMovements, type MemberMovementRow } from "./money-member-balances";
import { LedgerError } from "@/lib/money/errors";
import { monthLabel, monthRange } from "@/lib/money/months";
import { statementFigures, type StatementFigures } from "@/lib/money/statement-lines";

export function statementUrls(slug: string, memberUserId: string, month: string) {
  return {
    web: appUrl(`/clubs/${slug}/account/statements/${month}`),
    member: `/clubs/${slug}/money/members/${memberUserId}/statements/${month}`,
    pdf: appUrl(`/api/clubs/${slug}/statements/${memberUserId}/${month}`),
    pay: appUrl(`/clubs/${slug}/account`),
  };
}

/** One member's statement for a month, read live from the journal. */
export function statementFor(tx: DbLike, clubId: string, memberUserId: string, month: string): StatementFigures & { balanceNowMinor: number } {
  const { start, end } = monthRange(month);
  const movements = memberMovements(tx, clubId, memberUserId);
  const figures = statementFigures(movements.map((m) => ({ entryId: m.entryId, date: m.date, memo: m.memo, amountMinor: m.amountMinor, kind: m.kind })), start, end);
  return { ...figures, balanceNowMinor: movements.reduce((acc, m) => acc + m.amountMinor, 0) };
}

function groupByMember(rows: MemberMovementRow[]): Map<string, MemberMovementRow[]> {
  const out = new Map<string, MemberMovementRow[]>();
  for (const r of rows) {
    const list = out.get(r.memberUserId);
    if (list) list.push(r);
    else out.set(r.memberUserId, [r]);
  }
  return out;
}

type StatementEmail = EnqueueInput<"statement">;

/**
 * Issues the month's statement to each listed member who had a balance or any activity, once:
 * a member who already has that month's statement gets nothing new. Each new statement is
 * e-mailed through the outbox in the same transaction. Returns how many were issued.
 */
export function issueStatements(tx: DbLike, clubId: string, input: { month: string; billingRunId?: string | null; memberUserIds: readonly string[]; force?: boolean }): number {
  const club = tx.select().from(clubs).where(eq(clubs.id, clubId)).get();
  if (!club) throw new LedgerError("That club was not found.", "not-found");
  const { start, end } = monthRange(input.month);
  const byMember = groupByMember(memberMovements(tx, clubId));
  const contacts = memberContacts(tx, clubId);
  const emails: StatementEmail[] = [];
  const money = moneyFormatter(club.currency, club.locale);
  const due: { userId: string; f: StatementFigures; balanceNow: number; contact: { name: string; email: string } }[] = [];
  for (const userId of new Set(input.memberUserIds)) {
    const list = byMember.get(userId) ?? [];
    const f = statementFigures(list.map((m) => ({ entryId: m.entryId, date: m.date, memo: m.memo, amountMinor: m.amountMinor })), start, end);
    if (f.openingMinor === 0 && f.lines.length === 0 && !input.force) continue;
    const contact = contacts.get(userId);
    if (!contact) continue;
    due.push({ userId, f, balanceNow: list.reduce((acc, m) => acc + m.amountMinor, 0), contact });
  }
  const issued = new Set<string>();
  for (let i = 0; i < due.length; i += 100) {
    const rows = due.slice(i, i + 100).map(({ userId, f }) => ({ clubId, memberUserId: userId, periodStart: start, periodEnd: end, openingMinor: f.openingMinor, chargesMinor: f.chargesMinor, creditsMinor: f.creditsMinor, closingMinor: f.closingMinor, currency: club.currency, billingRunId: input.billingRunId ?? null, emailedAt: new Date() }));
    for (const r of tx.insert(statements).values(rows).onConflictDoNothing().returning({ userId: statements.memberUserId }).all()) issued.add(r.userId);
  }
  const label = monthLabel(input.month, club.locale);
  for (const { userId, f, balanceNow, contact } of due) {
    if (!issued.has(userId) && !input.force) continue;
    const urls = statementUrls(club.slug, userId, input.month);
    emails.push({
      clubId,
      to: contact.email,
      subject: `${club.name}: your statement for ${label}`,
      template: "statement",
      payload: {
        clubName: club.name,
        memberName: contact.name,
        periodLabel: label,
        opening: money(f.openingMinor),
        charges: money(f.chargesMinor),
        credits: money(f.creditsMinor),
        closing: money(f.closingMinor),
        balanceNow: money(balanceNow),
        owes: balanceNow > 0,
        statementUrl: urls.web,
        pdfUrl: urls.pdf,
        payUrl: urls.pay,
      },
    });
  }
  enqueueEmails(tx, emails);
  return emails.length;
}
