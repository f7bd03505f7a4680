// The middleware as a function: the page CSP with its per-request nonce, the strict CSP of route
// handlers, and the refusal of state-changing /api requests that are not same-origin JSON.
// Route files are read from app/api, so a new handler is covered without editing this file.
import fs from "node:fs";
import path from "node:path";
import { NextRequest } from "next/server";
import { afterEach, describe, expect, it } from "vitest";
import { API_CSP, CALLER_CHECKED_ELSEWHERE, MULTIPART_ROUTES, OWN_CSP_ROUTES, middleware, pageCsp } from "@/middleware";

const APP = "http://app.test";
const ORIGINAL_AUTH_URL = process.env.AUTH_URL;

afterEach(() => {
  if (ORIGINAL_AUTH_URL === undefined) delete process.env.AUTH_URL;
  else process.env.AUTH_URL = ORIGINAL_AUTH_URL;
});

function req(url: string, init: { method?: string; headers?: Record<string, string>; body?: string } = {}) {
  return new NextRequest(new URL(url, APP), { method: init.method ?? "GET", headers: init.headers, body: init.body });
}

const passedOn = (res: Response) => res.headers.get("x-middleware-next") === "1";

function directives(csp: string): Map<string, string> {
  return new Map(csp.split(";").map((d) => d.trim()).filter(Boolean).map((d) => [d.split(" ")[0]!, d.slice(d.indexOf(" ") + 1)]));
}

/** Every app/api route file, with its URL (dynamic segments filled in) and source text. */
function apiRoutes(): { url: string; file: string; source: string }[] {
  const root = path.resolve(import.meta.dirname, "../../app");
  const out: { url: string; file: string; source: string }[] = [];
  const walk = (dir: string) => {
    for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
      const p = path.join(dir, entry.name);
      if (entry.isDirectory()) walk(p);
      else if (/^route\.(ts|tsx)$/.test(entry.name)) {
        const segments = path.relative(root, dir).split(path.sep).filter((s) => !/^\(.*\)$/.test(s));
        const url = "/" + segments.map((s) => (s.startsWith("[...") ? "x/y" : s.startsWith("[") ? "abc123" : s)).join("/");
        out.push({ url, file: path.relative(root, p), source: fs.readFileSync(p, "utf8") });
      }
    }
  };
  walk(path.join(root, "api"));
  return out;
}

const WRITE_METHODS = ["POST", "PUT", "PATCH", "DELETE"] as const;
const exportedWrites = (source: string) => WRITE_METHODS.filter((m) => new RegExp(`export (async function|const) ${m}\\b|export const \\{[^}]*\\b${m}\\b`).test(source));

