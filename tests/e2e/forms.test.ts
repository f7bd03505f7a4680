import path from "node:path";
import Database from "better-sqlite3";
import { describe, expect, inject, it } from "vitest";
import { FORMS_CLUB, FORMS_REG, formPages, runForms, summarize } from "./form-runs";
import { baseUrl, getBrowser, newPage, signIn } from "./harness";

// Fifty forms in a row, seven kinds, four roles: each gets its own answer (role="status" text, or
// the page its answer sends the browser to) and each stored exactly one record.
describe("fifty forms in a row", () => {
  it("every submission answers, and each record landed once", async () => {
    const pages = await formPages(await getBrowser(), baseUrl);
    const tag = `Row ${Date.now()}`;
    const samples = await runForms(pages, { total: 50, answerTimeoutMs: 20_000, stopOnMissingAnswer: true, tag });
    const missing = samples.filter((s) => !s.answered).map((s) => `#${s.n} ${s.kind}`);
    expect(missing, "submissions that never showed their answer").toEqual([]);
    expect(samples).toHaveLength(50);
    expect(new Set(samples.map((s) => s.kind)).size).toBe(7);

    const db = new Database(path.join(inject("dataDir"), "e2e.db"), { readonly: true, fileMustExist: true });
    try {
      const landed = samples.flatMap((s) => (s.landed ? [{ n: s.n, kind: s.kind, ...s.landed }] : []));
      expect(landed.length).toBeGreaterThan(35);
      for (const l of landed) {
        const row = db.prepare(`SELECT count(*) AS n FROM ${l.table} WHERE ${l.column} = ?${l.where ? ` AND ${l.where}` : ""}`).get(l.value) as { n: number };
        expect(row.n, `#${l.n} ${l.kind}: rows in ${l.table} for ${l.value}`).toBe(1);
      }
      // Every notice issued by the run was lifted by it.
      const open = db.prepare("SELECT count(*) AS n FROM grounding_notices WHERE reason LIKE ? AND lifted_at IS NULL").get(`${tag} notice %`) as { n: number };
      expect(open.n).toBe(0);
    } finally {
      db.close();
    }
    const s = summarize(samples);
    expect(s.unanswered).toBe(0);
    for (const p of Object.values(pages)) await p.context().close();
  }, 600_000); // fifty submissions, each on a freshly loaded page, on a shared 2-core machine
});

describe("a refused submission keeps what was typed", () => {
  it("a refused photo keeps the squawk's description; the photo field is marked, described and focused", async () => {
    const page = await newPage("phone");
    await signIn(page, "pilot2@hangarline.test");
    await page.goto(`${FORMS_CLUB}/flight-line`);
    await page.locator(`article[data-registration="${FORMS_REG}"]`).getByRole("link", { name: FORMS_REG }).click();
    await page.waitForURL(/\/aircraft\/[^/]+$/);
    await page.getByRole("heading", { name: FORMS_REG, level: 1 }).waitFor();
    const form = page.getByRole("form", { name: `Report a squawk on ${FORMS_REG}` });
    const description = `Refused photo test ${Date.now()}: pitot tube bent`;
    await form.getByLabel("What did you find?").fill(description);
    // Called a PNG, but it is text: the server checks the content and refuses it.
    await form.getByLabel("Photos (optional)").setInputFiles({ name: "not-a-photo.png", mimeType: "image/png", buffer: Buffer.from("just some text, not an image") });
    await form.getByRole("button", { name: "Report squawk" }).click();
    const refusal = form.getByRole("status").getByRole("alert");
    await refusal.waitFor();
    expect(await refusal.textContent()).toMatch(/nothing was saved|need attention|photo/i);
    // One message in the status region, not two.
    expect(await form.getByRole("status").count()).toBe(1);
    expect(await form.getByLabel("What did you find?").inputValue()).toBe(description);
    const photos = form.getByLabel("Photos (optional)");
    expect(await photos.getAttribute("aria-invalid")).toBe("true");
    const describedBy = (await photos.getAttribute("aria-describedby")) ?? "";
    expect(describedBy).not.toBe("");
    expect((await page.locator(`#${describedBy.split(" ")[0]}`).textContent()) ?? "").not.toBe("");
    expect(await photos.evaluate((el) => el === document.activeElement)).toBe(true);
    // The button is enabled again (disabled only while waiting) and nothing was stored.
    expect(await form.getByRole("button", { name: "Report squawk" }).isDisabled()).toBe(false);
    await page.goto(page.url());
    expect(await page.locator("li[data-squawk]").filter({ hasText: description }).count()).toBe(0);
    await page.context().close();
  });
});
