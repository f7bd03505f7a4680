// Security headers on every kind of response from `next start` (page, route handler, static file,
// 404, redirect), the refusal of cross-site or non-JSON writes, and pages with charts and forms
// working in Chromium under the nonce-based Content-Security-Policy with no violation reported.
import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { baseUrl, newPage, signIn } from "./harness";

const CLUB = "reedwater";

function expectFixedHeaders(res: Response, what: string) {
  const h = res.headers;
  expect(h.get("x-content-type-options"), what).toBe("nosniff");
  expect(h.get("referrer-policy"), what).toBe("strict-origin-when-cross-origin");
  const permissions = h.get("permissions-policy") ?? "";
  for (const feature of ["camera", "microphone", "geolocation", "payment", "usb"]) expect(permissions, `${what}: ${feature}`).toContain(`${feature}=()`);
  expect(h.get("x-frame-options"), what).toBe("DENY");
  // Plain http here: no HSTS (a browser would ignore it anyway).
  expect(h.get("strict-transport-security"), what).toBeNull();
  const csp = h.get("content-security-policy") ?? "";
  expect(csp, what).toContain("frame-ancestors 'none'");
  expect(csp.split(",").length, `${what}: one policy, not two`).toBe(1);
  return csp;
}

const STRICT = "default-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'";

function pageNonce(csp: string): string {
  const nonce = /script-src 'self' 'nonce-([A-Za-z0-9+/=]+)' 'strict-dynamic'/.exec(csp)?.[1];
  expect(nonce, csp).toBeTruthy();
  return nonce!;
}

