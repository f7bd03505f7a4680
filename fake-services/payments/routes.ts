// The /v1 REST surface of the fake payment provider: the endpoints the SDK calls for
// customers, checkout sessions, payment intents, charges, refunds, balance transactions,
// the balance, payouts and events. Each handler returns the provider-shaped body; lists
// return their full newest-first array and the dispatcher pages them.
import { expireIfDue, createSession } from "./checkout";
import { invalidRequest, noSuch } from "./errors";
import { readInteger, readMetadata, readString, type FormObject } from "./form";
import { createPayout, createRefund, readBalance } from "./ledger";
import { newId, nowSeconds, type Customer, type PaymentsStore, type StoredObject } from "./store";
import type { EventBus } from "./webhooks";

export interface RouteContext {
  store: PaymentsStore;
  bus: EventBus;
  params: FormObject;
  /** Path captures, URL-decoded. */
  ids: string[];
  idempotencyKey: string | null;
  publicUrl: string;
}

export type RouteResult = { kind: "object"; body: unknown } | { kind: "list"; items: { id: string }[] };

interface Route {
  method: "GET" | "POST";
  pattern: RegExp;
  run(ctx: RouteContext): RouteResult;
}

const one = (body: unknown): RouteResult => ({ kind: "object", body });
const many = (items: { id: string }[]): RouteResult => ({ kind: "list", items });

function lookup<K extends StoredObject["object"]>(ctx: RouteContext, kind: K): Extract<StoredObject, { object: K }> {
  const id = ctx.ids[0] ?? "";
  const found = ctx.store.find(kind, id);
  if (!found) throw noSuch(id);
  return found;
}

/** Keeps items whose field equals the request param of the same name, when that param is given. */
function filterBy<T>(items: T[], params: FormObject, fields: (keyof T & string)[]): T[] {
  let out = items;
  for (const field of fields) {
    const wanted = readString(params, field);
    if (wanted !== null) out = out.filter((x) => String(x[field]) === wanted);
  }
  return out;
}

function writeCustomer(ctx: RouteContext, existing?: Customer): Customer {
  const p = ctx.params;
  const pick = (key: "email" | "name" | "description" | "phone") =>
    p[key] === "" ? null : (readString(p, key) ?? existing?.[key] ?? null);
  return {
    id: existing?.id ?? newId("cus", 14),
    object: "customer",
    created: existing?.created ?? nowSeconds(),
    email: pick("email"),
    name: pick("name"),
    description: pick("description"),
    phone: pick("phone"),
    metadata: readMetadata(p, existing?.metadata),
    livemode: false,
  };
}

const ID = "([^/]+)";

