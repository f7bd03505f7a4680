// Money movements of the fake provider: the fee on a charge, refunds, and payouts that sweep
// the available balance to the club's bank account net of fees. Every movement writes a
// balance transaction, which is what bank reconciliation matches a payout against.
import { invalidRequest, noSuch } from "./errors";
import type { FormObject } from "./form";
import { readEnum, readInteger, readMetadata, readString } from "./form";
import {
  newId,
  nowSeconds,
  type BalanceTransaction,
  type Charge,
  type Payout,
  type PaymentsStore,
  type Refund,
} from "./store";
import type { EventBus } from "./webhooks";

/** The fake's own fee schedule: 2.9% of the amount, rounded half up, plus 30 minor units. */
export const FEE_PERCENT_TENTHS = 29;
export const FEE_FIXED = 30;
export const FEE_DESCRIPTION = "Processing fee (the fake's own fee schedule: 2.9% + 30)";

export function feeFor(amount: number): number {
  // Integer arithmetic: amount × 29 / 1000 rounded half up, so no float error can creep in.
  return Math.floor((amount * FEE_PERCENT_TENTHS + 500) / 1000) + FEE_FIXED;
}

export function recordBalanceTransaction(
  store: PaymentsStore,
  entry: { amount: number; fee: number; currency: string; type: BalanceTransaction["type"]; source: string; description: string | null },
): BalanceTransaction {
  const created = nowSeconds();
  return store.put<BalanceTransaction>({
    id: newId("txn"),
    object: "balance_transaction",
    created,
    amount: entry.amount,
    // Funds are available at once so a test can pay out straight after paying.
    available_on: created,
    currency: entry.currency,
    description: entry.description,
    exchange_rate: null,
    fee: entry.fee,
    fee_details: entry.fee
      ? [{ amount: entry.fee, currency: entry.currency, description: FEE_DESCRIPTION, type: "stripe_fee" }]
      : [],
    net: entry.amount - entry.fee,
    reporting_category: entry.type,
    source: entry.source,
    status: "available",
    type: entry.type,
  });
}

function resolveCharge(store: PaymentsStore, chargeId: string | null, intentId: string | null): Charge {
  if (intentId) {
    const pi = store.find("payment_intent", intentId);
    if (!pi) throw noSuch(intentId, "payment_intent");
    const charge = pi.latest_charge ? store.find("charge", pi.latest_charge) : undefined;
    if (pi.status !== "succeeded" || !charge) {
      throw invalidRequest(`This PaymentIntent (${intentId}) does not have a successful charge to refund.`, "payment_intent");
    }
    if (chargeId && chargeId !== charge.id) {
      throw invalidRequest(`The charge ${chargeId} does not belong to the payment intent ${intentId}.`, "charge");
    }
    return charge;
  }
  if (!chargeId) {
    throw invalidRequest("One of the following params should be provided for this request: payment_intent or charge.", "charge", "parameter_missing");
  }
  const charge = store.find("charge", chargeId);
  if (!charge) throw noSuch(chargeId, "charge");
  return charge;
}

export function createRefund(store: PaymentsStore, bus: EventBus, params: FormObject, idempotencyKey: string | null): Refund {
  const charge = resolveCharge(store, readString(params, "charge"), readString(params, "payment_intent"));
  const remaining = charge.amount - charge.amount_refunded;
  if (remaining <= 0) throw invalidRequest(`Charge ${charge.id} has already been refunded.`, "charge", "charge_already_refunded");
  const amount = readInteger(params, "amount") ?? remaining;
  if (amount <= 0) throw invalidRequest("Refund amount must be a positive integer.", "amount", "parameter_invalid_integer");
  if (amount > remaining) {
    throw invalidRequest(
      `Refund amount (${amount}) is greater than unrefunded amount on charge (${remaining})`,
      "amount",
      "amount_too_large",
    );
  }
  const reason = readEnum(params, "reason", ["duplicate", "fraudulent", "requested_by_customer"] as const);
  const id = newId("re");
  // Refunds carry no fee of their own in this schedule; the charge's fee is not returned.
  const txn = recordBalanceTransaction(store, {
    amount: -amount,
    fee: 0,
    currency: charge.currency,
    type: "refund",
    source: id,
    description: `REFUND FOR CHARGE (${charge.description ?? charge.id})`,
  });
  const refund = store.put<Refund>({
    id,
    object: "refund",
    created: nowSeconds(),
    amount,
    balance_transaction: txn.id,
    charge: charge.id,
    currency: charge.currency,
    metadata: readMetadata(params),
    payment_intent: charge.payment_intent,
    reason,
    status: "succeeded",
  });
  const previous = { amount_refunded: charge.amount_refunded, refunded: charge.refunded };
  charge.amount_refunded += amount;
  charge.refunded = charge.amount_refunded === charge.amount;
  bus.emit("refund.created", refund, { idempotencyKey });
  bus.emit("charge.refunded", charge, { previous, idempotencyKey });
  return refund;
}

