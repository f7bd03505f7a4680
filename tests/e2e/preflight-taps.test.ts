import path from "node:path";
import Database from "better-sqlite3";
import type { Locator, Page } from "playwright-core";
import { describe, expect, inject, it } from "vitest";
import { expectNoHorizontalOverflow, newPage, screenshot, signIn } from "./harness";

// An all-OK preflight on a phone, counted tap by tap: one "All as expected" per area of the
// club's checklist, one for the tanks (full) and samples (clear), one for the oil, one to
// record. It must take 8 taps or fewer, and every control on the form must be at least 44 px.
// Uses the seeded N0527L (Fernwhistle-style template: five areas, two wing tanks, three drain points);
// its booking is written straight into the test database, since booking is tested elsewhere.

const dbFile = path.join(inject("dataDir"), "e2e.db");
const MAX_TAPS = 8;

function insertBooking(): string {
  const db = new Database(dbFile, { fileMustExist: true });
  db.pragma("busy_timeout = 5000");
  try {
    const club = db.prepare("select id from clubs where slug = 'reedwater'").get() as { id: string };
    const plane = db.prepare("select id from aircraft where club_id = ? and registration = 'N0527L'").get(club.id) as { id: string };
    const user = db.prepare("select id from users where email = 'member@hangarline.test'").get() as { id: string };
    const id = crypto.randomUUID();
    // Far ahead, on a day no other browser test books (an hour at a random day 400–800 days out).
    const start = Date.now() + (400 + Math.floor(Math.random() * 400)) * 86_400_000;
    const now = Date.now();
    db.prepare(
      `insert into bookings (id, club_id, aircraft_id, user_id, starts_at, ends_at, status, accepted_warnings, created_at, updated_at)
       values (?, ?, ?, ?, ?, ?, 'reserved', '[]', ?, ?)`,
    ).run(id, club.id, plane.id, user.id, start, start + 3_600_000, now, now);
    return id;
  } finally {
    db.close();
  }
}

/** Every visible control of the form that a finger presses: none under 44 × 44 px. */
async function smallTargets(form: Locator): Promise<string[]> {
  return form.evaluate((el) =>
    [...el.querySelectorAll<HTMLElement>("button, input:not([type=hidden]):not([type=checkbox]), select, textarea")]
      .filter((c) => c.offsetParent !== null)
      .map((c) => ({ c, r: c.getBoundingClientRect() }))
      .filter(({ r }) => r.height < 44 || r.width < 44)
      .map(({ c, r }) => `${c.getAttribute("aria-label") ?? c.textContent ?? c.getAttribute("name")} (${Math.round(r.width)}×${Math.round(r.height)})`),
  );
}

describe("preflight in few taps", () => {
  it(`an all-OK preflight on a phone takes ${MAX_TAPS} taps or fewer`, async () => {
    const page = await newPage("phone");
    try {
      await flow(page);
    } catch (error) {
      await screenshot(page, "preflight-taps-failure-phone");
      throw error;
    } finally {
      await page.context().close();
    }
  });
});

async function flow(page: Page) {
  await signIn(page, "member@hangarline.test");
  const bookingId = insertBooking();
  await page.goto(`/clubs/reedwater/bookings/${bookingId}/preflight`, { waitUntil: "networkidle" });
  const pf = page.getByRole("form", { name: "Preflight record" });
  await pf.waitFor();
  await expectNoHorizontalOverflow(page);
  expect(await smallTargets(pf)).toEqual([]);
  await screenshot(page, "preflight-start-phone");

  const taps: string[] = [];
  const tap = async (target: Locator) => {
    taps.push((await target.getAttribute("aria-label")) ?? (await target.textContent()) ?? "?");
    await target.tap();
  };

  const areas = await pf.getByRole("button", { name: /^All as expected: / }).all();
  expect(areas).toHaveLength(5);
  for (const area of areas) await tap(area);
  await tap(pf.getByRole("button", { name: "✓ Every tank full, every sample clear" }));
  await tap(pf.getByRole("button", { name: "Oil 6 qt" }));

  // What the taps filled in, before recording: each area done, the tanks at capacity.
  for (const area of ["Cabin", "Left wing", "Nose", "Right wing", "Tail"]) await pf.getByRole("group", { name: area, exact: true }).getByText(/^✓ All \d+ as expected$/).waitFor();
  expect(await pf.getByLabel("Left wing tank (US gal)").inputValue()).toBe("20");
  expect(await pf.getByLabel("Right wing tank (US gal)").inputValue()).toBe("20");
  expect(await pf.getByLabel("Oil quantity (qt)").inputValue()).toBe("6");
  expect(await smallTargets(pf)).toEqual([]);
  await expectNoHorizontalOverflow(page);
  await screenshot(page, "preflight-phone");
  await page.setViewportSize({ width: 1280, height: 800 });
  await screenshot(page, "preflight-desktop");
  await page.setViewportSize({ width: 390, height: 844 });

  await tap(pf.getByRole("button", { name: "Record the preflight" }));
  await page.getByText("Preflight recorded: everything as expected. You can begin the flight.").waitFor();
  expect(taps.length, `taps: ${taps.join(" · ")}`).toBeLessThanOrEqual(MAX_TAPS);
  expect(taps).toHaveLength(8);
}
