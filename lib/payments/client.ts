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
