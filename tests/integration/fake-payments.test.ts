// The fake card-payment provider driven through the real `stripe` SDK and
// lib/payments/provider.ts. Test card numbers and their outcomes are the provider's published
// test cards (from memory of its testing documentation). Fees are the fake's own fee
// schedule, 2.9% + 30 minor units rounded half up (our arithmetic, not a provider price list).
import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { parseForm } from "@/fake-services/payments/form";
import { startFakePaymentsServer, type FakePaymentsServer } from "@/fake-services/payments/server";
import { createPaymentsClient, verifyWebhook } from "@/lib/payments/provider";

const SECRET = "whsec_integration_test_secret";

interface Received {
  body: string;
  signature: string | null;
}

let receiver: Server;
let receiverUrl: string;
const received: Received[] = [];
let fake: FakePaymentsServer;
let stripe: Stripe;

beforeAll(async () => {
  receiver = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on("data", (c: Buffer) => chunks.push(c));
    req.on("end", () => {
      const sig = req.headers["stripe-signature"];
      received.push({ body: Buffer.concat(chunks).toString("utf8"), signature: typeof sig === "string" ? sig : null });
      res.writeHead(200).end("ok");
    });
  });
  await new Promise<void>((resolve) => receiver.listen(0, "127.0.0.1", resolve));
  receiverUrl = `http://127.0.0.1:${(receiver.address() as AddressInfo).port}/webhooks`;
  fake = await startFakePaymentsServer({ port: 0, webhookUrl: receiverUrl, webhookSecret: SECRET });
  stripe = createPaymentsClient({ secretKey: "sk_test_integration", host: "127.0.0.1", port: fake.port, protocol: "http" });
});

afterAll(async () => {
  await fake.close();
  await new Promise<void>((resolve) => receiver.close(() => resolve()));
});

function receivedEvents(): Stripe.Event[] {
  return received.map((r) => {
    const v = verifyWebhook(r.body, r.signature, SECRET);
    if (!v.ok) throw new Error(`webhook did not verify: ${v.error}`);
    return v.event;
  });
}

async function openSession(client: Stripe, amounts: number[], extra: Partial<Stripe.Checkout.SessionCreateParams> = {}) {
  return client.checkout.sessions.create({
    mode: "payment",
    line_items: amounts.map((unit_amount, i) => ({
      quantity: 1,
      price_data: { currency: "usd", unit_amount, product_data: { name: `Flight charge ${i + 1}` } },
    })),
    success_url: "http://localhost:3000/clubs/demo/money/paid?session={CHECKOUT_SESSION_ID}",
    cancel_url: "http://localhost:3000/clubs/demo/money",
    ...extra,
  });
}

describe("request decoding", () => {
  it("parses bracket-notation form bodies into nested objects and lists", () => {
    const parsed = parseForm(
      "metadata[member]=m_1&line_items[0][price_data][unit_amount]=2500&line_items[0][quantity]=2&line_items[1][quantity]=1&expand[]=a&expand[]=b&note=two+words%21",
    );
    expect(parsed).toEqual({
      metadata: { member: "m_1" },
      line_items: [{ price_data: { unit_amount: "2500" }, quantity: "2" }, { quantity: "1" }],
      expand: ["a", "b"],
      note: "two words!",
    });
  });
});

