import fs from "node:fs";
import path from "node:path";
import { chromium, type Browser, type Page } from "playwright-core";
import { afterAll, expect, inject } from "vitest";

// What every browser test gets: the running app (demo seed), the fakes, and a Chromium.
export const baseUrl = inject("baseUrl");
export const emailUrl = inject("emailUrl");
export const paymentsUrl = inject("paymentsUrl");
export const DEMO_PASSWORD = "hangar-demo-2026";

export const VIEWPORTS = { desktop: { width: 1280, height: 900 }, phone: { width: 390, height: 844 } } as const;

let browser: Browser | null = null;

export async function getBrowser(): Promise<Browser> {
  browser ??= await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    args: ["--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--disable-quic", "--no-first-run"],
  });
  return browser;
}

afterAll(async () => {
  await browser?.close();
  browser = null;
});

export async function newPage(kind: keyof typeof VIEWPORTS = "desktop"): Promise<Page> {
  const b = await getBrowser();
  const context = await b.newContext({ viewport: VIEWPORTS[kind], baseURL: baseUrl, isMobile: kind === "phone", hasTouch: kind === "phone" });
  const page = await context.newPage();
  page.setDefaultTimeout(40_000); // a loaded 2-core CI machine renders slowly
  return page;
}

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto("/sign-in", { waitUntil: "networkidle" }); // typed before hydration would be lost
  const form = page.getByRole("form", { name: "Sign in with password" });
  await form.getByLabel("E-mail").fill(email);
  await form.getByLabel("Password", { exact: true }).fill(password);
  await form.getByRole("button", { name: "Sign in", exact: true }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
}

/** The page is no wider than the viewport: nothing makes the phone scroll sideways. */
export async function expectNoHorizontalOverflow(page: Page): Promise<void> {
  const { scrollWidth, clientWidth } = await page.evaluate(() => ({ scrollWidth: document.documentElement.scrollWidth, clientWidth: document.documentElement.clientWidth }));
  expect(scrollWidth, "page scrolls sideways").toBeLessThanOrEqual(clientWidth);
}

export async function screenshot(page: Page, name: string): Promise<string> {
  const dir = path.resolve(import.meta.dirname, "../.artifacts");
  fs.mkdirSync(dir, { recursive: true });
  const file = path.join(dir, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}

type FakeMessage = { id: string; to: string[]; subject: string; html: string; text: string | null; createdAt: string };

/** Waits for the newest message to an address in the fake provider (the worker sends every 0.5 s). */
export async function waitForEmail(to: string, match: (m: FakeMessage) => boolean = () => true, timeoutMs = 20_000): Promise<FakeMessage> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const res = await fetch(`${emailUrl}/api/messages?to=${encodeURIComponent(to)}`);
    const body = (await res.json()) as { data: FakeMessage[] };
    const found = body.data.find(match);
    if (found) return found;
    await new Promise((r) => setTimeout(r, 300));
  }
  throw new Error(`No e-mail to ${to} within ${timeoutMs} ms`);
}

export function linksIn(html: string): string[] {
  return [...html.matchAll(/href="([^"]+)"/g)].map((m) => m[1]!.replace(/&amp;/g, "&"));
}
