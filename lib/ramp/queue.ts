// Ramp mode: the pure rules of the on-device queue of writes made with no signal (a squawk, a
// preflight record). No storage and no framework here: components/ramp/queue-store.ts keeps the
// entries in IndexedDB and sends them through the same server actions the forms call.

/** What can wait on the device. Each kind is sent by exactly one server action. */
export type QueuedKind = "squawk" | "preflight";

/** One form field as kept on the device: text, or a file kept as a Blob with its name and type. */
export type StoredField =
  | { name: string; kind: "text"; value: string }
  | { name: string; kind: "file"; blob: Blob; fileName: string; type: string };

export type QueuedWrite = {
  /** The submission's idempotency key: the same on every send, so the server writes it once. */
  id: string;
  kind: QueuedKind;
  /** Whose write it is: only this person's session ever sends or shows it. */
  userId: string;
  /** Milliseconds since the epoch, when it was kept; entries go out oldest first. */
  createdAt: number;
  /** A line a person recognises it by (the squawk's description). */
  summary: string;
  fields: StoredField[];
  /** waiting: to be sent; refused: the server said no, shown until the person dismisses it. */
  state: "waiting" | "refused";
  refusal?: string;
};

export const IDEMPOTENCY_FIELD = "idempotencyKey";

const NOUNS: Record<QueuedKind, [singular: string, plural: string]> = {
  squawk: ["squawk", "squawks"],
  preflight: ["preflight record", "preflight records"],
};

/** FormData entries → fields that IndexedDB can keep (strings and Blobs are both structured-cloneable). */
export function toStoredFields(entries: Iterable<[string, FormDataEntryValue]>): StoredField[] {
  const out: StoredField[] = [];
  for (const [name, value] of entries) {
    if (typeof value === "string") out.push({ name, kind: "text", value });
    else out.push({ name, kind: "file", blob: value, fileName: value.name, type: value.type });
  }
  return out;
}

/** The FormData the server action receives: the same fields, in the same order, files with their names. */
export function rebuildFormData(fields: StoredField[]): FormData {
  const fd = new FormData();
  for (const f of fields) {
    if (f.kind === "text") fd.append(f.name, f.value);
    else fd.append(f.name, f.blob, f.fileName);
  }
  return fd;
}

/** Like the action wrapper's reading of a form: `name[]` and repeated names become arrays. */
export function fieldsToObject(fields: StoredField[]): Record<string, unknown> {
  const grouped = new Map<string, unknown[]>();
  for (const f of fields) {
    const value = f.kind === "text" ? f.value : f.blob;
    const list = grouped.get(f.name) ?? [];
    list.push(value);
    grouped.set(f.name, list);
  }
  const out: Record<string, unknown> = {};
  for (const [name, values] of grouped) {
    if (name === "__proto__" || name === "constructor" || name === "prototype") continue;
    const key = name.endsWith("[]") ? name.slice(0, -2) : name;
    out[key] = name.endsWith("[]") || values.length > 1 ? values : values[0];
  }
  return out;
}

export function textField(fields: StoredField[], name: string): string | undefined {
  const f = fields.find((x) => x.name === name && x.kind === "text");
  return f && f.kind === "text" ? f.value : undefined;
}

/** What the person recognises the entry by: the squawk's description, or the kind of record. */
export function summarize(kind: QueuedKind, fields: StoredField[]): string {
  if (kind === "squawk") return (textField(fields, "description") ?? "").trim().replace(/\s+/g, " ");
  return "Preflight record";
}

/**
 * A kept entry from a submitted form. The form's own idempotency key goes with it (the key the
 * server would have seen had there been signal); makeKey is used only when the form had none yet.
 */
export function newQueuedWrite(input: { kind: QueuedKind; userId: string; fields: StoredField[]; now: number; makeKey: () => string }): QueuedWrite {
  let id = textField(input.fields, IDEMPOTENCY_FIELD) ?? "";
  let fields = input.fields;
  if (!id) {
    id = input.makeKey();
    fields = [...fields.filter((f) => f.name !== IDEMPOTENCY_FIELD), { name: IDEMPOTENCY_FIELD, kind: "text", value: id }];
  }
  return { id, kind: input.kind, userId: input.userId, createdAt: input.now, summary: summarize(input.kind, fields), fields, state: "waiting" };
}

