"use client";
// The on-device queue of writes made with no signal (rules in lib/ramp/queue.ts). One store per
// page, outside React, so the status survives the page being re-rendered or replaced by the
// action's own navigation. Entries live in IndexedDB (idb-keyval), keyed by their idempotency key.
import { createStore, del, entries as idbEntries, set, type UseStore } from "idb-keyval";
import type { ActionState } from "@/lib/actions/action-state";
import { recordPreflight } from "@/lib/actions/preflight/record-preflight";
import { reportSquawk } from "@/lib/actions/fleet/report-squawk";
import { classifyAnswer, classifyFailure, rebuildFormData, retryDelayMs, sentMessage, toSend, type QueuedKind, type QueuedWrite, type SendOutcome } from "@/lib/ramp/queue";

/** The one write path of each kind: the same server actions the forms call. */
const SENDERS: Record<QueuedKind, (prev: ActionState, formData: FormData) => Promise<ActionState>> = {
  squawk: reportSquawk,
  preflight: recordPreflight,
};

/** A confirmation of a kept entry that has been sent (refusals stay in `entries`, state "refused"). */
export type RampNotice = { id: string; text: string };
export type RampSnapshot = { userId: string | null; entries: QueuedWrite[]; notices: RampNotice[]; online: boolean; sending: boolean };

let snapshot: RampSnapshot = { userId: null, entries: [], notices: [], online: true, sending: false };
const listeners = new Set<() => void>();
let store: UseStore | null = null;
let flushing: Promise<void> | null = null;
let retryTimer: ReturnType<typeof setTimeout> | null = null;
let retryAttempt = 0;

function idb(): UseStore {
  store ??= createStore("hangarline-ramp", "queue");
  return store;
}

function update(patch: Partial<RampSnapshot>) {
  snapshot = { ...snapshot, ...patch };
  for (const l of listeners) l();
}

export function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function getSnapshot(): RampSnapshot {
  return snapshot;
}

const SERVER_SNAPSHOT: RampSnapshot = { userId: null, entries: [], notices: [], online: true, sending: false };
export function getServerSnapshot(): RampSnapshot {
  return SERVER_SNAPSHOT;
}

/** This person's kept entries (another person's never leave IndexedDB on this page). */
async function loadEntries(userId: string): Promise<QueuedWrite[]> {
  const all = (await idbEntries<string, QueuedWrite>(idb())).map(([, v]) => v);
  return all.filter((e) => e.userId === userId).sort((a, b) => a.createdAt - b.createdAt);
}

/** Called by <RampMode> with the signed-in person; loads their entries and sends what waits. */
export async function startRamp(userId: string): Promise<void> {
  if (snapshot.userId !== userId) update({ userId, entries: [], notices: [] });
  update({ online: navigator.onLine, entries: await loadEntries(userId) });
  await flushQueue();
}

export function setOnline(online: boolean) {
  update({ online });
}

export function currentUserId(): string | null {
  return snapshot.userId;
}

export async function keep(entry: QueuedWrite): Promise<void> {
  await set(entry.id, entry, idb());
  update({ entries: [...snapshot.entries.filter((e) => e.id !== entry.id), entry] });
  retryAttempt = 0;
  scheduleRetry();
}

/** While something waits and the browser thinks it has signal (one bar), try again now and then. */
function scheduleRetry() {
  const userId = snapshot.userId;
  if (retryTimer || !userId || navigator.onLine === false || toSend(snapshot.entries, userId).length === 0) return;
  retryTimer = setTimeout(() => {
    retryTimer = null;
    retryAttempt += 1;
    void flushQueue();
  }, retryDelayMs(retryAttempt));
}

export async function dismiss(id: string): Promise<void> {
  const entry = snapshot.entries.find((e) => e.id === id);
  // Only a refused entry or a notice can be dismissed; a waiting one is still to be sent.
  if (entry?.state === "refused") await del(id, idb());
  update({ entries: snapshot.entries.filter((e) => !(e.id === id && e.state === "refused")), notices: snapshot.notices.filter((n) => n.id !== id) });
}

async function sendOne(entry: QueuedWrite): Promise<SendOutcome> {
  try {
    return classifyAnswer(await SENDERS[entry.kind]({ ok: false, message: "", fieldErrors: {} }, rebuildFormData(entry.fields)));
  } catch (error) {
    return classifyFailure(error);
  }
}

async function flushOnce(): Promise<void> {
  const userId = snapshot.userId;
  if (!userId || navigator.onLine === false) return;
  // Another tab may have sent some meanwhile: read the device's copy, not this page's.
  const waiting = toSend(await loadEntries(userId), userId);
  if (waiting.length === 0) return;
  update({ sending: true });
  try {
    for (const entry of waiting) {
      const outcome = await sendOne(entry);
      if (outcome.kind === "retry") break; // no signal again: the rest wait too, in order
      if (outcome.kind === "sent") {
        await del(entry.id, idb());
        update({ entries: snapshot.entries.filter((e) => e.id !== entry.id), notices: [...snapshot.notices.filter((n) => n.id !== entry.id), { id: entry.id, text: sentMessage(entry) }] });
      } else {
        const refused: QueuedWrite = { ...entry, state: "refused", refusal: outcome.reason };
        await set(entry.id, refused, idb());
        // Kept, shown with the reason until the person dismisses it: a refusal is never dropped unseen.
        update({ entries: snapshot.entries.map((e) => (e.id === entry.id ? refused : e)) });
      }
    }
  } finally {
    update({ sending: false, entries: await loadEntries(userId) });
  }
}

/**
 * Sends what waits, oldest first, one at a time. One send at a time in this page, and across the
 * device's tabs through a Web Lock where the browser has them; the idempotency key makes any
 * remaining overlap harmless (the server answers a repeat with its first answer and writes nothing).
 */
export function flushQueue(): Promise<void> {
  flushing ??= (async () => {
    try {
      if (typeof navigator.locks?.request === "function") await navigator.locks.request("hangarline-ramp-queue", flushOnce);
      else await flushOnce();
    } finally {
      flushing = null;
      const userId = snapshot.userId;
      if (userId && toSend(snapshot.entries, userId).length === 0) retryAttempt = 0;
      scheduleRetry();
    }
  })();
  return flushing;
}
