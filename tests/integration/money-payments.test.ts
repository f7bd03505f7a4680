// Card payments through the real `stripe` SDK against fake-services/payments, with its signed
// webhooks forwarded to our route handler. Test card numbers are the provider's published test
// cards (from memory of its testing documentation); fees are the fake's own schedule,
// 2.9 % + 30 minor units rounded half up (fake-services/payments/ledger.ts, our arithmetic).
import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { and, eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { POST } from "@/app/api/webhooks/payments/route";
import { cardPayouts, emailOutbox, journalEntries, paymentEvents, payments, users } from "@/db/schema";
import { serializeEvent } from "@/fake-services/payments/webhooks";
import { signPayload, startFakePaymentsServer, type FakePaymentsServer } from "@/fake-services/payments/server";
import { postAdjustment } from "@/lib/actions/money/post-adjustment";
import { refundPayment } from "@/lib/actions/money/refund-payment";
import { startCardPayment } from "@/lib/actions/money/start-card-payment";
import { memberBalance } from "@/db/queries/money-member-balances";
import { createPaymentsClient } from "@/lib/payments/provider";
import { EMPTY, clubBySlug, db, expectRedirect, form, seedOnce, signInAs } from "./helpers";

const SECRET = "whsec_money_integration";
const CLUB = "reedwater";
const MEMBER = "member@hangarline.test";
const TREASURER = "treasurer@hangarline.test";

let fake: FakePaymentsServer;
let forwarder: Server;
let forwarderUrl: string;

beforeAll(async () => {
  await seedOnce();
  // A stand-in for the app's HTTP server: hands each delivery to the route handler as is.
  forwarder = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on("data", (c: Buffer) => chunks.push(c));
    req.on("end", async () => {
      const sig = req.headers["stripe-signature"];
      const response = await POST(new Request("http://app.test/api/webhooks/payments", { method: "POST", headers: { "content-type": "application/json", ...(typeof sig === "string" ? { "stripe-signature": sig } : {}) }, body: Buffer.concat(chunks).toString("utf8") }));
      res.writeHead(response.status, { "content-type": "application/json" }).end(await response.text());
    });
  });
  await new Promise<void>((r) => forwarder.listen(0, "127.0.0.1", r));
  forwarderUrl = `http://127.0.0.1:${(forwarder.address() as AddressInfo).port}/api/webhooks/payments`;
  fake = await startFakePaymentsServer({ port: 0, webhookUrl: forwarderUrl, webhookSecret: SECRET });
  Object.assign(process.env, { PAYMENTS_HOST: "127.0.0.1", PAYMENTS_PORT: String(fake.port), PAYMENTS_PROTOCOL: "http", STRIPE_SECRET_KEY: "sk_test_money_it", PAYMENTS_WEBHOOK_SECRET: SECRET });
});

afterAll(async () => {
  await fake.close();
  await new Promise<void>((r) => forwarder.close(() => r()));
});

const club = () => clubBySlug(CLUB);
const userId = (email: string) => db().select().from(users).where(eq(users.email, email)).get()!.id;
const balance = () => memberBalance(db(), club().id, userId(MEMBER));
const count = (kind: "card-payment" | "card-refund") =>
  Number(db().select({ n: sql<number>`count(*)` }).from(journalEntries).where(and(eq(journalEntries.clubId, club().id), eq(journalEntries.kind, kind), eq(journalEntries.memberUserId, userId(MEMBER)))).get()!.n);
const eventRows = () => Number(db().select({ n: sql<number>`count(*)` }).from(paymentEvents).get()!.n);
const allEntries = () => Number(db().select({ n: sql<number>`count(*)` }).from(journalEntries).get()!.n);

async function charge(amount: string) {
  signInAs(TREASURER);
  const state = await postAdjustment(EMPTY, form({ club: CLUB, memberUserId: userId(MEMBER), direction: "charge", account: "flight-income", amount, date: "2026-01-15", memo: "Flight N0412Q" }));
  expect(state).toMatchObject({ ok: true });
}

