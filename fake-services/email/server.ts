// HTTP stand-in for the e-mail provider's REST API, spoken to by the real `resend` SDK through
// its base-URL setting (`new Resend(key, { baseUrl })` or RESEND_BASE_URL). It implements the
// calls the app makes (POST /emails, GET /emails/:id), a failure switch for outbox-retry
// tests, an HTML outbox viewer and a JSON view for tests.
//
// Script mode: `tsx fake-services/email/server.ts` listens on PORT (default 3100); set
// EMAIL_OUTBOX_FILE to mirror messages to a JSON-lines file.
import type { IncomingMessage, ServerResponse } from "node:http";
import {
  BodyTooLargeError,
  isMainModule,
  listenServer,
  readBearer,
  readBody,
  sendHtml,
  sendJson,
} from "../shared/http";
import { createOutbox, type StoredMessage } from "./outbox";
import { isProviderError, validateSendRequest, type ProviderError, type ValidSendRequest } from "./validate";
import { renderMessagePage, renderNotFoundPage, renderOutboxPage } from "./viewer";

export type { StoredMessage } from "./outbox";

/** "500" answers a server error, "429" a rate limit, "down" drops every API connection. */
export type FailingMode = false | "500" | "429" | "down";

export interface FakeEmailServer {
  url: string;
  port: number;
  close(): Promise<void>;
  setFailing(mode: FailingMode): void;
  /** Newest first. */
  messages(): StoredMessage[];
  clear(): void;
}

function providerError(res: ServerResponse, err: ProviderError): void {
  sendJson(res, err.statusCode, err);
}

function toApiEmail(m: StoredMessage): Record<string, unknown> {
  return {
    object: "email",
    id: m.id,
    from: m.from,
    to: m.to,
    cc: m.cc.length ? m.cc : null,
    bcc: m.bcc.length ? m.bcc : null,
    reply_to: m.replyTo.length ? m.replyTo : null,
    subject: m.subject,
    html: m.html,
    text: m.text,
    created_at: m.createdAt,
    scheduled_at: null,
    last_event: "delivered",
    tags: m.tags,
  };
}

function sameRequest(a: ValidSendRequest, b: ValidSendRequest): boolean {
  const pick = (r: ValidSendRequest) =>
    JSON.stringify([r.from, r.to, r.cc, r.bcc, r.replyTo, r.subject, r.html, r.text, r.headers, r.tags]);
  return pick(a) === pick(b);
}

function parseFailingMode(value: unknown): FailingMode | undefined {
  if (value === false || value === null || value === "off") return false;
  if (value === "500" || value === "429" || value === "down") return value;
  return undefined;
}