describe("headers on every kind of response", () => {
  it("a page: the nonce in its policy is on its scripts, and fresh on every load", async () => {
    const first = await fetch(`${baseUrl}/sign-in`);
    expect(first.status).toBe(200);
    const csp = expectFixedHeaders(first, "page");
    const nonce = pageNonce(csp);
    const html = await first.text();
    const scripts = [...html.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
    expect(scripts.length).toBeGreaterThan(1);
    for (const tag of scripts) expect(tag, "every script carries the nonce").toContain(`nonce="${nonce}"`);
    for (const d of ["default-src 'self'", "object-src 'none'", "base-uri 'self'", "form-action 'self'", "img-src 'self' blob: data:", "font-src 'self'", "connect-src 'self'"]) expect(csp).toContain(d);
    expect(csp).not.toMatch(/script-src[^;]*'unsafe-(inline|eval)'/);
    expect(csp).not.toContain("upgrade-insecure-requests");
    const second = await fetch(`${baseUrl}/sign-in`);
    expect(pageNonce(second.headers.get("content-security-policy")!)).not.toBe(nonce);
  });

  it("HSTS and upgrade-insecure-requests only when the request came over https (the proxy says so)", async () => {
    const page = await fetch(`${baseUrl}/sign-in`, { headers: { "x-forwarded-proto": "https" } });
    expect(page.headers.get("strict-transport-security")).toBe("max-age=63072000; includeSubDomains");
    expect(page.headers.get("content-security-policy")).toContain("upgrade-insecure-requests");
    const asset = await fetch(`${baseUrl}/_next/static/does-not-exist.js`, { headers: { "x-forwarded-proto": "https" } });
    expect(asset.headers.get("strict-transport-security")).toBe("max-age=63072000; includeSubDomains");
  });

  it("a route handler's JSON gets the strict policy", async () => {
    const res = await fetch(`${baseUrl}/api/clubs/${CLUB}/flight-line`);
    expect(res.status).toBe(401);
    expect(expectFixedHeaders(res, "api")).toBe(STRICT);
    expect(await res.json()).toEqual({ error: { code: "unauthenticated", message: "Sign in first." } });
  });

  it("static files (the page's own stylesheet and scripts) and a missing one", async () => {
    const html = await (await fetch(`${baseUrl}/sign-in`)).text();
    const assets = [...new Set([...html.matchAll(/\/_next\/static\/[^"'\s]+\.(?:css|js)/g)].map((m) => m[0]))];
    expect(assets.some((a) => a.endsWith(".css"))).toBe(true);
    expect(assets.some((a) => a.endsWith(".js"))).toBe(true);
    for (const a of assets.slice(0, 4)) {
      const res = await fetch(`${baseUrl}${a}`);
      expect(res.status, a).toBe(200);
      expect(expectFixedHeaders(res, a)).toBe(STRICT);
    }
    const missing = await fetch(`${baseUrl}/_next/static/chunks/no-such-chunk.js`);
    expect(missing.status).toBe(404);
    expect(expectFixedHeaders(missing, "missing static")).toBe(STRICT);
  });

  it("a 404 page", async () => {
    const res = await fetch(`${baseUrl}/no-such-page-here`);
    expect(res.status).toBe(404);
    pageNonce(expectFixedHeaders(res, "404"));
  });

  it("a redirect (no session → sign-in)", async () => {
    const res = await fetch(`${baseUrl}/clubs/${CLUB}/money`, { redirect: "manual" });
    expect(res.status).toBe(307);
    expect(res.headers.get("location")).toContain("/sign-in?callbackUrl=");
    pageNonce(expectFixedHeaders(res, "redirect"));
  });
});

describe("state-changing route handlers take same-origin JSON only", () => {
  const url = `${baseUrl}/api/clubs/${CLUB}/bookings`;

  it("text/plain JSON (a 'simple' cross-site request) is 415, another site's Origin 403, both before the handler", async () => {
    const plain = await fetch(url, { method: "POST", headers: { "content-type": "text/plain", origin: baseUrl }, body: "{}" });
    expect(plain.status).toBe(415);
    expect(((await plain.json()) as { error: { code: string } }).error.code).toBe("unsupported_media_type");
    expectFixedHeaders(plain, "415");
    const foreign = await fetch(url, { method: "POST", headers: { "content-type": "application/json", origin: "https://elsewhere.example" }, body: "{}" });
    expect(foreign.status).toBe(403);
    expect(((await foreign.json()) as { error: { code: string } }).error.code).toBe("forbidden");
    const none = await fetch(url, { method: "POST", headers: { "content-type": "application/json" }, body: "{}" });
    expect(none.status).toBe(403);
  });

  it("same-origin JSON reaches the handler (which then asks for a session)", async () => {
    const res = await fetch(url, { method: "POST", headers: { "content-type": "application/json", origin: baseUrl }, body: "{}" });
    expect(res.status).toBe(401);
    expect(((await res.json()) as { error: { code: string } }).error.code).toBe("unauthenticated");
  });
});

/** Records CSP violations from the page's own event and from the console, and script errors. */
async function watchViolations(page: Page): Promise<() => Promise<string[]>> {
  const seen: string[] = [];
  page.on("console", (m) => {
    const text = m.text();
    if (/Content Security Policy|Refused to (load|execute|apply|connect|frame)|Permissions-Policy/i.test(text)) seen.push(`console: ${text}`);
  });
  page.on("pageerror", (e) => seen.push(`pageerror: ${e.message}`));
  // Injected by the browser's debugging protocol, so it is not itself subject to the policy.
  await page.addInitScript(() => {
    const w = window as unknown as { __csp: string[] };
    w.__csp = [];
    document.addEventListener("securitypolicyviolation", (e) => w.__csp.push(`${e.violatedDirective} ${e.blockedURI} ${e.sourceFile}:${e.lineNumber}`));
  });
  return async () => [...seen, ...(await page.evaluate(() => (window as unknown as { __csp?: string[] }).__csp ?? []))];
}

describe("pages with charts and forms work under the policy", () => {
  it("the hourly-rate calculator: the chart draws, follows the form, and the save answers", async () => {
    const page = await newPage("desktop");
    const violations = await watchViolations(page);
    await signIn(page, "treasurer@hangarline.test");
    expect(await violations()).toEqual([]);
    const res = await page.goto(`/clubs/${CLUB}/money/rates`, { waitUntil: "networkidle" });
    expect(res?.headers()["content-security-policy"]).toContain("'nonce-");
    const form = page.getByRole("form", { name: "Hourly-rate calculator" });
    await form.getByLabel("Aircraft or scenario").fill(`CSP check ${Date.now()}`);
    await form.getByLabel(/Fixed costs per year/).fill("24000");
    await form.getByLabel("Hours flown per year").fill("300");
    await form.getByLabel(/Fuel price/).fill("6.50");
    await form.getByLabel(/Oil per hour/).fill("2");
    await form.getByLabel(/Maintenance reserve per hour/).fill("25");
    await form.getByLabel(/Engine overhaul cost/).fill("32000");
    const chart = page.getByRole("region", { name: "Rate by hours flown per year" });
    await chart.locator("svg.recharts-surface").first().waitFor();
    await chart.locator(".recharts-line-curve").nth(1).waitFor();
    expect(await chart.locator(".recharts-line-curve").count()).toBe(2);
    // The chart's own positioning is inline style, applied and measured (not blocked): it has a size.
    const sizes = await chart.locator("svg.recharts-surface").evaluateAll((svgs) => svgs.map((s) => s.getBoundingClientRect()).map((r) => [r.width, r.height]));
    const [width, height] = sizes.sort((a, b) => b[0]! * b[1]! - a[0]! * a[1]!)[0] ?? [0, 0];
    expect(width).toBeGreaterThan(200);
    expect(height).toBeGreaterThan(150);
    // The stylesheet applied and the shipped fonts loaded from our own origin.
    expect(await page.evaluate(() => getComputedStyle(document.body).fontFamily)).toMatch(/sans/i);
    await expect.poll(() => page.evaluate(async () => (await document.fonts.ready, [...document.fonts].filter((f) => f.status === "loaded").length))).toBeGreaterThan(0);
    await form.getByRole("button", { name: "Save this calculation" }).click();
    await page.getByRole("status").filter({ hasText: "Rate calculation saved." }).waitFor();
    expect(await violations()).toEqual([]);
    await page.context().close();
  });

  it("the weight-and-balance tool: a GET form and the envelope chart", async () => {
    const page = await newPage("desktop");
    const violations = await watchViolations(page);
    await signIn(page, "member@hangarline.test");
    await page.goto(`/clubs/${CLUB}/tools/weight-balance`, { waitUntil: "networkidle" });
    const choose = page.getByRole("form", { name: "Choose the aircraft" });
    const value = await choose.locator("option", { hasText: "N0527L" }).getAttribute("value");
    await choose.getByLabel("Aircraft").selectOption(value!);
    await choose.getByRole("button", { name: "Use this aircraft" }).click();
    const loading = page.getByRole("form", { name: "Loading" });
    await loading.getByLabel("Front seats (lb)").fill("360");
    await loading.getByLabel("Baggage (lb)").fill("25");
    await loading.getByLabel("Wing tanks (US gal)").fill("36");
    await loading.getByLabel("Planned fuel burn (US gal)").fill("12");
    await loading.getByRole("button", { name: "Work it out" }).click();
    const chart = page.getByRole("figure", { name: "CG envelope chart" });
    await chart.locator(".recharts-scatter-symbol path.recharts-symbols").first().waitFor();
    expect(await chart.locator(".recharts-scatter-symbol path.recharts-symbols").count()).toBe(2);
    expect(await violations()).toEqual([]);
    await page.context().close();
  });
});
