import "server-only";
import type { Db } from "@/db/client";
import { recordCardPayment } from "./money-card-payments";
import { snapshotOfIntent } from "./money-card-events";
import { isLedgerError } from "@/lib/money/errors";
import { getPaymentsClient } from "@/lib/payments/client";
import { logError } from "@/lib/server/log";

/**
 * Asks the provider about one checkout session and posts it if it was paid: for the return
 * page, when the webhook has not arrived yet. Keyed like the webhook, so it never posts twice.
 */
export async function syncCheckoutSession(db: Db, clubId: string, sessionId: string): Promise<void> {
  try {
    const stripe = getPaymentsClient();
    const session = await stripe.checkout.sessions.retrieve(sessionId);
    if (session.metadata?.clubId !== clubId || session.payment_status !== "paid" || !session.payment_intent) return;
    const snapshot = await snapshotOfIntent(stripe, typeof session.payment_intent === "string" ? session.payment_intent : session.payment_intent.id, session.id);
    if (!snapshot || snapshot.clubId !== clubId) return;
    db.transaction((tx) => recordCardPayment(tx, snapshot));
  } catch (error) {
    // The webhook remains the way in; this page only tries to be early.
    if (!isLedgerError(error)) logError("payments", "return-page check failed", error);
  }
}
