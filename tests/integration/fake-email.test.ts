// The fake e-mail provider driven through the real `resend` SDK and lib/email/provider.ts.
// Error names and shapes follow the provider's published REST error format (from memory of
// its API reference: { statusCode, name, message }).
import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { Resend } from "resend";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { startFakeEmailServer, type FakeEmailServer } from "@/fake-services/email/server";
import { createEmailProvider } from "@/lib/email/provider";

let fake: FakeEmailServer;

beforeAll(async () => {
  fake = await startFakeEmailServer({ port: 0 });
});
afterAll(async () => {
  await fake.close();
});
beforeEach(() => {
  fake.setFailing(false);
  fake.clear();
});

const message = {
  from: "Hangarline <no-reply@club.example>",
  to: "pilot.one@members.example",
  subject: "Your sign-in link",
  html: '<p>Sign in: <a href="http://localhost:3000/sign-in/check?token=abc&amp;x=1">Sign in</a></p>',
  text: "Sign in: http://localhost:3000/sign-in/check?token=abc&x=1",
};

describe("fake e-mail provider through the resend SDK", () => {
  it("stores a message sent with resend.emails.send and lists it over JSON", async () => {
    const resend = new Resend("re_test_key", { baseUrl: fake.url });
    const { data, error } = await resend.emails.send(message);
    expect(error).toBeNull();
    expect(data?.id).toMatch(/^[0-9a-f-]{36}$/);

    const stored = fake.messages();
    expect(stored).toHaveLength(1);
    expect(stored[0]).toMatchObject({ id: data?.id, to: [message.to], subject: message.subject, html: message.html });

    const all = (await (await fetch(`${fake.url}/api/messages`)).json()) as { data: { id: string }[] };
    expect(all.data.map((m) => m.id)).toEqual([data?.id]);

    const fetched = await resend.emails.get(data?.id ?? "");
    expect(fetched.data).toMatchObject({ object: "email", id: data?.id, subject: message.subject });
  });

  it("filters /api/messages by recipient, newest first", async () => {
    const resend = new Resend("re_test_key", { baseUrl: fake.url });
    await resend.emails.send({ ...message, to: "a@members.example", subject: "first" });
    await resend.emails.send({ ...message, to: ["b@members.example", "A@Members.example"], subject: "second" });
    await resend.emails.send({ ...message, to: "c@members.example", subject: "third" });
    const res = await fetch(`${fake.url}/api/messages?to=${encodeURIComponent("a@members.example")}`);
    const body = (await res.json()) as { data: { subject: string }[] };
    expect(body.data.map((m) => m.subject)).toEqual(["second", "first"]);
  });

  it("answers 422 in the provider's error shape for an invalid body", async () => {
    const resend = new Resend("re_test_key", { baseUrl: fake.url });
    const noSubject = await resend.emails.send({ ...message, subject: "" });
    expect(noSubject.error).toMatchObject({ statusCode: 422, name: "missing_required_field" });
    const badTo = await resend.emails.send({ ...message, to: "not-an-address" });
    expect(badTo.error).toMatchObject({ statusCode: 422, name: "validation_error" });
    const noBody = await fetch(`${fake.url}/emails`, {
      method: "POST",
      headers: { Authorization: "Bearer re_x", "Content-Type": "application/json" },
      body: JSON.stringify({ from: message.from, to: message.to, subject: "s" }),
    });
    expect(noBody.status).toBe(422);
    expect(fake.messages()).toHaveLength(0);
  });

  it("requires a Bearer API key", async () => {
    const res = await fetch(`${fake.url}/emails`, {
      method: "POST",
      headers: { "Content-Type": "application/json" },
      body: JSON.stringify(message),
    });
    expect(res.status).toBe(401);
    expect(await res.json()).toMatchObject({ statusCode: 401, name: "missing_api_key" });
  });

  it("stores a retried send with the same idempotency key once", async () => {
    const resend = new Resend("re_test_key", { baseUrl: fake.url });
    const first = await resend.emails.send(message, { idempotencyKey: "outbox-row-7" });
    const again = await resend.emails.send(message, { idempotencyKey: "outbox-row-7" });
    expect(again.data?.id).toBe(first.data?.id);
    expect(fake.messages()).toHaveLength(1);
    const changed = await resend.emails.send({ ...message, subject: "other" }, { idempotencyKey: "outbox-row-7" });
    expect(changed.error).toMatchObject({ statusCode: 409, name: "invalid_idempotent_request" });
  });
});