describe("customers and checkout sessions", () => {
  it("creates and retrieves a customer; a missing one raises the SDK's typed 404", async () => {
    const customer = await stripe.customers.create({ email: "pilot.two@members.example", name: "Pilot Two", metadata: { member: "m_2" } });
    expect(customer.id).toMatch(/^cus_/);
    const again = await stripe.customers.retrieve(customer.id);
    expect(again).toMatchObject({ id: customer.id, email: "pilot.two@members.example", metadata: { member: "m_2" } });
    await expect(stripe.customers.retrieve("cus_missing")).rejects.toMatchObject({
      type: "StripeInvalidRequestError",
      statusCode: 404,
      code: "resource_missing",
    });
  });

  it("creates a payment session with a hosted URL and reads its line items back", async () => {
    const customer = await stripe.customers.create({ email: "pilot.three@members.example" });
    const session = await openSession(stripe, [4200, 800], {
      customer: customer.id,
      client_reference_id: "statement_77",
      metadata: { club: "demo", member: "m_3" },
    });
    expect(session).toMatchObject({ status: "open", payment_status: "unpaid", amount_total: 5000, currency: "usd" });
    expect(session.url).toBe(`${fake.url}/pay/${session.id}`);
    const read = await stripe.checkout.sessions.retrieve(session.id, { expand: ["line_items"] });
    expect(read.line_items?.data.map((li) => li.amount_total)).toEqual([4200, 800]);
    expect(read).toMatchObject({ client_reference_id: "statement_77", metadata: { club: "demo", member: "m_3" } });
  });

  it("rejects bad session parameters with the SDK's typed 400", async () => {
    await expect(
      stripe.checkout.sessions.create({ mode: "payment", line_items: [], success_url: "http://localhost/x" }),
    ).rejects.toMatchObject({ type: "StripeInvalidRequestError", statusCode: 400, param: "line_items" });
    await expect(openSession(stripe, [1000], { customer: "cus_nope" })).rejects.toMatchObject({ code: "resource_missing", param: "customer" });
  });

  it("refuses live keys and replays an idempotent request", async () => {
    const live = createPaymentsClient({ secretKey: "sk_live_nope", host: "127.0.0.1", port: fake.port, protocol: "http" });
    await expect(live.customers.create({})).rejects.toMatchObject({ type: "StripeAuthenticationError", statusCode: 401 });
    const a = await stripe.customers.create({ email: "same@members.example" }, { idempotencyKey: "k-1" });
    const b = await stripe.customers.create({ email: "same@members.example" }, { idempotencyKey: "k-1" });
    expect(b.id).toBe(a.id);
    await expect(stripe.customers.create({ email: "other@members.example" }, { idempotencyKey: "k-1" })).rejects.toMatchObject({
      type: "StripeIdempotencyError",
    });
  });
});

describe("paying a session", () => {
  it("completes with 4242…, records the fee, and sends webhooks that verify", async () => {
    const session = await openSession(stripe, [12345], { customer_email: "pilot.four@members.example", metadata: { member: "m_4" } });
    const before = received.length;
    const outcome = await fake.payCheckoutSession(session.id, "4242 4242 4242 4242");
    expect(outcome.ok).toBe(true);

    const done = await stripe.checkout.sessions.retrieve(session.id, {
      expand: ["payment_intent.latest_charge.balance_transaction"],
    });
    expect(done).toMatchObject({ status: "complete", payment_status: "paid", url: null });
    const pi = done.payment_intent as Stripe.PaymentIntent;
    expect(pi).toMatchObject({ status: "succeeded", amount_received: 12345 });
    const txn = (pi.latest_charge as Stripe.Charge).balance_transaction as Stripe.BalanceTransaction;
    // fake's fee schedule: 12,345 × 2.9% = 358.005 → 358, + 30 = 388; net 11,957 (our arithmetic)
    expect(txn).toMatchObject({ amount: 12345, fee: 388, net: 11957, type: "charge", currency: "usd" });

    const events = receivedEvents().slice(before);
    expect(events.map((e) => e.type)).toEqual([
      "payment_intent.created",
      "charge.succeeded",
      "payment_intent.succeeded",
      "checkout.session.completed",
    ]);
    const completed = events[3] as Stripe.CheckoutSessionCompletedEvent;
    expect(completed.data.object).toMatchObject({ id: session.id, payment_status: "paid", metadata: { member: "m_4" } });
    expect(completed).toMatchObject({ livemode: false, object: "event" });
    expect(completed.id).toMatch(/^evt_/);
    // The same bytes also pass the SDK's verifier called directly.
    const raw = received[received.length - 1] as Received;
    expect(stripe.webhooks.constructEvent(raw.body, raw.signature ?? "", SECRET).id).toBe(completed.id);
  });

  it("rounds the fee half up and applies the fixed part", async () => {
    const session = await openSession(stripe, [500]);
    const outcome = await fake.payCheckoutSession(session.id, "5555555555554444");
    if (!outcome.ok) throw new Error(outcome.message);
    const txn = await stripe.balanceTransactions.retrieve(outcome.charge.balance_transaction);
    // fake's fee schedule: 500 × 2.9% = 14.5 → 15 (half up), + 30 = 45; net 455 (our arithmetic)
    expect([txn.fee, txn.net]).toEqual([45, 455]);
  });

  it("declines 4000…0002 and 4000…9995 without a charge, and refuses a bad Luhn number", async () => {
    const session = await openSession(stripe, [3000]);
    const before = received.length;
    const generic = await fake.payCheckoutSession(session.id, "4000000000000002");
    expect(generic).toMatchObject({ ok: false, kind: "declined", code: "card_declined", declineCode: "generic_decline" });
    const funds = await fake.payCheckoutSession(session.id, "4000000000009995");
    expect(funds).toMatchObject({ ok: false, declineCode: "insufficient_funds" });
    const luhn = await fake.payCheckoutSession(session.id, "4242424242424241");
    expect(luhn).toMatchObject({ ok: false, kind: "invalid", code: "incorrect_number" });

    const open = await stripe.checkout.sessions.retrieve(session.id);
    expect(open).toMatchObject({ status: "open", payment_status: "unpaid" });
    const pi = await stripe.paymentIntents.retrieve(open.payment_intent as string);
    expect(pi).toMatchObject({ status: "requires_payment_method", latest_charge: null });
    expect(pi.last_payment_error).toMatchObject({ decline_code: "insufficient_funds" });
    expect((await stripe.charges.list({ payment_intent: pi.id })).data).toHaveLength(0);
    const types = receivedEvents().slice(before).map((e) => e.type);
    expect(types.filter((t) => t === "payment_intent.payment_failed")).toHaveLength(2);
    expect(types).not.toContain("charge.succeeded");
  });

  it("serves the hosted page: a decline shows the error, success redirects to success_url", async () => {
    const session = await openSession(stripe, [2000]);
    const page = await fetch(session.url ?? "");
    expect(page.status).toBe(200);
    expect(await page.text()).toMatch(/name="card_number"/);
    const post = (card: string) =>
      fetch(session.url ?? "", {
        method: "POST",
        redirect: "manual",
        headers: { "Content-Type": "application/x-www-form-urlencoded" },
        body: new URLSearchParams({ card_number: card, expiry: "11/39", cvc: "321", name: "Pilot Five" }).toString(),
      });
    const declined = await post("4000000000000002");
    expect(declined.status).toBe(402);
    expect(await declined.text()).toContain("Your card was declined.");
    const paid = await post("4242424242424242");
    expect(paid.status).toBe(303);
    expect(paid.headers.get("location")).toBe(`http://localhost:3000/clubs/demo/money/paid?session=${session.id}`);
  });
});

