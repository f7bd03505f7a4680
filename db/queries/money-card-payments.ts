import "server-only";
// Card payments in the books. Every posting is keyed by the provider's own id (payment intent,
// refund, payout), so it does not matter which webhook arrives first, or how often.
import { and, eq, inArray, or, sql } from "drizzle-orm";
import { cardPayouts, clubs, paymentRefunds, payments, type PaymentRow } from "@/db/schema";
import { accountId, memberAccountId, type DbLike } from "./money-accounts";
import { LedgerError } from "@/lib/money/errors";
import { lockedPeriodNote } from "@/lib/money/open-period";
import { openPostingDate, postEntry } from "./money-post-entry";
import { queueReceipt } from "./money-receipts";
import { clubToday } from "@/lib/money/settings";

/** What the provider says about one payment, read fresh from it (never from the event alone). */
export type CardPaymentSnapshot = {
  clubId: string;
  memberUserId: string;
  paymentId: string | null;
  checkoutSessionId: string | null;
  paymentIntentId: string;
  chargeId: string | null;
  status: "succeeded" | "failed" | "pending";
  amountMinor: number;
  feeMinor: number;
  /** ISO 4217 code as the provider writes it (lower case). */
  currency: string;
  paidAt: Date;
  lastError: string | null;
};

function clubOf(tx: DbLike, clubId: string) {
  const club = tx.select().from(clubs).where(eq(clubs.id, clubId)).get();
  if (!club) throw new LedgerError("That club was not found.", "not-found");
  return club;
}

function findPayment(tx: DbLike, clubId: string, s: Pick<CardPaymentSnapshot, "paymentId" | "paymentIntentId" | "checkoutSessionId">): PaymentRow | undefined {
  const keys = [
    s.paymentId ? eq(payments.id, s.paymentId) : undefined,
    eq(payments.paymentIntentId, s.paymentIntentId),
    s.checkoutSessionId ? eq(payments.checkoutSessionId, s.checkoutSessionId) : undefined,
  ].filter(Boolean);
  return tx.select().from(payments).where(and(eq(payments.clubId, clubId), or(...keys))).get();
}

export type CardPaymentOutcome = "posted" | "already-posted" | "failed-recorded" | "pending";

/**
 * Brings the club's books in line with the provider's state of one card payment: a success is
 * posted once (card clearing ← member account for the gross amount, processor fees ← card
 * clearing for the fee) with a receipt e-mail; a decline only notes the error, so the balance
 * stays as it was.
 */
export function recordCardPayment(tx: DbLike, s: CardPaymentSnapshot): CardPaymentOutcome {
  const club = clubOf(tx, s.clubId);
  if (s.currency.toUpperCase() !== club.currency) {
    throw new LedgerError(`The payment is in ${s.currency.toUpperCase()} but ${club.name} keeps its books in ${club.currency}.`, "currency");
  }
  let payment = findPayment(tx, s.clubId, s);
  if (payment && payment.memberUserId !== s.memberUserId) throw new LedgerError("The payment belongs to another member.", "invalid");
  const member = memberAccountId(tx, s.clubId, s.memberUserId);
  if (!payment) {
    payment = tx
      .insert(payments)
      .values({ id: s.paymentId ?? undefined, clubId: s.clubId, memberUserId: s.memberUserId, method: "card", status: "pending", amountMinor: s.amountMinor, currency: club.currency, checkoutSessionId: s.checkoutSessionId, paymentIntentId: s.paymentIntentId })
      .returning()
      .all()[0]!;
  }
  if (s.status !== "succeeded") {
    if (payment.status === "pending" || payment.status === "failed") {
      tx.update(payments)
        .set({ status: s.status === "failed" ? "failed" : payment.status, lastError: s.lastError, paymentIntentId: s.paymentIntentId })
        .where(and(eq(payments.clubId, s.clubId), eq(payments.id, payment.id)))
        .run();
    }
    return s.status === "failed" ? "failed-recorded" : "pending";
  }
  const receivedOn = clubToday(club, s.paidAt);
  const lines = [
    { accountId: accountId(tx, s.clubId, "card-clearing"), debitMinor: s.amountMinor, memo: "Card payment received by the provider" },
    { accountId: member, creditMinor: s.amountMinor },
  ];
  if (s.feeMinor > 0) {
    lines.push({ accountId: accountId(tx, s.clubId, "processor-fees"), debitMinor: s.feeMinor, memo: "Provider's processing fee" });
    lines.push({ accountId: accountId(tx, s.clubId, "card-clearing"), creditMinor: s.feeMinor });
  }
  // A payment the provider took is never refused: in a locked period it posts on the first open day.
  const open = openPostingDate(tx, s.clubId, receivedOn);
  const posted = postEntry(tx, s.clubId, {
    date: open.postOn,
    kind: "card-payment",
    memo: `Card payment${lockedPeriodNote(open)}`,
    lines,
    memberUserId: s.memberUserId,
    sourceType: "payment",
    sourceId: payment.id,
    sourceKey: `card:${s.paymentIntentId}`,
    reference: s.chargeId,
  });
  const settled = payment.status === "refunded" || payment.status === "partially_refunded";
  tx.update(payments)
    .set({
      status: settled ? payment.status : "succeeded",
      amountMinor: s.amountMinor,
      feeMinor: s.feeMinor,
      paymentIntentId: s.paymentIntentId,
      chargeId: s.chargeId,
      receivedOn,
      lastError: null,
      journalEntryId: posted.entryId,
    })
    .where(and(eq(payments.clubId, s.clubId), eq(payments.id, payment.id)))
    .run();
  if (!posted.created) return "already-posted";
  queueReceipt(tx, s.clubId, { memberUserId: s.memberUserId, amountMinor: s.amountMinor, method: "card", receivedOn, reference: s.chargeId });
  return "posted";
}