/** Balance transactions that are available and not yet carried by any payout. */
export function unpaidTransactions(store: PaymentsStore, currency?: string): BalanceTransaction[] {
  const now = nowSeconds();
  return store
    .all("balance_transaction")
    .filter(
      (t) =>
        t.type !== "payout" &&
        t.status === "available" &&
        t.available_on <= now &&
        !store.payoutOf.has(t.id) &&
        (!currency || t.currency === currency),
    )
    .reverse();
}

export interface PayoutRequest {
  currency?: string;
  amount?: number | null;
  automatic: boolean;
  arrivalDate?: number | null;
  description?: string | null;
  statementDescriptor?: string | null;
  metadata?: Record<string, string>;
  idempotencyKey?: string | null;
}

/**
 * Sweeps every unpaid available balance transaction of one currency into one payout whose
 * amount is the sum of their nets. The fake always pays out the whole available balance, so
 * an explicit amount must equal it.
 */
export function createPayout(store: PaymentsStore, bus: EventBus, req: PayoutRequest): Payout {
  const wanted = req.currency?.toLowerCase();
  const candidates = unpaidTransactions(store, wanted);
  const currencies = [...new Set(candidates.map((t) => t.currency))];
  if (currencies.length === 0) {
    throw invalidRequest("You have insufficient funds in your account: nothing is available to pay out.", "amount", "balance_insufficient");
  }
  if (currencies.length > 1) {
    throw invalidRequest(`Balance is held in ${currencies.join(", ")}; name the currency to pay out.`, "currency");
  }
  const currency = currencies[0] as string;
  const sum = candidates.reduce((acc, t) => acc + t.net, 0);
  if (sum <= 0) {
    throw invalidRequest("You have insufficient funds in your account: the available balance is not positive.", "amount", "balance_insufficient");
  }
  if (req.amount !== undefined && req.amount !== null && req.amount !== sum) {
    throw invalidRequest(`The fake pays out the whole available balance (${sum}); omit amount or pass exactly that.`, "amount");
  }
  const id = newId("po");
  const txn = recordBalanceTransaction(store, { amount: -sum, fee: 0, currency, type: "payout", source: id, description: "PAYOUT" });
  const created = nowSeconds();
  const payout = store.put<Payout>({
    id,
    object: "payout",
    created,
    amount: sum,
    arrival_date: req.arrivalDate ?? created,
    automatic: req.automatic,
    balance_transaction: txn.id,
    currency,
    description: req.description ?? null,
    destination: "ba_fakebankaccount0001",
    metadata: req.metadata ?? {},
    method: "standard",
    statement_descriptor: req.statementDescriptor ?? null,
    status: "paid",
    type: "bank_account",
    livemode: false,
  });
  for (const t of candidates) store.payoutOf.set(t.id, id);
  store.payoutOf.set(txn.id, id);
  bus.emit("payout.created", payout, { idempotencyKey: req.idempotencyKey });
  bus.emit("payout.paid", payout, { idempotencyKey: req.idempotencyKey });
  return payout;
}

export function readBalance(store: PaymentsStore): Record<string, unknown> {
  const byCurrency = new Map<string, number>();
  for (const t of unpaidTransactions(store)) byCurrency.set(t.currency, (byCurrency.get(t.currency) ?? 0) + t.net);
  return {
    object: "balance",
    available: [...byCurrency].map(([currency, amount]) => ({ amount, currency, source_types: { card: amount } })),
    pending: [],
    livemode: false,
  };
}
