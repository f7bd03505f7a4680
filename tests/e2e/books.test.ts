import path from "node:path";
import { eq } from "drizzle-orm";
import { describe, expect, inject, it } from "vitest";
import { openDatabase } from "@/db/client";
import { clubs } from "@/db/schema";
import { isoDateInTimeZone } from "@/lib/dates";
import { newPage, screenshot, signIn } from "./harness";

// The treasurer's books in the browser: a bill entered with its category, paid from the bank,
// matched to the bank statement's line, and found in the month's profit and loss. Each attempt
// uses its own vendor and amount, so a retried run never meets the one before it.

describe("the treasurer's books", () => {
  it("enters a bill, pays it, reconciles it and sees it in the month's profit and loss", async () => {
    const db = openDatabase(path.join(inject("dataDir"), "e2e.db"));
    const club = db.select().from(clubs).where(eq(clubs.slug, "lakeshore-aero")).get()!;
    db.$client.close();
    const today = isoDateInTimeZone(new Date(), club.timeZone);
    const cents = 100 + Math.floor(Math.random() * 400);
    const amount = `${300 + (cents % 100)}.${String(cents % 100).padStart(2, "0")}`; // 300.00–399.99, under the approval amount
    const vendor = `Tiedown Cooperative ${cents}`;

    const page = await newPage("desktop");
    await signIn(page, "treasurer@hangarline.test");
    await page.goto("/clubs/lakeshore-aero/money/bills");
    const enter = page.getByRole("form", { name: "Enter a bill" });
    await enter.getByLabel("Vendor").fill(vendor);
    await enter.getByLabel("Invoice number (optional)").fill(`TD-${cents}`);
    await enter.getByLabel("Category").selectOption({ label: "Hangar and tie-down" });
    await enter.getByLabel(/^Amount/).fill(amount);
    await enter.getByRole("button", { name: "Enter bill" }).click();
    // The form's own answer (the status region is there, empty, before it).
    await enter.getByRole("status").filter({ hasText: `Bill from ${vendor} for $${amount} entered and ready to pay.` }).waitFor();

    const pay = page.getByRole("form", { name: "Pay a bill" });
    await pay.getByLabel("Bill").selectOption({ label: `${vendor} · $${amount} · due ${today}` });
    await pay.getByRole("button", { name: "Pay from the bank" }).click();
    await pay.getByRole("status").filter({ hasText: `Paid: $${amount} to ${vendor} from the bank on ${today}.` }).waitFor();

    // The bank's statement shows the payment going out; importing it matches the line to the payment.
    await page.goto("/clubs/lakeshore-aero/money/reconciliation");
    const form = page.getByRole("form", { name: "Import a bank statement" });
    const csv = `Date,Description,Amount,Reference\r\n${today},${vendor.toUpperCase()},-${amount},TD-${cents}\r\n`;
    await form.getByLabel("Statement file").setInputFiles({ name: `bank-bill-${cents}.csv`, mimeType: "text/csv", buffer: Buffer.from(csv) });
    await form.getByLabel(/^Closing balance/).fill("0.00");
    await form.getByRole("button", { name: "Import and match" }).click();
    await page.waitForURL(/\/money\/reconciliation\/[0-9a-f-]{36}$/);
    const line = page.getByRole("listitem").filter({ hasText: vendor.toUpperCase() }).first();
    await expect(line.getByText(/Matched: /).first().textContent()).resolves.toMatch(/Matched: (same reference|same amount and date)/);

    // The month's profit and loss lists the expense under its category.
    await page.goto(`/clubs/lakeshore-aero/money/reports/profit-and-loss?from=${today.slice(0, 7)}-01&to=${today}`);
    const row = page.getByRole("row").filter({ hasText: "Hangar and tie-down" });
    const text = (await row.textContent()) ?? "";
    expect(text).toMatch(/hangar-tie-down.*Hangar and tie-down/);
    // At least this bill's amount (a retried attempt adds its own bill to the same month).
    expect(Number(text.replace(/^.*\$/, "").replace(/,/g, ""))).toBeGreaterThanOrEqual(Number(amount));
    await screenshot(page, "books-profit-and-loss-desktop");
  });
});