describe("lib/email/provider against the fake", () => {
  it("returns the provider id on success", async () => {
    const provider = createEmailProvider({ apiKey: "re_test_key", baseUrl: fake.url });
    const result = await provider.send(message);
    expect(result).toEqual({ ok: true, providerId: fake.messages()[0]?.id });
  });

  it("reports a 500 as retryable and recovers when the provider does", async () => {
    const provider = createEmailProvider({ apiKey: "re_test_key", baseUrl: fake.url });
    fake.setFailing("500");
    const failed = await provider.send(message);
    expect(failed).toMatchObject({ ok: false, retryable: true });
    expect(fake.messages()).toHaveLength(0);
    fake.setFailing(false);
    expect(await provider.send(message)).toMatchObject({ ok: true });
  });

  it("reports dropped connections and rate limits as retryable", async () => {
    const provider = createEmailProvider({ apiKey: "re_test_key", baseUrl: fake.url });
    fake.setFailing("down");
    const down = await provider.send(message);
    expect(down).toMatchObject({ ok: false, retryable: true });
    if (!down.ok) expect(down.error).toContain("network");
    fake.setFailing("429");
    expect(await provider.send(message)).toMatchObject({ ok: false, retryable: true });
  });

  it("can switch failure modes over HTTP for tests that run the fake as a process", async () => {
    const provider = createEmailProvider({ apiKey: "re_test_key", baseUrl: fake.url });
    const res = await fetch(`${fake.url}/_control/failing`, { method: "POST", body: JSON.stringify({ mode: "500" }) });
    expect(res.status).toBe(200);
    expect(await provider.send(message)).toMatchObject({ ok: false, retryable: true });
  });

  it("reports validation errors and a missing key as not retryable", async () => {
    const provider = createEmailProvider({ apiKey: "re_test_key", baseUrl: fake.url });
    expect(await provider.send({ ...message, to: "nobody" })).toMatchObject({ ok: false, retryable: false });
    const keyless = createEmailProvider({ apiKey: "", baseUrl: fake.url });
    expect(await keyless.send(message)).toMatchObject({ ok: false, retryable: false });
  });

  it("reports an unreachable provider as retryable without throwing", async () => {
    const other = await startFakeEmailServer({ port: 0 });
    const deadUrl = other.url;
    await other.close();
    const provider = createEmailProvider({ apiKey: "re_test_key", baseUrl: deadUrl });
    expect(await provider.send(message)).toMatchObject({ ok: false, retryable: true });
  });
});

describe("outbox viewer", () => {
  it("lists messages newest first and renders a message with clickable links", async () => {
    const provider = createEmailProvider({ apiKey: "re_test_key", baseUrl: fake.url });
    await provider.send({ ...message, subject: "Older <notice>" });
    await provider.send(message);
    const list = await (await fetch(`${fake.url}/`)).text();
    expect(list.indexOf("Your sign-in link")).toBeLessThan(list.indexOf("Older &lt;notice&gt;"));

    const id = fake.messages()[0]?.id ?? "";
    const res = await fetch(`${fake.url}/messages/${id}`);
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html).toContain('<a href="http://localhost:3000/sign-in/check?token=abc&amp;x=1">');
    expect(html).toMatch(/<iframe[^>]+sandbox="[^"]*"[^>]+srcdoc="/);
    expect((await fetch(`${fake.url}/messages/nope`)).status).toBe(404);
  });

  it("mirrors messages to a JSON-lines file and reloads them on restart", async () => {
    const dir = mkdtempSync(path.join(tmpdir(), "fake-email-"));
    const file = path.join(dir, "outbox.jsonl");
    try {
      const first = await startFakeEmailServer({ port: 0, file });
      await createEmailProvider({ apiKey: "re_k", baseUrl: first.url }).send(message);
      await first.close();
      expect(readFileSync(file, "utf8").trim().split("\n")).toHaveLength(1);
      const second = await startFakeEmailServer({ port: 0, file });
      expect(second.messages().map((m) => m.subject)).toEqual([message.subject]);
      await second.close();
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