async function openCheckout(): Promise<string> {
  signInAs(MEMBER);
  const url = await expectRedirect(() => startCardPayment(EMPTY, form({ club: CLUB })));
  expect(url).toMatch(new RegExp(`^${fake.url}/pay/cs_test_`));
  return url.split("/pay/")[1]!;
}

describe("card payments posted from signed webhooks", () => {
  let paymentId = "";

  it("a member pays their balance by card: the webhook posts one payment with its fee", async () => {
    await charge("120.00");
    expect(balance()).toBe(12000);
    const sessionId = await openCheckout();
    const outcome = await fake.payCheckoutSession(sessionId, "4242 4242 4242 4242");
    expect(outcome.ok).toBe(true);
    expect(balance()).toBe(0);
    expect(count("card-payment")).toBe(1);
    const payment = db().select().from(payments).where(eq(payments.checkoutSessionId, sessionId)).get()!;
    paymentId = payment.id;
    // fake's fee schedule: 12,000 × 2.9 % = 348, + 30 = 378 (our arithmetic)
    expect(payment).toMatchObject({ status: "succeeded", amountMinor: 12000, feeMinor: 378, method: "card" });
    expect(db().select().from(emailOutbox).where(and(eq(emailOutbox.toAddress, MEMBER), eq(emailOutbox.template, "receipt"))).all()).toHaveLength(1);
    expect(fake.deliveries().every((d) => d.status === 200)).toBe(true);
  });

  it("the same event replayed 20 times posts nothing more", async () => {
    const completed = fake.events().filter((e) => e.type === "checkout.session.completed").at(-1)!;
    const entriesBefore = allEntries();
    const eventsBefore = eventRows();
    for (let i = 0; i < 20; i++) expect((await fake.resendEvent(completed.id))?.status).toBe(200);
    for (const e of fake.events()) await fake.resendEvent(e.id);
    expect(count("card-payment")).toBe(1);
    expect(allEntries()).toBe(entriesBefore);
    expect(eventRows()).toBe(eventsBefore);
    expect(balance()).toBe(0);
  });

  it("a bad signature is refused with 400 and nothing is written", async () => {
    const event = fake.events().filter((e) => e.type === "payment_intent.succeeded").at(-1)!;
    const body = serializeEvent({ ...event, id: "evt_forged_0001" });
    const before = [allEntries(), eventRows()];
    const post = (signature: string | null, payload = body) =>
      POST(new Request("http://app.test/api/webhooks/payments", { method: "POST", headers: signature ? { "stripe-signature": signature } : {}, body: payload }));
    const now = Math.floor(Date.now() / 1000);
    expect((await post(signPayload(body, "whsec_wrong_secret", now))).status).toBe(400);
    expect((await post(null)).status).toBe(400);
    expect((await post(signPayload(body, SECRET, now), body.replace('"amount": ', '"amount": 1'))).status).toBe(400);
    expect((await post(signPayload(body, SECRET, now - 3600))).status).toBe(400);
    expect([allEntries(), eventRows()]).toEqual(before);
  });

  it("a declined card leaves the balance unchanged", async () => {
    await charge("80.00");
    const sessionId = await openCheckout();
    const declined = await fake.payCheckoutSession(sessionId, "4000000000000002");
    expect(declined).toMatchObject({ ok: false, kind: "declined" });
    const funds = await fake.payCheckoutSession(sessionId, "4000000000009995");
    expect(funds).toMatchObject({ ok: false, declineCode: "insufficient_funds" });
    expect(balance()).toBe(8000);
    expect(count("card-payment")).toBe(1);
    expect(db().select().from(payments).where(eq(payments.checkoutSessionId, sessionId)).get()).toMatchObject({ status: "failed", lastError: "Your card has insufficient funds." });
    // The member can still pay on the same page afterwards.
    expect((await fake.payCheckoutSession(sessionId, "4242424242424242")).ok).toBe(true);
    expect(balance()).toBe(0);
    expect(count("card-payment")).toBe(2);
  });

  it("a treasurer's refund reverses the payment on the member's account, once", async () => {
    signInAs(TREASURER);
    const state = await refundPayment(EMPTY, form({ club: CLUB, paymentId, amount: "50.00", treatment: "reopen" }));
    expect(state).toMatchObject({ ok: true });
    await fake.flushWebhooks();
    expect(balance()).toBe(5000);
    expect(count("card-refund")).toBe(1);
    for (const e of fake.events().filter((x) => x.type === "charge.refunded" || x.type === "refund.created")) await fake.resendEvent(e.id);
    expect(count("card-refund")).toBe(1);
    expect(db().select().from(payments).where(eq(payments.id, paymentId)).get()).toMatchObject({ status: "partially_refunded", refundedMinor: 5000 });
    const tooMuch = await refundPayment(EMPTY, form({ club: CLUB, paymentId, amount: "70.01", treatment: "reopen" }));
    expect(tooMuch.ok).toBe(false);
    expect(tooMuch.fieldErrors.amount?.[0]).toMatch(/At most \$70\.00/);
    signInAs(MEMBER);
    const notAllowed = await refundPayment(EMPTY, form({ club: CLUB, paymentId, amount: "1.00", treatment: "reopen" }));
    expect(notAllowed.ok).toBe(false);
    expect(count("card-refund")).toBe(1);
  });

  it("a payout records which payments it carries, net of fees", async () => {
    const payout = await fake.triggerPayout({ currency: "usd" });
    const row = db().select().from(cardPayouts).where(and(eq(cardPayouts.clubId, club().id), eq(cardPayouts.payoutId, payout.id))).get();
    // 12,000 − 378 fee + 8,000 − (232 + 30) fee − 5,000 refund = 14,360 (fake's fee schedule, our arithmetic)
    expect(row).toMatchObject({ netMinor: 14360, feeMinor: 640 });
    expect(payout.amount).toBe(14360);
    expect(db().select().from(payments).where(eq(payments.payoutId, payout.id)).all()).toHaveLength(2);
  });

  it("events that arrive late and out of order still post the payment once", async () => {
    await charge("45.00");
    const sessionId = await openCheckout();
    fake.setWebhookTarget(null);
    expect((await fake.payCheckoutSession(sessionId, "5555555555554444")).ok).toBe(true);
    const payout = await fake.triggerPayout({ currency: "usd" });
    expect(balance()).toBe(9500);
    fake.setWebhookTarget(forwarderUrl, SECRET);
    const mine = fake.events().filter((e) => JSON.stringify(e.data.object).includes(sessionId) || e.data.object.id === payout.id || e.type.startsWith("charge.") || e.type.startsWith("payment_intent."));
    for (const e of [...mine].reverse()) await fake.resendEvent(e.id);
    // "Pay my balance" pays all of it: the 50.00 reopened by the refund and the new 45.00.
    expect(balance()).toBe(0);
    expect(count("card-payment")).toBe(3);
    // 9,500 − (275.5 → 276 + 30) = 9,194 (fake's fee schedule, our arithmetic)
    expect(db().select().from(cardPayouts).where(eq(cardPayouts.payoutId, payout.id)).get()).toMatchObject({ netMinor: 9194, feeMinor: 306 });
  });

  it("an event naming a club that does not exist writes nothing", async () => {
    const stripe = createPaymentsClient({ secretKey: "sk_test_money_it", host: "127.0.0.1", port: fake.port, protocol: "http" });
    const meta = { clubId: "no-such-club", memberUserId: userId(MEMBER), paymentId: "p_x" };
    const session = await stripe.checkout.sessions.create({ mode: "payment", line_items: [{ quantity: 1, price_data: { currency: "usd", unit_amount: 1000, product_data: { name: "x" } } }], metadata: meta, payment_intent_data: { metadata: meta }, success_url: "http://app.test/x" });
    const before = [allEntries(), eventRows()];
    expect((await fake.payCheckoutSession(session.id, "4242424242424242")).ok).toBe(true);
    expect([allEntries(), eventRows()]).toEqual(before);
  });
});
