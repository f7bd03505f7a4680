import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { expectNoHorizontalOverflow, newPage, screenshot, signIn } from "./harness";

// Our own status mark and due view, instants in the club's words, and touch targets on the phone.
// Uses Reedwater's N0556L (no other browser test relies on it); its notice takes effect in
// 2199, so it never grounds the aircraft for anyone else. No retries, no sleeps.
const CLUB = "/clubs/reedwater";
const REG = "N0556L";
const ANSWER = { timeout: 120_000 };
const STATUS_WORD = /^(Flyable|Flyable with limits|Grounded|Status unknown)$/;
const RAW_INSTANT = /\d{4}-\d{2}-\d{2}T\d{2}:\d{2}/;

async function mainText(page: Page): Promise<string> {
  return (await page.locator("main").innerText()).replace(/\s+/g, " ");
}

/** Every visible target of a kind in a region is at least 44 px tall (WCAG 2.2 SC 2.5.5). */
async function smallTargets(page: Page, selector: string): Promise<string[]> {
  return page.locator(selector).evaluateAll((els) =>
    els
      .filter((el) => {
        const r = el.getBoundingClientRect();
        const style = getComputedStyle(el);
        return r.width > 0 && r.height > 0 && style.visibility !== "hidden" && (el as HTMLInputElement).type !== "hidden";
      })
      .filter((el) => el.getBoundingClientRect().height < 44)
      .map((el) => `${el.tagName.toLowerCase()} "${(el.textContent ?? (el as HTMLInputElement).name ?? "").trim().slice(0, 40)}" ${Math.round(el.getBoundingClientRect().height)} px`),
  );
}

async function openAircraft(page: Page): Promise<void> {
  await page.goto(`${CLUB}/flight-line`, { waitUntil: "networkidle" });
  await page.locator(`article[data-registration="${REG}"]`).getByRole("link", { name: REG }).click();
  await page.waitForURL(/\/aircraft\/[^/]+$/);
  await page.getByRole("heading", { name: REG, level: 1 }).waitFor();
}

describe("our own look on the flight line and the aircraft page", { retry: 0 }, () => {
  it("desktop: one status mark everywhere, the due view in words, the notice time on the club's clock", async () => {
    const page = await newPage("desktop");
    await page.setViewportSize({ width: 1280, height: 800 });
    await signIn(page, "maintenance@hangarline.test");

    await openAircraft(page);
    await page.waitForLoadState("networkidle");
    await page.getByText(`Ground ${REG}`, { exact: true }).click();
    const form = page.getByRole("form", { name: `Ground ${REG}` });
    const reason = `Taxiway resurfacing at the home field ${Date.now()}`;
    await form.getByLabel("Reason").fill(reason);
    await form.getByLabel(/^Effective from/).fill("2199-06-01T08:00");
    await form.getByRole("button", { name: /Issue grounding notice/ }).click();
    await form.getByRole("status").getByText(/Grounding notice issued/).waitFor(ANSWER);

    // The club's clock (America/Chicago) in words, as typed; never the UTC instant.
    await page.goto(`${CLUB}/flight-line`, { waitUntil: "networkidle" });
    const card = page.locator(`article[data-registration="${REG}"]`);
    await card.getByText(`Grounding notice takes effect Sat 1 Jun 2199, 08:00: ${reason}`).waitFor();
    expect(await card.getAttribute("data-status")).not.toBe("grounded");
    expect(await mainText(page)).not.toMatch(RAW_INSTANT);
    const badges = page.locator("article[data-registration] > header [data-status]");
    expect(await badges.count()).toBeGreaterThan(0);
    for (const text of await badges.allInnerTexts()) expect(text.trim()).toMatch(STATUS_WORD);
    await screenshot(page, "look-flight-line-desktop");

    await card.getByRole("link", { name: REG }).click();
    await page.waitForURL(/\/aircraft\/[^/]+$/);
    const due = page.getByRole("group", { name: `Inspection items of ${REG}` });
    await due.getByRole("heading", { name: "Grounds the aircraft when due" }).waitFor();
    expect(await due.locator("table").count()).toBe(0); // cards, not the four-column table
    const items = due.locator("li[data-due-state]");
    expect(await items.count()).toBeGreaterThan(3);
    for (const text of await items.allInnerTexts()) expect(text).toMatch(/left|Due today|Overdue by|Status unknown/);
    await page.getByRole("region", { name: "Grounding notices" }).getByText(/in effect from Sat 1 Jun 2199, 08:00/).waitFor();
    expect(await mainText(page)).not.toMatch(RAW_INSTANT);
    await expect(page.locator("main [data-status]").first().innerText()).resolves.toMatch(STATUS_WORD);
    await screenshot(page, "look-aircraft-desktop");
    await page.locator("#due").screenshot({ path: new URL("../.artifacts/look-due-view-desktop.png", import.meta.url).pathname });
  });

  it("phone: the same marks fit, and every button, control, menu link and list link is at least 44 px tall", async () => {
    const page = await newPage("phone");
    await signIn(page, "maintenance@hangarline.test");
    await page.goto(`${CLUB}/flight-line`, { waitUntil: "networkidle" });
    await page.locator(`article[data-registration="${REG}"] [data-status]`).first().waitFor();
    await expectNoHorizontalOverflow(page);
    expect(await smallTargets(page, "main button, main li > a, main h2 > a, main footer a")).toEqual([]);
    await screenshot(page, "look-flight-line-phone");

    await page.getByText("Menu", { exact: true }).click();
    const nav = page.getByRole("navigation").first();
    await nav.getByRole("link").first().waitFor();
    expect(await smallTargets(page, "header nav a, header summary")).toEqual([]);
    await page.getByText("Close", { exact: true }).click();

    await openAircraft(page);
    await page.getByRole("group", { name: `Inspection items of ${REG}` }).waitFor();
    await expectNoHorizontalOverflow(page);
    // A checkbox's target is its whole label (the box itself is drawn 24 px inside it).
    expect(await smallTargets(page, "main button, main summary, main select, main input:not([type=checkbox]):not([type=radio]), main label:has(> input[type=checkbox]), main textarea, main li > a")).toEqual([]);
    const boxes = await page.locator("main input[type=checkbox]").evaluateAll((els) => els.filter((el) => el.getBoundingClientRect().width > 0).map((el) => Math.round(el.getBoundingClientRect().width)));
    expect(boxes.length).toBeGreaterThan(0);
    expect(boxes.filter((w) => w < 24)).toEqual([]);
    await screenshot(page, "look-aircraft-phone");
    await page.locator("#due").screenshot({ path: new URL("../.artifacts/look-due-view-phone.png", import.meta.url).pathname });
  });
});
