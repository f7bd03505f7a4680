// HTTP stand-in for the card-payment provider's REST API, spoken to by the real `stripe` SDK
// through its host/port/protocol settings (see lib/payments/provider.ts). It serves /v1 (api.ts,
// routes.ts), the hosted payment page at /pay/:sessionId (hosted-page.ts), test controls at
// /_control (control.ts), and delivers signed webhooks (webhooks.ts).
//
// Script mode: `tsx fake-services/payments/server.ts` listens on PORT (default 3200) and
// delivers webhooks to PAYMENTS_WEBHOOK_URL signed with PAYMENTS_WEBHOOK_SECRET (or
// STRIPE_WEBHOOK_SECRET). PAYMENTS_PUBLIC_URL overrides the origin used in hosted-page links.
import type { IncomingMessage, ServerResponse } from "node:http";
import { isMainModule, listenServer, sendJson } from "../shared/http";
import { createApiHandler } from "./api";
import { paySession, type PayOutcome } from "./checkout";
import { defaultCvc, defaultExpiry, handleControl } from "./control";
import { handleHostedPage } from "./hosted-page";
import { createPayout } from "./ledger";
import { PaymentsStore, type FakeEvent, type Payout } from "./store";
import { EventBus, type Delivery } from "./webhooks";

export type { FakeEvent, Payout } from "./store";
export type { Delivery } from "./webhooks";
export type { PayOutcome } from "./checkout";
export { feeFor, FEE_DESCRIPTION } from "./ledger";
export { signPayload } from "./webhooks";

/** The version the installed SDK pins; replaced by the Stripe-Version header the SDK sends. */
const DEFAULT_API_VERSION = "2026-10-28.endive";
/** Used when a webhook URL is configured without a secret. */
export const DEFAULT_WEBHOOK_SECRET = "whsec_fake_local_secret";

export interface FakePaymentsOptions {
  port?: number;
  host?: string;
  webhookUrl?: string;
  webhookSecret?: string;
  /** Origin put in checkout session URLs, when the browser reaches the fake by another name. */
  publicUrl?: string;
}

export interface CardExtras {
  expiry?: string;
  cvc?: string;
  name?: string;
  email?: string;
}

export interface FakePaymentsServer {
  url: string;
  port: number;
  close(): Promise<void>;
  /** Every event, oldest first. */
  events(): FakeEvent[];
  /** Every delivery attempt, oldest first. */
  deliveries(): Delivery[];
  /** Delivers an event again with the same id and body; resolves after the attempt. */
  resendEvent(eventId: string): Promise<Delivery | null>;
  /** Pays out all available, not yet paid-out balance (one currency) and waits for its webhooks. */
  triggerPayout(opts?: { currency?: string; arrivalDate?: number }): Promise<Payout>;
  setWebhookTarget(url: string | null, secret?: string | null): void;
  /** What the hosted page does with that card, then waits for the webhooks it caused. */
  payCheckoutSession(sessionId: string, cardNumber: string, extras?: CardExtras): Promise<PayOutcome>;
  /** Resolves once every webhook queued so far has been attempted. */
  flushWebhooks(): Promise<void>;
}

export async function startFakePaymentsServer(opts: FakePaymentsOptions = {}): Promise<FakePaymentsServer> {
  const store = new PaymentsStore();
  const target = opts.webhookUrl ? { url: opts.webhookUrl, secret: opts.webhookSecret ?? DEFAULT_WEBHOOK_SECRET } : null;
  const bus = new EventBus(store, target, DEFAULT_API_VERSION);
  let publicUrl = opts.publicUrl?.replace(/\/+$/, "") ?? "";
  const api = createApiHandler({ store, bus, publicUrl: () => publicUrl });

  async function handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const url = new URL(req.url ?? "/", "http://fake.local");
    if (url.pathname.startsWith("/v1/")) return api(req, res, url);
    const page = /^\/pay\/([^/]+)\/?$/.exec(url.pathname);
    if (page) return handleHostedPage(req, res, decodeURIComponent(page[1] ?? ""), { store, bus });
    if (url.pathname.startsWith("/_control/")) return handleControl(req, res, url, { store, bus });
    if (url.pathname === "/") return sendJson(res, 200, { service: "fake card-payment provider", api: "/v1", controls: "/_control" });
    sendJson(res, 404, { error: { type: "invalid_request_error", message: `Unrecognized request URL (${req.method}: ${url.pathname}).` } });
  }

  const server = await listenServer(handle, { port: opts.port, host: opts.host });
  if (!publicUrl) publicUrl = server.url;

  return {
    url: server.url,
    port: server.port,
    close: server.close,
    events: () => bus.events(),
    deliveries: () => [...bus.deliveries],
    resendEvent: (eventId) => bus.resend(eventId),
    async triggerPayout(payoutOpts = {}) {
      const payout = createPayout(store, bus, {
        currency: payoutOpts.currency,
        automatic: true,
        arrivalDate: payoutOpts.arrivalDate ?? null,
      });
      await bus.flush();
      return payout;
    },
    setWebhookTarget(url, secret) {
      bus.setTarget(url, url ? (secret ?? DEFAULT_WEBHOOK_SECRET) : null);
    },
    async payCheckoutSession(sessionId, cardNumber, extras = {}) {
      const outcome = paySession(store, bus, sessionId, {
        number: cardNumber,
        expiry: extras.expiry ?? defaultExpiry(),
        cvc: extras.cvc ?? defaultCvc(cardNumber),
        name: extras.name ?? null,
        email: extras.email ?? null,
      });
      await bus.flush();
      return outcome;
    },
    flushWebhooks: () => bus.flush(),
  };
}

if (isMainModule(import.meta.url)) {
  const port = Number(process.env.PORT ?? 3200);
  startFakePaymentsServer({
    port,
    host: process.env.HOST ?? "127.0.0.1",
    webhookUrl: process.env.PAYMENTS_WEBHOOK_URL || undefined,
    webhookSecret: process.env.PAYMENTS_WEBHOOK_SECRET || process.env.STRIPE_WEBHOOK_SECRET || undefined,
    publicUrl: process.env.PAYMENTS_PUBLIC_URL || undefined,
  }).then(
    (s) => {
      console.log(`Fake card-payment provider listening on ${s.url}`);
      console.log(process.env.PAYMENTS_WEBHOOK_URL ? `Webhooks go to ${process.env.PAYMENTS_WEBHOOK_URL}` : "No webhook URL set.");
    },
    (err: unknown) => {
      console.error(err);
      process.exit(1);
    },
  );
}
