import { describe, expect, it } from "vitest";
import { formatDate, isoDateInTimeZone } from "@/lib/dates";
import { ofxFile, twoAccounts } from "../fixtures/ofx-two-accounts";
import { expectNoHorizontalOverflow, newPage, screenshot, signIn } from "./harness";

// Reedwater's treasurer imports an OFX file holding two accounts (invented), chooses the savings
// account, corrects its closing balance and removes the statement. The period is this month in
// the club's time zone, which no other test locks.
const SLUG = "reedwater";
const BASE = `/clubs/${SLUG}/money/reconciliation`;

function thisMonth(): { start: string; end: string } {
  const today = isoDateInTimeZone(new Date(), "America/Chicago");
  return { start: `${today.slice(0, 7)}-01`, end: today };
}

describe("bank statements: an OFX file with two accounts, corrected and removed", () => {
  it("asks which account to import, imports only that one, corrects its balance and removes it", async () => {
    const { start, end } = thisMonth();
    const fileName = `two-accounts-${Date.now()}.ofx`;
    const page = await newPage("desktop");
    page.on("dialog", (d) => void d.accept());
    await signIn(page, "treasurer@hangarline.test");
    await page.goto(BASE);
    const form = page.getByRole("form", { name: "Import a bank statement" });
    await form.getByLabel("Statement file").setInputFiles({ name: fileName, mimeType: "application/x-ofx", buffer: Buffer.from(ofxFile(twoAccounts(start, end))) });
    await form.getByRole("combobox", { name: "Format" }).selectOption("ofx");
    await form.getByRole("button", { name: "Import and match" }).click();

    // The answer: nothing imported, both accounts listed (masked, type, currency, count, dates).
    const status = form.getByRole("status");
    await expect(status.getByText("This file holds 2 accounts; choose the one to import").waitFor()).resolves.toBeUndefined();
    const checking = form.getByRole("radio", { name: /••••2333/ });
    const savings = form.getByRole("radio", { name: /••••8777/ });
    await expect(form.getByText(/••••2333 · checking · USD · 3 transactions/).count()).resolves.toBe(1);
    await expect(form.getByText(/••••8777 · savings · USD · 2 transactions/).count()).resolves.toBe(1);
    await expect(checking.count()).resolves.toBe(1);
    await expect(page.getByText("000111222333").count()).resolves.toBe(0); // the full number is never shown
    await expect(page.getByRole("link", { name: new RegExp(`^${start} to ${end}$`) }).filter({ hasText: fileName }).count()).resolves.toBe(0);
    await screenshot(page, "bank-ofx-choice-desktop");

    // The file stays chosen: pick the savings account and import it.
    await savings.check();
    await form.getByRole("button", { name: "Import the chosen account" }).click();
    await page.waitForURL(/\/money\/reconciliation\/[0-9a-f-]{36}$/);
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toBe(`Statement ${formatDate(start, "en-US")} to ${formatDate(end, "en-US")}`);
    await expect(page.getByText(`${fileName} · 2 lines`).count()).resolves.toBe(1);
    await expect(page.getByText("INTEREST PAID").count()).resolves.toBeGreaterThan(0);
    await expect(page.getByText("DEPOSIT CLUB DUES BATCH").count()).resolves.toBe(0);

    // A mistyped closing balance corrected: the answer names both figures.
    const correct = page.getByRole("form", { name: "Correct the closing balance" });
    await expect(correct.getByLabel(/^Closing balance as printed/).inputValue()).resolves.toBe("9021.66");
    await correct.getByLabel(/^Closing balance as printed/).fill("9012.66");
    await correct.getByRole("button", { name: "Correct closing balance" }).click();
    await expect(correct.getByRole("status").getByText("Closing balance corrected from $9,021.66 to $9,012.66.").waitFor()).resolves.toBeUndefined();
    await screenshot(page, "bank-statement-edit-desktop");

    // Removed: the answer sends the treasurer to the list, where the statement is gone.
    const remove = page.getByRole("form", { name: "Remove the statement" });
    await remove.getByRole("button", { name: "Remove statement" }).click();
    await page.waitForURL((url) => url.pathname === BASE);
    await page.getByRole("heading", { name: "Statements" }).waitFor();
    await expect(page.getByText(`${fileName} (OFX)`).count()).resolves.toBe(0);
  });

  it("shows the account choice on a phone without sideways scrolling", async () => {
    const { start, end } = thisMonth();
    const phone = await newPage("phone");
    await signIn(phone, "treasurer@hangarline.test");
    await phone.goto(BASE);
    const form = phone.getByRole("form", { name: "Import a bank statement" });
    await form.getByLabel("Statement file").setInputFiles({ name: "two-accounts-phone.ofx", mimeType: "application/x-ofx", buffer: Buffer.from(ofxFile(twoAccounts(start, end))) });
    await form.getByRole("combobox", { name: "Format" }).selectOption("ofx");
    await form.getByRole("button", { name: "Import and match" }).click();
    await expect(form.getByRole("status").getByText("This file holds 2 accounts; choose the one to import").waitFor()).resolves.toBeUndefined();
    await expect(form.getByRole("radio").count()).resolves.toBe(2);
    await form.getByRole("radio", { name: /••••2333/ }).scrollIntoViewIfNeeded();
    await screenshot(phone, "bank-ofx-choice-phone");
    await expectNoHorizontalOverflow(phone);
  });

  it("says why a locked statement can no longer be corrected or removed", async () => {
    // Cottonwood's books are locked through the month before last (demo seed).
    const page = await newPage("phone");
    await signIn(page, "cottonwood.admin@hangarline.test");
    await page.goto("/clubs/cottonwood-flyers/money/reconciliation");
    const lockedRow = page.getByRole("row").filter({ hasText: "Reconciled and locked" }).first();
    const href = await lockedRow.getByRole("link").getAttribute("href");
    expect(href).toMatch(/\/money\/reconciliation\/[0-9a-f-]{36}$/);
    await page.goto(href!);
    await expect(page.getByText(/it can no longer be corrected or removed\.$/).waitFor()).resolves.toBeUndefined();
    await expect(page.getByRole("button", { name: "Remove statement" }).count()).resolves.toBe(0);
    await screenshot(page, "bank-statement-locked-phone");
    await expectNoHorizontalOverflow(page);
  });
});
