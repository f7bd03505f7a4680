// Ramp mode on a phone: installable, the ramp pages kept by the service worker, and a squawk made
// with no signal kept on the device and sent exactly once when the signal returns. Uses Aeroclub
// Silberau's D-0SLB, which no other browser test relies on; every description is unique to the run.
import path from "node:path";
import Database from "better-sqlite3";
import type { Page } from "playwright-core";
import sharp from "sharp";
import { describe, expect, inject, it } from "vitest";
import { baseUrl, newPage, screenshot, signIn } from "./harness";

const CLUB = "/clubs/aeroclub-silberau";
const REG = "D-0SLB";
const PILOT = "silberau.pilot@hangarline.test";
const PAGES_CACHE = "hangarline-ramp-pages"; // lib/ramp/pages.ts RAMP_PAGES_CACHE

function readDb<T>(read: (db: Database.Database) => T): T {
  const db = new Database(path.join(inject("dataDir"), "e2e.db"), { readonly: true, fileMustExist: true });
  try {
    return read(db);
  } finally {
    db.close();
  }
}

/** A small real photo, made here. */
function photo(): Promise<Buffer> {
  return sharp({ create: { width: 32, height: 24, channels: 3, background: { r: 120, g: 96, b: 64 } } }).jpeg().toBuffer();
}

async function workerInControl(page: Page): Promise<void> {
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null);
}

/** The worker has kept this page (asked by the page itself once it is shown). */
async function kept(page: Page, pathname: string): Promise<void> {
  await expect
    .poll(() => page.evaluate(async ([cache, url]) => Boolean(await (await caches.open(cache!)).match(url!)), [PAGES_CACHE, `${baseUrl}${pathname}`]), { timeout: 40_000, interval: 200 })
    .toBe(true);
}

