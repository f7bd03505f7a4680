import { describe, expect, it } from "vitest";
import { linksIn, newPage, screenshot, signIn, waitForEmail } from "./harness";

// The small things of the pilot's day: a calendar link shown again, signed in after joining, the
// e-mail kept after a wrong password, and pages that show a change right after its answer.

async function feedStatus(url: string): Promise<number> {
  return (await fetch(url)).status;
}

describe("the calendar link", () => {
  it("is shown again on a second device, and replacing it is a separate, confirmed choice", async () => {
    const page = await newPage("desktop");
    await signIn(page, "student@hangarline.test");
    await page.goto("/clubs/reedwater/bookings/calendar", { waitUntil: "networkidle" });
    const make = page.getByRole("button", { name: "Make my calendar link" });
    if (await make.count()) {
      await make.click();
      await page.getByRole("form", { name: "Make my calendar link" }).getByRole("status").filter({ hasText: /Calendar link made/ }).waitFor();
    }
    const field = page.getByLabel("Your calendar link");
    await field.waitFor();
    const first = await field.inputValue();
    expect(first).toMatch(/\/api\/calendar\/[\w-]{20,}$/);
    expect(await feedStatus(first)).toBe(200);
    await screenshot(page, "calendar-link-desktop");

    // A second device (a phone) signs in and sees the very same link.
    const phone = await newPage("phone");
    await signIn(phone, "student@hangarline.test");
    await phone.goto("/clubs/reedwater/bookings/calendar", { waitUntil: "networkidle" });
    expect(await phone.getByLabel("Your calendar link").inputValue()).toBe(first);
    await screenshot(phone, "calendar-link-phone");
    await phone.context().close();
    expect(await feedStatus(first)).toBe(200);

    // Replacing without ticking the confirmation is refused; the link keeps working.
    const stop = page.getByRole("form", { name: "Replace or turn off the calendar link" });
    await stop.getByRole("button", { name: "Replace with a new link" }).click();
    await stop.getByRole("status").getByRole("alert").waitFor();
    expect(await stop.getByText(/Tick the box to confirm/).count()).toBe(1);
    expect(await feedStatus(first)).toBe(200);

    await stop.getByLabel(/calendars using the current link stop updating/).check();
    await stop.getByRole("button", { name: "Replace with a new link" }).click();
    await stop.getByRole("status").filter({ hasText: /New calendar link made; the old one no longer works/ }).waitFor();
    const second = await page.getByLabel("Your calendar link").inputValue();
    expect(second).not.toBe(first);
    expect(await feedStatus(first)).toBe(404);
    expect(await feedStatus(second)).toBe(200);
    await page.context().close();
  });
});

describe("joining and signing in", () => {
  it("a new member is signed in straight after accepting an invitation", async () => {
    const address = `new.flyer.${Date.now()}@example.test`;
    const admin = await newPage("desktop");
    await signIn(admin, "admin@hangarline.test");
    await admin.goto("/clubs/reedwater/members", { waitUntil: "networkidle" });
    const invite = admin.getByRole("form", { name: "Invite a member" });
    await invite.getByLabel("E-mail address").fill(address);
    await invite.getByRole("button", { name: "Send invitation" }).click();
    await invite.getByRole("status").filter({ hasText: /./ }).waitFor();
    await admin.context().close();

    const mail = await waitForEmail(address);
    const link = linksIn(mail.html).find((h) => h.includes("/invitations/"));
    expect(link).toBeTruthy();
    const page = await newPage("phone");
    await page.goto(new URL(link!).pathname, { waitUntil: "networkidle" });
    const form = page.getByRole("form", { name: "Accept invitation" });
    await form.getByLabel("Your name").fill("Nova Tarrant");
    await form.getByLabel("Choose a password").fill("a-long-enough-password-2026");
    await form.getByRole("button", { name: "Create my account and join" }).click();
    await page.waitForURL(/\/clubs\/reedwater$/);
    // The club's own pages, no sign-in form in between.
    await page.getByRole("heading", { level: 1 }).first().waitFor();
    expect(page.url()).not.toMatch(/sign-in/);
    // The club's shell for this person (on the phone it sits in the closed menu, so it is matched in the DOM).
    expect(await page.locator('nav[aria-label="Club sections"]').count()).toBeGreaterThan(0);
    await page.getByText("Nova Tarrant").first().waitFor({ state: "attached" });
    await screenshot(page, "joined-signed-in-phone");
    await page.context().close();
  });

  it("a wrong password keeps the e-mail typed", async () => {
    const page = await newPage("desktop");
    await page.goto("/sign-in", { waitUntil: "networkidle" });
    const form = page.getByRole("form", { name: "Sign in with password" });
    await form.getByLabel("E-mail").fill("member@hangarline.test");
    await form.getByLabel("Password", { exact: true }).fill("not-the-password");
    await form.getByRole("button", { name: "Sign in", exact: true }).click();
    await form.getByRole("status").getByRole("alert").filter({ hasText: /do not match an active account/ }).waitFor();
    expect(await form.getByLabel("E-mail").inputValue()).toBe("member@hangarline.test");
    // One refusal message on the page.
    expect(await page.getByText(/do not match an active account/).count()).toBe(1);
    await screenshot(page, "sign-in-wrong-password-desktop");
    await page.context().close();
  });
});

