import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { baseUrl, expectNoHorizontalOverflow, linksIn, newPage, screenshot, signIn, waitForEmail } from "./harness";

async function navLabels(page: import("playwright-core").Page): Promise<string[]> {
  const nav = page.locator("aside").getByRole("navigation", { name: "Club sections" });
  await nav.waitFor();
  return (await nav.getByRole("link").allTextContents()).map((t) => t.trim());
}

describe("signing in and the navigation each role sees", () => {
  it("a member sees the member sections and no officer ones", async () => {
    const page = await newPage("desktop");
    await signIn(page, "member@hangarline.test");
    await page.waitForURL(/\/clubs\/reedwater$/);
    const labels = await navLabels(page);
    expect(labels).toEqual(expect.arrayContaining(["Club home", "Flight line", "Members", "My account"]));
    expect(labels).not.toContain("Money");
    expect(labels).not.toContain("Audit log");
    await page.getByText("The pilot in command decides airworthiness.").first().waitFor();
    await page.context().close();
  });

  it("a treasurer sees the money section", async () => {
    const page = await newPage("desktop");
    await signIn(page, "treasurer@hangarline.test");
    const labels = await navLabels(page);
    expect(labels).toContain("Money");
    expect(labels).not.toContain("Audit log");
    await page.context().close();
  });

  it("an admin sees the audit log and can open the roster", async () => {
    const page = await newPage("desktop");
    await signIn(page, "admin@hangarline.test");
    expect(await navLabels(page)).toEqual(expect.arrayContaining(["Members", "Audit log", "Outbox"]));
    await page.getByRole("navigation", { name: "Club sections" }).getByRole("link", { name: "Members" }).click();
    await page.waitForURL(/\/members/);
    await page.getByRole("table").getByText("Rowan Pike").waitFor();
    await page.context().close();
  });

  it("an operator reaches the console with the association's clubs, counts only", async () => {
    const page = await newPage("desktop");
    await signIn(page, "operator@hangarline.test");
    await page.goto("/operator");
    for (const name of ["Cottonwood Flyers", "Reedwater Flying Society", "Aeroclub Silberau"]) {
      await page.getByRole("heading", { name }).waitFor();
    }
    expect(await page.getByText("rowan", { exact: false }).count()).toBe(0);
    await page.context().close();
  });

  it("someone in two clubs switches between them", async () => {
    const page = await newPage("desktop");
    await signIn(page, "twoclubs@hangarline.test");
    await page.waitForURL(/\/clubs$/);
    await page.getByRole("link", { name: "Reedwater Flying Society" }).click();
    await page.waitForURL(/\/clubs\/reedwater$/);
    await page.locator("aside").getByLabel("Switch club").selectOption("cottonwood-flyers");
    await page.waitForURL(/\/clubs\/cottonwood-flyers$/);
    await page.getByRole("heading", { level: 1, name: "Cottonwood Flyers" }).waitFor();
    await page.context().close();
  });

  it("the home page fits a phone with no sideways scrolling", async () => {
    const page = await newPage("phone");
    await signIn(page, "member@hangarline.test");
    await page.waitForURL(/\/clubs\/reedwater$/);
    // The page streams in behind its loading outline; React reveals it a moment after the load event.
    await page.getByRole("heading", { level: 1 }).waitFor();
    await expectNoHorizontalOverflow(page);
    const file = await screenshot(page, "home-phone");
    expect(fs.statSync(file).size).toBeGreaterThan(10_000);
    await page.getByText("Menu").click();
    await expect(page.getByRole("navigation", { name: "Club sections" }).first().isVisible()).resolves.toBe(true);
    await expectNoHorizontalOverflow(page);
    await page.context().close();
  });

  it("an e-mail link arrives in the outbox and signs in; sign-out ends the session", async () => {
    const page = await newPage("desktop");
    await page.goto("/sign-in", { waitUntil: "networkidle" });
    const form = page.getByRole("form", { name: "Sign in with an e-mail link" });
    await form.getByLabel("E-mail").fill("instructor@hangarline.test");
    const requestedAt = Date.now();
    await form.getByRole("button", { name: "E-mail me a sign-in link" }).click();
    await page.waitForURL(/check-email/);
    const message = await waitForEmail("instructor@hangarline.test", (m) => m.subject.includes("sign-in link") && Date.parse(m.createdAt) >= requestedAt - 1000);
    const link = linksIn(message.html).find((l) => l.includes("/api/auth/callback/email"));
    expect(link).toBeTruthy();
    await page.goto(link!);
    await page.waitForURL(/\/clubs/);
    await page.getByText("Imani Ostrowski").first().waitFor({ state: "attached" });
    await page.locator("aside").getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL(/signedOut=1/);
    await page.goto("/clubs/reedwater");
    await page.waitForURL(/\/sign-in/);
    await page.context().close();
  });

  it("a wrong password gets the same answer as an unknown address", async () => {
    const page = await newPage("desktop");
    await page.goto("/sign-in", { waitUntil: "networkidle" });
    const form = page.getByRole("form", { name: "Sign in with password" });
    await form.getByLabel("E-mail").fill("nobody-here@hangarline.test");
    await form.getByLabel("Password", { exact: true }).fill("whatever-password");
    await form.getByRole("button", { name: "Sign in", exact: true }).click();
    const alert = form.getByRole("status").getByRole("alert");
    await alert.waitFor();
    const unknown = await alert.textContent();
    // Each answer is a new message in the status region: mark this one to wait for the next.
    await alert.evaluate((el) => el.setAttribute("data-seen", ""));
    await form.getByLabel("E-mail").fill("pilot2@hangarline.test");
    await form.getByLabel("Password", { exact: true }).fill("whatever-password");
    await form.getByRole("button", { name: "Sign in", exact: true }).click();
    const next = form.locator("[role=status] [role=alert]:not([data-seen])");
    await next.waitFor();
    const wrong = await next.textContent();
    expect(unknown).toMatch(/do not match an active account/);
    expect(wrong).toBe(unknown);
    await page.context().close();
  });
});

