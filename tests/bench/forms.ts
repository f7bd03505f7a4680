// `npm run bench:forms` (FORMS_N=200 by default): a browser probe of the write path. Builds (or reuses:
// E2E_DIST_DIR, E2E_REBUILD=1) a production build, starts `next start` with a fresh demo database
// through the browser tests' stack, signs in as four demo roles in headless Chromium and submits
// FORMS_N forms in a row across seven kinds (tests/e2e/form-runs.ts: report squawk, triage, issue and
// lift a grounding notice, invite, publish and acknowledge a bulletin). Each is timed from the click
// to its answer being visible. Prints count, median, p95, max and how many waited more than 3 s; a
// submission with no answer after 30 s counts as unanswered and its page is loaded again so that the
// run goes on. Not part of `npm run bench` (no run() export): it needs a build and a browser.
import { register } from "node:module";
import { pathToFileURL } from "node:url";
import type { Submission } from "../e2e/form-runs";

function line(label: string, s: { count: number; median: number; p95: number; max: number; slow: number; unanswered: number }): string {
  return `  ${label.padEnd(18)} n=${String(s.count).padStart(4)}  median ${s.median.toFixed(0).padStart(6)} ms  p95 ${s.p95.toFixed(0).padStart(6)} ms  max ${s.max.toFixed(0).padStart(6)} ms  >3 s: ${String(s.slow).padStart(3)}  unanswered: ${s.unanswered}`;
}

async function main(): Promise<void> {
  // Database modules import "server-only", which refuses to load outside the framework's server build.
  register("data:text/javascript,export async function resolve(s,c,n){ if(s==='server-only') return {url:'data:text/javascript,',shortCircuit:true}; return n(s,c); }");
  const total = Number(process.env.FORMS_N ?? 200);
  const { startStack } = await import("../e2e/stack");
  const { formPages, runForms, summarize } = await import("../e2e/form-runs");
  const { chromium } = await import("playwright-core");
  const stack = await startStack();
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    args: ["--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--disable-quic", "--no-first-run"],
  });
  try {
    const pages = await formPages(browser, stack.baseUrl);
    const started = performance.now();
    const samples: Submission[] = await runForms(pages, { total, answerTimeoutMs: 30_000, stopOnMissingAnswer: false, tag: `Bench ${Date.now()}`, log: (l) => console.log(l) });
    const wall = (performance.now() - started) / 1000;
    console.log(`\nforms probe: ${samples.length} submissions against next start, ${wall.toFixed(0)} s`);
    for (const kind of [...new Set(samples.map((s) => s.kind))]) console.log(line(kind, summarize(samples.filter((s) => s.kind === kind))));
    console.log(line("all", summarize(samples)));
  } finally {
    await browser.close();
    await stack.close();
  }
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  main().then(
    () => process.exit(0),
    (error: unknown) => {
      console.error(error);
      process.exit(1);
    },
  );
}
