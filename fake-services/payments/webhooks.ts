// Events and their delivery to the configured webhook endpoint, signed with the provider's
// published scheme so the SDK's `webhooks.constructEvent(payload, header, secret)` accepts
// them: header `Stripe-Signature: t=<unix seconds>,v1=<hex HMAC-SHA256("<t>.<payload>")>`.
// Deliveries go out one at a time in creation order; a failed delivery is recorded, not
// retried by itself (tests call resendEvent to replay it).
import { createHmac } from "node:crypto";
import { newId, nowSeconds, type FakeEvent, type PaymentsStore, type StoredObject } from "./store";

export interface WebhookTarget {
  url: string;
  secret: string;
}

export interface Delivery {
  eventId: string;
  type: string;
  url: string;
  /** HTTP status the endpoint answered; null when it could not be reached. */
  status: number | null;
  error: string | null;
  /** UTC instant of the attempt, ISO 8601. */
  at: string;
}

const DELIVERY_TIMEOUT_MS = 10_000;

export function signPayload(payload: string, secret: string, timestamp: number): string {
  const v1 = createHmac("sha256", secret).update(`${timestamp}.${payload}`, "utf8").digest("hex");
  return `t=${timestamp},v1=${v1}`;
}

/** The exact bytes sent: pretty-printed JSON, as the provider's own deliveries are. */
export function serializeEvent(event: FakeEvent): string {
  return JSON.stringify(event, null, 2);
}

export class EventBus {
  private target: WebhookTarget | null;
  private tail: Promise<unknown> = Promise.resolve();
  readonly deliveries: Delivery[] = [];
  /** Reported in each event; follows the Stripe-Version the SDK last sent. */
  apiVersion: string;

  constructor(
    private readonly store: PaymentsStore,
    target: WebhookTarget | null,
    apiVersion: string,
  ) {
    this.target = target;
    this.apiVersion = apiVersion;
  }

  setTarget(url: string | null, secret: string | null): void {
    this.target = url && secret ? { url, secret } : null;
  }

  getTarget(): WebhookTarget | null {
    return this.target;
  }

  /** Records an event holding a snapshot of `object` and queues its delivery. */
  emit(
    type: string,
    object: StoredObject,
    opts: { previous?: Record<string, unknown>; idempotencyKey?: string | null } = {},
  ): FakeEvent {
    const event: FakeEvent = {
      id: newId("evt"),
      object: "event",
      api_version: this.apiVersion,
      created: nowSeconds(),
      data: {
        object: structuredClone(object) as unknown as Record<string, unknown>,
        ...(opts.previous ? { previous_attributes: structuredClone(opts.previous) } : {}),
      },
      livemode: false,
      pending_webhooks: this.target ? 1 : 0,
      request: { id: opts.idempotencyKey === undefined ? null : newId("req", 14), idempotency_key: opts.idempotencyKey ?? null },
      type,
    };
    this.store.put(event);
    void this.enqueue(event);
    return event;
  }

  /** Every event, oldest first. */
  events(): FakeEvent[] {
    return this.store.all("event").reverse();
  }

  /** Resolves once every delivery queued so far has been attempted. */
  flush(): Promise<void> {
    return this.tail.then(() => undefined);
  }

  /** Delivers an already-recorded event again (same id and body, fresh signature). */
  resend(eventId: string): Promise<Delivery | null> {
    const event = this.store.find("event", eventId);
    if (!event) return Promise.reject(new Error(`No such event: '${eventId}'`));
    return this.enqueue(event);
  }

  private enqueue(event: FakeEvent): Promise<Delivery | null> {
    const run = this.tail.then(() => this.deliver(event));
    this.tail = run.catch(() => undefined);
    return run;
  }

  private async deliver(event: FakeEvent): Promise<Delivery | null> {
    const target = this.target;
    if (!target) return null;
    const payload = serializeEvent(event);
    const delivery: Delivery = {
      eventId: event.id,
      type: event.type,
      url: target.url,
      status: null,
      error: null,
      at: new Date().toISOString(),
    };
    try {
      const res = await fetch(target.url, {
        method: "POST",
        headers: {
          "Content-Type": "application/json; charset=utf-8",
          "User-Agent": "FakePayments-Webhooks/1.0",
          "Stripe-Signature": signPayload(payload, target.secret, nowSeconds()),
        },
        body: payload,
        signal: AbortSignal.timeout(DELIVERY_TIMEOUT_MS),
      });
      delivery.status = res.status;
      await res.arrayBuffer().catch(() => undefined);
      if (!res.ok) delivery.error = `endpoint answered ${res.status}`;
    } catch (err) {
      delivery.error = err instanceof Error ? err.message : String(err);
    }
    this.deliveries.push(delivery);
    return delivery;
  }
}