export async function startFakeEmailServer(
  opts: { port?: number; host?: string; file?: string } = {},
): Promise<FakeEmailServer> {
  const outbox = createOutbox(opts.file);
  let failing: FailingMode = false;

  // Returns true when the request was answered by the failure switch.
  function applyFailure(req: IncomingMessage, res: ServerResponse): boolean {
    if (failing === "down") {
      req.socket.destroy();
      return true;
    }
    if (failing === "500") {
      providerError(res, { statusCode: 500, name: "internal_server_error", message: "The fake provider is set to fail." });
      return true;
    }
    if (failing === "429") {
      providerError(res, {
        statusCode: 429,
        name: "rate_limit_exceeded",
        message: "Too many requests. The fake provider is set to rate-limit.",
      });
      return true;
    }
    return false;
  }

  function requireKey(req: IncomingMessage, res: ServerResponse): boolean {
    if (readBearer(req)) return true;
    providerError(res, {
      statusCode: 401,
      name: "missing_api_key",
      message: "Missing API key in the authorization header. Include the header `Authorization: Bearer YOUR_API_KEY`.",
    });
    return false;
  }

  async function handleSend(req: IncomingMessage, res: ServerResponse): Promise<void> {
    let body: unknown;
    try {
      body = JSON.parse(await readBody(req));
    } catch (err) {
      const tooLarge = err instanceof BodyTooLargeError;
      providerError(res, {
        statusCode: tooLarge ? 413 : 422,
        name: "validation_error",
        message: tooLarge ? err.message : "The request body is not valid JSON.",
      });
      return;
    }
    const parsed = validateSendRequest(body);
    if (isProviderError(parsed)) return providerError(res, parsed);
    const key = req.headers["idempotency-key"];
    const idempotencyKey = typeof key === "string" && key ? key : null;
    if (idempotencyKey) {
      const earlier = outbox.findByIdempotencyKey(idempotencyKey);
      if (earlier && !sameRequest(earlier, parsed)) {
        return providerError(res, {
          statusCode: 409,
          name: "invalid_idempotent_request",
          message: "Same idempotency key used with a different request payload.",
        });
      }
      // A retried send with the same key is answered with the first id and stored once.
      if (earlier) return sendJson(res, 200, { id: earlier.id });
    }
    const stored = outbox.add(parsed, idempotencyKey);
    sendJson(res, 200, { id: stored.id });
  }

  async function handleControl(req: IncomingMessage, res: ServerResponse): Promise<void> {
    let body: { mode?: unknown } = {};
    try {
      body = JSON.parse((await readBody(req)) || "{}") as { mode?: unknown };
    } catch {
      return sendJson(res, 400, { error: "body must be JSON" });
    }
    const mode = parseFailingMode(body.mode);
    if (mode === undefined) return sendJson(res, 400, { error: 'mode must be false, "500", "429" or "down"' });
    failing = mode;
    sendJson(res, 200, { mode: failing });
  }

  async function handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const url = new URL(req.url ?? "/", "http://fake.local");
    const method = req.method ?? "GET";
    const p = url.pathname.replace(/\/+$/, "") || "/";
    const emailMatch = /^\/emails\/([^/]+)$/.exec(p);

    if (p === "/emails" || emailMatch) {
      if (applyFailure(req, res) || !requireKey(req, res)) return;
      if (p === "/emails" && method === "POST") return handleSend(req, res);
      if (emailMatch && method === "GET") {
        const m = outbox.get(decodeURIComponent(emailMatch[1] ?? ""));
        if (!m) return providerError(res, { statusCode: 404, name: "not_found", message: "Email not found" });
        return sendJson(res, 200, toApiEmail(m));
      }
      return providerError(res, { statusCode: 405, name: "method_not_allowed", message: "Method is not allowed for this path." });
    }
    if (p === "/" && method === "GET") {
      const to = url.searchParams.get("to")?.trim() || null;
      return sendHtml(res, 200, renderOutboxPage(outbox.list(to ? { to } : undefined), to));
    }
    const pageMatch = /^\/messages\/([^/]+)$/.exec(p);
    if (pageMatch && method === "GET") {
      const id = decodeURIComponent(pageMatch[1] ?? "");
      const m = outbox.get(id);
      return m ? sendHtml(res, 200, renderMessagePage(m)) : sendHtml(res, 404, renderNotFoundPage(id));
    }
    if (p === "/api/messages" && method === "GET") {
      const to = url.searchParams.get("to")?.trim() || undefined;
      return sendJson(res, 200, { data: outbox.list(to ? { to } : undefined) });
    }
    if (p === "/api/messages" && method === "DELETE") {
      outbox.clear();
      return sendJson(res, 200, { cleared: true });
    }
    const apiMatch = /^\/api\/messages\/([^/]+)$/.exec(p);
    if (apiMatch && method === "GET") {
      const m = outbox.get(decodeURIComponent(apiMatch[1] ?? ""));
      return m ? sendJson(res, 200, m) : sendJson(res, 404, { error: "not found" });
    }
    if (p === "/_control/failing" && method === "POST") return handleControl(req, res);
    if (p === "/_control/health" && method === "GET") return sendJson(res, 200, { ok: true, failing });
    sendJson(res, 404, { statusCode: 404, name: "not_found", message: "The requested endpoint does not exist." });
  }

  const server = await listenServer(handle, { port: opts.port, host: opts.host });
  return {
    url: server.url,
    port: server.port,
    close: server.close,
    setFailing(mode) {
      failing = mode;
    },
    messages: () => outbox.list(),
    clear: () => outbox.clear(),
  };
}

if (isMainModule(import.meta.url)) {
  const port = Number(process.env.PORT ?? 3100);
  startFakeEmailServer({ port, host: process.env.HOST ?? "127.0.0.1", file: process.env.EMAIL_OUTBOX_FILE }).then(
    (s) => console.log(`Fake e-mail provider listening on ${s.url} (outbox viewer at ${s.url}/)`),
    (err: unknown) => {
      console.error(err);
      process.exit(1);
    },
  );
}
