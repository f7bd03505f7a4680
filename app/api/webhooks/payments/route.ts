import { NextResponse } from "next/server";
import { getDb } from "@/db/client";
import { processPaymentEvent } from "@/db/queries/money-card-events";
import { getPaymentsClient } from "@/lib/payments/client";
import { verifyWebhook, webhookSigningSecret } from "@/lib/payments/provider";
import { logError, logWarn } from "@/lib/server/log";

export const dynamic = "force-dynamic";

/**
 * The payment provider's signed webhook. The signature is checked on the raw bytes before the
 * body is read as data; a bad one is a 400 and nothing is written. The club comes from the
 * payment's own metadata and must exist. Replays and late events post nothing twice.
 * Without a signing secret nothing can be checked, so every delivery is refused (503: the
 * provider delivers it again once the secret is configured).
 */
export async function POST(request: Request): Promise<Response> {
  const secret = webhookSigningSecret();
  if (!secret) {
    logWarn("payments", "webhook refused: no signing secret configured (PAYMENTS_WEBHOOK_SECRET)");
    return NextResponse.json({ error: { code: "not_configured", message: "Payment webhooks are not set up on this server; nothing was recorded." } }, { status: 503 });
  }
  const payload = await request.text();
  const verified = verifyWebhook(payload, request.headers.get("stripe-signature"), secret);
  if (!verified.ok) {
    return NextResponse.json({ error: { code: "invalid", message: `Webhook signature check failed: ${verified.error}` } }, { status: 400 });
  }
  try {
    const result = await processPaymentEvent(getDb(), getPaymentsClient(), verified.event);
    return NextResponse.json({ received: true, eventId: verified.event.id, ...result });
  } catch (error) {
    // Not stored: the provider delivers the event again and it is processed then.
    logError("payments", "webhook processing failed", error, { eventId: verified.event.id });
    return NextResponse.json({ error: { code: "unprocessable", message: "The event could not be processed now; deliver it again." } }, { status: 500 });
  }
}
