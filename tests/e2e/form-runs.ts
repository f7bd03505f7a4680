// Forms submitted one after another in a real browser, shared by the 50-forms browser test
// (tests/e2e/forms.test.ts) and the write-path probe (`npm run bench:forms`, tests/bench/forms.ts).
// Seven kinds in turn, by four demo roles of the Reedwater club on N0549L (no other browser test
// uses that aircraft): report a squawk, triage it, issue a grounding notice, lift it, invite a
// member, publish a bulletin, acknowledge it. Each submission is timed from the click to its own
// answer being visible (the form's role="status" text, or the page the answer sends it to).
// No vitest imports here: the probe runs outside vitest.
import type { Browser, Locator, Page } from "playwright-core";

export const FORMS_CLUB = "/clubs/reedwater";
export const FORMS_REG = "N0549L";
const PASSWORD = "hangar-demo-2026";

/** What a submission should have stored, to count afterwards (table, column, value). */
export type Landed = { table: "squawks" | "grounding_notices" | "invitations" | "bulletins" | "squawk_events" | "bulletin_acknowledgements"; column: string; value: string; where?: string };
export type Submission = { n: number; kind: string; ms: number; answered: boolean; landed: Landed | null };
export type FormPages = { member: Page; maint: Page; admin: Page; safety: Page };

export async function signedInPage(browser: Browser, baseUrl: string, email: string): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 }, baseURL: baseUrl });
  const page = await context.newPage();
  page.setDefaultTimeout(40_000);
  await page.goto("/sign-in", { waitUntil: "networkidle" });
  const form = page.getByRole("form", { name: "Sign in with password" });
  await form.getByLabel("E-mail").fill(email);
  await form.getByLabel("Password", { exact: true }).fill(PASSWORD);
  await form.getByRole("button", { name: "Sign in", exact: true }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
  return page;
}

export async function formPages(browser: Browser, baseUrl: string): Promise<FormPages> {
  return {
    member: await signedInPage(browser, baseUrl, "pilot2@hangarline.test"),
    maint: await signedInPage(browser, baseUrl, "maintenance@hangarline.test"),
    admin: await signedInPage(browser, baseUrl, "admin@hangarline.test"),
    safety: await signedInPage(browser, baseUrl, "safety@hangarline.test"),
  };
}

async function open(page: Page, url: string): Promise<void> {
  await page.goto(url, { waitUntil: "networkidle" }); // typed before hydration would be lost
}

/**
 * Submits `total` forms in turn. `answerTimeoutMs`: how long an answer may take before the
 * submission counts as unanswered. With `stopOnMissingAnswer` the run ends at the first one
 * (a test); otherwise that page is loaded again and the run goes on (the probe).
 */
