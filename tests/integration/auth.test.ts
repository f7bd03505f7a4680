import { beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { users } from "@/db/schema";
import { authorizeCredentials } from "@/lib/auth/credentials";
import { MAX_FAILURES_PER_EMAIL } from "@/lib/auth/rate-limit";
import { DEMO_PASSWORD } from "@/db/seed/scenario";
import { db, seedOnce } from "./helpers";

describe("sign-in with e-mail and password", () => {
  beforeAll(async () => {
    await seedOnce();
  });

  it("signs in an active account with the right password", async () => {
    const result = await authorizeCredentials(db(), { email: "Member@Hangarline.test ", password: DEMO_PASSWORD }, "10.0.0.1");
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.user.email).toBe("member@hangarline.test");
  });

  it("answers a wrong password and an unknown address the same way", async () => {
    const wrong = await authorizeCredentials(db(), { email: "instructor@hangarline.test", password: "nope-nope-nope" }, "10.0.0.2");
    const unknown = await authorizeCredentials(db(), { email: "nobody@hangarline.test", password: "nope-nope-nope" }, "10.0.0.2");
    expect(wrong).toEqual({ ok: false, reason: "invalid" });
    expect(unknown).toEqual({ ok: false, reason: "invalid" });
  });

  it("refuses a disabled account as if it did not exist", async () => {
    db().update(users).set({ disabledAt: new Date() }).where(eq(users.email, "pilot2@hangarline.test")).run();
    const result = await authorizeCredentials(db(), { email: "pilot2@hangarline.test", password: DEMO_PASSWORD }, "10.0.0.3");
    expect(result).toEqual({ ok: false, reason: "invalid" });
  });

  it("rate-limits an address after repeated failures, even with the right password afterwards", async () => {
    const email = "safety@hangarline.test";
    for (let i = 0; i < MAX_FAILURES_PER_EMAIL; i++) {
      const r = await authorizeCredentials(db(), { email, password: `wrong-${i}-password` }, `10.1.0.${i}`);
      expect(r).toEqual({ ok: false, reason: "invalid" });
    }
    const blocked = await authorizeCredentials(db(), { email, password: DEMO_PASSWORD }, "10.1.0.99");
    expect(blocked).toEqual({ ok: false, reason: "rate_limited" });
    // An address with no account is limited the same way, so the limit reveals nothing.
    for (let i = 0; i < MAX_FAILURES_PER_EMAIL; i++) await authorizeCredentials(db(), { email: "ghost@hangarline.test", password: "x-wrong-pass" }, "10.2.0.1");
    expect(await authorizeCredentials(db(), { email: "ghost@hangarline.test", password: "x-wrong-pass" }, "10.2.0.1")).toEqual({ ok: false, reason: "rate_limited" });
  }, 90_000); // a dozen deliberate bcrypt comparisons; slow on a loaded 2-core machine

  it("rejects malformed input without touching the database", async () => {
    expect(await authorizeCredentials(db(), { email: "not-an-email", password: "" }, null)).toEqual({ ok: false, reason: "invalid" });
  });
});
