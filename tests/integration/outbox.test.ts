import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { emailOutbox } from "@/db/schema";
import { startFakeEmailServer, type FakeEmailServer } from "@/fake-services/email/server";
import { enqueueEmail } from "@/lib/email/outbox";
import { createEmailProvider } from "@/lib/email/provider";
import { drainOutbox, retryDelayMs } from "@/lib/email/worker";
import { db } from "./helpers";

let fake: FakeEmailServer;

beforeAll(async () => {
  fake = await startFakeEmailServer({ port: 0 });
});
afterAll(async () => {
  await fake.close();
});

function queue(to: string) {
  return enqueueEmail(db(), { clubId: null, to, subject: `Hello ${to}`, template: "notice", payload: { title: "Test notice", paragraphs: ["First paragraph."] } });
}

describe("e-mail outbox", () => {
  it("sends through the provider SDK and records the provider's message id", async () => {
    const id = queue("one@example.test");
    const provider = createEmailProvider({ apiKey: "re_test", baseUrl: fake.url });
    const result = await drainOutbox(db(), provider);
    expect(result.sent).toBe(1);
    const row = db().select().from(emailOutbox).where(eq(emailOutbox.id, id)).get()!;
    expect(row.status).toBe("sent");
    const delivered = fake.messages().find((m) => m.to.includes("one@example.test"));
    expect(delivered).toBeTruthy();
    expect(row.providerMessageId).toBe(delivered!.id);
    expect(delivered!.html).toContain("First paragraph.");
  });

  it("survives the provider being down and delivers once it is back: nothing lost, nothing twice", async () => {
    const ids = [queue("two@example.test"), queue("three@example.test")];
    const provider = createEmailProvider({ apiKey: "re_test", baseUrl: fake.url });
    fake.setFailing("down");
    const t0 = new Date();
    const first = await drainOutbox(db(), provider, { now: t0 });
    expect(first).toMatchObject({ sent: 0, retried: 2 });
    for (const id of ids) {
      const row = db().select().from(emailOutbox).where(eq(emailOutbox.id, id)).get()!;
      expect(row).toMatchObject({ status: "pending", attempts: 1 });
      expect(row.nextAttemptAt.getTime()).toBe(t0.getTime() + retryDelayMs(1));
      expect(row.lastError).toBeTruthy();
    }
    // Not due yet: a drain before the backoff sends nothing.
    expect((await drainOutbox(db(), provider, { now: new Date(t0.getTime() + 1000) })).sent).toBe(0);
    fake.setFailing("500");
    const second = await drainOutbox(db(), provider, { now: new Date(t0.getTime() + retryDelayMs(1) + 1) });
    expect(second.retried).toBe(2);
    fake.setFailing(false);
    const later = new Date(t0.getTime() + retryDelayMs(1) + retryDelayMs(2) + 10);
    const third = await drainOutbox(db(), provider, { now: later });
    expect(third.sent).toBe(2);
    for (const id of ids) expect(db().select().from(emailOutbox).where(eq(emailOutbox.id, id)).get()!.status).toBe("sent");
    expect(fake.messages().filter((m) => m.to.includes("two@example.test"))).toHaveLength(1);
    expect((await drainOutbox(db(), provider, { now: new Date(later.getTime() + 3_600_000) })).sent).toBe(0);
  });

  it("backs off exponentially and caps the wait", () => {
    expect([1, 2, 3, 4].map(retryDelayMs)).toEqual([5_000, 10_000, 20_000, 40_000]);
    expect(retryDelayMs(40)).toBe(30 * 60_000);
  });

  it("takes back a message left 'sending' by a worker that died", async () => {
    const id = queue("four@example.test");
    db().update(emailOutbox).set({ status: "sending", lockedUntil: new Date(Date.now() - 1000) }).where(eq(emailOutbox.id, id)).run();
    const provider = createEmailProvider({ apiKey: "re_test", baseUrl: fake.url });
    expect((await drainOutbox(db(), provider)).sent).toBe(1);
  });
});