describe("the page Content-Security-Policy", () => {
  it("carries a fresh nonce per request, passed to the framework in the request headers", () => {
    const a = middleware(req("/sign-in"));
    const b = middleware(req("/sign-in"));
    expect(passedOn(a)).toBe(true);
    const csp = a.headers.get("content-security-policy")!;
    const nonce = a.headers.get("x-middleware-request-x-nonce")!;
    expect(nonce).toMatch(/^[A-Za-z0-9+/]{22}==$/); // 16 random bytes
    expect(b.headers.get("x-middleware-request-x-nonce")).not.toBe(nonce);
    // The framework reads the nonce from the request's CSP header: the same policy goes both ways.
    expect(a.headers.get("x-middleware-request-content-security-policy")).toBe(csp);
    const d = directives(csp);
    expect(d.get("script-src")).toBe(`'self' 'nonce-${nonce}' 'strict-dynamic'`);
    expect(d.get("style-src-elem")).toBe(`'self' 'nonce-${nonce}'`);
    expect(d.get("frame-ancestors")).toBe("'none'");
    expect(d.get("object-src")).toBe("'none'");
    expect(d.get("default-src")).toBe("'self'");
    expect(d.get("connect-src")).toBe("'self'");
    expect(csp).not.toMatch(/script-src[^;]*'unsafe-(inline|eval)'/);
    expect(csp).not.toMatch(/https?:\/\//); // nothing is loaded from another host
    expect(d.has("upgrade-insecure-requests")).toBe(false);
  });

  it("next dev gets what its fast refresh needs; production never does", () => {
    const dev = directives(pageCsp("abc", { dev: true }));
    expect(dev.get("script-src")).toBe("'self' 'nonce-abc' 'strict-dynamic' 'unsafe-eval'");
    expect(dev.get("style-src-elem")).toBe("'self' 'unsafe-inline'");
    const prod = directives(pageCsp("abc"));
    expect(prod.get("script-src")).toBe("'self' 'nonce-abc' 'strict-dynamic'");
    expect(prod.get("style-src-elem")).toBe("'self' 'nonce-abc'");
    expect(prod.get("style-src-attr")).toBe("'unsafe-inline'"); // chart and width styles; attributes cannot run code
  });

  it("asks for https subresources only when the request came over https", () => {
    const res = middleware(req("/sign-in", { headers: { "x-forwarded-proto": "https" } }));
    expect(directives(res.headers.get("content-security-policy")!).has("upgrade-insecure-requests")).toBe(true);
  });

  it("a club page without a session cookie is redirected to sign-in, with the CSP on the redirect", () => {
    const res = middleware(req("/clubs/reedwater/money?x=1"));
    expect(res.status).toBe(307);
    expect(res.headers.get("location")).toBe(`${APP}/sign-in?callbackUrl=${encodeURIComponent("/clubs/reedwater/money?x=1")}`);
    expect(res.headers.get("content-security-policy")).toContain("frame-ancestors 'none'");
    const withCookie = middleware(req("/clubs/reedwater", { headers: { cookie: "authjs.session-token=abc" } }));
    expect(passedOn(withCookie)).toBe(true);
    expect(withCookie.headers.get("content-security-policy")).toContain("'nonce-");
    expect(passedOn(middleware(req("/operatorish")))).toBe(true); // only /operator and below need a session
  });

  it("the matcher leaves out only the build's static files", async () => {
    const { config } = await import("@/middleware");
    const re = new RegExp(`^${config.matcher[0]!.replace("/((?!", "/(?!").replace(").*)", ").*")}$`);
    for (const p of ["/", "/sign-in", "/clubs/x/money", "/api/clubs/x/bookings", "/favicon.ico", "/does-not-exist"]) expect(re.test(p), p).toBe(true);
    for (const p of ["/_next/static/chunks/main.js", "/_next/image"]) expect(re.test(p), p).toBe(false);
  });
});

describe("route handler responses", () => {
  it("get the strict policy: nothing may run, load or frame them", () => {
    const res = middleware(req("/api/clubs/reedwater/flight-line"));
    expect(passedOn(res)).toBe(true);
    expect(res.headers.get("content-security-policy")).toBe(API_CSP);
    expect(directives(API_CSP).get("default-src")).toBe("'none'");
    expect(directives(API_CSP).get("frame-ancestors")).toBe("'none'");
  });

  it("a route that sets its own policy keeps it (Next would drop the handler's header if middleware set one)", () => {
    expect(middleware(req("/api/clubs/reedwater/uploads/u1")).headers.get("content-security-policy")).toBeNull();
    const own = apiRoutes().filter((r) => /content-security-policy/i.test(r.source));
    for (const r of own) expect(OWN_CSP_ROUTES.some((re) => re.test(r.url)), `${r.file} sets its own CSP but middleware.ts would overwrite it`).toBe(true);
    for (const r of apiRoutes().filter((x) => !own.includes(x) && !OWN_CSP_ROUTES.some((re) => re.test(x.url)))) {
      expect(middleware(req(r.url)).headers.get("content-security-policy"), r.file).toBe(API_CSP);
    }
  });
});

describe("state-changing route handlers answer only same-origin JSON", () => {
  const url = "/api/clubs/reedwater/bookings";
  const json = { "content-type": "application/json", origin: APP };

  async function expectRefusal(res: Response, status: number, code: string) {
    expect(res.status).toBe(status);
    expect(passedOn(res)).toBe(false);
    const body = (await res.json()) as { error: { code: string; message: string } };
    expect(body.error.code).toBe(code);
    expect(body.error.message.length).toBeGreaterThan(10);
    expect(res.headers.get("content-security-policy")).toBe(API_CSP);
  }

  it("same-origin JSON goes on to the handler, a charset parameter included", () => {
    expect(passedOn(middleware(req(url, { method: "POST", headers: json, body: "{}" })))).toBe(true);
    expect(passedOn(middleware(req(url, { method: "POST", headers: { ...json, "content-type": "Application/JSON; charset=utf-8" }, body: "{}" })))).toBe(true);
  });

  it("no Origin header: 403", async () => {
    await expectRefusal(middleware(req(url, { method: "POST", headers: { "content-type": "application/json" }, body: "{}" })), 403, "forbidden");
  });

  it("another site's Origin: 403, even with a JSON body", async () => {
    await expectRefusal(middleware(req(url, { method: "POST", headers: { ...json, origin: "https://evil.example" }, body: "{}" })), 403, "forbidden");
    await expectRefusal(middleware(req(url, { method: "POST", headers: { ...json, origin: "null" }, body: "{}" })), 403, "forbidden");
    await expectRefusal(middleware(req(url, { method: "POST", headers: { ...json, origin: "http://app.test:8080" }, body: "{}" })), 403, "forbidden");
  });

  it("text/plain, form posts and multipart are 415 (what a cross-site form or a simple fetch can send)", async () => {
    for (const type of ["text/plain", "application/x-www-form-urlencoded", "multipart/form-data; boundary=x", ""]) {
      const headers: Record<string, string> = { origin: APP };
      if (type) headers["content-type"] = type;
      await expectRefusal(middleware(req(url, { method: "POST", headers, body: '{"a":1}' })), 415, "unsupported_media_type");
    }
    expect(MULTIPART_ROUTES).toEqual([]); // no handler takes a file today; uploads go through server actions
  });

  it("with AUTH_URL configured, the expected origin is the configured one, not the request's host", async () => {
    process.env.AUTH_URL = "https://club.example.org/api/auth";
    await expectRefusal(middleware(req(url, { method: "POST", headers: json, body: "{}" })), 403, "forbidden");
    expect(passedOn(middleware(req(url, { method: "POST", headers: { ...json, origin: "https://club.example.org" }, body: "{}" })))).toBe(true);
    // A forged Host cannot make a foreign Origin look like ours.
    const forged = new NextRequest("https://evil.example/api/clubs/reedwater/bookings", { method: "POST", headers: { "content-type": "application/json", origin: "https://evil.example" }, body: "{}" });
    await expectRefusal(middleware(forged), 403, "forbidden");
  });

  it("reads are never refused", () => {
    for (const method of ["GET", "HEAD", "OPTIONS"]) expect(passedOn(middleware(req(url, { method, headers: { origin: "https://evil.example" } }))), method).toBe(true);
  });

  it("every state-changing handler under app/api is covered, except Auth.js and the signed webhook", async () => {
    const writers = apiRoutes().flatMap((r) => exportedWrites(r.source).map((method) => ({ ...r, method })));
    const checked = writers.filter((w) => !CALLER_CHECKED_ELSEWHERE.some((re) => re.test(w.url)));
    expect(checked.length).toBeGreaterThanOrEqual(2); // bookings and document reminders today
    for (const w of checked) {
      for (const method of WRITE_METHODS) {
        await expectRefusal(middleware(req(w.url, { method, headers: { "content-type": "text/plain", origin: APP }, body: "{}" })), 415, "unsupported_media_type");
        await expectRefusal(middleware(req(w.url, { method, headers: { "content-type": "application/json", origin: "https://evil.example" }, body: "{}" })), 403, "forbidden");
      }
    }
    const exempt = writers.filter((w) => CALLER_CHECKED_ELSEWHERE.some((re) => re.test(w.url))).map((w) => w.file).sort();
    expect(exempt).toEqual(["api/auth/[...nextauth]/route.ts", "api/cron/tick/route.ts", "api/webhooks/payments/route.ts"]);
    // Exempt ones are passed on as they are: Auth.js checks its own CSRF token, the webhook its signature.
    expect(passedOn(middleware(req("/api/auth/callback/credentials", { method: "POST", headers: { "content-type": "application/x-www-form-urlencoded", origin: APP }, body: "a=b" })))).toBe(true);
    expect(passedOn(middleware(req("/api/webhooks/payments", { method: "POST", headers: { "content-type": "application/json; charset=utf-8" }, body: "{}" })))).toBe(true);
  });
});
