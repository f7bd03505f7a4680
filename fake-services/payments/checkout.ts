// Checkout sessions of the fake provider: creation from line items with inline price data,
// and paying one with a card, which is what the hosted page and payCheckoutSession() do.
import { checkCard, declineFor, type CardInput } from "./cards";
import { invalidRequest, noSuch } from "./errors";
import { readArray, readInteger, readMetadata, readObject, readString, requireInteger, requireString, type FormObject } from "./form";
import { feeFor, recordBalanceTransaction } from "./ledger";
import {
  newId,
  nowSeconds,
  type Charge,
  type CheckoutSession,
  type LineItem,
  type PaymentIntent,
  type PaymentsStore,
} from "./store";
import type { EventBus } from "./webhooks";

const MIN_TOTAL = 50; // the provider's minimum charge is about 0.50 of a major unit (from memory)
const DAY = 86_400;

function readUrl(params: FormObject, key: string): string | null {
  const v = readString(params, key);
  if (v === null) return null;
  try {
    new URL(v.replace(/\{CHECKOUT_SESSION_ID\}/g, "x"));
  } catch {
    throw invalidRequest(`Not a valid URL`, key, "url_invalid");
  }
  return v;
}

function readLineItem(raw: unknown, i: number): LineItem {
  const base = `line_items[${i}]`;
  if (typeof raw !== "object" || raw === null || Array.isArray(raw)) throw invalidRequest(`Invalid object`, base);
  const item = raw as FormObject;
  const priceId = readString(item, "price", `${base}[price]`);
  if (priceId) throw invalidRequest(`No such price: '${priceId}'`, `${base}[price]`, "resource_missing");
  const priceData = readObject(item, "price_data", `${base}[price_data]`);
  if (!priceData) throw invalidRequest(`Missing required param: ${base}[price_data].`, `${base}[price_data]`, "parameter_missing");
  const currency = requireString(priceData, "currency", `${base}[price_data][currency]`).toLowerCase();
  if (!/^[a-z]{3}$/.test(currency)) throw invalidRequest(`Invalid currency: ${currency}`, `${base}[price_data][currency]`);
  const unitAmount = requireInteger(priceData, "unit_amount", `${base}[price_data][unit_amount]`);
  if (unitAmount < 0) throw invalidRequest("unit_amount must be zero or more", `${base}[price_data][unit_amount]`);
  const productData = readObject(priceData, "product_data", `${base}[price_data][product_data]`);
  const productId = readString(priceData, "product", `${base}[price_data][product]`);
  if (!productData && !productId) {
    throw invalidRequest(`Missing required param: ${base}[price_data][product_data].`, `${base}[price_data][product_data]`, "parameter_missing");
  }
  const name = productData ? requireString(productData, "name", `${base}[price_data][product_data][name]`) : (productId as string);
  const quantity = requireInteger(item, "quantity", `${base}[quantity]`);
  if (quantity < 1) throw invalidRequest("quantity must be at least 1", `${base}[quantity]`);
  const total = unitAmount * quantity;
  return {
    id: newId("li"),
    object: "item",
    amount_discount: 0,
    amount_subtotal: total,
    amount_tax: 0,
    amount_total: total,
    currency,
    description: name,
    quantity,
    price: {
      id: newId("price"),
      object: "price",
      active: false,
      currency,
      unit_amount: unitAmount,
      product: productId ?? newId("prod", 14),
      type: "one_time",
      livemode: false,
    },
  };
}

export function createSession(store: PaymentsStore, params: FormObject, publicUrl: string): CheckoutSession {
  const mode = readString(params, "mode");
  if (!mode) throw invalidRequest("Missing required param: mode.", "mode", "parameter_missing");
  if (mode !== "payment") throw invalidRequest(`The fake supports only mode "payment", not "${mode}".`, "mode");
  const rawItems = readArray(params, "line_items");
  if (!rawItems || rawItems.length === 0) throw invalidRequest("Missing required param: line_items.", "line_items", "parameter_missing");
  const items = rawItems.map(readLineItem);
  const currency = items[0]?.currency as string;
  if (items.some((li) => li.currency !== currency)) throw invalidRequest("All line items must use the same currency.", "line_items");
  const total = items.reduce((acc, li) => acc + li.amount_total, 0);
  if (total < MIN_TOTAL) {
    throw invalidRequest(`The Checkout Session's total amount due must add up to at least ${MIN_TOTAL} minor units.`, "line_items", "amount_too_small");
  }
  const customerId = readString(params, "customer");
  const customerEmail = readString(params, "customer_email");
  if (customerId && customerEmail) throw invalidRequest("You may only specify one of these parameters: customer, customer_email.", "customer_email");
  if (customerId && !store.find("customer", customerId)) throw noSuch(customerId, "customer");
  const clientRef = readString(params, "client_reference_id");
  if (clientRef && clientRef.length > 200) throw invalidRequest("client_reference_id can be at most 200 characters.", "client_reference_id");
  const created = nowSeconds();
  const expiresAt = readInteger(params, "expires_at") ?? created + DAY;
  if (expiresAt < created + 1800 || expiresAt > created + DAY) {
    throw invalidRequest("expires_at must be between 30 minutes and 24 hours from now.", "expires_at");
  }
  const id = newId("cs_test", 58);
  const intentData = readObject(params, "payment_intent_data");
  store.intentData.set(id, {
    description: intentData ? readString(intentData, "description", "payment_intent_data[description]") : null,
    metadata: intentData ? readMetadata(intentData) : {},
    receipt_email: intentData ? readString(intentData, "receipt_email", "payment_intent_data[receipt_email]") : null,
  });
  store.lineItems.set(id, items);
  return store.put<CheckoutSession>({
    id,
    object: "checkout.session",
    created,
    expires_at: expiresAt,
    mode: "payment",
    status: "open",
    payment_status: "unpaid",
    amount_subtotal: total,
    amount_total: total,
    currency,
    customer: customerId,
    customer_email: customerEmail,
    customer_details: null,
    client_reference_id: clientRef,
    metadata: readMetadata(params),
    payment_intent: null,
    payment_method_types: ["card"],
    success_url: readUrl(params, "success_url"),
    cancel_url: readUrl(params, "cancel_url"),
    url: `${publicUrl}/pay/${id}`,
    livemode: false,
  });
}

