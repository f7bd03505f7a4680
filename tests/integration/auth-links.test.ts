import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { eq } from "drizzle-orm";
import { signInLinkRequests } from "@/db/schema";
import { MAX_LINKS_PER_ADDRESS } from "@/lib/auth/rate-limit";
import { assertDeploymentConfig, deploymentConfigProblems, DeploymentConfigError } from "@/lib/server/deployment-config";
import { appUrl } from "@/lib/server/urls";
import { AuthClient } from "./auth-http";
import { db, outboxFor, seedOnce } from "./helpers";

const linkOf = (row: { payload: unknown }) => {
  const payload = (typeof row.payload === "string" ? JSON.parse(row.payload) : row.payload) as { url: string };
  return new URL(payload.url);
};

const saved = { ...process.env };
afterEach(() => {
  for (const key of ["AUTH_URL", "APP_URL", "NODE_ENV", "AUTH_SECRET", "TRUST_PROXY"] as const) {
    if (saved[key] === undefined) delete (process.env as Record<string, string | undefined>)[key];
    else (process.env as Record<string, string | undefined>)[key] = saved[key];
  }
});

describe("sign-in links are built from AUTH_URL only", () => {
  beforeAll(async () => {
    await seedOnce();
  });

  it("a forged Host / X-Forwarded-Host never reaches the link mailed to the member", async () => {
    const attacker = new AuthClient("http://evil.example", { host: "evil.example", "x-forwarded-host": "evil.example", "x-forwarded-proto": "https" });
    const response = await attacker.requestLink("member@hangarline.test");
    expect(response.status).toBe(302);
    const rows = outboxFor("member@hangarline.test").filter((r) => r.template === "magic-link");
    expect(rows).toHaveLength(1);
    const link = linkOf(rows[0]!);
    expect(link.origin).toBe("http://app.test");
    expect(link.pathname).toBe("/api/auth/callback/email");
    expect(JSON.stringify(rows[0])).not.toContain("evil.example");
  });

  it("even if Auth.js were given the forged host (no AUTH_URL in development), the link uses the configured address", async () => {
    delete process.env.AUTH_URL; // APP_URL (http://app.test) stays configured
    const attacker = new AuthClient("http://evil.example", { host: "evil.example", "x-forwarded-host": "evil.example" });
    await attacker.requestLink("safety@hangarline.test");
    const rows = outboxFor("safety@hangarline.test").filter((r) => r.template === "magic-link");
    expect(rows).toHaveLength(1);
    expect(linkOf(rows[0]!).origin).toBe("http://app.test");
    expect(JSON.stringify(rows[0])).not.toContain("evil.example");
  });

  it("25 link requests for one address send 5 e-mails; every request gets the same answer", async () => {
    const client = new AuthClient();
    const answers = new Set<string>();
    for (let i = 0; i < 25; i++) {
      const response = await client.requestLink("instructor@hangarline.test");
      answers.add(`${response.status} ${response.headers.get("location")}`);
    }
    expect(answers.size).toBe(1);
    expect(outboxFor("instructor@hangarline.test").filter((r) => r.template === "magic-link")).toHaveLength(MAX_LINKS_PER_ADDRESS);
    expect(db().select().from(signInLinkRequests).where(eq(signInLinkRequests.emailKey, "instructor@hangarline.test")).all()).toHaveLength(MAX_LINKS_PER_ADDRESS);
  });

  it("an address without an account gets no e-mail and the same answer", async () => {
    const client = new AuthClient();
    const known = await client.requestLink("treasurer@hangarline.test");
    const unknown = await client.requestLink("nobody-at-all@hangarline.test");
    expect(unknown.status).toBe(known.status);
    expect(unknown.headers.get("location")).toBe(known.headers.get("location"));
    expect(outboxFor("nobody-at-all@hangarline.test")).toHaveLength(0);
  });
});

describe("production refuses to start without AUTH_URL and AUTH_SECRET", () => {
  const good = { NODE_ENV: "production", AUTH_URL: "https://portal.example-club.org", AUTH_SECRET: "k".repeat(12) + "Zq9-random-enough-value-xx" };

  it("names each missing or unsafe setting", () => {
    expect(deploymentConfigProblems(good)).toEqual([]);
    expect(deploymentConfigProblems({ ...good, AUTH_URL: undefined }).join()).toMatch(/AUTH_URL is not set/);
    expect(deploymentConfigProblems({ ...good, AUTH_URL: "portal.example-club.org" }).join()).toMatch(/AUTH_URL must be an absolute http\(s\) address/);
    expect(deploymentConfigProblems({ ...good, AUTH_SECRET: undefined }).join()).toMatch(/AUTH_SECRET is not set/);
    expect(deploymentConfigProblems({ ...good, AUTH_SECRET: "hangarline-demo-secret-change-me-in-production" }).join()).toMatch(/published development secrets/);
    expect(deploymentConfigProblems({ ...good, AUTH_SECRET: "short" }).join()).toMatch(/shorter than 32/);
    expect(deploymentConfigProblems({ NODE_ENV: "production" })).toHaveLength(2);
    // Development and tests need neither.
    expect(deploymentConfigProblems({ NODE_ENV: "development" })).toEqual([]);
    expect(() => assertDeploymentConfig({ NODE_ENV: "production" })).toThrow(DeploymentConfigError);
    expect(() => assertDeploymentConfig({ NODE_ENV: "production" })).toThrow(/will not start in production[\s\S]*AUTH_URL[\s\S]*AUTH_SECRET/);
  });

  it("the server's start-up hook refuses, and no link is built from a request in production", async () => {
    const env = process.env as Record<string, string | undefined>;
    env.NODE_ENV = "production";
    delete env.AUTH_URL;
    delete env.APP_URL;
    delete env.AUTH_SECRET;
    const { register } = await import("@/instrumentation");
    const runtime = env.NEXT_RUNTIME;
    env.NEXT_RUNTIME = "nodejs";
    const exit = vi.spyOn(process, "exit").mockImplementation(((code?: number) => {
      throw new Error(`process.exit(${code})`);
    }) as never);
    const logged = vi.spyOn(process.stderr, "write").mockImplementation(() => true);
    try {
      await expect(register()).rejects.toThrow("process.exit(1)");
      expect(String(logged.mock.calls[0]?.[0])).toMatch(/will not start in production[\s\S]*AUTH_URL is not set[\s\S]*AUTH_SECRET is not set/);
    } finally {
      exit.mockRestore();
      logged.mockRestore();
      if (runtime === undefined) delete env.NEXT_RUNTIME;
      else env.NEXT_RUNTIME = runtime;
    }
    expect(() => appUrl("/invitations/x")).toThrow(/AUTH_URL is not set/);
    // Auth.js itself is not configured either: its handler refuses instead of using a known key.
    await expect(new AuthClient().request("/api/auth/csrf")).rejects.toThrow(/will not start in production/);
  });

  it("with AUTH_URL set, invitations and statements use it", () => {
    process.env.AUTH_URL = "https://portal.example-club.org";
    delete process.env.APP_URL;
    expect(appUrl("/invitations/abc")).toBe("https://portal.example-club.org/invitations/abc");
  });
});