describe("ramp mode", () => {
  it("installs: a manifest with our name and colours, icons and a worker served by the app itself", async () => {
    const res = await fetch(`${baseUrl}/manifest.webmanifest`);
    expect(res.status).toBe(200);
    const manifest = (await res.json()) as { name: string; display: string; start_url: string; theme_color: string; icons: { src: string; sizes: string; purpose: string }[] };
    expect(manifest).toMatchObject({ name: "Hangarline", display: "standalone", start_url: "/clubs", theme_color: "#1f4e5f" });
    expect(manifest.icons.map((i) => `${i.sizes} ${i.purpose}`)).toEqual(expect.arrayContaining(["192x192 any", "512x512 any", "512x512 maskable"]));
    for (const icon of manifest.icons) {
      const file = await fetch(`${baseUrl}${icon.src}`);
      expect(file.status, icon.src).toBe(200);
      expect(icon.src.startsWith("/"), "served by us").toBe(true);
    }
    const apple = await fetch(`${baseUrl}/sign-in`).then((r) => r.text());
    expect(apple).toMatch(/<link rel="apple-touch-icon" href="\/apple-icon\.png/);
    expect(apple).toMatch(/<link rel="manifest" href="\/manifest\.webmanifest"/);

    const sw = await fetch(`${baseUrl}/sw.js`);
    expect(sw.status).toBe(200);
    expect(sw.headers.get("content-type")).toMatch(/javascript/);
    const csp = sw.headers.get("content-security-policy") ?? "";
    expect(csp).toContain("script-src 'self'");
    expect(csp).not.toContain("nonce-");
    expect(csp.split(",").length, "one policy").toBe(1);
  });

  it("a squawk with a photo made with no signal waits on the phone, then lands once when the signal returns", async () => {
    const page = await newPage("phone");
    const context = page.context();
    await signIn(page, PILOT);
    await page.goto(`${CLUB}/flight-line`);
    await workerInControl(page);
    await page.locator(`article[data-registration="${REG}"]`).getByRole("link", { name: REG }).click();
    await page.waitForURL(/\/aircraft\/[^/?]+$/);
    await page.getByRole("heading", { name: REG, level: 1 }).waitFor();
    const aircraftPath = new URL(page.url()).pathname;
    await kept(page, aircraftPath);

    await context.setOffline(true);
    await page.waitForFunction(() => navigator.onLine === false);
    const description = `Rudder cable chafing at the fairlead ${Date.now()}`;
    const form = page.getByRole("form", { name: `Report a squawk on ${REG}` });
    await form.getByLabel("What did you find?").fill(description);
    await form.getByLabel("Photos (optional)").setInputFiles({ name: "fairlead.jpg", mimeType: "image/jpeg", buffer: await photo() });
    await form.getByRole("button", { name: "Report squawk" }).click();

    const waiting = page.getByRole("status").filter({ hasText: "1 squawk not sent yet — it will be sent when you have signal." });
    await waiting.waitFor();
    const stored = await page.evaluate(
      () =>
        new Promise<{ count: number; photoBytes: number; key: string }>((resolve, reject) => {
          const open = indexedDB.open("hangarline-ramp");
          open.onerror = () => reject(open.error);
          open.onsuccess = () => {
            const all = open.result.transaction("queue").objectStore("queue").getAll();
            all.onsuccess = () => {
              const rows = all.result as { id: string; fields: { name: string; kind: string; blob?: Blob }[] }[];
              const file = rows[0]?.fields.find((f) => f.kind === "file" && f.name === "photos");
              resolve({ count: rows.length, photoBytes: file?.blob?.size ?? 0, key: rows[0]?.id ?? "" });
            };
          };
        }),
    );
    expect(stored.count).toBe(1);
    expect(stored.photoBytes).toBeGreaterThan(0); // the photo itself is on the device, as a Blob
    expect(stored.key).toMatch(/^[0-9a-f-]{36}$/); // with the form's idempotency key
    expect(readDb((db) => db.prepare("SELECT count(*) AS n FROM squawks WHERE description = ?").get(description) as { n: number }).n).toBe(0);
    await screenshot(page, "ramp-squawk-not-sent-yet-phone");
    // As the phone shows it: the form's answer and the waiting count at the foot of the screen.
    await form.getByRole("button", { name: "Report squawk" }).scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.resolve(import.meta.dirname, "../.artifacts/ramp-squawk-not-sent-yet-phone-viewport.png") });

    await context.setOffline(false);
    await page.getByRole("status").filter({ hasText: `Squawk sent: “${description}”` }).waitFor();
    await page.getByRole("status").filter({ hasText: "not sent yet" }).waitFor({ state: "detached" });

    const rows = readDb((db) => db.prepare("SELECT id FROM squawks WHERE description = ?").all(description) as { id: string }[]);
    expect(rows).toHaveLength(1);
    const photos = readDb((db) => db.prepare("SELECT count(*) AS n FROM uploads WHERE subject_id = ?").get(rows[0]!.id) as { n: number }).n;
    expect(photos).toBe(1);
    // The queue on the device is empty: nothing is left to send a second time.
    expect(await page.evaluate(() => new Promise<number>((resolve) => {
      const open = indexedDB.open("hangarline-ramp");
      open.onsuccess = () => {
        const c = open.result.transaction("queue").objectStore("queue").count();
        c.onsuccess = () => resolve(c.result);
      };
    }))).toBe(0);

    await page.goto(aircraftPath);
    await page.getByRole("listitem").filter({ hasText: description }).first().waitFor();
    await page.context().close();
  });

  it("a kept squawk the server refuses when the signal returns is shown with the reason, kept until dismissed, and written nowhere", async () => {
    const page = await newPage("phone");
    const context = page.context();
    await signIn(page, PILOT);
    await page.goto(`${CLUB}/flight-line`);
    await page.locator(`article[data-registration="${REG}"]`).getByRole("link", { name: REG }).click();
    await page.waitForURL(/\/aircraft\/[^/?]+$/);
    const form = page.getByRole("form", { name: `Report a squawk on ${REG}` });
    await form.getByLabel("What did you find?").waitFor();

    await context.setOffline(true);
    await page.waitForFunction(() => navigator.onLine === false);
    // The aircraft is gone by the time it is sent (here: an id no club has), which only the server can know.
    await form.locator("input[name=aircraftId]").evaluate((el) => ((el as HTMLInputElement).value = "00000000-0000-4000-8000-000000000000"));
    const description = `Nav light lens cracked, left wing ${Date.now()}`;
    await form.getByLabel("What did you find?").fill(description);
    await form.getByRole("button", { name: "Report squawk" }).click();
    await page.getByRole("status").filter({ hasText: "1 squawk not sent yet" }).waitFor();

    await context.setOffline(false);
    const refusal = page.getByRole("status").filter({ hasText: `Squawk “${description}” was not accepted: That aircraft was not found in this club.` });
    await refusal.waitFor();
    await page.reload();
    await refusal.waitFor(); // still there after a reload: kept on the device, not dropped
    await expect(page.getByRole("status").filter({ hasText: "not sent yet" }).count()).resolves.toBe(0); // and not sent again
    await refusal.getByRole("button", { name: "Dismiss" }).click();
    await refusal.waitFor({ state: "detached" });
    expect(readDb((db) => db.prepare("SELECT count(*) AS n FROM squawks WHERE description = ?").get(description) as { n: number }).n).toBe(0);
    await page.context().close();
  });

  it("with the worker in control and no signal, the kept flight line opens; a page never kept says so; signing out forgets what was kept", async () => {
    const page = await newPage("phone");
    const context = page.context();
    await signIn(page, PILOT);
    await page.goto(`${CLUB}/flight-line`);
    await workerInControl(page);
    await kept(page, `${CLUB}/flight-line`);

    await context.setOffline(true);
    // A page never kept: the worker's own fetch fails too (so what follows cannot come from the network).
    await page.goto(`${CLUB}/money`);
    await page.getByRole("heading", { name: "No signal, and this page is not kept on this phone" }).waitFor();
    // The kept flight line opens, with its status words and the caution.
    const res = await page.goto(`${CLUB}/flight-line`);
    expect(res?.fromServiceWorker()).toBe(true);
    await page.locator(`article[data-registration="${REG}"]`).waitFor();
    expect(await page.locator(`article[data-registration="${REG}"] [data-status]`).first().textContent()).toMatch(/Flyable|Flyable with limits|Grounded|Status unknown/);
    await page.getByRole("note", { name: "Airworthiness caution" }).waitFor();

    await context.setOffline(false);
    await page.goto(`${CLUB}/flight-line`);
    await workerInControl(page);
    await page.getByText("Menu", { exact: true }).click();
    await page.getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL(/\/sign-in/);
    await expect.poll(() => page.evaluate(async ([cache]) => (await (await caches.open(cache!)).keys()).length, [PAGES_CACHE]), { timeout: 20_000, interval: 200 }).toBe(0);
    await page.context().close();
  });
});