const APP = path.resolve(import.meta.dirname, "../../app");
const FAKE_ID = "00000000-0000-4000-8000-000000000000";

function routesUnder(dir: string, file: string): string[] {
  const out: string[] = [];
  const walk = (d: string) => {
    for (const e of fs.readdirSync(d, { withFileTypes: true })) {
      const p = path.join(d, e.name);
      if (e.isDirectory()) walk(p);
      else if (e.name === file) out.push(path.relative(APP, path.dirname(p)));
    }
  };
  walk(dir);
  return out.map((r) => "/" + r.split(path.sep).filter((s) => !s.startsWith("(")).join("/"));
}

function fill(route: string, slug: string): string {
  return route.replace("[club]", slug).replace(/\[\.\.\.[^\]]+\]/g, "x").replace(/\[[^\]]+\]/g, FAKE_ID);
}

describe("tenant isolation", () => {
  it("a member of one club gets 404 for every page and API route of another club", async () => {
    const pages = routesUnder(path.join(APP, "clubs/[club]"), "page.tsx");
    const apis = routesUnder(path.join(APP, "api/clubs/[club]"), "route.ts");
    expect(pages.length).toBeGreaterThan(3);
    expect(apis.length).toBeGreaterThan(1);
    const page = await newPage("desktop");
    await signIn(page, "member@hangarline.test"); // Reedwater only
    const failures: string[] = [];
    for (const route of pages) {
      const url = fill(route, "cottonwood-flyers");
      const res = await page.request.get(url, { maxRedirects: 0 });
      if (res.status() !== 404) failures.push(`GET ${url} → ${res.status()}`);
    }
    for (const route of apis) {
      const url = fill(route, "cottonwood-flyers");
      for (const method of ["GET", "POST"] as const) {
        // Same-origin JSON, as the app's own pages send it: anything else is refused (403/415) before any handler.
        const res = await page.request.fetch(url, { method, maxRedirects: 0, data: method === "POST" ? "{}" : undefined, headers: { "content-type": "application/json", origin: baseUrl } });
        // 405 means the route has no such method at all, which leaks nothing.
        if (res.status() !== 404 && res.status() !== 405) failures.push(`${method} ${url} → ${res.status()}`);
      }
    }
    // The same routes exist for the member's own club (so the 404s above are not just typos).
    const own = await page.request.get("/clubs/reedwater/members");
    expect(own.status()).toBe(200);
    expect(failures).toEqual([]);
    await page.context().close();
  });
});
