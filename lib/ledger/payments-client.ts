import type Stripe from "stripe";
import { createPaymentsClient } from "@/lib/payments/provider";

// One SDK client per configuration (tests point the environment at a fake on a new port).
const holder = globalThis as unknown as { __paymentsClient?: { key: string; client: Stripe } };

export function getPaymentsClient(): Stripe {
  const env = process.env;
  const key = [env.STRIPE_SECRET_KEY, env.PAYMENTS_HOST, env.PAYMENTS_PORT, env.PAYMENTS_PROTOCOL].join("|");
  if (!holder.__paymentsClient || holder.__paymentsClient.key !== key) holder.__paymentsClient = { key, client: createPaymentsClient() };
  return holder.__paymentsClient.client;
}

/** Matches the local fake's default (fake-services/payments/server.ts), for development and tests. */
export const LOCAL_WEBHOOK_SECRET = "whsec_fake_local_secret";

/** The secret webhooks are signed with; the local fake's default when none is configured. */
export function webhookSecret(): string {
  return process.env.PAYMENTS_WEBHOOK_SECRET || process.env.STRIPE_WEBHOOK_SECRET || LOCAL_WEBHOOK_SECRET;
}
