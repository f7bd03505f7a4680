// The fake provider's memory of every accepted message, optionally mirrored to a JSON-lines
// file so that a developer's outbox survives a restart of `npm run fake:email`.
import { randomUUID } from "node:crypto";
import { appendFileSync, existsSync, readFileSync } from "node:fs";
import type { ValidSendRequest } from "./validate";

export interface StoredMessage extends ValidSendRequest {
  id: string;
  /** UTC instant the fake accepted the message, ISO 8601. */
  createdAt: string;
  idempotencyKey: string | null;
}

export interface Outbox {
  add(request: ValidSendRequest, idempotencyKey: string | null): StoredMessage;
  /** Newest first. */
  list(filter?: { to?: string }): StoredMessage[];
  get(id: string): StoredMessage | undefined;
  findByIdempotencyKey(key: string): StoredMessage | undefined;
  clear(): void;
}

function loadFile(file: string): StoredMessage[] {
  if (!existsSync(file)) return [];
  const out: StoredMessage[] = [];
  for (const line of readFileSync(file, "utf8").split("\n")) {
    if (!line.trim()) continue;
    try {
      out.push(JSON.parse(line) as StoredMessage);
    } catch {
      // A half-written last line from a crash is skipped rather than blocking startup.
    }
  }
  return out;
}

function bareAddress(value: string): string {
  const m = /<([^<>]+)>\s*$/.exec(value);
  return (m?.[1] ?? value).trim().toLowerCase();
}

export function createOutbox(file?: string): Outbox {
  const messages: StoredMessage[] = file ? loadFile(file) : [];
  return {
    add(request, idempotencyKey) {
      const message: StoredMessage = {
        ...request,
        id: randomUUID(),
        createdAt: new Date().toISOString(),
        idempotencyKey,
      };
      messages.push(message);
      if (file) appendFileSync(file, `${JSON.stringify(message)}\n`, "utf8");
      return message;
    },
    list(filter) {
      const wanted = filter?.to ? bareAddress(filter.to) : null;
      const matches = wanted
        ? messages.filter((m) => [...m.to, ...m.cc, ...m.bcc].some((a) => bareAddress(a) === wanted))
        : messages;
      return [...matches].reverse();
    },
    get(id) {
      return messages.find((m) => m.id === id);
    },
    findByIdempotencyKey(key) {
      return messages.find((m) => m.idempotencyKey === key);
    },
    clear() {
      // Only memory is cleared: the file is an append-only record for the developer.
      messages.length = 0;
    },
  };
}
