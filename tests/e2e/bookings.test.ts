import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { expectNoHorizontalOverflow, newPage, screenshot, signIn } from "./harness";

// A member on a phone: book an aircraft, work out weight and balance (the envelope chart with
// both points), record a preflight with a finding that becomes a squawk, begin the flight, close the flight sheet.
// Uses the seeded N0527L in the Reedwater club, far enough ahead not to meet the seeded bookings.

const PNG = Buffer.from("iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==", "base64");

function localDay(daysAhead: number, timeZone: string): string {
  return new Intl.DateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" }).format(new Date(Date.now() + daysAhead * 86_400_000));
}

async function tickWarningsAndRetry(page: Page, button: string) {
  // Guard warnings (currency, arrears) depend on the demo records of the day: read and tick
  // each one shown, then book again. Refusals would stop the test here, with their reasons.
  const boxes = page.getByRole("group", { name: "Warnings to read" }).getByRole("checkbox");
  if ((await boxes.count()) > 0) {
    for (const box of await boxes.all()) await box.check();
    await page.getByRole("button", { name: button, exact: true }).click();
  }
}

describe("the booking page on a desktop", () => {
  it("lists each aircraft's days with free windows in words and a Book link", async () => {
    const page = await newPage("desktop");
    try {
      await signIn(page, "member@hangarline.test");
      await page.goto("/clubs/reedwater/bookings?days=7", { waitUntil: "networkidle" });
      await page.locator('section[data-aircraft="N0527L"]').getByRole("heading", { name: "N0527L", exact: true }).waitFor();
      await page.getByRole("link", { name: /^Book N0527L .* from \d\d:\d\d$/ }).first().waitFor();
      await expectNoHorizontalOverflow(page);
      await screenshot(page, "bookings-page-desktop");
    } catch (error) {
      await screenshot(page, "bookings-page-failure-desktop");
      throw error;
    }
    await page.context().close();
  });
});

describe("a grounded aircraft on the booking page", () => {
  // The seeded N0512L carries a squawk triaged as grounding (no other browser test touches it).
  it("shows its status word and grounding reason in place of Book links, on a desktop and a phone", async () => {
    for (const kind of ["desktop", "phone"] as const) {
      const page = await newPage(kind);
      if (kind === "desktop") await page.setViewportSize({ width: 1280, height: 800 });
      try {
        await signIn(page, "member@hangarline.test");
        await page.goto("/clubs/reedwater/bookings?days=3", { waitUntil: "networkidle" });
        const card = page.locator('section[data-aircraft="N0512L"]');
        await card.getByRole("heading", { name: "N0512L", exact: true }).waitFor();
        expect(await card.locator("[data-status]").first().getAttribute("data-status")).toBe("grounded");
        const note = (await card.locator('[data-status-note="grounded"]').innerText()).replace(/\s+/g, " ").trim();
        expect(note).toMatch(/^Grounded — /);
        expect(note).toContain("Grounding squawk: Right brake fades and the pedal sinks; fluid on the right wheel fairing");
        expect(note).toMatch(/\. Booking opens when maintenance returns it to service\.$/);
        // No "Book" link anywhere on its card: each free window names the status instead.
        expect(await card.getByRole("link", { name: /^Book\b/ }).count()).toBe(0);
        const free = card.locator("li[data-free]");
        const windows = await free.count();
        expect(windows).toBeGreaterThan(0);
        expect(await free.getByText("Grounded — no booking", { exact: true }).count()).toBe(windows);
        // An aircraft that may fly keeps its links.
        expect(await page.locator('section[data-aircraft="N0527L"]').getByRole("link", { name: /^Book N0527L / }).count()).toBeGreaterThan(0);
        await expectNoHorizontalOverflow(page);
        await card.scrollIntoViewIfNeeded();
        await screenshot(page, `bookings-grounded-${kind}`);
        await card.screenshot({ path: new URL(`../.artifacts/bookings-grounded-card-${kind}.png`, import.meta.url).pathname });
      } catch (error) {
        await screenshot(page, `bookings-grounded-failure-${kind}`);
        throw error;
      }
      await page.context().close();
    }
  });
});

