import { AsyncResource } from "node:async_hooks";
import { getDb } from "@/db/client";
import { produceScheduledBills } from "@/db/queries/money-recurring";
import { createEmailProvider, type EmailProvider } from "./provider";
import { composeBookingReminders } from "./booking-reminders";
import { composeSafetyDigests, type DigestTickResult } from "./safety-digest";
import { drainOutbox } from "./worker";
import { logError } from "@/lib/server/log";

// The in-process worker: started once by instrumentation.ts, and nudged right after a message is
// queued so that a sign-in link does not wait for the next tick.
const state = globalThis as unknown as { __outbox?: { provider: EmailProvider; running: Promise<void> | null; again: boolean; timer?: NodeJS.Timeout; digestTimer?: NodeJS.Timeout; scope?: AsyncResource } };

function getState() {
  state.__outbox ??= { provider: createEmailProvider(), running: null, again: false };
  return state.__outbox;
}

/** Nudges the worker without tying the drain to the request that queued the message. */
export function kickOutbox(): void {
  const s = getState();
  if (s.scope) s.scope.runInAsyncScope(drainNow);
  else drainNow();
}

function drainNow(): void {
  const s = getState();
  if (s.running) {
    s.again = true;
    return;
  }
  s.running = drainOutbox(getDb(), s.provider)
    .then(() => undefined)
    .catch((error) => logError("outbox", "drain failed", error))
    .finally(() => {
      s.running = null;
      if (s.again) {
        s.again = false;
        drainNow();
      }
    });
}

/** What one scheduled tick did: the safety digests' counts, the reminders queued and the recurring bills entered. */
export type ScheduledTickResult = DigestTickResult & { reminders: number; bills: number };

/**
 * The scheduled tick: queues any safety digest whose batch time has passed and the booking
 * reminders, enters every club's recurring bills that have fallen due, then drains. Safe to
 * call as often as wanted (the in-process timer, a cron route or a script): a batch is composed
 * once and a recurring bill's period is billed once.
 */
export function runScheduledTick(now = new Date()): ScheduledTickResult {
  let result: DigestTickResult = { clubs: 0, messages: 0 };
  try {
    result = composeSafetyDigests(getDb(), now);
  } catch (error) {
    logError("outbox", "scheduled tick failed", error);
  }
  let reminders = 0;
  try {
    reminders = composeBookingReminders(getDb(), now).messages;
  } catch (error) {
    logError("outbox", "booking reminders failed", error);
  }
  let bills = 0;
  try {
    bills = produceScheduledBills(getDb(), now).bills;
  } catch (error) {
    logError("money", "scheduled recurring bills failed", error);
  }
  if (result.messages > 0 || reminders > 0) kickOutbox();
  return { ...result, reminders, bills };
}

export function startOutboxWorker(intervalMs = Number(process.env.OUTBOX_INTERVAL_MS ?? 2000), digestIntervalMs = Number(process.env.SCHEDULED_TICK_INTERVAL_MS ?? 60_000)): void {
  const s = getState();
  if (s.timer) return;
  // Created at start-up, outside any request: drains run in this scope, not a request's.
  s.scope = new AsyncResource("hangarline-outbox");
  s.timer = setInterval(() => s.scope!.runInAsyncScope(drainNow), intervalMs);
  s.timer.unref();
  if (process.env.SCHEDULED_TICK !== "off") {
    s.digestTimer = setInterval(() => s.scope!.runInAsyncScope(() => void runScheduledTick()), digestIntervalMs);
    s.digestTimer.unref();
    s.scope.runInAsyncScope(() => void runScheduledTick());
  }
  drainNow();
}
