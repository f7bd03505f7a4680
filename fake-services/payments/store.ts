// In-memory state of the fake payment provider. Objects are kept in the provider's own JSON
// shape (snake_case, unix-second timestamps, integer minor units) so routes can return them
// as they are; bookkeeping the provider does not expose lives in side maps.
import { randomBytes } from "node:crypto";

export type Metadata = Record<string, string>;

export interface Customer {
  id: string;
  object: "customer";
  created: number;
  email: string | null;
  name: string | null;
  description: string | null;
  phone: string | null;
  metadata: Metadata;
  livemode: false;
}

export interface LineItem {
  id: string;
  object: "item";
  amount_discount: number;
  amount_subtotal: number;
  amount_tax: number;
  amount_total: number;
  currency: string;
  description: string;
  quantity: number;
  price: Record<string, unknown>;
}

export interface CheckoutSession {
  id: string;
  object: "checkout.session";
  created: number;
  expires_at: number;
  mode: "payment";
  status: "open" | "complete" | "expired";
  payment_status: "unpaid" | "paid";
  amount_subtotal: number;
  amount_total: number;
  currency: string;
  customer: string | null;
  customer_email: string | null;
  customer_details: { email: string | null; name: string | null } | null;
  client_reference_id: string | null;
  metadata: Metadata;
  payment_intent: string | null;
  payment_method_types: string[];
  success_url: string | null;
  cancel_url: string | null;
  url: string | null;
  livemode: false;
}

export interface PaymentError {
  type: "card_error";
  code: string;
  decline_code?: string;
  message: string;
}

export interface PaymentIntent {
  id: string;
  object: "payment_intent";
  created: number;
  amount: number;
  amount_received: number;
  currency: string;
  customer: string | null;
  description: string | null;
  metadata: Metadata;
  status: "requires_payment_method" | "succeeded";
  latest_charge: string | null;
  last_payment_error: PaymentError | null;
  payment_method: string | null;
  payment_method_types: string[];
  receipt_email: string | null;
  livemode: false;
}

export interface CardDetails {
  brand: string;
  last4: string;
  exp_month: number;
  exp_year: number;
  funding: string;
}

export interface Charge {
  id: string;
  object: "charge";
  created: number;
  amount: number;
  amount_captured: number;
  amount_refunded: number;
  balance_transaction: string;
  billing_details: { email: string | null; name: string | null };
  captured: true;
  currency: string;
  customer: string | null;
  description: string | null;
  metadata: Metadata;
  outcome: Record<string, unknown>;
  paid: true;
  payment_intent: string;
  payment_method: string;
  payment_method_details: { type: "card"; card: CardDetails };
  receipt_email: string | null;
  refunded: boolean;
  status: "succeeded";
  livemode: false;
}

export interface Refund {
  id: string;
  object: "refund";
  created: number;
  amount: number;
  balance_transaction: string;
  charge: string;
  currency: string;
  metadata: Metadata;
  payment_intent: string;
  reason: string | null;
  status: "succeeded";
}

export interface FeeDetail {
  amount: number;
  currency: string;
  description: string;
  type: "stripe_fee";
}

export interface BalanceTransaction {
  id: string;
  object: "balance_transaction";
  created: number;
  amount: number;
  available_on: number;
  currency: string;
  description: string | null;
  exchange_rate: null;
  fee: number;
  fee_details: FeeDetail[];
  net: number;
  reporting_category: "charge" | "refund" | "payout";
  source: string;
  status: "available" | "pending";
  type: "charge" | "refund" | "payout";
}

export interface Payout {
  id: string;
  object: "payout";
  created: number;
  amount: number;
  arrival_date: number;
  automatic: boolean;
  balance_transaction: string;
  currency: string;
  description: string | null;
  destination: string;
  metadata: Metadata;
  method: "standard";
  statement_descriptor: string | null;
  status: "paid";
  type: "bank_account";
  livemode: false;
}

export interface FakeEvent {
  id: string;
  object: "event";
  api_version: string;
  created: number;
  data: { object: Record<string, unknown>; previous_attributes?: Record<string, unknown> };
  livemode: false;
  pending_webhooks: number;
  request: { id: string | null; idempotency_key: string | null };
  type: string;
}

export type StoredObject =
  | Customer
  | CheckoutSession
  | PaymentIntent
  | Charge
  | Refund
  | BalanceTransaction
  | Payout
  | FakeEvent;

export interface IntentData {
  description: string | null;
  metadata: Metadata;
  receipt_email: string | null;
}

const ALPHABET = "0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz";

export function newId(prefix: string, length = 24): string {
  const bytes = randomBytes(length);
  let out = "";
  for (const b of bytes) out += ALPHABET[b % ALPHABET.length];
  return `${prefix}_${out}`;
}

export function nowSeconds(): number {
  return Math.floor(Date.now() / 1000);
}

export class PaymentsStore {
  private readonly objects = new Map<string, StoredObject>();
  /** Line items by checkout session id: the provider only returns them on request. */
  readonly lineItems = new Map<string, LineItem[]>();
  /** Which payout carried each balance transaction. */
  readonly payoutOf = new Map<string, string>();
  /** payment_intent_data given at session creation, applied when the intent is made. */
  readonly intentData = new Map<string, IntentData>();

  put<T extends StoredObject>(obj: T): T {
    this.objects.set(obj.id, obj);
    return obj;
  }

  get(id: string): StoredObject | undefined {
    return this.objects.get(id);
  }

  /** The object with that id, if it is of the wanted kind. */
  find<K extends StoredObject["object"]>(kind: K, id: string): Extract<StoredObject, { object: K }> | undefined {
    const obj = this.objects.get(id);
    return obj && obj.object === kind ? (obj as Extract<StoredObject, { object: K }>) : undefined;
  }

  /** Every object of a kind, newest first (the provider's list order). */
  all<K extends StoredObject["object"]>(kind: K): Extract<StoredObject, { object: K }>[] {
    const out: Extract<StoredObject, { object: K }>[] = [];
    for (const obj of this.objects.values()) {
      if (obj.object === kind) out.push(obj as Extract<StoredObject, { object: K }>);
    }
    return out.reverse();
  }
}
