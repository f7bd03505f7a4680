import "server-only";
import { and, desc, eq } from "drizzle-orm";
import type { Db } from "@/db/client";
import { paymentRefunds, payments, users } from "@/db/schema";

export type PaymentListRow = {
  id: string;
  member: string;
  memberUserId: string;
  method: string;
  status: string;
  amountMinor: number;
  feeMinor: number;
  refundedMinor: number;
  receivedOn: string | null;
  reference: string | null;
  payoutId: string | null;
  createdAt: string;
};

export function listPayments(db: Db, clubId: string, opts: { memberUserId?: string; limit?: number } = {}): PaymentListRow[] {
  return db
    .select({ p: payments, name: users.name, email: users.email })
    .from(payments)
    .innerJoin(users, eq(users.id, payments.memberUserId))
    .where(and(eq(payments.clubId, clubId), opts.memberUserId ? eq(payments.memberUserId, opts.memberUserId) : undefined))
    .orderBy(desc(payments.createdAt))
    .limit(opts.limit ?? 1000)
    .all()
    .map(({ p, name, email }) => ({
      id: p.id,
      member: name ?? email,
      memberUserId: p.memberUserId,
      method: p.method,
      status: p.status,
      amountMinor: p.amountMinor,
      feeMinor: p.feeMinor,
      refundedMinor: p.refundedMinor,
      receivedOn: p.receivedOn,
      reference: p.reference ?? p.chargeId,
      payoutId: p.payoutId,
      createdAt: p.createdAt.toISOString(),
    }));
}

export function listRefunds(db: Db, clubId: string, paymentId: string) {
  return db.select().from(paymentRefunds).where(and(eq(paymentRefunds.clubId, clubId), eq(paymentRefunds.paymentId, paymentId))).orderBy(desc(paymentRefunds.createdAt)).all();
}

export function getPaymentBySession(db: Db, clubId: string, checkoutSessionId: string) {
  return db.select().from(payments).where(and(eq(payments.clubId, clubId), eq(payments.checkoutSessionId, checkoutSessionId))).get();
}