describe("bookings on a phone", () => {
  it("book → weight and balance with the envelope → preflight with a finding → begin flight → flight sheet", async () => {
    const page = await newPage("phone");
    try {
      await flow(page);
    } catch (error) {
      await screenshot(page, "bookings-failure-phone");
      throw error;
    }
    await page.context().close();
  });
});

async function flow(page: Page) {
  await signIn(page, "member@hangarline.test");

  // The booking page: each aircraft with its status and its days; book from a free window.
  // BOOKINGS_E2E_DAYS moves the day when rerunning against a database kept from an earlier run.
  // A retried run books another day, so it never meets its own earlier booking.
  const day = localDay(Number(process.env.BOOKINGS_E2E_DAYS ?? 11 + Math.floor(Math.random() * 40)), "America/Chicago");
  await page.goto(`/clubs/reedwater/bookings?from=${day}&days=3`, { waitUntil: "networkidle" });
  await page.getByRole("heading", { name: "Bookings", exact: true }).waitFor();
  await page.getByText("The pilot in command decides airworthiness.").first().waitFor();
  const card = page.locator('section[data-aircraft="N0527L"]');
  await card.getByRole("heading", { name: "N0527L", exact: true }).waitFor();
  // Status beside the aircraft, in the status component's words and shape.
  expect(await card.locator("[data-status]").first().getAttribute("data-status")).toMatch(/^(flyable|limited|grounded|unknown)$/);
  await expectNoHorizontalOverflow(page);
  await screenshot(page, "bookings-page-phone");
  const dayItem = card.locator(`li[data-day="${day}"]`);
  const freeLine = dayItem.locator("li[data-free]").first();
  const freeText = (await freeLine.innerText()).split("\n")[0]!;
  expect(freeText).toMatch(/Free \d\d:\d\d–\d\d:\d\d/);
  const book = freeLine.getByRole("link", { name: /^Book N0527L .* from \d\d:\d\d$/ });
  // A touch target of at least 44 px.
  expect((await book.boundingBox())!.height).toBeGreaterThanOrEqual(44);
  const from = /from (\d\d:\d\d)$/.exec((await book.getAttribute("aria-label"))!)![1]!;
  await book.click();
  await page.waitForURL(/\/bookings\/new\?/);
  const form = page.getByRole("form", { name: "Book an aircraft" });
  const plane = await form.locator("select[name=aircraftId] option", { hasText: "N0527L" }).getAttribute("value");
  // The form opens filled in from the free window.
  expect(await form.getByLabel("Aircraft").inputValue()).toBe(plane);
  expect(await form.getByLabel("Start (club time)").inputValue()).toBe(`${day}T${from}`);
  await form.getByLabel("Instructor").selectOption({ label: "Imani Ostrowski" });
  await form.getByLabel("Purpose (optional)").fill("Phone test: pattern work");
  await form.getByRole("button", { name: "Book", exact: true }).click();
  await Promise.race([page.waitForURL(/\/bookings\/[\w-]{36}$/, { timeout: 15_000 }), page.getByRole("group", { name: "Warnings to read" }).waitFor({ timeout: 15_000 })]).catch(() => undefined);
  if (!/\/bookings\/[\w-]{36}$/.test(page.url())) {
    await tickWarningsAndRetry(page, "Book");
    await page.waitForURL(/\/bookings\/[\w-]{36}$/);
  }
  const bookingUrl = page.url();
  await page.getByRole("heading", { name: /^N0527L · / }).waitFor();
  await expectNoHorizontalOverflow(page);

  // Back on the booking page, the booking is listed in words where the free time was.
  await page.goto(`/clubs/reedwater/bookings?from=${day}&days=3`, { waitUntil: "networkidle" });
  await card.locator(`li[data-day="${day}"]`).getByRole("link", { name: new RegExp(`^${from}–\\d\\d:\\d\\d · Rowan Pike with Imani Ostrowski \\(you\\)$`) }).waitFor();
  await page.goto(bookingUrl, { waitUntil: "networkidle" });

  // Weight and balance, saved with the booking, drawn on the envelope.
  await page.getByRole("link", { name: "Work out weight and balance" }).click();
  await page.waitForURL(/\/weight-balance$/);
  const wb = page.getByRole("form", { name: "Weight and balance" });
  await wb.getByLabel("Front seats (lb)").fill("360");
  await wb.getByLabel("Baggage (lb)").fill("25");
  await wb.getByLabel("Wing tanks (US gal)").fill("36");
  await wb.getByLabel("Planned fuel burn (US gal)").fill("12");
  await wb.getByRole("button", { name: "Work out and save" }).click();
  await page.getByText("Saved: within the envelope and every limit at takeoff and at landing.").first().waitFor();
  await page.getByText("● Within limits at takeoff").waitFor();
  await page.getByText("● Within limits at landing").waitFor();
  const chart = page.getByRole("figure", { name: "CG envelope chart" });
  await chart.waitFor();
  // One drawn symbol for takeoff (a circle) and one for landing (a triangle), on the outline.
  await chart.locator(".recharts-scatter-symbol path.recharts-symbols").first().waitFor();
  expect(await chart.locator(".recharts-scatter-symbol path.recharts-symbols").count()).toBe(2);
  expect(await chart.locator(".recharts-scatter-line path, .recharts-scatter-line").count()).toBeGreaterThanOrEqual(1);
  // Our arithmetic on the seeded F160 figures: 1486 + 360 + 25 + 216 (36 gal × 6 lb, FAA-H-8083-25)
  // = 2087 lb, moment 83868.4 → CG 40.2 in; 72 lb burned at 48 in → 2015 lb, CG 39.9 in.
  await chart.getByRole("row", { name: /Takeoff 2,087 40\.2/ }).waitFor();
  await chart.getByRole("row", { name: /Landing 2,015 39\.9/ }).waitFor();
  await expectNoHorizontalOverflow(page);
  await screenshot(page, "bookings-weight-balance-phone");

  // Preflight: one tap makes the tire a finding (it becomes a squawk, here with words and a photo),
  // then one tap per area for the rest, one for the tanks and samples, one for the oil.
  await page.goto(`${bookingUrl}/preflight`, { waitUntil: "networkidle" });
  const pf = page.getByRole("form", { name: "Preflight record" });
  await pf.getByRole("group", { name: "tire, brake and strut" }).first().getByRole("button", { name: "Finding" }).click();
  await pf.getByLabel("What you found (optional): tire, brake and strut").fill("Left main tire worn through the tread");
  await pf.locator('input[type=file][name^="photos."]').setInputFiles({ name: "tire.png", mimeType: "image/png", buffer: PNG });
  // The finding's "may affect airworthiness" row: a 24 px box in a row at least 44 px tall.
  const mark = pf.getByLabel("This may affect airworthiness");
  expect((await mark.boundingBox())!.height).toBeGreaterThanOrEqual(24);
  expect((await pf.locator("label").filter({ hasText: "This may affect airworthiness" }).boundingBox())!.height).toBeGreaterThanOrEqual(44);
  await mark.scrollIntoViewIfNeeded();
  await screenshot(page, "preflight-finding-phone");
  await page.setViewportSize({ width: 1280, height: 800 });
  await screenshot(page, "preflight-finding-desktop");
  await page.setViewportSize({ width: 390, height: 844 });
  for (const area of await pf.getByRole("button", { name: /^All as expected: / }).all()) await area.click();
  await pf.getByRole("button", { name: "✓ Every tank full, every sample clear" }).click();
  await pf.getByRole("button", { name: "Oil 6 qt" }).click();
  await pf.getByRole("button", { name: "Record the preflight" }).click();
  await page.getByText(/Preflight recorded with 1 finding; 1 reported as squawk for maintenance/).waitFor();
  await expectNoHorizontalOverflow(page);
  const squawks = (await (await page.request.get(`/api/clubs/reedwater/squawks?aircraftId=${plane}&status=open`)).json()) as { squawks: { description: string; foundDuring: string }[] };
  expect(squawks.squawks.some((s) => s.foundDuring === "preflight" && s.description.includes("Left main tire worn through the tread"))).toBe(true);

  // Beginning the flight confirms the record (its finding needs the extra tick), then the flight sheet.
  await page.goto(bookingUrl, { waitUntil: "networkidle" });
  const begin = page.getByRole("form", { name: "Begin flight" });
  await begin.getByLabel(/I did this preflight myself/).check();
  await begin.getByLabel("I have dealt with every finding listed for this aircraft.").check();
  // N0527L flies with a deferred landing light: its limitation is ticked again here.
  await begin.getByLabel("I have read each limitation and will fly this flight within them.").check();
  await begin.getByRole("button", { name: "Begin flight" }).click();
  await page.getByRole("link", { name: "Close the flight sheet" }).waitFor();
  await page.getByRole("link", { name: "Close the flight sheet" }).click();
  await page.waitForURL(/\/flight-sheet$/);
  const sheet = page.getByRole("form", { name: "Flight sheet" });
  const hobbsOut = Number(await sheet.getByLabel("Hobbs out").inputValue());
  const tachOut = Number(await sheet.getByLabel("Tach out").inputValue());
  // Fuel out comes from the preflight record: both tanks full, 20 + 20 US gal.
  expect(await sheet.getByLabel("Fuel out").inputValue()).toBe("40");
  const preview = sheet.getByTestId("charge-preview");
  expect(await preview.textContent()).toBe("Enter Hobbs in to see the charge.");
  await sheet.getByLabel("Hobbs in").fill((hobbsOut + 1.2).toFixed(1));
  // Worked out as the pilot types: 1.2 Hobbs h × $152.00 = $182.40 (the seeded rate).
  await sheet.getByText("$182.40 for 1.2 Hobbs h").waitFor();
  await sheet.getByLabel("Tach in").fill((tachOut + 1.0).toFixed(1));
  await sheet.getByLabel("Fuel in").fill("29");
  await sheet.getByLabel("Time in").fill("07:40");
  await sheet.getByLabel("Day landings", { exact: true }).fill("4");
  await expectNoHorizontalOverflow(page);
  await screenshot(page, "flight-sheet-phone");
  await page.setViewportSize({ width: 1280, height: 800 });
  await screenshot(page, "flight-sheet-desktop");
  await page.setViewportSize({ width: 390, height: 844 });
  await sheet.getByRole("button", { name: "Close the flight sheet" }).click();
  await page.getByText(/Flight sheet closed: flight logged and \$182\.40 charged to the account/).waitFor();
  await expectNoHorizontalOverflow(page);
  await page.goto(bookingUrl, { waitUntil: "networkidle" });
  await page.getByText("Flown, sheet closed").first().waitFor();
}

