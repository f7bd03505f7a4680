import "server-only";
import { and, eq } from "drizzle-orm";
import { clubs, duesReminders, memberships } from "@/db/schema";
import type { IsoDate } from "@/lib/dates";
import { enqueueEmails, type EnqueueInput } from "@/lib/email/outbox";
import { moneyFormatter } from "@/lib/money/format";
import { appUrl } from "@/lib/server/urls";
import type { DbLike } from "./money-accounts";
import { memberContacts, memberPositions } from "./money-member-balances";
import { LedgerError } from "@/lib/money/errors";

/**
 * Reminds every active member with charges past due on `asOf`, through the outbox, at most
 * once a day per member (a second click the same day sends nothing). Returns how many went out.
 */
export function sendDuesReminders(tx: DbLike, clubId: string, asOf: IsoDate): number {
  const club = tx.select().from(clubs).where(eq(clubs.id, clubId)).get();
  if (!club) throw new LedgerError("That club was not found.", "not-found");
  const active = new Set(tx.select({ userId: memberships.userId }).from(memberships).where(and(eq(memberships.clubId, clubId), eq(memberships.status, "active"))).all().map((m) => m.userId));
  const contacts = memberContacts(tx, clubId);
  const emails: EnqueueInput<"dues-reminder">[] = [];
  const money = moneyFormatter(club.currency, club.locale);
  for (const [userId, p] of memberPositions(tx, clubId)) {
    const overdue = p.items.filter((i) => i.dueDate < asOf).reduce((s, i) => s + i.openMinor, 0);
    const contact = contacts.get(userId);
    if (!active.has(userId) || !contact || p.balanceMinor <= 0 || overdue <= 0) continue;
    const sent = tx.insert(duesReminders).values({ clubId, memberUserId: userId, sentOn: asOf, balanceMinor: p.balanceMinor }).onConflictDoNothing().returning({ id: duesReminders.id }).all();
    if (sent.length === 0) continue;
    emails.push({
      clubId,
      to: contact.email,
      subject: `${club.name}: ${money(Math.min(overdue, p.balanceMinor))} overdue on your account`,
      template: "dues-reminder",
      payload: {
        clubName: club.name,
        memberName: contact.name,
        balance: money(p.balanceMinor),
        overdue: money(Math.min(overdue, p.balanceMinor)),
        oldestDueDate: p.oldestDueDate ?? asOf,
        payUrl: appUrl(`/clubs/${club.slug}/account`),
      },
    });
  }
  enqueueEmails(tx, emails);
  return emails.length;
}
