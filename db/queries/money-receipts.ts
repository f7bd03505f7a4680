import "server-only";
import { and, eq } from "drizzle-orm";
import { clubs, memberships, users } from "@/db/schema";
import { enqueueEmail } from "@/lib/email/outbox";
import { moneyFormatter } from "@/lib/money/format";
import { appUrl } from "@/lib/server/urls";
import type { DbLike } from "./money-accounts";
import { memberBalance } from "./money-member-balances";

const METHOD_WORDS = { card: "card", cheque: "cheque", cash: "cash", transfer: "bank transfer" } as const;

/** Queues the member's receipt for a payment, in the posting's transaction. */
export function queueReceipt(tx: DbLike, clubId: string, p: { memberUserId: string; amountMinor: number; method: keyof typeof METHOD_WORDS; receivedOn: string; reference?: string | null }): void {
  const club = tx.select().from(clubs).where(eq(clubs.id, clubId)).get();
  const person = tx
    .select({ name: users.name, email: users.email })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.clubId, clubId), eq(memberships.userId, p.memberUserId)))
    .get();
  if (!club || !person) return;
  const money = moneyFormatter(club.currency, club.locale);
  enqueueEmail(tx, {
    clubId,
    to: person.email,
    subject: `${club.name}: payment received, ${money(p.amountMinor)}`,
    template: "receipt",
    payload: {
      clubName: club.name,
      memberName: person.name ?? person.email,
      amount: money(p.amountMinor),
      method: METHOD_WORDS[p.method],
      receivedOn: p.receivedOn,
      reference: p.reference ?? null,
      balanceNow: money(memberBalance(tx, clubId, p.memberUserId)),
      accountUrl: appUrl(`/clubs/${club.slug}/account`),
    },
  });
}
