import { NextResponse } from "next/server";
import { getDb } from "@/db/client";
import { processPaymentEvent } from "@/lib/ledger/card-events";
import { getPaymentsClient, webhookSecret } from "@/lib/ledger/payments-client";
import { verifyWebhook } from "@/lib/payments/provider";

export const dynamic = "force-dynamic";

/**
 * The payment provider's signed webhook. The signature is checked on the raw bytes before the
 * body is read as data; a bad one is a 400 and nothing is written. The club comes from the
 * payment's own metadata and must exist. Replays and late events post nothing twice.
 */
export async function POST(request: Request): Promise<Response> {
  const payload = await request.text();
  const verified = verifyWebhook(payload, request.headers.get("stripe-signature"), webhookSecret());
  if (!verified.ok) {
    return NextResponse.json({ error: { code: "invalid", message: `Webhook signature check failed: ${verified.error}` } }, { status: 400 });
  }
  try {
    const result = await processPaymentEvent(getDb(), getPaymentsClient(), verified.event);
    return NextResponse.json({ received: true, eventId: verified.event.id, ...result });
  } catch (error) {
    // Not stored: the provider delivers the event again and it is processed then.
    console.error("[payments] webhook processing failed", verified.event.id, error);
    return NextResponse.json({ error: { code: "unprocessable", message: "The event could not be processed now; deliver it again." } }, { status: 500 });
  }
}
