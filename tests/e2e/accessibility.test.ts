import fs from "node:fs";
import { createRequire } from "node:module";
import type { BrowserContext, Page } from "playwright-core";
import { afterAll, describe, expect, it } from "vitest";
import { baseUrl, getBrowser, screenshot, signIn } from "./harness";

const VIEWPORTS = { desktop: { width: 1280, height: 800 }, phone: { width: 390, height: 844 } } as const;

// axe-core on every page reachable from the navigation, for every role of the demo seed, on both
// viewports: no serious or critical violation. axe's source is put into the page from
// node_modules (addScriptTag with content): nothing is fetched from the network.
const AXE_SOURCE = fs.readFileSync(createRequire(import.meta.url).resolve("axe-core/axe.min.js"), "utf8");

const ROLES = [
  { role: "member", email: "member@hangarline.test" },
  { role: "instructor", email: "instructor@hangarline.test" },
  { role: "safety officer", email: "safety@hangarline.test" },
  { role: "treasurer", email: "treasurer@hangarline.test" },
  { role: "maintenance", email: "maintenance@hangarline.test" },
  { role: "admin", email: "admin@hangarline.test" },
  { role: "operator", email: "operator@hangarline.test" },
] as const;

type Violation = { id: string; impact: string | null; help: string; nodes: { target: unknown[]; failureSummary?: string }[] };

async function seriousViolations(page: Page): Promise<Violation[]> {
  if (!(await page.evaluate(() => "axe" in window))) await page.addScriptTag({ content: AXE_SOURCE });
  const violations = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (ctx: Document, opts: object) => Promise<{ violations: Violation[] }> } }).axe;
    const result = await axe.run(document, { resultTypes: ["violations"] });
    return result.violations.map((v) => ({ id: v.id, impact: v.impact, help: v.help, nodes: v.nodes.map((n) => ({ target: n.target, failureSummary: n.failureSummary })) }));
  });
  return violations.filter((v) => v.impact === "serious" || v.impact === "critical");
}

function describeViolations(url: string, violations: Violation[]): string {
  return violations
    .map((v) => `${url}: [${v.impact}] ${v.id} — ${v.help}\n${v.nodes.map((n) => `    ${JSON.stringify(n.target)}${n.failureSummary ? `\n      ${n.failureSummary.replace(/\n/g, "\n      ")}` : ""}`).join("\n")}`)
    .join("\n");
}

/** Same-origin page links of the navigation landmarks (the club's sections, or the operator's). */
async function navigationTargets(page: Page): Promise<string[]> {
  const hrefs = await page.evaluate(() =>
    [...document.querySelectorAll<HTMLAnchorElement>("nav a[href], aside a[href], header a[href]")].map((a) => a.href),
  );
  const origin = new URL(page.url()).origin;
  const paths = hrefs.map((h) => new URL(h)).filter((u) => u.origin === origin && !u.pathname.startsWith("/api")).map((u) => u.pathname);
  return [...new Set([new URL(page.url()).pathname, ...paths])];
}

const contexts: BrowserContext[] = [];
afterAll(async () => {
  for (const c of contexts) await c.close();
});

describe("accessibility: no serious or critical axe violation on any page in the navigation", () => {
  for (const { role, email } of ROLES) {
    it(`${role}, desktop and phone`, async () => {
      const browser = await getBrowser();
      // One context per role: signed in once, the phone viewport is the same session resized.
      const context = await browser.newContext({ viewport: VIEWPORTS.desktop, baseURL: baseUrl });
      contexts.push(context);
      const page = await context.newPage();
      page.setDefaultTimeout(40_000);
      await signIn(page, email);
      if (role === "operator") await page.goto("/operator", { waitUntil: "load" });
      const targets = await navigationTargets(page);
      expect(targets.length, "pages found in the navigation").toBeGreaterThan(1);
      const problems: string[] = [];
      for (const viewport of ["desktop", "phone"] as const) {
        await page.setViewportSize(VIEWPORTS[viewport]);
        for (const target of targets) {
          const response = await page.goto(target, { waitUntil: "load" });
          expect(response?.status(), `${target} answers`).toBeLessThan(400);
          await page.locator("main h1").first().waitFor();
          const found = await seriousViolations(page);
          if (target.endsWith("/audit")) await screenshot(page, `audit-log-${viewport}`);
          if (found.length) problems.push(describeViolations(`${viewport} ${target}`, found));
        }
      }
      expect(problems, problems.join("\n")).toEqual([]);
    }, 600_000);
  }
});