export const routes: Route[] = [
  {
    method: "POST",
    pattern: /^\/v1\/customers$/,
    run(ctx) {
      const customer = ctx.store.put(writeCustomer(ctx));
      ctx.bus.emit("customer.created", customer, { idempotencyKey: ctx.idempotencyKey });
      return one(customer);
    },
  },
  { method: "GET", pattern: /^\/v1\/customers$/, run: (ctx) => many(filterBy(ctx.store.all("customer"), ctx.params, ["email"])) },
  { method: "GET", pattern: new RegExp(`^/v1/customers/${ID}$`), run: (ctx) => one(lookup(ctx, "customer")) },
  {
    method: "POST",
    pattern: new RegExp(`^/v1/customers/${ID}$`),
    run(ctx) {
      const existing = lookup(ctx, "customer");
      const updated = writeCustomer(ctx, existing);
      const previous: Record<string, unknown> = {};
      for (const k of ["email", "name", "description", "phone", "metadata"] as const) {
        if (JSON.stringify(existing[k]) !== JSON.stringify(updated[k])) previous[k] = existing[k];
      }
      Object.assign(existing, updated);
      ctx.bus.emit("customer.updated", existing, { previous, idempotencyKey: ctx.idempotencyKey });
      return one(existing);
    },
  },
  {
    method: "POST",
    pattern: /^\/v1\/checkout\/sessions$/,
    run: (ctx) => one(createSession(ctx.store, ctx.params, ctx.publicUrl)),
  },
  {
    method: "GET",
    pattern: /^\/v1\/checkout\/sessions$/,
    run(ctx) {
      const all = ctx.store.all("checkout.session");
      for (const s of all) expireIfDue(s, ctx.bus);
      return many(filterBy(all, ctx.params, ["payment_intent", "customer", "status", "client_reference_id"]));
    },
  },
  {
    method: "GET",
    pattern: new RegExp(`^/v1/checkout/sessions/${ID}$`),
    run(ctx) {
      const session = lookup(ctx, "checkout.session");
      expireIfDue(session, ctx.bus);
      return one(session);
    },
  },
  {
    method: "POST",
    pattern: new RegExp(`^/v1/checkout/sessions/${ID}/expire$`),
    run(ctx) {
      const session = lookup(ctx, "checkout.session");
      if (!expireIfDue(session, ctx.bus, true) && session.status !== "expired") {
        throw invalidRequest(`Only Checkout Sessions with a status in ["open"] can be expired; this one is ${session.status}.`);
      }
      return one(session);
    },
  },
  {
    method: "GET",
    pattern: new RegExp(`^/v1/checkout/sessions/${ID}/line_items$`),
    run: (ctx) => many(ctx.store.lineItems.get(lookup(ctx, "checkout.session").id) ?? []),
  },
  {
    method: "GET",
    pattern: /^\/v1\/payment_intents$/,
    run: (ctx) => many(filterBy(ctx.store.all("payment_intent"), ctx.params, ["customer"])),
  },
  { method: "GET", pattern: new RegExp(`^/v1/payment_intents/${ID}$`), run: (ctx) => one(lookup(ctx, "payment_intent")) },
  {
    method: "GET",
    pattern: /^\/v1\/charges$/,
    run: (ctx) => many(filterBy(ctx.store.all("charge"), ctx.params, ["payment_intent", "customer"])),
  },
  { method: "GET", pattern: new RegExp(`^/v1/charges/${ID}$`), run: (ctx) => one(lookup(ctx, "charge")) },
  {
    method: "POST",
    pattern: /^\/v1\/refunds$/,
    run: (ctx) => one(createRefund(ctx.store, ctx.bus, ctx.params, ctx.idempotencyKey)),
  },
  {
    method: "GET",
    pattern: /^\/v1\/refunds$/,
    run: (ctx) => many(filterBy(ctx.store.all("refund"), ctx.params, ["charge", "payment_intent"])),
  },
  { method: "GET", pattern: new RegExp(`^/v1/refunds/${ID}$`), run: (ctx) => one(lookup(ctx, "refund")) },
  {
    method: "GET",
    pattern: /^\/v1\/balance_transactions$/,
    run(ctx) {
      let items = filterBy(ctx.store.all("balance_transaction"), ctx.params, ["type", "source", "currency"]);
      const payout = readString(ctx.params, "payout");
      if (payout !== null) {
        if (!ctx.store.find("payout", payout)) throw noSuch(payout, "payout");
        items = items.filter((t) => ctx.store.payoutOf.get(t.id) === payout);
      }
      return many(items);
    },
  },
  {
    method: "GET",
    pattern: new RegExp(`^/v1/balance_transactions/${ID}$`),
    run: (ctx) => one(lookup(ctx, "balance_transaction")),
  },
  { method: "GET", pattern: /^\/v1\/balance$/, run: (ctx) => one(readBalance(ctx.store)) },
  {
    method: "POST",
    pattern: /^\/v1\/payouts$/,
    run: (ctx) =>
      one(
        createPayout(ctx.store, ctx.bus, {
          currency: readString(ctx.params, "currency") ?? undefined,
          amount: readInteger(ctx.params, "amount"),
          automatic: false,
          description: readString(ctx.params, "description"),
          statementDescriptor: readString(ctx.params, "statement_descriptor"),
          metadata: readMetadata(ctx.params),
          idempotencyKey: ctx.idempotencyKey,
        }),
      ),
  },
  {
    method: "GET",
    pattern: /^\/v1\/payouts$/,
    run: (ctx) => many(filterBy(ctx.store.all("payout"), ctx.params, ["status", "currency"])),
  },
  { method: "GET", pattern: new RegExp(`^/v1/payouts/${ID}$`), run: (ctx) => one(lookup(ctx, "payout")) },
  { method: "GET", pattern: /^\/v1\/events$/, run: (ctx) => many(filterBy(ctx.store.all("event"), ctx.params, ["type"])) },
  { method: "GET", pattern: new RegExp(`^/v1/events/${ID}$`), run: (ctx) => one(lookup(ctx, "event")) },
];

export function matchRoute(method: string, pathname: string): { route: Route; ids: string[] } | { allowed: string[] } | null {
  const allowed: string[] = [];
  for (const route of routes) {
    const m = route.pattern.exec(pathname);
    if (!m) continue;
    if (route.method === method) return { route, ids: m.slice(1).map((s) => decodeURIComponent(s)) };
    allowed.push(route.method);
  }
  return allowed.length ? { allowed } : null;
}