/** This person's entries still to send, oldest first. Another person's entries are never sent. */
export function toSend(entries: QueuedWrite[], userId: string): QueuedWrite[] {
  return entries.filter((e) => e.userId === userId && e.state === "waiting").sort((a, b) => a.createdAt - b.createdAt || a.id.localeCompare(b.id));
}

/** The status line while entries wait, e.g. "1 squawk not sent yet — it will be sent when you have signal." */
export function waitingMessage(entries: QueuedWrite[], userId: string): string | null {
  const waiting = toSend(entries, userId);
  if (waiting.length === 0) return null;
  const parts = (Object.keys(NOUNS) as QueuedKind[])
    .map((kind) => {
      const n = waiting.filter((e) => e.kind === kind).length;
      if (n === 0) return null;
      return `${n} ${NOUNS[kind][n === 1 ? 0 : 1]}`;
    })
    .filter((p): p is string => p !== null);
  const list = parts.length > 1 ? `${parts.slice(0, -1).join(", ")} and ${parts.at(-1)}` : parts[0]!;
  return `${list} not sent yet — ${waiting.length === 1 ? "it" : "they"} will be sent when you have signal.`;
}

/** The confirmation once the server took it, quoting what was sent. */
export function sentMessage(entry: Pick<QueuedWrite, "kind" | "summary">): string {
  return entry.kind === "squawk" ? `Squawk sent: “${entry.summary}”` : "Preflight record sent.";
}

export function refusedMessage(entry: Pick<QueuedWrite, "kind" | "summary">, reason: string): string {
  const what = entry.kind === "squawk" ? `Squawk “${entry.summary}”` : "Preflight record";
  return `${what} was not accepted: ${reason}`;
}

/** What a server action's answer (or failure) means for a kept entry. */
export type SendOutcome =
  | { kind: "sent" }
  | { kind: "refused"; reason: string }
  /** Not answered (no signal, server unreachable, session to renew): keep it and try again later. */
  | { kind: "retry"; reason: string };

/** An answer that says "sign in again" is not a refusal of the record: it waits for the next session. */
const SESSION_ENDED = /session has ended|sign in again/i;

export function classifyAnswer(answer: { ok: boolean; message?: string } | null | undefined): SendOutcome {
  if (!answer || typeof answer.ok !== "boolean") return { kind: "retry", reason: "The server's answer could not be read." };
  if (answer.ok) return { kind: "sent" };
  const reason = answer.message?.trim() || "The server refused it.";
  if (SESSION_ENDED.test(reason)) return { kind: "retry", reason };
  return { kind: "refused", reason };
}

/**
 * A thrown failure while sending. The framework answers a redirecting action by navigating and
 * rejecting with its redirect signal (digest "NEXT_REDIRECT…"): the write was accepted. A TypeError
 * from fetch is no signal; anything else (a 5xx, a broken response) is tried again later, never dropped.
 */
export function classifyFailure(error: unknown): SendOutcome {
  const digest = typeof error === "object" && error !== null && "digest" in error ? String((error as { digest: unknown }).digest) : "";
  if (digest.startsWith("NEXT_REDIRECT")) return { kind: "sent" };
  if (isNetworkFailure(error)) return { kind: "retry", reason: "No signal." };
  return { kind: "retry", reason: error instanceof Error ? error.message : "The server did not answer." };
}

/** fetch rejects with a TypeError when the request never reached the server (offline, DNS, reset). */
export function isNetworkFailure(error: unknown): boolean {
  return error instanceof TypeError;
}

/**
 * With one bar the browser still says it is online, so no `online` event will come: waiting entries
 * are tried again after 15 s, 30 s, 1 min, then every 2 min (our own choice: soon enough to land
 * while the pilot is still at the aircraft, sparse enough not to drain a phone on a weak signal).
 */
export function retryDelayMs(attempt: number): number {
  const steps = [15_000, 30_000, 60_000];
  return steps[Math.max(0, Math.floor(attempt))] ?? 120_000;
}
