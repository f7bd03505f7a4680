import "server-only";
// What a verified webhook event means for the books. The event only says that something
// happened: the current state is read back from the provider through the SDK, so events
// that arrive late, out of order or twice all lead to the same postings.
import { eq } from "drizzle-orm";
import type Stripe from "stripe";
import type { Db, Tx } from "@/db/client";
import { clubs, paymentEvents, paymentRefunds, payments } from "@/db/schema";
import { recordCardPayment, recordCardRefund, recordPayoutShare, markCheckoutExpired, type CardPaymentSnapshot, type PayoutShare } from "./money-card-payments";
import { isLedgerError } from "@/lib/money/errors";
import { clubToday } from "@/lib/money/settings";

export type EventResult = { handled: "processed" | "duplicate" | "ignored"; detail: string };

type Step = { clubId: string; apply: (tx: Tx) => string };

const idOf = (v: string | { id: string } | null | undefined): string | null => (typeof v === "string" ? v : (v?.id ?? null));

function clubExists(db: Db, clubId: string | undefined): clubId is string {
  return !!clubId && !!db.select({ id: clubs.id }).from(clubs).where(eq(clubs.id, clubId)).get();
}

/** The provider's current state of a payment intent, as a snapshot for recordCardPayment. */
export async function snapshotOfIntent(stripe: Stripe, paymentIntentId: string, checkoutSessionId: string | null = null): Promise<CardPaymentSnapshot | null> {
  const pi = await stripe.paymentIntents.retrieve(paymentIntentId, { expand: ["latest_charge.balance_transaction"] });
  const clubId = pi.metadata?.clubId;
  const memberUserId = pi.metadata?.memberUserId;
  if (!clubId || !memberUserId) return null;
  const charge = typeof pi.latest_charge === "object" ? pi.latest_charge : null;
  const txn = charge && typeof charge.balance_transaction === "object" ? charge.balance_transaction : null;
  return {
    clubId,
    memberUserId,
    paymentId: pi.metadata?.paymentId ?? null,
    checkoutSessionId,
    paymentIntentId: pi.id,
    chargeId: idOf(pi.latest_charge),
    status: pi.status === "succeeded" ? "succeeded" : pi.last_payment_error ? "failed" : "pending",
    amountMinor: pi.status === "succeeded" ? pi.amount_received : pi.amount,
    feeMinor: txn?.fee ?? 0,
    currency: pi.currency,
    paidAt: new Date((charge?.created ?? pi.created) * 1000),
    lastError: pi.last_payment_error?.message ?? null,
  };
}

function paymentStep(snapshot: CardPaymentSnapshot): Step {
  return { clubId: snapshot.clubId, apply: (tx) => `payment ${recordCardPayment(tx, snapshot)}` };
}

async function refundSteps(db: Db, stripe: Stripe, refunds: Stripe.Refund[], chargeId: string): Promise<Step[]> {
  const charge = await stripe.charges.retrieve(chargeId);
  const clubId = charge.metadata?.clubId;
  const piId = idOf(charge.payment_intent);
  if (!clubExists(db, clubId) || !piId) return [];
  const snapshot = await snapshotOfIntent(stripe, piId);
  return [
    {
      clubId,
      apply: (tx) => {
        const done = snapshot ? [`payment ${recordCardPayment(tx, snapshot)}`] : [];
        for (const r of refunds) {
          if (r.status !== "succeeded") continue;
          const treatment = r.metadata?.treatment === "absorb" ? "absorb" : "reopen";
          done.push(`refund ${recordCardRefund(tx, { clubId, paymentIntentId: piId, refundId: r.id, amountMinor: r.amount, currency: r.currency, treatment, createdAt: new Date(r.created * 1000), requestedById: r.metadata?.requestedById || null })}`);
        }
        return done.join(", ");
      },
    },
  ];
}

async function payoutSteps(db: Db, stripe: Stripe, payout: Stripe.Payout): Promise<Step[]> {
  // The list includes the payout's own balance transaction (type "payout"): not a carried item.
  const txns = (await stripe.balanceTransactions.list({ payout: payout.id, limit: 100 }).autoPagingToArray({ limit: 10_000 })).filter((t) => t.type !== "payout");
  const shares = new Map<string, PayoutShare>();
  const snapshots: CardPaymentSnapshot[] = [];
  const refunds: { clubId: string; piId: string; refund: Stripe.Refund }[] = [];
  for (const t of txns) {
    const source = idOf(t.source);
    if (!source) continue;
    const refund = t.type === "refund" ? await stripe.refunds.retrieve(source) : null;
    const chargeId = t.type === "charge" ? source : idOf(refund?.charge);
    if (!chargeId) continue;
    const charge = await stripe.charges.retrieve(chargeId);
    const clubId = charge.metadata?.clubId;
    const piId = idOf(charge.payment_intent);
    if (!clubExists(db, clubId) || !piId) continue;
    const club = db.select().from(clubs).where(eq(clubs.id, clubId)).get()!;
    const share = shares.get(clubId) ?? { clubId, payoutId: payout.id, arrivalOn: clubToday(club, new Date(payout.arrival_date * 1000)), currency: payout.currency, charges: [], refunds: [] };
    shares.set(clubId, share);
    if (refund) {
      share.refunds.push({ refundId: refund.id, netMinor: t.net });
      refunds.push({ clubId, piId, refund });
    } else share.charges.push({ chargeId, netMinor: t.net, feeMinor: t.fee });
    const known = db.select({ id: payments.id }).from(payments).where(eq(payments.chargeId, chargeId)).get();
    if (!known) {
      const snapshot = await snapshotOfIntent(stripe, piId);
      if (snapshot) snapshots.push(snapshot);
    }
  }
  return [...shares.values()].map((share) => ({
    clubId: share.clubId,
    apply: (tx) => {
      for (const s of snapshots.filter((x) => x.clubId === share.clubId)) recordCardPayment(tx, s);
      for (const r of refunds.filter((x) => x.clubId === share.clubId)) {
        const known = tx.select({ id: paymentRefunds.id }).from(paymentRefunds).where(eq(paymentRefunds.providerRefundId, r.refund.id)).get();
        if (!known) recordCardRefund(tx, { clubId: r.clubId, paymentIntentId: r.piId, refundId: r.refund.id, amountMinor: r.refund.amount, currency: r.refund.currency, treatment: r.refund.metadata?.treatment === "absorb" ? "absorb" : "reopen", createdAt: new Date(r.refund.created * 1000) });
      }
      return `payout ${recordPayoutShare(tx, share)}`;
    },
  }));
}