describe("fresh data after a change, without a reload", () => {
  it("the flight line shows a grounding squawk as soon as the pilot goes back to it", async () => {
    const page = await newPage("desktop");
    await signIn(page, "silberau.pilot@hangarline.test");
    const nav = page.locator("aside").getByRole("navigation", { name: "Club sections" });
    await nav.getByRole("link", { name: "Flight line" }).click();
    await page.waitForURL(/\/flight-line$/);
    const card = page.locator("article[data-registration]:not([data-status=grounded])").first();
    await card.waitFor();
    const reg = (await card.getAttribute("data-registration"))!;
    await card.getByRole("link", { name: reg }).click();
    await page.waitForURL(/\/aircraft\/[^/]+$/);
    const description = `Cracked nose wheel fairing ${Date.now()}`;
    const form = page.getByRole("form", { name: `Report a squawk on ${reg}` });
    await form.getByLabel("What did you find?").fill(description);
    await form.getByLabel("I think this may make the aircraft unsafe to fly").check();
    await form.getByRole("button", { name: "Report squawk" }).click();
    await form.getByRole("status").filter({ hasText: /Squawk reported/ }).waitFor();
    // Back through the navigation (no reload): the board shows the aircraft grounded at once.
    await nav.getByRole("link", { name: "Flight line" }).click();
    await page.waitForURL(/\/flight-line$/);
    await page.locator(`article[data-registration="${reg}"][data-status="grounded"]`).getByText(description, { exact: false }).waitFor();
    await page.context().close();
  });

  it("the roster shows new roles as soon as the admin goes back to it", async () => {
    const page = await newPage("desktop");
    await signIn(page, "silberau.admin@hangarline.test");
    const nav = page.locator("aside").getByRole("navigation", { name: "Club sections" });
    await nav.getByRole("link", { name: "Members" }).click();
    const row = page.getByRole("row").filter({ hasText: "Carla Weidenfels" });
    await row.waitFor();
    const before = (await row.textContent()) ?? "";
    const adding = before.includes("Instructor") ? false : true;
    await row.getByRole("link", { name: "Carla Weidenfels" }).click();
    const form = page.getByRole("form", { name: "Change roles" });
    const box = form.getByLabel(/^Instructor/);
    if (adding) await box.check();
    else await box.uncheck();
    await form.getByRole("button", { name: "Save roles" }).click();
    await form.getByRole("status").filter({ hasText: "Roles saved." }).waitFor();
    expect(await box.isChecked()).toBe(adding);
    await page.getByRole("link", { name: "← Members" }).click();
    await page.waitForURL(/\/members(\?.*)?$/);
    const after = page.getByRole("row").filter({ hasText: "Carla Weidenfels" });
    if (adding) await after.filter({ hasText: "Instructor" }).waitFor();
    else await after.filter({ hasNotText: "Instructor" }).waitFor();
    await page.context().close();
  });
});

describe("a tap on a link always leads somewhere", () => {
  it("loads the page the plain way when the router never shows it", async () => {
    const page = await newPage("desktop");
    await signIn(page, "member@hangarline.test");
    // Every router request for the flight line (its prefetches too) is held unanswered: the router's
    // navigation can never commit, as when it parks under load. A plain page load (no RSC header) goes through.
    let held = 0;
    await page.route("**/clubs/reedwater/flight-line**", async (route) => {
      if (route.request().headers()["rsc"]) held += 1;
      else await route.continue();
    });
    await page.goto("/clubs/reedwater", { waitUntil: "load" });
    const documents: string[] = [];
    page.on("request", (r) => {
      if (r.isNavigationRequest() && r.frame() === page.mainFrame()) documents.push(new URL(r.url()).pathname);
    });
    const nav = page.locator("aside").getByRole("navigation", { name: "Club sections" });
    await nav.getByRole("link", { name: "Flight line" }).click();
    await page.getByRole("heading", { level: 1, name: /Flight line/ }).waitFor({ timeout: 30_000 });
    expect(new URL(page.url()).pathname).toBe("/clubs/reedwater/flight-line");
    // It came as a plain page load, once.
    expect(documents).toEqual(["/clubs/reedwater/flight-line"]);
    expect(held).toBeGreaterThan(0);
    await page.unrouteAll({ behavior: "ignoreErrors" });
    await page.context().close();
  });
});
