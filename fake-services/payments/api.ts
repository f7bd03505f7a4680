// Dispatcher for /v1 requests: API-key check, form decoding, idempotent replays, the route
// table, `expand[]`, list paging, and errors in the provider's JSON shape.
import { createHash } from "node:crypto";
import type { IncomingMessage, ServerResponse } from "node:http";
import { BodyTooLargeError, readBearer, readBody, sendJson } from "../shared/http";
import { ApiError } from "./errors";
import { parseForm, type FormObject } from "./form";
import { matchRoute, type RouteContext } from "./routes";
import { newId, type PaymentsStore } from "./store";
import { applyExpand, paginate } from "./views";
import type { EventBus } from "./webhooks";

interface CachedResponse {
  fingerprint: string;
  status: number;
  body: unknown;
}

export interface ApiDeps {
  store: PaymentsStore;
  bus: EventBus;
  publicUrl: () => string;
}

// The SDK sends Bearer; Basic with the key as user name is accepted too, for curl -u.
function readApiKey(req: IncomingMessage): string | null {
  const bearer = readBearer(req);
  if (bearer) return bearer;
  const m = /^Basic\s+(\S+)$/i.exec(req.headers.authorization?.trim() ?? "");
  if (!m) return null;
  const user = Buffer.from(m[1] ?? "", "base64").toString("utf8").split(":")[0];
  return user || null;
}

function authenticate(req: IncomingMessage): void {
  const key = readApiKey(req);
  if (!key) {
    throw new ApiError(
      401,
      "invalid_request_error",
      "You did not provide an API key. Provide it in the Authorization header, using Bearer auth (e.g. 'Authorization: Bearer YOUR_SECRET_KEY').",
    );
  }
  // The fake is test-mode only: a live key reaching it is a configuration mistake to surface.
  if (!/^(sk|rk)_test_\S+$/.test(key)) {
    throw new ApiError(401, "invalid_request_error", `Invalid API Key provided: ${key.slice(0, 8)}****`, { code: "api_key_invalid" });
  }
}

function headerValue(req: IncomingMessage, name: string): string | null {
  const v = req.headers[name];
  return typeof v === "string" && v ? v : null;
}

export function createApiHandler(deps: ApiDeps) {
  const idempotent = new Map<string, CachedResponse>();

  function reply(res: ServerResponse, status: number, body: unknown, requestId: string, key: string | null): void {
    sendJson(res, status, body, {
      "Request-Id": requestId,
      "Stripe-Version": deps.bus.apiVersion,
      ...(key ? { "Idempotency-Key": key } : {}),
    });
  }

  return async function handleApi(req: IncomingMessage, res: ServerResponse, url: URL): Promise<void> {
    const requestId = newId("req", 14);
    const method = req.method ?? "GET";
    const key = method === "POST" ? headerValue(req, "idempotency-key") : null;
    try {
      authenticate(req);
      const version = headerValue(req, "stripe-version");
      if (version) deps.bus.apiVersion = version;
      const raw = method === "POST" ? await readBody(req, 1_000_000) : url.search.slice(1);
      const fingerprint = createHash("sha256").update(`${method} ${url.pathname}\n${raw}`).digest("hex");
      if (key) {
        const cached = idempotent.get(key);
        if (cached && cached.fingerprint !== fingerprint) {
          throw new ApiError(
            400,
            "idempotency_error",
            `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${key}' if you meant to execute a different request.`,
          );
        }
        if (cached) return reply(res, cached.status, cached.body, requestId, key);
      }
      const params: FormObject = parseForm(raw);
      const found = matchRoute(method, url.pathname.replace(/\/+$/, ""));
      if (!found) throw new ApiError(404, "invalid_request_error", `Unrecognized request URL (${method}: ${url.pathname}).`);
      if ("allowed" in found) {
        throw new ApiError(404, "invalid_request_error", `Unrecognized request URL (${method}: ${url.pathname}). Use ${found.allowed.join(" or ")}.`);
      }
      const ctx: RouteContext = {
        store: deps.store,
        bus: deps.bus,
        params,
        ids: found.ids,
        idempotencyKey: key,
        publicUrl: deps.publicUrl(),
      };
      let status = 200;
      let body: unknown;
      try {
        const result = found.route.run(ctx);
        body =
          result.kind === "list"
            ? paginate(result.items, params, url.pathname)
            : result.body;
        body = applyExpand(deps.store, body, params);
      } catch (err) {
        if (!(err instanceof ApiError)) throw err;
        status = err.status;
        body = err.toBody();
      }
      // Replays answer exactly as the first attempt did, errors included.
      if (key) idempotent.set(key, { fingerprint, status, body });
      reply(res, status, body, requestId, key);
    } catch (err) {
      if (err instanceof ApiError) return reply(res, err.status, err.toBody(), requestId, key);
      if (err instanceof BodyTooLargeError) {
        return reply(res, 413, new ApiError(413, "invalid_request_error", err.message).toBody(), requestId, key);
      }
      console.error("[fake-payments] internal error", err);
      reply(res, 500, { error: { type: "api_error", message: "The fake payment provider hit an internal error." } }, requestId, key);
    }
  };
}
