// Test-control endpoints under /_control: the same helpers the in-process handle offers, for
// browser tests that run the fake as a separate process. JSON in, JSON out; no API key.
import type { IncomingMessage, ServerResponse } from "node:http";
import { readBody, sendJson } from "../shared/http";
import { paySession } from "./checkout";
import { ApiError } from "./errors";
import { createPayout } from "./ledger";
import type { PaymentsStore } from "./store";
import type { EventBus } from "./webhooks";

export interface ControlDeps {
  store: PaymentsStore;
  bus: EventBus;
}

/** A card expiry comfortably in the future, for helpers that do not ask for one. */
export function defaultExpiry(now: Date = new Date()): string {
  return `12/${String((now.getUTCFullYear() + 5) % 100).padStart(2, "0")}`;
}

/** A security code of the right length for the card's brand (four digits for amex). */
export function defaultCvc(cardNumber: string): string {
  return /^3[47]/.test(cardNumber.replace(/[\s-]/g, "")) ? "1234" : "123";
}

async function readJson(req: IncomingMessage): Promise<Record<string, unknown>> {
  const raw = await readBody(req, 100_000);
  if (!raw.trim()) return {};
  const parsed: unknown = JSON.parse(raw);
  if (typeof parsed !== "object" || parsed === null || Array.isArray(parsed)) throw new Error("body must be a JSON object");
  return parsed as Record<string, unknown>;
}

const str = (v: unknown): string | undefined => (typeof v === "string" && v ? v : undefined);

export async function handleControl(req: IncomingMessage, res: ServerResponse, url: URL, deps: ControlDeps): Promise<void> {
  const method = req.method ?? "GET";
  const p = url.pathname.replace(/\/+$/, "");
  let body: Record<string, unknown>;
  try {
    body = method === "POST" ? await readJson(req) : {};
  } catch (err) {
    return sendJson(res, 400, { error: { message: err instanceof Error ? err.message : "invalid body" } });
  }
  try {
    if (p === "/_control/health") return sendJson(res, 200, { ok: true });
    if (p === "/_control/webhook" && method === "POST") {
      const target = str(body.url) ?? null;
      const secret = str(body.secret) ?? null;
      if (target && !secret) return sendJson(res, 400, { error: { message: "secret is required with url" } });
      deps.bus.setTarget(target, secret);
      return sendJson(res, 200, { url: target });
    }
    if (p === "/_control/webhook" && method === "GET") return sendJson(res, 200, { url: deps.bus.getTarget()?.url ?? null });
    if (p === "/_control/events" && method === "GET") {
      return sendJson(res, 200, { data: deps.bus.events(), deliveries: deps.bus.deliveries });
    }
    const resend = /^\/_control\/events\/([^/]+)\/resend$/.exec(p);
    if (resend && method === "POST") {
      const delivery = await deps.bus.resend(decodeURIComponent(resend[1] ?? ""));
      return sendJson(res, 200, { delivery });
    }
    if (p === "/_control/payout" && method === "POST") {
      const payout = createPayout(deps.store, deps.bus, {
        currency: str(body.currency),
        automatic: true,
        arrivalDate: typeof body.arrival_date === "number" ? body.arrival_date : null,
      });
      await deps.bus.flush();
      return sendJson(res, 200, payout);
    }
    const pay = /^\/_control\/checkout\/sessions\/([^/]+)\/pay$/.exec(p);
    if (pay && method === "POST") {
      const outcome = paySession(deps.store, deps.bus, decodeURIComponent(pay[1] ?? ""), {
        number: str(body.card_number) ?? "",
        expiry: str(body.expiry) ?? defaultExpiry(),
        cvc: str(body.cvc) ?? defaultCvc(str(body.card_number) ?? ""),
        name: str(body.name) ?? null,
        email: str(body.email) ?? null,
      });
      await deps.bus.flush();
      return sendJson(res, outcome.ok ? 200 : 402, outcome);
    }
    return sendJson(res, 404, { error: { message: `no control endpoint ${method} ${p}` } });
  } catch (err) {
    if (err instanceof ApiError) return sendJson(res, err.status, err.toBody());
    if (err instanceof Error && err.message.startsWith("No such event")) return sendJson(res, 404, { error: { message: err.message } });
    throw err;
  }
}