describe("a weekly series on its booking page", () => {
  it("books four weeks, moves them all to a new time, then cancels them, each answer in words", async () => {
    const page = await newPage("desktop");
    const phone = await newPage("phone");
    try {
      await signIn(page, "member@hangarline.test");
      // Early in the day, on days after the phone flow's (its days are 11 to 50 ahead).
      const day = localDay(55 + Math.floor(Math.random() * 40), "America/Chicago");
      await page.goto(`/clubs/reedwater/bookings/new?start=${day}T06:00&end=${day}T07:00`, { waitUntil: "networkidle" });
      const form = page.getByRole("form", { name: "Book an aircraft" });
      const plane = await form.locator("select[name=aircraftId] option", { hasText: "N0527L" }).getAttribute("value");
      await form.getByLabel("Aircraft").selectOption(plane!);
      await form.getByLabel("Repeat").selectOption("4");
      await form.getByRole("button", { name: "Book", exact: true }).click();
      const answer = form.getByRole("status");
      await Promise.race([answer.getByText(/booked \d of 4 weeks/).waitFor({ timeout: 15_000 }), page.getByRole("group", { name: "Warnings to read" }).waitFor({ timeout: 15_000 })]).catch(() => undefined);
      if (!(await answer.getByText(/booked \d of 4 weeks/).count())) await tickWarningsAndRetry(page, "Book");
      await answer.getByText(/^N0527L booked 4 of 4 weeks: /).waitFor();
      // The first week's page, from the answer's list.
      await form.getByRole("list", { name: "Weeks" }).getByRole("link").first().click();
      await page.waitForURL(/\/bookings\/[\w-]{36}$/);
      const series = page.getByRole("region", { name: "Weekly series" });
      await series.getByText("4 weeks are still booked and yet to start").waitFor();
      expect(await series.getByRole("list", { name: "Weeks still booked" }).getByRole("listitem").count()).toBe(4);
      await expectNoHorizontalOverflow(page);
      await screenshot(page, "booking-series-desktop");
      await signIn(phone, "member@hangarline.test");
      await phone.goto(page.url(), { waitUntil: "networkidle" });
      await phone.getByRole("region", { name: "Weekly series" }).getByRole("button", { name: "Cancel this and the later weeks" }).waitFor();
      await expectNoHorizontalOverflow(phone);
      await screenshot(phone, "booking-series-phone");

      // Move every week to 06:30–08:00: the answer counts the weeks and names their dates in words.
      const move = series.getByRole("form", { name: "Move this and the later weeks" });
      await move.getByLabel("New start (club time)").fill("06:30");
      await move.getByLabel("New end (club time)").fill("08:00");
      await move.getByRole("button", { name: "Move this and the later weeks" }).click();
      const moved = move.getByRole("status");
      await Promise.race([moved.getByText(/^Moved /).waitFor({ timeout: 15_000 }), move.getByRole("group", { name: "Warnings to read" }).waitFor({ timeout: 15_000 })]).catch(() => undefined);
      if (!(await moved.getByText(/^Moved /).count())) {
        for (const box of await move.getByRole("group", { name: "Warnings to read" }).getByRole("checkbox").all()) await box.check();
        await move.getByRole("button", { name: "Move this and the later weeks" }).click();
      }
      await moved.getByText(/^Moved 4 weeks to 06:30–08:00 club time: (Sun|Mon|Tue|Wed|Thu|Fri|Sat) \d{1,2} [A-Z][a-z]{2} \d{4}; /).waitFor();
      await series.getByRole("list", { name: "Weeks still booked" }).getByText(/, 06:30–08:00$/).first().waitFor();
      // The single change form shows the booking's new times too.
      expect(await page.getByRole("form", { name: "Change the booking" }).getByLabel("New start (club time)").inputValue()).toBe(`${day}T06:30`);
      await screenshot(page, "booking-series-moved-desktop");

      // Cancel them all: the answer stays on screen after the page shows nothing left to act on.
      const cancel = series.getByRole("form", { name: "Cancel this and the later weeks" });
      await cancel.getByLabel("Reason (optional)").fill("Lessons moved to another aircraft");
      await cancel.getByRole("button", { name: "Cancel this and the later weeks" }).click();
      await cancel.getByRole("status").getByText(/^Cancelled 4 weeks: .*The aircraft is free again on those days\./).waitFor();
      await series.getByText("No week of this series from this booking on is still booked and yet to start.").waitFor();
      await page.getByText(/Cancelled .*: Lessons moved to another aircraft\./).waitFor();
      await screenshot(page, "booking-series-cancelled-desktop");
    } catch (error) {
      await screenshot(page, "booking-series-failure-desktop");
      throw error;
    }
    await page.context().close();
    await phone.context().close();
  });
});
