// Which secret the payment webhook checks signatures against: the configured one; the local
// stand-in's well-known one only while the SDK points at the stand-in on this machine; otherwise
// none, and every delivery is refused with nothing written.
import { sql } from "drizzle-orm";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import { POST } from "@/app/api/webhooks/payments/route";
import { journalEntries, paymentEvents } from "@/db/schema";
import { DEFAULT_WEBHOOK_SECRET, signPayload } from "@/fake-services/payments/server";
import { LOCAL_STANDIN_WEBHOOK_SECRET, webhookSigningSecret } from "@/lib/payments/provider";
import { db } from "./helpers";

const KEYS = ["PAYMENTS_WEBHOOK_SECRET", "STRIPE_WEBHOOK_SECRET", "PAYMENTS_HOST"] as const;
const saved = Object.fromEntries(KEYS.map((k) => [k, process.env[k]]));

function setEnv(values: Partial<Record<(typeof KEYS)[number], string>>) {
  for (const k of KEYS) delete process.env[k];
  Object.assign(process.env, values);
}

beforeEach(() => setEnv({}));
afterEach(() => {
  for (const k of KEYS) {
    if (saved[k] === undefined) delete process.env[k];
    else process.env[k] = saved[k];
  }
});

// An event that passes the signature check and is then ignored (its club does not exist), so a
// 200 shows the signature was accepted and nothing is posted either way.
const body = JSON.stringify({ id: "evt_secret_test_1", object: "event", type: "checkout.session.completed", data: { object: { id: "cs_x", object: "checkout.session", metadata: { clubId: "no-such-club" }, payment_status: "paid", payment_intent: "pi_x" } } }, null, 2);
const now = () => Math.floor(Date.now() / 1000);
const deliver = (secret: string) =>
  POST(new Request("http://app.test/api/webhooks/payments", { method: "POST", headers: { "content-type": "application/json", "stripe-signature": signPayload(body, secret, now()) }, body }));
const rows = () => [db().select({ n: sql<number>`count(*)` }).from(paymentEvents).get()!.n, db().select({ n: sql<number>`count(*)` }).from(journalEntries).get()!.n];

describe("the payment webhook's signing secret", () => {
  it("the stand-in's secret is the fake's default, the one anyone can read here", () => {
    expect(LOCAL_STANDIN_WEBHOOK_SECRET).toBe(DEFAULT_WEBHOOK_SECRET);
  });

  it("no secret and no stand-in: a delivery signed with the public secret is refused and writes nothing", async () => {
    const before = rows();
    expect(webhookSigningSecret()).toBe("");
    const res = await deliver(LOCAL_STANDIN_WEBHOOK_SECRET);
    expect(res.status).toBe(503);
    expect(await res.json()).toEqual({ error: { code: "not_configured", message: expect.stringContaining("not set up") } });
    expect(rows()).toEqual(before);
  });

  it("no secret and the SDK pointed at a host that is not this machine: refused", async () => {
    for (const host of ["api.payments.example", "10.0.0.5", "127.0.0.1.evil.example", "localhost.example"]) {
      setEnv({ PAYMENTS_HOST: host });
      expect(webhookSigningSecret(), host).toBe("");
      expect((await deliver(LOCAL_STANDIN_WEBHOOK_SECRET)).status, host).toBe(503);
    }
  });

  it("no secret, stand-in on this machine: the stand-in's secret applies, and only it", async () => {
    for (const host of ["127.0.0.1", "localhost", "::1"]) {
      setEnv({ PAYMENTS_HOST: host });
      const ok = await deliver(LOCAL_STANDIN_WEBHOOK_SECRET);
      expect(ok.status, host).toBe(200);
      expect(await ok.json()).toMatchObject({ received: true, handled: "ignored", detail: "no such club" });
      expect((await deliver("whsec_someone_else")).status, host).toBe(400);
    }
  });

  it("a configured secret is the only one accepted, the stand-in's included", async () => {
    for (const key of ["PAYMENTS_WEBHOOK_SECRET", "STRIPE_WEBHOOK_SECRET"] as const) {
      setEnv({ [key]: "whsec_configured_for_test", PAYMENTS_HOST: "127.0.0.1" });
      expect((await deliver("whsec_configured_for_test")).status, key).toBe(200);
      const refused = await deliver(LOCAL_STANDIN_WEBHOOK_SECRET);
      expect(refused.status, key).toBe(400);
      expect(((await refused.json()) as { error: { code: string } }).error.code).toBe("invalid");
    }
  });
});