/** Moves an open session past its expiry time to "expired"; true when it did. */
export function expireIfDue(session: CheckoutSession, bus: EventBus, force = false): boolean {
  if (session.status !== "open" || (!force && nowSeconds() < session.expires_at)) return false;
  session.status = "expired";
  session.url = null;
  bus.emit("checkout.session.expired", session);
  return true;
}

export interface PayInput extends CardInput {
  name?: string | null;
  email?: string | null;
}

export type PayOutcome =
  | { ok: true; session: CheckoutSession; paymentIntent: PaymentIntent; charge: Charge }
  | {
      ok: false;
      /** invalid: refused by the form, nothing recorded. declined: the network said no. inactive: paid or expired. */
      kind: "invalid" | "declined" | "inactive";
      code: string;
      declineCode: string | null;
      message: string;
      paymentIntent: PaymentIntent | null;
    };

function intentFor(store: PaymentsStore, bus: EventBus, session: CheckoutSession, email: string | null): PaymentIntent {
  const existing = session.payment_intent ? store.find("payment_intent", session.payment_intent) : undefined;
  if (existing) return existing;
  const data = store.intentData.get(session.id);
  const pi = store.put<PaymentIntent>({
    id: newId("pi"),
    object: "payment_intent",
    created: nowSeconds(),
    amount: session.amount_total,
    amount_received: 0,
    currency: session.currency,
    customer: session.customer,
    description: data?.description ?? null,
    metadata: data?.metadata ?? {},
    status: "requires_payment_method",
    latest_charge: null,
    last_payment_error: null,
    payment_method: null,
    payment_method_types: ["card"],
    receipt_email: data?.receipt_email ?? email,
    livemode: false,
  });
  session.payment_intent = pi.id;
  bus.emit("payment_intent.created", pi);
  return pi;
}

export function paySession(store: PaymentsStore, bus: EventBus, sessionId: string, input: PayInput): PayOutcome {
  const session = store.find("checkout.session", sessionId);
  if (!session) throw noSuch(sessionId);
  expireIfDue(session, bus);
  if (session.status !== "open") {
    const message = session.status === "complete" ? "This payment has already been completed." : "This payment page has expired.";
    return { ok: false, kind: "inactive", code: "checkout_session_inactive", declineCode: null, message, paymentIntent: null };
  }
  const check = checkCard(input);
  if (!check.ok) return { ok: false, kind: "invalid", code: check.code, declineCode: null, message: check.message, paymentIntent: null };

  const customer = session.customer ? store.find("customer", session.customer) : undefined;
  const email = session.customer_email ?? customer?.email ?? (input.email?.trim() || null);
  const name = input.name?.trim() || customer?.name || null;
  const pi = intentFor(store, bus, session, email);
  const decline = declineFor(input.number);
  if (decline) {
    pi.last_payment_error = decline;
    bus.emit("payment_intent.payment_failed", pi);
    return { ok: false, kind: "declined", code: decline.code, declineCode: decline.decline_code ?? null, message: decline.message, paymentIntent: pi };
  }

  const chargeId = newId("ch");
  const paymentMethod = newId("pm");
  const amount = session.amount_total;
  const txn = recordBalanceTransaction(store, {
    amount,
    fee: feeFor(amount),
    currency: session.currency,
    type: "charge",
    source: chargeId,
    description: pi.description,
  });
  const charge = store.put<Charge>({
    id: chargeId,
    object: "charge",
    created: nowSeconds(),
    amount,
    amount_captured: amount,
    amount_refunded: 0,
    balance_transaction: txn.id,
    billing_details: { email, name },
    captured: true,
    currency: session.currency,
    customer: session.customer,
    description: pi.description,
    metadata: { ...pi.metadata },
    outcome: { network_status: "approved_by_network", type: "authorized", seller_message: "Payment complete.", risk_level: "normal" },
    paid: true,
    payment_intent: pi.id,
    payment_method: paymentMethod,
    payment_method_details: { type: "card", card: check.card },
    receipt_email: pi.receipt_email,
    refunded: false,
    status: "succeeded",
    livemode: false,
  });
  Object.assign(pi, {
    status: "succeeded",
    amount_received: amount,
    latest_charge: charge.id,
    last_payment_error: null,
    payment_method: paymentMethod,
  });
  Object.assign(session, { status: "complete", payment_status: "paid", url: null, customer_details: { email, name } });
  bus.emit("charge.succeeded", charge);
  bus.emit("payment_intent.succeeded", pi);
  bus.emit("checkout.session.completed", session);
  return { ok: true, session, paymentIntent: pi, charge };
}
