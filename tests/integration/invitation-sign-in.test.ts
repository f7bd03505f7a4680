import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { users } from "@/db/schema";
import { acceptInvitation } from "@/lib/actions/invitations/accept-invitation";
import { inviteMember } from "@/lib/actions/members/invite-member";
import { EMPTY, db, form, membershipOf, outboxFor, seedOnce, signInAs } from "./helpers";

// Auth.js's signIn needs a live request to set its cookie; here it is replaced by a stand-in that
// checks the credentials the same way the real provider does (authorizeCredentials), so the test
// sees which account the action signs in, with the password the person just chose.
const signInCalls = vi.hoisted(() => [] as { provider: string; email: string; password: string }[]);
const failNext = vi.hoisted(() => ({ value: false }));
vi.mock("@/auth", async () => {
  const { CredentialsSignin } = await import("next-auth");
  const { getDb } = await import("@/db/client");
  const { authorizeCredentials: check } = await import("@/lib/auth/credentials");
  return {
    signIn: async (provider: string, options: { email: string; password: string }) => {
      signInCalls.push({ provider, email: options.email, password: options.password });
      if (failNext.value) {
        failNext.value = false;
        throw new Error("no request to set a cookie on");
      }
      const result = await check(getDb(), { email: options.email, password: options.password }, "client:test");
      if (!result.ok) throw new CredentialsSignin();
      return undefined;
    },
    signOut: async () => undefined,
    auth: async () => null,
    handlers: {},
  };
});

async function invite(address: string): Promise<string> {
  signInAs("admin@hangarline.test");
  const state = await inviteMember(EMPTY, form({ club: "reedwater", email: address, roles: ["member"] }));
  expect(state.ok, state.message).toBe(true);
  const url = (outboxFor(address).at(-1)?.payload as { url: string }).url;
  return url.split("/invitations/")[1]!;
}

describe("a new member is signed in by accepting the invitation", () => {
  beforeAll(async () => {
    await seedOnce();
  });

  it("creates the account, joins the club, signs in with the chosen password and goes to the club", async () => {
    const token = await invite("joiner.one@example.test");
    signInAs(null);
    const answer = await acceptInvitation(EMPTY, form({ token, name: "Joiner One", password: "a-long-enough-password" }));
    expect(answer.ok, answer.message).toBe(true);
    expect(answer.redirectTo).toBe("/clubs/reedwater");
    expect(answer.message).toMatch(/signed in/);
    expect(signInCalls.at(-1)).toEqual({ provider: "credentials", email: "joiner.one@example.test", password: "a-long-enough-password" });
    expect(membershipOf("joiner.one@example.test", "reedwater")?.roles).toEqual(["member"]);
  });

  it("a refused acceptance signs nobody in and creates nothing", async () => {
    const token = await invite("joiner.two@example.test");
    signInAs(null);
    const calls = signInCalls.length;
    const refused = await acceptInvitation(EMPTY, form({ token, name: "", password: "short" }));
    expect(refused.ok).toBe(false);
    // One message per problem: the summary does not repeat a field's own message.
    expect(refused.message).toBe("Some fields need attention; nothing was saved.");
    expect(signInCalls.length).toBe(calls);
    expect(db().select().from(users).where(eq(users.email, "joiner.two@example.test")).all()).toHaveLength(0);
  });

  it("an existing account joining while signed in is not signed in again", async () => {
    const token = await invite("cottonwood.pilot@hangarline.test");
    signInAs("cottonwood.pilot@hangarline.test");
    const calls = signInCalls.length;
    const answer = await acceptInvitation(EMPTY, form({ token }));
    expect(answer.ok, answer.message).toBe(true);
    expect(answer.redirectTo).toBe("/clubs/reedwater");
    expect(signInCalls.length).toBe(calls);
  });

  it("when the sign-in cannot complete, the answer sends the person to sign in, saying the account is ready", async () => {
    const token = await invite("joiner.three@example.test");
    signInAs(null);
    failNext.value = true;
    const answer = await acceptInvitation(EMPTY, form({ token, name: "Joiner Three", password: "a-long-enough-password" }));
    expect(answer.ok).toBe(true);
    expect(answer.redirectTo).toBe(`/sign-in?joined=1&callbackUrl=${encodeURIComponent("/clubs/reedwater")}`);
    expect(membershipOf("joiner.three@example.test", "reedwater")?.roles).toEqual(["member"]);
  });
});
