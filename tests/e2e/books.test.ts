import path from "node:path";
import { eq } from "drizzle-orm";
import { describe, expect, inject, it } from "vitest";
import { openDatabase } from "@/db/client";
import { bills, clubs } from "@/db/schema";
import { formatDate, isoDateInTimeZone } from "@/lib/dates";
import { expectNoHorizontalOverflow, newPage, screenshot, signIn } from "./harness";

// The treasurer's books in the browser: a bill entered with its category, paid from the bank,
// matched to the bank statement's line, and found in the month's profit and loss. Each attempt
// uses its own vendor and amount, so a retried run never meets the one before it.

describe("the treasurer's books", () => {
  it("enters a bill, pays it, reconciles it and sees it in the month's profit and loss", async () => {
    const db = openDatabase(path.join(inject("dataDir"), "e2e.db"));
    const club = db.select().from(clubs).where(eq(clubs.slug, "reedwater")).get()!;
    db.$client.close();
    const today = isoDateInTimeZone(new Date(), club.timeZone);
    const cents = 100 + Math.floor(Math.random() * 400);
    const amount = `${300 + (cents % 100)}.${String(cents % 100).padStart(2, "0")}`; // 300.00–399.99, under the approval amount
    const vendor = `Tiedown Cooperative ${cents}`;

    const page = await newPage("desktop");
    await signIn(page, "treasurer@hangarline.test");
    await page.goto("/clubs/reedwater/money/bills");
    const enter = page.getByRole("form", { name: "Enter a bill" });
    await enter.getByLabel("Vendor").fill(vendor);
    await enter.getByLabel("Invoice number (optional)").fill(`TD-${cents}`);
    await enter.getByLabel("Category").selectOption({ label: "Hangar and tie-down" });
    await enter.getByLabel(/^Amount/).fill(amount);
    await enter.getByRole("button", { name: "Enter bill" }).click();
    // The form's own answer (the status region is there, empty, before it).
    await enter.getByRole("status").filter({ hasText: `Bill from ${vendor} for $${amount} entered and ready to pay.` }).waitFor();

    const pay = page.getByRole("form", { name: "Pay a bill" });
    await pay.getByLabel("Bill").selectOption({ label: `${vendor} · $${amount} · due ${formatDate(today, "en-US")}` });
    await pay.getByRole("button", { name: "Pay from the bank" }).click();
    await pay.getByRole("status").filter({ hasText: `Paid: $${amount} to ${vendor} from the bank on ${today}.` }).waitFor();

    // The bank's statement shows the payment going out; importing it matches the line to the payment.
    await page.goto("/clubs/reedwater/money/reconciliation");
    const form = page.getByRole("form", { name: "Import a bank statement" });
    const csv = `Date,Description,Amount,Reference\r\n${today},${vendor.toUpperCase()},-${amount},TD-${cents}\r\n`;
    await form.getByLabel("Statement file").setInputFiles({ name: `bank-bill-${cents}.csv`, mimeType: "text/csv", buffer: Buffer.from(csv) });
    await form.getByLabel(/^Closing balance/).fill("0.00");
    await form.getByRole("button", { name: "Import and match" }).click();
    await page.waitForURL(/\/money\/reconciliation\/[0-9a-f-]{36}$/);
    const line = page.getByRole("listitem").filter({ hasText: vendor.toUpperCase() }).first();
    await expect(line.getByText(/Matched: /).first().textContent()).resolves.toMatch(/Matched: (same reference|same amount and date)/);

    // The month's profit and loss lists the expense under its category.
    await page.goto(`/clubs/reedwater/money/reports/profit-and-loss?from=${today.slice(0, 7)}-01&to=${today}`);
    const row = page.getByRole("row").filter({ hasText: "Hangar and tie-down" });
    const text = (await row.textContent()) ?? "";
    expect(text).toMatch(/hangar-tie-down.*Hangar and tie-down/);
    // At least this bill's amount (a retried attempt adds its own bill to the same month).
    expect(Number(text.replace(/^.*\$/, "").replace(/,/g, ""))).toBeGreaterThanOrEqual(Number(amount));
    await screenshot(page, "books-profit-and-loss-desktop");

    // Budget against actual: the treasurer budgets the category for this month in the year grid,
    // and the month's comparison shows the budget beside the actual that includes this bill.
    const year = today.slice(0, 4);
    const mm = today.slice(5, 7);
    const monthShort = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"][Number(mm) - 1]!;
    const budget = `${5000 + cents}.00`;
    const budgetShown = `$${(5000 + cents).toLocaleString("en-US")}.00`;
    await page.goto(`/clubs/reedwater/money/reports/budget?year=${year}&month=${mm}`);
    const grid = page.getByRole("form", { name: `Budget for ${year}` });
    await grid.getByLabel(`Hangar and tie-down, ${monthShort} ${year}`).fill(budget);
    await grid.getByRole("button", { name: "Save budget" }).click();
    await grid.getByRole("status").filter({ hasText: `Budget for ${year} saved: 1 month changed.` }).waitFor();
    // The page's tables follow the answer (refreshed after it): the month's row carries the new budget.
    const monthTable = page.getByRole("table", { name: new RegExp(`^${monthShort} ${year}: budget against actual`) });
    const budgetRow = monthTable.getByRole("row").filter({ hasText: "Hangar and tie-down" }).filter({ hasText: budgetShown });
    await budgetRow.waitFor();
    const cells = await budgetRow.getByRole("cell").allTextContents();
    expect(cells[1]).toBe(budgetShown);
    expect(Number(cells[2]!.replace(/[$,]/g, ""))).toBeGreaterThanOrEqual(Number(amount)); // the actual includes this bill
    expect(cells[3]).toMatch(/(favourable|unfavourable|on budget)$/);
    await screenshot(page, "books-budget-desktop");

    // A recurring bill: saved, then its due bill entered once.
    await page.goto("/clubs/reedwater/money/bills/recurring");
    const recurring = page.getByRole("form", { name: "Add a recurring bill" });
    const lease = `Cove Hangar Trust ${cents}`;
    await recurring.getByLabel("Vendor").fill(lease);
    await recurring.getByLabel("Category").selectOption({ label: "Hangar and tie-down" });
    await recurring.getByLabel(/^Amount each time/).fill("125.00");
    await recurring.getByLabel("How often").selectOption({ label: "Every month" });
    await recurring.getByRole("button", { name: "Save recurring bill" }).click();
    await recurring.getByRole("status").filter({ hasText: `Recurring bill saved: ${lease}, $125.00, every month from ${today}.` }).waitFor();
    const produce = page.getByRole("form", { name: "Enter due bills" });
    await produce.getByRole("button", { name: "Enter the bills due" }).click();
    const produced = await produce.getByRole("status").filter({ hasText: /bills? entered|nothing was entered/ }).textContent();
    // The server's scheduled tick (every minute) enters due bills too, through the same path: if it
    // came first, the button finds nothing left. Either way this month is billed exactly once.
    if (!/nothing was entered/.test(produced!)) expect(produced).toContain(`${lease} ${today.slice(0, 7)}`);
    const books = openDatabase(path.join(inject("dataDir"), "e2e.db"));
    const leaseBills = books.select({ periodKey: bills.periodKey }).from(bills).where(eq(bills.vendor, lease)).all();
    books.$client.close();
    expect(leaseBills).toEqual([{ periodKey: today.slice(0, 7) }]);
    await screenshot(page, "books-recurring-desktop");

    await page.goto("/clubs/reedwater/money/reports/year-end");
    await page.getByRole("table", { name: /The closing entry, dated Dec 31, \d{4}/ }).waitFor(); // the club's locale (en-US)
    await screenshot(page, "books-year-end-desktop");

    const phone = await newPage("phone");
    await signIn(phone, "treasurer@hangarline.test");
    for (const [path_, name] of [[`/money/reports/budget?year=${year}&month=${mm}`, "budget"], ["/money/bills/recurring", "recurring"], ["/money/reports/year-end", "year-end"]] as const) {
      await phone.goto(`/clubs/reedwater${path_}`);
      await phone.getByRole("heading", { level: 1 }).waitFor();
      await expectNoHorizontalOverflow(phone);
      await screenshot(phone, `books-${name}-phone`);
    }
  });
});