/** The postings an event leads to, per club, after reading the provider's current state. */
async function planEvent(db: Db, stripe: Stripe, event: Stripe.Event): Promise<Step[] | string> {
  switch (event.type) {
    case "checkout.session.completed":
    case "checkout.session.async_payment_succeeded": {
      const session = event.data.object;
      const clubId = session.metadata?.clubId;
      if (!clubExists(db, clubId)) return "no such club";
      const piId = idOf(session.payment_intent);
      if (!piId || session.payment_status !== "paid") return "session not paid";
      const snapshot = await snapshotOfIntent(stripe, piId, session.id);
      if (!snapshot || snapshot.clubId !== clubId) return "payment intent of another club";
      return [paymentStep(snapshot)];
    }
    case "checkout.session.expired": {
      const session = event.data.object;
      const clubId = session.metadata?.clubId;
      if (!clubExists(db, clubId)) return "no such club";
      return [{ clubId, apply: (tx) => `session ${markCheckoutExpired(tx, clubId, session.id)}` }];
    }
    case "payment_intent.succeeded":
    case "payment_intent.payment_failed":
    case "charge.succeeded": {
      const obj = event.data.object;
      const piId = event.type === "charge.succeeded" ? idOf(event.data.object.payment_intent) : obj.id;
      if (!piId) return "no payment intent";
      const snapshot = await snapshotOfIntent(stripe, piId);
      if (!snapshot || !clubExists(db, snapshot.clubId)) return "no such club";
      return [paymentStep(snapshot)];
    }
    case "charge.refunded": {
      const charge = event.data.object;
      const refunds = await stripe.refunds.list({ charge: charge.id, limit: 100 }).autoPagingToArray({ limit: 1000 });
      const steps = await refundSteps(db, stripe, refunds, charge.id);
      return steps.length ? steps : "no such club";
    }
    case "refund.created":
    case "refund.updated": {
      const refund = event.data.object;
      const chargeId = idOf(refund.charge);
      if (!chargeId) return "refund without a charge";
      const steps = await refundSteps(db, stripe, [refund], chargeId);
      return steps.length ? steps : "no such club";
    }
    case "payout.paid": {
      const steps = await payoutSteps(db, stripe, event.data.object);
      return steps.length ? steps : "payout carries nothing of ours";
    }
    default:
      return `not an event we act on (${event.type})`;
  }
}

/**
 * Acts on a verified event once per club: the event id is stored in the same transaction as
 * its postings, so a replay finds it and writes nothing. A refusal by the ledger (a currency
 * mismatch, say) is recorded with the event rather than retried for ever.
 */
export async function processPaymentEvent(db: Db, stripe: Stripe, event: Stripe.Event): Promise<EventResult> {
  const seen = db.select({ clubId: paymentEvents.clubId }).from(paymentEvents).where(eq(paymentEvents.eventId, event.id)).all();
  if (seen.length > 0) return { handled: "duplicate", detail: "event already processed" };
  const plan = await planEvent(db, stripe, event);
  if (typeof plan === "string") return { handled: "ignored", detail: plan };
  const outcomes = db.transaction((tx) =>
    plan.map((step) => {
      const fresh = tx.insert(paymentEvents).values({ clubId: step.clubId, eventId: event.id, type: event.type, outcome: "processing" }).onConflictDoNothing().returning({ id: paymentEvents.id }).all();
      if (fresh.length === 0) return "duplicate";
      let outcome: string;
      try {
        outcome = tx.transaction((inner) => step.apply(inner));
      } catch (error) {
        if (!isLedgerError(error)) throw error;
        outcome = `refused: ${error.message}`;
      }
      tx.update(paymentEvents).set({ outcome }).where(eq(paymentEvents.id, fresh[0]!.id)).run();
      return outcome;
    }),
  );
  const all = outcomes.every((o) => o === "duplicate");
  return { handled: all ? "duplicate" : "processed", detail: outcomes.join("; ") };
}
