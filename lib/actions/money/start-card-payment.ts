"use server";
import { randomUUID } from "node:crypto";
import { payments } from "@/db/schema";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { memberBalance } from "@/db/queries/money-member-balances";
import { getPaymentsClient } from "@/lib/payments/client";
import { formatMoney } from "@/lib/money";
import { appUrl } from "@/lib/server/urls";
import { emptySchema } from "@/lib/validation/money";
import { canOn } from "@/permissions";
import { logError } from "@/lib/server/log";

// The provider's smallest charge is about half a major unit (from memory of its documentation).
const MIN_CARD_MINOR = 50;

/**
 * "Pay my balance": opens a checkout session for the member's whole balance and sends the
 * browser to the provider's hosted page. Nothing is posted here: the payment is posted when the
 * provider's signed webhook says it succeeded.
 */
export const startCardPayment = clubAction({
  schema: emptySchema,
  permission: (ability, _input, ctx) => canOn(ability, "pay", "Account", { userId: ctx.user.id }),
  success: "Opening the payment page…",
  async prepare(ctx) {
    const balance = memberBalance(ctx.db, ctx.club.id, ctx.user.id);
    if (balance <= 0) throw new ActionError("There is nothing to pay: your balance is settled.");
    if (balance < MIN_CARD_MINOR) throw new ActionError(`Balances under ${formatMoney(MIN_CARD_MINOR, ctx.club.currency, ctx.club.locale)} cannot be paid by card; pay them with your next charge.`);
    const paymentId = randomUUID();
    const metadata = { clubId: ctx.club.id, memberUserId: ctx.user.id, paymentId };
    const base = `/clubs/${ctx.club.slug}/account`;
    try {
      const session = await getPaymentsClient().checkout.sessions.create(
        {
          mode: "payment",
          line_items: [{ quantity: 1, price_data: { currency: ctx.club.currency.toLowerCase(), unit_amount: balance, product_data: { name: `${ctx.club.name}: account balance` } } }],
          customer_email: ctx.user.email,
          client_reference_id: paymentId,
          metadata,
          payment_intent_data: { metadata, description: `${ctx.club.name} account balance` },
          success_url: appUrl(`${base}/paid?session={CHECKOUT_SESSION_ID}`),
          cancel_url: appUrl(`${base}/cancelled?session={CHECKOUT_SESSION_ID}`),
        },
        { idempotencyKey: `checkout:${paymentId}` },
      );
      if (!session.url) throw new Error("the provider gave no payment page");
      return { paymentId, balance, sessionId: session.id, url: session.url };
    } catch (error) {
      if (error instanceof ActionError) throw error;
      logError("payments", "checkout session failed", error);
      throw new ActionError("The payment provider could not be reached; nothing was charged. Try again in a minute.");
    }
  },
  run(tx, ctx, _input, prepared) {
    tx.insert(payments)
      .values({ id: prepared.paymentId, clubId: ctx.club.id, memberUserId: ctx.user.id, method: "card", status: "pending", amountMinor: prepared.balance, currency: ctx.club.currency, checkoutSessionId: prepared.sessionId })
      .run();
    return { redirectTo: prepared.url, data: { url: prepared.url } };
  },
});