export type CardRefundInput = {
  clubId: string;
  paymentIntentId: string;
  refundId: string;
  amountMinor: number;
  currency: string;
  /** reopen: the member owes it again (the usual case); absorb: the club bears it as an expense. */
  treatment: "reopen" | "absorb";
  createdAt: Date;
  requestedById?: string | null;
};

/** Posts a provider refund once (by refund id) and updates the payment's refunded total. */
export function recordCardRefund(tx: DbLike, r: CardRefundInput): "posted" | "already-posted" {
  const club = clubOf(tx, r.clubId);
  if (r.currency.toUpperCase() !== club.currency) throw new LedgerError(`The refund is in ${r.currency.toUpperCase()}, not ${club.currency}.`, "currency");
  const payment = tx.select().from(payments).where(and(eq(payments.clubId, r.clubId), eq(payments.paymentIntentId, r.paymentIntentId))).get();
  if (!payment || !payment.journalEntryId) throw new LedgerError("The refunded payment has not been posted in this club.", "not-found");
  const known = tx.select({ id: paymentRefunds.id }).from(paymentRefunds).where(eq(paymentRefunds.providerRefundId, r.refundId)).get();
  if (known) return "already-posted";
  const debit = r.treatment === "absorb" ? accountId(tx, r.clubId, "refunds") : memberAccountId(tx, r.clubId, payment.memberUserId);
  const open = openPostingDate(tx, r.clubId, clubToday(club, r.createdAt));
  const date = open.postOn;
  const { entryId } = postEntry(tx, r.clubId, {
    date,
    kind: "card-refund",
    memo: `${r.treatment === "absorb" ? "Card refund (borne by the club)" : "Card refund"}${lockedPeriodNote(open)}`,
    lines: [
      { accountId: debit, debitMinor: r.amountMinor },
      { accountId: accountId(tx, r.clubId, "card-clearing"), creditMinor: r.amountMinor, memo: "Returned to the card" },
    ],
    memberUserId: payment.memberUserId,
    sourceType: "payment",
    sourceId: payment.id,
    sourceKey: `refund:${r.refundId}`,
    reference: r.refundId,
    createdById: r.requestedById ?? null,
  });
  tx.insert(paymentRefunds)
    .values({ clubId: r.clubId, paymentId: payment.id, providerRefundId: r.refundId, amountMinor: r.amountMinor, currency: club.currency, treatment: r.treatment, journalEntryId: entryId, requestedById: r.requestedById ?? null })
    .run();
  const total = tx
    .select({ sum: sql<number>`coalesce(sum(${paymentRefunds.amountMinor}), 0)` })
    .from(paymentRefunds)
    .where(and(eq(paymentRefunds.clubId, r.clubId), eq(paymentRefunds.paymentId, payment.id)))
    .get();
  const refunded = Number(total?.sum ?? 0);
  tx.update(payments)
    .set({ refundedMinor: refunded, status: refunded >= payment.amountMinor ? "refunded" : "partially_refunded" })
    .where(and(eq(payments.clubId, r.clubId), eq(payments.id, payment.id)))
    .run();
  return "posted";
}

export type PayoutShare = {
  clubId: string;
  payoutId: string;
  arrivalOn: string;
  currency: string;
  charges: { chargeId: string; netMinor: number; feeMinor: number }[];
  refunds: { refundId: string; netMinor: number }[];
};

/**
 * Notes which of the club's card payments and refunds a provider payout carries, and its net.
 * Nothing is posted yet: the transfer into the bank account is posted when the bank statement
 * shows the payout (reconciliation), so the books never claim money the bank has not seen.
 */
export function recordPayoutShare(tx: DbLike, p: PayoutShare): "recorded" | "already-recorded" {
  const club = clubOf(tx, p.clubId);
  const exists = tx.select({ id: cardPayouts.id }).from(cardPayouts).where(and(eq(cardPayouts.clubId, p.clubId), eq(cardPayouts.payoutId, p.payoutId))).get();
  if (exists) return "already-recorded";
  const net = p.charges.reduce((a, c) => a + c.netMinor, 0) + p.refunds.reduce((a, r) => a + r.netMinor, 0);
  const fee = p.charges.reduce((a, c) => a + c.feeMinor, 0);
  tx.insert(cardPayouts).values({ clubId: p.clubId, payoutId: p.payoutId, netMinor: net, feeMinor: fee, currency: club.currency, arrivalOn: p.arrivalOn }).run();
  const chargeIds = p.charges.map((c) => c.chargeId);
  const refundIds = p.refunds.map((r) => r.refundId);
  if (chargeIds.length) tx.update(payments).set({ payoutId: p.payoutId }).where(and(eq(payments.clubId, p.clubId), inArray(payments.chargeId, chargeIds))).run();
  if (refundIds.length) tx.update(paymentRefunds).set({ payoutId: p.payoutId }).where(and(eq(paymentRefunds.clubId, p.clubId), inArray(paymentRefunds.providerRefundId, refundIds))).run();
  return "recorded";
}

/** A checkout session that ran out before it was paid. */
export function markCheckoutExpired(tx: DbLike, clubId: string, checkoutSessionId: string): "expired" | "unchanged" {
  const res = tx
    .update(payments)
    .set({ status: "expired" })
    .where(and(eq(payments.clubId, clubId), eq(payments.checkoutSessionId, checkoutSessionId), inArray(payments.status, ["pending", "failed"])))
    .run();
  return res.changes > 0 ? "expired" : "unchanged";
}