export async function runForms(pages: FormPages, opts: { total: number; answerTimeoutMs: number; stopOnMissingAnswer: boolean; tag: string; log?: (line: string) => void }): Promise<Submission[]> {
  const { member, maint, admin, safety } = pages;
  const samples: Submission[] = [];
  await open(member, `${FORMS_CLUB}/flight-line`);
  const href = await member.locator(`article[data-registration="${FORMS_REG}"]`).getByRole("link", { name: FORMS_REG }).getAttribute("href");
  if (!href) throw new Error(`No link to ${FORMS_REG}`);
  const aircraftUrl = href;
  await open(member, aircraftUrl);

  let lastSquawk = "";
  let lastNotice = "";
  let lastBulletin = "";
  let lastBulletinTitle = "";
  let stop = false;

  /** Clicks, then waits for the answer; records the time between them. */
  const submit = async (kind: string, page: Page, button: Locator, answer: Locator, reloadTo: string, landed: Landed | null, after?: () => Promise<void>) => {
    const start = performance.now();
    await button.click();
    let answered = true;
    let ms = Number.NaN;
    try {
      await answer.waitFor({ state: "visible", timeout: opts.answerTimeoutMs });
      ms = performance.now() - start;
      // The follow-up the answer asked for (a page to open) must happen too; not part of the time.
      if (after) await after();
    } catch {
      answered = false;
      ms = performance.now() - start;
    }
    samples.push({ n: samples.length + 1, kind, ms, answered, landed });
    if (!answered) {
      // What the page shows instead: the button's words, and whether a loading skeleton is up.
      const still = await button.textContent({ timeout: 1_000 }).catch(() => "(button not found)");
      const skeleton = await page.locator('[aria-busy="true"][aria-label="Loading"]').count();
      opts.log?.(`  #${samples.length} ${kind}: no answer after ${opts.answerTimeoutMs} ms (button now "${still}", loading skeletons shown: ${skeleton}, at ${page.url()})`);
      if (opts.stopOnMissingAnswer) stop = true;
      else await open(page, reloadTo);
    }
    if (samples.length % 20 === 0) opts.log?.(`  ${samples.length}/${opts.total} done`);
  };

  const kinds: Array<() => Promise<void>> = [
    async () => {
      // The member stays on the aircraft page and reports one squawk after another.
      lastSquawk = `${opts.tag} squawk ${samples.length + 1}: loose screw on the glareshield`;
      const form = member.getByRole("form", { name: `Report a squawk on ${FORMS_REG}` });
      await form.getByLabel("What did you find?").fill(lastSquawk);
      await submit("report squawk", member, form.getByRole("button", { name: "Report squawk" }), member.getByRole("status").filter({ hasText: `Squawk reported: “${lastSquawk}”` }), aircraftUrl, { table: "squawks", column: "description", value: lastSquawk });
    },
    async () => {
      await open(maint, aircraftUrl);
      const item = maint.locator("li[data-squawk]").filter({ hasText: lastSquawk });
      await item.locator("summary", { hasText: "Triage" }).click();
      const form = item.getByRole("form", { name: "Triage squawk" });
      await form.getByLabel("Triage", { exact: true }).selectOption("note");
      const squawkId = (await item.getAttribute("data-squawk")) ?? "";
      await submit("triage squawk", maint, form.getByRole("button", { name: "Save triage" }), item.getByRole("status").filter({ hasText: "Kept as a note" }), aircraftUrl, { table: "squawk_events", column: "squawk_id", value: squawkId, where: "kind = 'triaged'" });
    },
    async () => {
      await open(maint, aircraftUrl);
      lastNotice = `${opts.tag} notice ${samples.length + 1}: fuel sample check pending`;
      await maint.locator("summary", { hasText: `Ground ${FORMS_REG}` }).click();
      const form = maint.getByRole("form", { name: `Ground ${FORMS_REG}` });
      await form.getByLabel("Reason").fill(lastNotice);
      await form.getByLabel("Kind").selectOption("safety");
      await submit("issue notice", maint, form.getByRole("button", { name: /Issue grounding notice/ }), maint.getByRole("status").filter({ hasText: "Grounding notice issued" }), aircraftUrl, { table: "grounding_notices", column: "reason", value: lastNotice });
    },
    async () => {
      await open(maint, aircraftUrl);
      const item = maint.locator("li").filter({ hasText: lastNotice }).filter({ has: maint.locator("summary") });
      await item.locator("summary", { hasText: "Lift this notice" }).click();
      const form = item.getByRole("form", { name: "Lift grounding notice" });
      await form.getByLabel("Why it is lifted").fill("Fuel sample clear.");
      // The answer, or the lifted notice the refreshed page shows in its place.
      await submit("lift notice", maint, form.getByRole("button", { name: "Lift notice" }), maint.getByText(/Grounding notice lifted\.|^Lifted .* Fuel sample clear\./).first(), aircraftUrl, null);
    },
    async () => {
      await open(admin, `${FORMS_CLUB}/members`);
      const email = `${opts.tag.toLowerCase().replace(/[^a-z0-9]+/g, ".")}.${samples.length + 1}@hangarline.test`;
      const form = admin.getByRole("form", { name: "Invite a member" });
      await form.getByLabel("E-mail address").fill(email);
      await submit("invite", admin, form.getByRole("button", { name: "Send invitation" }), admin.getByRole("status").filter({ hasText: "Invitation sent" }), `${FORMS_CLUB}/members`, { table: "invitations", column: "email", value: email });
    },
    async () => {
      await open(safety, `${FORMS_CLUB}/safety/bulletins/new`);
      lastBulletinTitle = `${opts.tag} bulletin ${samples.length + 1}`;
      const form = safety.getByRole("form", { name: "New bulletin" });
      await form.getByLabel("Title").fill(lastBulletinTitle);
      await form.getByLabel("Text").fill("Check the fuel caps on the walk-around.");
      await form.getByLabel("Audience").selectOption("everyone");
      // Its answer, then the bulletin's own page, where the answer sends the officer.
      await submit("publish bulletin", safety, form.getByRole("button", { name: "Publish and send" }), safety.getByRole("status").filter({ hasText: "Published and sent to" }), `${FORMS_CLUB}/safety`, { table: "bulletins", column: "title", value: lastBulletinTitle }, async () => {
        await safety.waitForURL(/\/safety\/bulletins\/(?!new)[^/?]+/, { timeout: opts.answerTimeoutMs });
        await safety.getByRole("heading", { name: lastBulletinTitle }).waitFor({ timeout: opts.answerTimeoutMs });
      });
      const landed = new URL(safety.url()).pathname;
      lastBulletin = /\/safety\/bulletins\/(?!new)[^/]+$/.test(landed) ? landed : "";
    },
    async () => {
      if (!lastBulletin) return; // its publication went unanswered (counted there): nothing to acknowledge
      await open(member, lastBulletin);
      const form = member.getByRole("form", { name: "Acknowledge bulletin" });
      const bulletinId = lastBulletin.split("/").pop() ?? "";
      await submit("acknowledge", member, form.getByRole("button", { name: "Acknowledge" }), member.getByText(/Acknowledged\. Thank you\.|You acknowledged this on/).first(), lastBulletin, { table: "bulletin_acknowledgements", column: "bulletin_id", value: bulletinId });
      await open(member, aircraftUrl);
    },
  ];

  for (let i = 0; samples.length < opts.total && !stop; i++) {
    try {
      await kinds[i % kinds.length]!();
    } catch (error) {
      // A step before the click failed (a page that never loaded): in a test that is a failure; the probe goes on.
      if (opts.stopOnMissingAnswer) throw error;
      opts.log?.(`  step ${i} failed before its submission: ${error instanceof Error ? error.message.split("\n")[0] : String(error)}`);
    }
  }
  return samples;
}

/** count, median, p95, max, and how many waited more than `slowMs`. */
export function summarize(samples: Submission[], slowMs = 3_000) {
  const ms = samples.map((s) => s.ms).sort((a, b) => a - b);
  const at = (p: number) => ms[Math.min(ms.length - 1, Math.max(0, Math.ceil(ms.length * p) - 1))] ?? Number.NaN;
  const median = ms.length === 0 ? Number.NaN : ms.length % 2 ? ms[(ms.length - 1) / 2]! : (ms[ms.length / 2 - 1]! + ms[ms.length / 2]!) / 2;
  return { count: samples.length, median, p95: at(0.95), max: ms[ms.length - 1] ?? Number.NaN, slow: samples.filter((s) => s.ms > slowMs).length, unanswered: samples.filter((s) => !s.answered).length };
}
