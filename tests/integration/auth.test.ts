import { beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { revokedSessions, signInAttempts, signInLinkRequests, users, verificationTokens } from "@/db/schema";
import { clientKeyFrom, UNKNOWN_CLIENT } from "@/lib/auth/client-key";
import { authorizeCredentials, type CredentialsResult } from "@/lib/auth/credentials";
import { verifyPassword } from "@/lib/auth/password";
import {
  FIRST_WAIT_MS,
  FREE_FAILURES_PER_ACCOUNT,
  FREE_FAILURES_UNKNOWN_CLIENT,
  MAX_WAIT_MS,
  pruneSignInRecords,
  requiredWaitMs,
  reserveSignInLink,
  MAX_LINKS_PER_CLIENT,
} from "@/lib/auth/rate-limit";
import { DEMO_PASSWORD } from "@/db/seed/scenario";
import { db, seedOnce } from "./helpers";

/** A clock the test moves forward instead of waiting. */
function testClock(start = Date.UTC(2026, 5, 1, 12)) {
  let t = start;
  return { now: () => new Date(t), advance: (ms: number) => (t += ms) };
}

/** The real password check, counted. */
function countedVerify() {
  const calls = { n: 0 };
  const verify = (password: string, hash: string) => {
    calls.n += 1;
    return verifyPassword(password, hash);
  };
  return { calls, verify };
}

/** "ok", "invalid" or "rate_limited". */
const reasonOf = (r: CredentialsResult) => (r.ok ? "ok" : r.reason);

/** A cheap stand-in for bcrypt where the test is about counting, not hashing. */
const fastVerify = async (password: string, _hash?: string) => password === DEMO_PASSWORD;

describe("sign-in with e-mail and password", () => {
  beforeAll(async () => {
    await seedOnce();
  });

  it("signs in an active account with the right password", async () => {
    const result = await authorizeCredentials(db(), { email: "Member@Hangarline.test ", password: DEMO_PASSWORD }, "ip:10.0.0.1");
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.user.email).toBe("member@hangarline.test");
  });

  it("answers a wrong password and an unknown address the same way", async () => {
    const wrong = await authorizeCredentials(db(), { email: "instructor@hangarline.test", password: "nope-nope-nope" }, "ip:10.0.0.2");
    const unknown = await authorizeCredentials(db(), { email: "nobody@hangarline.test", password: "nope-nope-nope" }, "ip:10.0.0.2");
    expect(wrong).toEqual({ ok: false, reason: "invalid" });
    expect(unknown).toEqual({ ok: false, reason: "invalid" });
  });

  it("refuses a disabled account as if it did not exist", async () => {
    db().update(users).set({ disabledAt: new Date() }).where(eq(users.email, "pilot2@hangarline.test")).run();
    const result = await authorizeCredentials(db(), { email: "pilot2@hangarline.test", password: DEMO_PASSWORD }, "ip:10.0.0.3");
    expect(result).toEqual({ ok: false, reason: "invalid" });
  });

  it("20 parallel wrong guesses: at most 5 passwords are hashed and tried, the rest are refused before hashing", async () => {
    const clock = testClock();
    const { calls, verify } = countedVerify();
    const email = "safety@hangarline.test";
    const results = await Promise.all(
      Array.from({ length: 20 }, (_, i) => authorizeCredentials(db(), { email, password: `guess-${i}-wrong` }, `ip:10.9.0.${i}`, { now: clock.now, verify })),
    );
    expect(calls.n).toBe(FREE_FAILURES_PER_ACCOUNT);
    expect(results.filter((r) => reasonOf(r) === "invalid")).toHaveLength(5);
    expect(results.filter((r) => reasonOf(r) === "rate_limited")).toHaveLength(15);
    // Only the attempts that were tried left a row; a refused one writes nothing.
    expect(db().select().from(signInAttempts).where(eq(signInAttempts.emailKey, email)).all()).toHaveLength(5);
    expect(db().select().from(signInAttempts).where(eq(signInAttempts.outcome, "pending")).all()).toHaveLength(0);
  }, 60_000);

  it("the owner signs in once the wait is over (no lockout), and success clears the account's count", async () => {
    const clock = testClock(Date.UTC(2026, 5, 2, 12));
    const { calls, verify } = countedVerify();
    const email = "treasurer@hangarline.test";
    for (let i = 0; i < FREE_FAILURES_PER_ACCOUNT; i++) {
      expect(await authorizeCredentials(db(), { email, password: `wrong-${i}-password` }, `ip:10.1.0.${i}`, { now: clock.now, verify: fastVerify })).toEqual({ ok: false, reason: "invalid" });
    }
    // Right away, even the right password waits (and is not hashed): the first wait is 30 s.
    const early = await authorizeCredentials(db(), { email, password: DEMO_PASSWORD }, "ip:10.1.0.99", { now: clock.now, verify });
    expect(early).toMatchObject({ ok: false, reason: "rate_limited" });
    expect(early.ok === false && early.reason === "rate_limited" && early.retryAfterMs).toBe(FIRST_WAIT_MS);
    expect(calls.n).toBe(0);
    clock.advance(FIRST_WAIT_MS);
    const owner = await authorizeCredentials(db(), { email, password: DEMO_PASSWORD }, "ip:10.1.0.99", { now: clock.now, verify });
    expect(owner.ok).toBe(true);
    expect(calls.n).toBe(1);
    // The count is cleared: five more mistakes are allowed before any wait.
    for (let i = 0; i < FREE_FAILURES_PER_ACCOUNT; i++) {
      expect(reasonOf(await authorizeCredentials(db(), { email, password: `again-${i}-wrong` }, "ip:10.1.1.1", { now: clock.now, verify: fastVerify }))).toBe("invalid");
    }
    expect(reasonOf(await authorizeCredentials(db(), { email, password: DEMO_PASSWORD }, "ip:10.1.1.1", { now: clock.now, verify: fastVerify }))).toBe("rate_limited");
  });

  it("the wait doubles with each further failure, up to a cap", async () => {
    // Common practice (exponential back-off): 30 s after the 5th failure, doubling, capped at 15 min.
    expect(requiredWaitMs(4, 5)).toBe(0);
    expect(requiredWaitMs(5, 5)).toBe(30_000);
    expect(requiredWaitMs(6, 5)).toBe(60_000);
    expect(requiredWaitMs(7, 5)).toBe(120_000);
    expect(requiredWaitMs(40, 5)).toBe(MAX_WAIT_MS);
    const clock = testClock(Date.UTC(2026, 5, 3, 12));
    const email = "maintenance@hangarline.test";
    for (let i = 0; i < 5; i++) await authorizeCredentials(db(), { email, password: `w-${i}-wrong-pw` }, `ip:10.3.0.${i}`, { now: clock.now, verify: fastVerify });
    clock.advance(FIRST_WAIT_MS);
    expect(reasonOf(await authorizeCredentials(db(), { email, password: "sixth-wrong-pw" }, "ip:10.3.1.1", { now: clock.now, verify: fastVerify }))).toBe("invalid");
    clock.advance(FIRST_WAIT_MS); // 30 s is no longer enough after the 6th failure
    const r = await authorizeCredentials(db(), { email, password: DEMO_PASSWORD }, "ip:10.3.1.1", { now: clock.now, verify: fastVerify });
    expect(r).toEqual({ ok: false, reason: "rate_limited", retryAfterMs: FIRST_WAIT_MS });
    clock.advance(FIRST_WAIT_MS);
    expect((await authorizeCredentials(db(), { email, password: DEMO_PASSWORD }, "ip:10.3.1.1", { now: clock.now, verify: fastVerify })).ok).toBe(true);
  });

  it("an address with no account is limited the same way, so the limit reveals nothing", async () => {
    const clock = testClock(Date.UTC(2026, 5, 4, 12));
    const email = "ghost@hangarline.test";
    for (let i = 0; i < 5; i++) await authorizeCredentials(db(), { email, password: "x-wrong-pass" }, `ip:10.2.0.${i}`, { now: clock.now, verify: fastVerify });
    expect(reasonOf(await authorizeCredentials(db(), { email, password: "x-wrong-pass" }, "ip:10.2.0.9", { now: clock.now, verify: fastVerify }))).toBe("rate_limited");
  });

  it("limits one client guessing across many accounts", async () => {
    const clock = testClock(Date.UTC(2026, 5, 5, 12));
    const calls = { n: 0 };
    const fast = async (p: string, h: string) => (calls.n++, fastVerify(p, h));
    const results = [];
    for (let i = 0; i < FREE_FAILURES_UNKNOWN_CLIENT + 5; i++) {
      results.push(await authorizeCredentials(db(), { email: `spray-${i}@example.test`, password: "Spring2026!" }, UNKNOWN_CLIENT, { now: clock.now, verify: fast }));
    }
    expect(calls.n).toBe(FREE_FAILURES_UNKNOWN_CLIENT);
    expect(reasonOf(results.at(-1)!)).toBe("rate_limited");
  });

  it("X-Forwarded-For is ignored unless TRUST_PROXY says a proxy of ours is in front", () => {
    const forged = new Headers({ "x-forwarded-for": "203.0.113.7" });
    expect(clientKeyFrom(forged, {})).toBe(UNKNOWN_CLIENT);
    expect(clientKeyFrom(forged, { TRUST_PROXY: "0" })).toBe(UNKNOWN_CLIENT);
    // Behind one proxy, the client is the address the proxy appended (the last one), not what the client wrote.
    const viaProxy = new Headers({ "x-forwarded-for": "203.0.113.7, 198.51.100.20" });
    expect(clientKeyFrom(viaProxy, { TRUST_PROXY: "1" })).toBe("ip:198.51.100.20");
    expect(clientKeyFrom(viaProxy, { TRUST_PROXY: "2" })).toBe("ip:203.0.113.7");
    expect(clientKeyFrom(new Headers({ "x-forwarded-for": "not an address" }), { TRUST_PROXY: "1" })).toBe(UNKNOWN_CLIENT);
  });

  it("rotating a forged X-Forwarded-For does not escape the client limit without the proxy setting", async () => {
    const clock = testClock(Date.UTC(2026, 5, 10, 12)); // days after the other test of the shared bucket
    const env = {}; // no TRUST_PROXY
    let tried = 0;
    const fast = async (p: string, h: string) => (tried++, fastVerify(p, h));
    for (let i = 0; i < FREE_FAILURES_UNKNOWN_CLIENT + 3; i++) {
      const key = clientKeyFrom(new Headers({ "x-forwarded-for": `198.18.${i >> 8}.${i & 255}` }), env);
      await authorizeCredentials(db(), { email: `rotate-${i}@example.test`, password: "Autumn2026!" }, key, { now: clock.now, verify: fast });
    }
    expect(tried).toBe(FREE_FAILURES_UNKNOWN_CLIENT);
  });

  it("rejects malformed input without touching the database", async () => {
    const before = db().select().from(signInAttempts).all().length;
    expect(await authorizeCredentials(db(), { email: "not-an-email", password: "" }, UNKNOWN_CLIENT)).toEqual({ ok: false, reason: "invalid" });
    expect(db().select().from(signInAttempts).all().length).toBe(before);
  });

  it("old throttling rows are pruned; the attempts table is indexed", () => {
    const now = new Date(Date.UTC(2026, 5, 20, 12));
    db().insert(signInAttempts).values({ emailKey: "old@example.test", clientKey: UNKNOWN_CLIENT, outcome: "failed", createdAt: new Date(now.getTime() - 25 * 3600_000) }).run();
    db().insert(signInLinkRequests).values({ emailKey: "old@example.test", clientKey: UNKNOWN_CLIENT, createdAt: new Date(now.getTime() - 25 * 3600_000) }).run();
    const member = db().select().from(users).where(eq(users.email, "member@hangarline.test")).get()!;
    db().insert(revokedSessions).values({ sessionId: "expired-session", userId: member.id, expiresAt: new Date(now.getTime() - 1000) }).run();
    db().insert(revokedSessions).values({ sessionId: "live-session", userId: member.id, expiresAt: new Date(now.getTime() + 1000) }).run();
    db().insert(verificationTokens).values({ identifier: "old@example.test", token: "expired-token", expires: new Date(now.getTime() - 1000) }).run();
    pruneSignInRecords(db(), now);
    expect(db().select().from(revokedSessions).all().map((r) => r.sessionId)).toEqual(["live-session"]);
    expect(db().select().from(verificationTokens).where(eq(verificationTokens.token, "expired-token")).all()).toHaveLength(0);
    expect(db().select().from(signInAttempts).where(eq(signInAttempts.emailKey, "old@example.test")).all()).toHaveLength(0);
    expect(db().select().from(signInLinkRequests).where(eq(signInLinkRequests.emailKey, "old@example.test")).all()).toHaveLength(0);
    const plan = db().$client.prepare("EXPLAIN QUERY PLAN SELECT count(*) FROM sign_in_attempts WHERE email_key = ? AND created_at >= ?").all("a", 0) as { detail: string }[];
    expect(plan.map((p) => p.detail).join(" ")).toMatch(/USING (COVERING )?INDEX sign_in_attempts_email_key/);
  });

  it("sign-in links: a few per client, then none (checked before anything is queued)", () => {
    const at = new Date(Date.UTC(2026, 5, 7, 12));
    const sent = Array.from({ length: MAX_LINKS_PER_CLIENT + 5 }, (_, i) => reserveSignInLink(db(), `link-${i}@example.test`, "ip:192.0.2.44", at));
    expect(sent.filter(Boolean)).toHaveLength(MAX_LINKS_PER_CLIENT);
    // Another client is not affected.
    expect(reserveSignInLink(db(), "link-x@example.test", "ip:192.0.2.45", at)).toBe(true);
  });
});