describe("refunds", () => {
  it("refunds part then the rest, refuses more, and sends charge.refunded", async () => {
    const session = await openSession(stripe, [10000]);
    const outcome = await fake.payCheckoutSession(session.id, "4242424242424242");
    if (!outcome.ok) throw new Error(outcome.message);
    const part = await stripe.refunds.create({ payment_intent: outcome.paymentIntent.id, amount: 2500 });
    expect(part).toMatchObject({ amount: 2500, status: "succeeded", charge: outcome.charge.id });
    const rest = await stripe.refunds.create({ charge: outcome.charge.id });
    expect(rest.amount).toBe(7500);
    await expect(stripe.refunds.create({ charge: outcome.charge.id, amount: 1 })).rejects.toMatchObject({
      type: "StripeInvalidRequestError",
      code: "charge_already_refunded",
    });
    const charge = await stripe.charges.retrieve(outcome.charge.id);
    expect(charge).toMatchObject({ amount_refunded: 10000, refunded: true });
    const txn = await stripe.balanceTransactions.retrieve(part.balance_transaction as string);
    expect(txn).toMatchObject({ type: "refund", amount: -2500, fee: 0, net: -2500, source: part.id });
    await fake.flushWebhooks();
    const refunded = receivedEvents().filter((e) => e.type === "charge.refunded" && e.data.object.id === outcome.charge.id);
    expect(refunded).toHaveLength(2);
  });

  it("refuses a refund larger than what is left", async () => {
    const session = await openSession(stripe, [1500]);
    const outcome = await fake.payCheckoutSession(session.id, "4242424242424242");
    if (!outcome.ok) throw new Error(outcome.message);
    await expect(stripe.refunds.create({ charge: outcome.charge.id, amount: 1501 })).rejects.toMatchObject({ code: "amount_too_large" });
  });
});

