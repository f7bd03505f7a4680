import { beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { revokedSessions } from "@/db/schema";
import { changeRoles } from "@/lib/actions/members/change-roles";
import { setMembershipStatus } from "@/lib/actions/members/set-membership-status";
import { DEMO_PASSWORD } from "@/db/seed/scenario";
import { AuthClient } from "./auth-http";
import { EMPTY, db, form, membershipOf, seedOnce, signInAs } from "./helpers";

/** Signs in through Auth.js itself and returns the client holding the session cookie. */
async function signedIn(email: string): Promise<AuthClient> {
  const client = new AuthClient();
  const response = await client.signInWithPassword(email, DEMO_PASSWORD);
  expect(response.status).toBe(302);
  expect(client.sessionCookie()).toBeTruthy();
  expect((await client.session())?.user?.email).toBe(email);
  return client;
}

/** A second client presenting a copy of the same session cookie (a stolen or kept copy). */
function copyOf(client: AuthClient): AuthClient {
  const copy = new AuthClient();
  copy.cookies.set("authjs.session-token", client.sessionCookie()!);
  return copy;
}

describe("sessions can be revoked", () => {
  beforeAll(async () => {
    await seedOnce();
  });

  it("sign-out ends the session: a kept copy of the cookie is refused afterwards", async () => {
    const client = await signedIn("member@hangarline.test");
    const kept = copyOf(client);
    expect((await kept.session())?.user?.email).toBe("member@hangarline.test");
    const out = await client.signOut();
    expect(out.status).toBe(302);
    expect(client.sessionCookie()).toBeUndefined();
    expect(await kept.session()).toBeNull();
    expect(db().select().from(revokedSessions).all().length).toBeGreaterThan(0);
    // Signing in again gives a new, working session.
    const again = await signedIn("member@hangarline.test");
    expect((await again.session())?.user?.email).toBe("member@hangarline.test");
  }, 60_000);

  it("a role change ends the member's sessions", async () => {
    const client = await signedIn("student@hangarline.test");
    signInAs("admin@hangarline.test");
    const m = membershipOf("student@hangarline.test", "reedwater")!;
    const state = await changeRoles(EMPTY, form({ club: "reedwater", membershipId: m.id, roles: ["member", "instructor"] }));
    expect(state.ok).toBe(true);
    expect(await client.session()).toBeNull();
    // Another member's session is untouched.
    const other = await signedIn("instructor@hangarline.test");
    expect((await other.session())?.user?.email).toBe("instructor@hangarline.test");
  }, 60_000);

  it("deactivation ends the member's sessions", async () => {
    const client = await signedIn("pilot2@hangarline.test");
    signInAs("admin@hangarline.test");
    const m = membershipOf("pilot2@hangarline.test", "reedwater")!;
    const state = await setMembershipStatus(EMPTY, form({ club: "reedwater", membershipId: m.id, status: "inactive" }));
    expect(state.ok).toBe(true);
    expect(await client.session()).toBeNull();
  }, 60_000);

  it("a session cookie without a session id (issued before revocation existed) is refused", async () => {
    const { encode } = await import("next-auth/jwt");
    const user = db().query.users.findFirst({ where: (u) => eq(u.email, "safety@hangarline.test") }).sync();
    const token = await encode({ token: { sub: user!.id, email: user!.email }, secret: "hangarline-local-development-secret-change-me", salt: "authjs.session-token" });
    const client = new AuthClient();
    client.cookies.set("authjs.session-token", token);
    expect(await client.session()).toBeNull();
  });
});
