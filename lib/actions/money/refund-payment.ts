"use server";
import { and, eq } from "drizzle-orm";
import type Stripe from "stripe";
import { payments } from "@/db/schema";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { kickOutbox } from "@/lib/email/runner";
import { recordCardRefund } from "@/db/queries/money-card-payments";
import { getPaymentsClient } from "@/lib/payments/client";
import { writeAudit } from "@/lib/server/audit";
import { refundSchema } from "@/lib/validation/money";
import { formatMoney } from "@/lib/money";
import { minorOf } from "./amounts";
import { ledger } from "./ledger-errors";

export const refundPayment = clubAction({
  schema: refundSchema,
  permission: ["refund", "Payment"],
  success: "Refund made.",
  // The provider is asked first; its refund id keys the posting, so the webhook that follows
  // (or came first) finds it posted.
  async prepare(ctx, input): Promise<{ refund: Stripe.Refund; amountMinor: number; paymentIntentId: string }> {
    const payment = ctx.db.select().from(payments).where(and(eq(payments.clubId, ctx.club.id), eq(payments.id, input.paymentId))).get();
    if (!payment) throw new ActionError("That payment was not found in this club.", {}, "not_found");
    if (payment.method !== "card" || !payment.paymentIntentId) throw new ActionError("Only card payments are refunded here; reverse a cheque or cash payment in the journal.");
    if (payment.status !== "succeeded" && payment.status !== "partially_refunded") throw new ActionError("This payment has nothing left to refund.");
    const amountMinor = minorOf(input.amount, ctx.club.currency, "amount");
    const left = payment.amountMinor - payment.refundedMinor;
    if (amountMinor > left) throw new ActionError("Some fields need attention; nothing was saved.", { amount: [`At most ${formatMoney(left, ctx.club.currency, ctx.club.locale)} is left to refund.`] });
    try {
      const refund = await getPaymentsClient().refunds.create(
        { payment_intent: payment.paymentIntentId, amount: amountMinor, metadata: { clubId: ctx.club.id, paymentId: payment.id, treatment: input.treatment, requestedById: ctx.user.id } },
        { idempotencyKey: `refund:${payment.id}:${payment.refundedMinor}:${amountMinor}` },
      );
      return { refund, amountMinor, paymentIntentId: payment.paymentIntentId };
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      throw new ActionError(`The payment provider refused the refund: ${message}`);
    }
  },
  run(tx, ctx, input, prepared) {
    const { refund, amountMinor, paymentIntentId } = prepared;
    const outcome = ledger(() =>
      recordCardRefund(tx, { clubId: ctx.club.id, paymentIntentId, refundId: refund.id, amountMinor: refund.amount, currency: refund.currency, treatment: input.treatment, createdAt: new Date(refund.created * 1000), requestedById: ctx.user.id }),
    );
    writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "money.payment.refund", subjectType: "Payment", subjectId: input.paymentId, after: { refundId: refund.id, amountMinor, treatment: input.treatment, outcome } });
    return { refresh: true };
  },
  after: () => kickOutbox(),
});