describe("payouts", () => {
  it("groups available net amounts into one payout and lists its balance transactions", async () => {
    // A fresh fake so the balance holds only what this test puts in.
    const own = await startFakePaymentsServer({ port: 0, webhookUrl: receiverUrl, webhookSecret: SECRET });
    const client = createPaymentsClient({ secretKey: "sk_test_payouts", host: "127.0.0.1", port: own.port, protocol: "http" });
    try {
      const first = await own.payCheckoutSession((await openSession(client, [10000])).id, "4242424242424242");
      const second = await own.payCheckoutSession((await openSession(client, [2500])).id, "4242424242424242");
      if (!first.ok || !second.ok) throw new Error("payment failed");
      await client.refunds.create({ charge: first.charge.id, amount: 1000 });
      const payout = await own.triggerPayout();
      // nets (fake's fee schedule, our arithmetic): 10,000 − (290 + 30) = 9,680;
      // 2,500 − (72.5 → 73 + 30) = 2,397; refund −1,000 → 9,680 + 2,397 − 1,000 = 11,077
      expect(payout).toMatchObject({ amount: 11077, currency: "usd", status: "paid", automatic: true });
      const all = await client.balanceTransactions.list({ payout: payout.id, limit: 100 });
      expect(all.data.map((t) => t.type).sort()).toEqual(["charge", "charge", "payout", "refund"]);
      const carried = all.data.filter((t) => t.type !== "payout").reduce((acc, t) => acc + t.net, 0);
      expect(carried).toBe(payout.amount);
      expect(own.events().filter((e) => e.type === "payout.paid").map((e) => e.data.object.id)).toEqual([payout.id]);
      expect(own.deliveries().every((d) => d.status === 200)).toBe(true);
      await expect(own.triggerPayout()).rejects.toMatchObject({ details: { code: "balance_insufficient" } });

      const third = await own.payCheckoutSession((await openSession(client, [4000])).id, "4242424242424242");
      if (!third.ok) throw new Error("payment failed");
      // 4,000 − (116 + 30) = 3,854 (fake's fee schedule, our arithmetic)
      await expect(client.payouts.create({ amount: 1, currency: "usd" })).rejects.toMatchObject({ param: "amount" });
      const manual = await client.payouts.create({ amount: 3854, currency: "usd" });
      expect((await client.payouts.list()).data.map((p) => p.id)).toEqual([manual.id, payout.id]);
    } finally {
      await own.close();
    }
  });
});

describe("webhook signatures", () => {
  it("fails verification for a tampered body, a wrong secret or a missing header", async () => {
    const session = await openSession(stripe, [6000]);
    await fake.payCheckoutSession(session.id, "4242424242424242");
    const last = received[received.length - 1] as Received;
    expect(verifyWebhook(last.body, last.signature, SECRET).ok).toBe(true);
    const tampered = last.body.replace('"amount_total": 6000', '"amount_total": 1');
    expect(tampered).not.toBe(last.body);
    expect(verifyWebhook(tampered, last.signature, SECRET)).toMatchObject({ ok: false });
    expect(verifyWebhook(last.body, last.signature, "whsec_wrong")).toMatchObject({ ok: false });
    expect(verifyWebhook(last.body, null, SECRET)).toMatchObject({ ok: false });
  });

  it("re-delivers an event with the same id, and follows a new target set over HTTP", async () => {
    const event = fake.events().find((e) => e.type === "checkout.session.completed");
    if (!event) throw new Error("no event yet");
    const before = received.length;
    const delivery = await fake.resendEvent(event.id);
    expect(delivery).toMatchObject({ eventId: event.id, status: 200 });
    expect(receivedEvents().slice(before).map((e) => e.id)).toEqual([event.id]);

    const res = await fetch(`${fake.url}/_control/webhook`, {
      method: "POST",
      body: JSON.stringify({ url: `${receiverUrl}?second`, secret: "whsec_second" }),
    });
    expect(res.status).toBe(200);
    await stripe.customers.create({ email: "pilot.six@members.example" });
    await fake.flushWebhooks();
    const last = received[received.length - 1] as Received;
    expect(verifyWebhook(last.body, last.signature, "whsec_second")).toMatchObject({ ok: true });
    fake.setWebhookTarget(receiverUrl, SECRET);
  });
});
