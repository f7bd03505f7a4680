// Adapter around the card-payment provider's SDK. The SDK's own host/port/protocol settings
// point it at fake-services/payments locally and in tests; unset, it talks to the hosted API.
import Stripe from "stripe";

export interface PaymentsClientOptions {
  secretKey?: string;
  host?: string;
  port?: number;
  protocol?: "http" | "https";
}

export const DEFAULT_TEST_SECRET_KEY = "sk_test_fake";

function readProtocol(value: string | undefined): "http" | "https" | undefined {
  if (value === undefined || value === "") return undefined;
  if (value === "http" || value === "https") return value;
  throw new RangeError(`PAYMENTS_PROTOCOL must be "http" or "https", not "${value}"`);
}

function readPort(value: string | undefined): number | undefined {
  if (value === undefined || value === "") return undefined;
  const port = Number(value);
  if (!Number.isInteger(port) || port < 1 || port > 65535) throw new RangeError(`PAYMENTS_PORT is not a port: "${value}"`);
  return port;
}

/**
 * A configured SDK client. Options win over the environment (STRIPE_SECRET_KEY,
 * PAYMENTS_HOST, PAYMENTS_PORT, PAYMENTS_PROTOCOL); a bad port or protocol throws at once,
 * since it is a deployment mistake rather than a runtime condition.
 */
export function createPaymentsClient(opts: PaymentsClientOptions = {}): Stripe {
  const env = process.env;
  const host = opts.host ?? (env.PAYMENTS_HOST || undefined);
  const port = opts.port ?? readPort(env.PAYMENTS_PORT);
  const protocol = opts.protocol ?? readProtocol(env.PAYMENTS_PROTOCOL);
  const key = opts.secretKey ?? (env.STRIPE_SECRET_KEY || DEFAULT_TEST_SECRET_KEY);
  return new Stripe(key, {
    ...(host ? { host } : {}),
    ...(port ? { port } : {}),
    ...(protocol ? { protocol } : {}),
  });
}

/** The local stand-in's signing secret (fake-services/payments/server.ts uses the same default). */
export const LOCAL_STANDIN_WEBHOOK_SECRET = "whsec_fake_local_secret";

const LOOPBACK_HOSTS = /^(localhost|127(?:\.\d{1,3}){3}|::1|\[::1\])$/i;

/**
 * The secret webhooks must be signed with, or "" when there is none: a configured
 * PAYMENTS_WEBHOOK_SECRET (or STRIPE_WEBHOOK_SECRET); otherwise the stand-in's well-known secret,
 * but only while the SDK is pointed at the stand-in on this machine (PAYMENTS_HOST is a loopback
 * address). Against the hosted provider an unset secret means every delivery is refused, never
 * checked against a secret anyone can read in this repository.
 */
export function webhookSigningSecret(env: Record<string, string | undefined> = process.env): string {
  const configured = env.PAYMENTS_WEBHOOK_SECRET || env.STRIPE_WEBHOOK_SECRET;
  if (configured) return configured;
  const host = env.PAYMENTS_HOST?.trim();
  return host && LOOPBACK_HOSTS.test(host) ? LOCAL_STANDIN_WEBHOOK_SECRET : "";
}

export type WebhookVerification = { ok: true; event: Stripe.Event } | { ok: false; error: string };

/**
 * Checks the Stripe-Signature header against the raw request body with the SDK's own
 * verifier (which also rejects timestamps older than its default tolerance). Never throws.
 */
export function verifyWebhook(payload: string, signature: string | null, secret: string): WebhookVerification {
  if (!signature) return { ok: false, error: "missing signature header" };
  if (!secret) return { ok: false, error: "no webhook signing secret configured" };
  try {
    return { ok: true, event: Stripe.webhooks.constructEvent(payload, signature, secret) };
  } catch (err) {
    return { ok: false, error: err instanceof Error ? err.message : String(err) };
  }
}
