import { and, eq, inArray, lte, or, isNull, lt } from "drizzle-orm";
import type { Db } from "@/db/client";
import { emailOutbox, type OutboxMessage } from "@/db/schema";
import { isEmailTemplateName, renderEmail, type EmailTemplates } from "@/emails";
import type { EmailProvider } from "./provider";

export const EMAIL_FROM = process.env.EMAIL_FROM ?? "Hangarline <no-reply@hangarline.test>";
const LOCK_MS = 60_000;
const BASE_DELAY_MS = 5_000;
const MAX_DELAY_MS = 30 * 60_000;

/** Exponential backoff: 5 s, 10 s, 20 s … capped at 30 minutes. Messages are never dropped. */
export function retryDelayMs(attempts: number): number {
  return Math.min(MAX_DELAY_MS, BASE_DELAY_MS * 2 ** Math.max(0, attempts - 1));
}

export type DrainResult = { sent: number; retried: number; failed: number };

function claimDue(db: Db, now: Date, batch: number): OutboxMessage[] {
  return db.transaction((tx) => {
    const due = tx
      .select()
      .from(emailOutbox)
      .where(
        or(
          and(eq(emailOutbox.status, "pending"), lte(emailOutbox.nextAttemptAt, now)),
          // A worker that died mid-send leaves "sending" rows; take them back after the lock.
          and(eq(emailOutbox.status, "sending"), or(isNull(emailOutbox.lockedUntil), lt(emailOutbox.lockedUntil, now))),
        ),
      )
      .orderBy(emailOutbox.nextAttemptAt)
      .limit(batch)
      .all();
    if (due.length === 0) return [];
    tx.update(emailOutbox)
      .set({ status: "sending", lockedUntil: new Date(now.getTime() + LOCK_MS) })
      .where(inArray(emailOutbox.id, due.map((m) => m.id)))
      .run();
    return due;
  });
}

export async function drainOutbox(db: Db, provider: EmailProvider, opts: { now?: Date; batch?: number } = {}): Promise<DrainResult> {
  const now = opts.now ?? new Date();
  const result: DrainResult = { sent: 0, retried: 0, failed: 0 };
  const messages = claimDue(db, now, opts.batch ?? 50);
  for (const message of messages) {
    const attempts = message.attempts + 1;
    if (!isEmailTemplateName(message.template)) {
      db.update(emailOutbox).set({ status: "failed", attempts, lastError: `Unknown template ${message.template}`, lockedUntil: null }).where(eq(emailOutbox.id, message.id)).run();
      result.failed++;
      continue;
    }
    let outcome: Awaited<ReturnType<EmailProvider["send"]>>;
    try {
      const { html, text } = await renderEmail(message.template, message.payload as EmailTemplates[typeof message.template]);
      outcome = await provider.send({
        from: EMAIL_FROM,
        to: message.toAddress,
        subject: message.subject,
        html,
        text,
        headers: { "X-Hangarline-Outbox-Id": message.id },
      }, { idempotencyKey: message.id });
    } catch (error) {
      outcome = { ok: false, error: error instanceof Error ? error.message : String(error), retryable: true };
    }
    if (outcome.ok) {
      db.update(emailOutbox)
        .set({ status: "sent", attempts, providerMessageId: outcome.providerId, sentAt: new Date(), lastError: null, lockedUntil: null })
        .where(eq(emailOutbox.id, message.id))
        .run();
      result.sent++;
    } else if (outcome.retryable) {
      db.update(emailOutbox)
        .set({ status: "pending", attempts, lastError: outcome.error, lockedUntil: null, nextAttemptAt: new Date(now.getTime() + retryDelayMs(attempts)) })
        .where(eq(emailOutbox.id, message.id))
        .run();
      result.retried++;
    } else {
      // The provider refused the message itself (bad address): kept, shown to admins, not retried.
      db.update(emailOutbox).set({ status: "failed", attempts, lastError: outcome.error, lockedUntil: null }).where(eq(emailOutbox.id, message.id)).run();
      result.failed++;
    }
  }
  return result;
}
