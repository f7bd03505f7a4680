import path from "node:path";
import { eq } from "drizzle-orm";
import { describe, expect, inject, it } from "vitest";
import { openDatabase } from "@/db/client";
import { clubs } from "@/db/schema";
import { demoBankStatement } from "@/db/seed/money";
import { formatDate, isoDateInTimeZone } from "@/lib/dates";
import { monthOf, shiftMonthKey } from "@/lib/money/months";
import { minorToDecimalString } from "@/lib/money";
import { expectNoHorizontalOverflow, newPage, paymentsUrl, screenshot, signIn } from "./harness";

// Money in the browser. Accounts used only here: Aeroclub Silberau's pilot pays (in euros), and
// Cottonwood's treasurer reconciles last month (its books are locked through the month before).
// Card numbers are the provider's published test cards (from memory of its testing documentation).

describe("money in the browser", () => {
  it("a member pays their balance through the hosted page and sees it at zero", async () => {
    const page = await newPage("desktop");
    await signIn(page, "silberau.pilot@hangarline.test");
    await page.goto("/clubs/aeroclub-silberau/account");
    const before = (await page.getByTestId("account-balance").textContent()) ?? "";
    // The euro club's locale is de-DE (migration 0026): amounts read "2.893,06 €" (CLDR de, ECMA-402 Intl.NumberFormat).
    expect(before).toMatch(/^[1-9][\d.]*,\d{2}\u00a0€$/);
    await page.getByRole("button", { name: /^Pay .* by card$/ }).click();
    await page.waitForURL((url) => url.href.startsWith(`${paymentsUrl}/pay/`));

    // A declined card first: the page says so and nothing is posted.
    const fill = async (card: string) => {
      await page.getByLabel("Card number").fill(card);
      await page.getByLabel("Expiry (MM/YY)").fill("12/34");
      await page.getByLabel("Security code").fill("123");
      await page.getByLabel("Name on card").fill("Carla Weidenfels");
      await page.getByRole("button", { name: /^Pay / }).click();
    };
    await fill("4000 0000 0000 0002");
    await expect(page.getByRole("alert").textContent()).resolves.toMatch(/declined/i);
    await fill("4242 4242 4242 4242");
    await page.waitForURL(/\/clubs\/aeroclub-silberau\/account\/paid\?session=/);
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toBe("Thank you: payment received");
    await expect(page.getByTestId("balance-after").textContent()).resolves.toBe("0,00\u00a0€");
    await screenshot(page, "money-paid-desktop");

    await page.goto("/clubs/aeroclub-silberau/account");
    await expect(page.getByTestId("account-balance").textContent()).resolves.toBe("0,00\u00a0€");
    await expect(page.getByText("Nothing to pay right now.").count()).resolves.toBe(1);
    const phone = await newPage("phone");
    await signIn(phone, "silberau.pilot@hangarline.test");
    await phone.goto("/clubs/aeroclub-silberau/account");
    await expectNoHorizontalOverflow(phone);
  });

  it("the treasurer imports last month's bank statement and reconciles the month", async () => {
    // The bank's export for last month, built from the books the seed wrote (what the bank saw).
    const db = openDatabase(path.join(inject("dataDir"), "e2e.db"));
    const club = db.select().from(clubs).where(eq(clubs.slug, "cottonwood-flyers")).get()!;
    const month = shiftMonthKey(monthOf(isoDateInTimeZone(new Date(), club.timeZone)), -1);
    const statement = demoBankStatement(db, club.id, month);
    db.$client.close();

    const page = await newPage("desktop");
    page.on("dialog", (d) => void d.accept());
    await signIn(page, "cottonwood.admin@hangarline.test");
    await page.goto("/clubs/cottonwood-flyers/money/reconciliation");
    const form = page.getByRole("form", { name: "Import a bank statement" });
    await form.getByLabel("Statement file").setInputFiles({ name: `bank-${month}.csv`, mimeType: "text/csv", buffer: Buffer.from(statement.csv) });
    await form.getByLabel(/^Closing balance/).fill(minorToDecimalString(statement.closingMinor, 2));
    await form.getByRole("button", { name: "Import and match" }).click();
    await page.waitForURL(/\/money\/reconciliation\/[0-9a-f-]{36}$/);
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toBe(`Statement ${formatDate(statement.periodStart, "en-US")} to ${formatDate(statement.periodEnd, "en-US")}`);

    // The bank's fee is not in the books yet: post it from the statement line.
    const fee = page.getByRole("listitem").filter({ hasText: "ACCOUNT MAINTENANCE FEE" }).first();
    await fee.getByText("Not in the books: post it…").click();
    // No account is chosen for the treasurer: the item goes where they say.
    await fee.getByRole("combobox", { name: /^Account/ }).selectOption({ label: "Bank fees" });
    await fee.getByRole("button", { name: "Post to the books" }).click();
    await expect(page.getByText("The two sides agree.").waitFor()).resolves.toBeUndefined();
    await page.getByRole("button", { name: "Lock this period" }).click();
    await expect(page.getByText(`Reconciled and locked through ${formatDate(statement.periodEnd, "en-US")}.`).waitFor()).resolves.toBeUndefined();
    await screenshot(page, "money-reconciled-desktop");

    await page.goto("/clubs/cottonwood-flyers/money/reconciliation");
    await expect(page.getByText(`The books are locked through ${statement.periodEnd}`).count()).resolves.toBe(1);
    const phone = await newPage("phone");
    await signIn(phone, "cottonwood.admin@hangarline.test");
    await phone.goto(page.url());
    await expectNoHorizontalOverflow(phone);
  });

  it("the treasurer's tables sort, filter and stay inside a phone's width", async () => {
    const page = await newPage("phone");
    await signIn(page, "cottonwood.admin@hangarline.test");
    await page.goto("/clubs/cottonwood-flyers/money/journal");
    const table = page.getByRole("table", { name: "Journal entries" });
    await page.getByLabel("Kind").selectOption("dues");
    await page.waitForURL(/kind=dues/);
    const kinds = await table.locator("tbody tr td:nth-child(2)").allTextContents();
    expect(kinds.length).toBeGreaterThan(0);
    expect(new Set(kinds)).toEqual(new Set(["Dues"]));
    // Amounts sort largest first on the first click.
    await table.getByRole("button", { name: /Entry total/ }).click();
    await page.waitForURL(/sort=-amountMinor/);
    const totals = (await table.locator("tbody tr td:nth-child(6)").allTextContents()).map((t) => Number(t.replace(/[^0-9.]/g, "")));
    expect(totals.length).toBeGreaterThan(1);
    expect(totals).toEqual([...totals].sort((a, b) => b - a));
    await expectNoHorizontalOverflow(page);
    for (const p of ["", "/balances", "/ageing", "/billing", "/rates"]) {
      await page.goto(`/clubs/cottonwood-flyers/money${p}`);
      await expectNoHorizontalOverflow(page);
    }
  });
});
