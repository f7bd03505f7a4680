// `npm test`: installs what is missing, then lint, unit, integration, build and browser tests.
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { ensureChromium, ensureNodeModules } from "./ensure-deps.mjs";

const root = path.resolve(import.meta.dirname, "..");
ensureNodeModules();
ensureChromium();

const bin = (name) => path.join(root, "node_modules", ".bin", name);
const steps = [
  ["type check", bin("tsc"), ["--noEmit", "-p", "."]],
  ["lint", bin("eslint"), ["."]],
  ["unit and integration tests", bin("vitest"), ["run", "--project", "unit", "--project", "integration", "--reporter=default", "--reporter=json", "--outputFile.json=tests/.artifacts/unit-integration.json"]],
  ["browser tests", bin("vitest"), ["run", "--config", "vitest.e2e.config.ts", "--reporter=default", "--reporter=json", "--outputFile.json=tests/.artifacts/e2e.json"]],
];
fs.mkdirSync(path.join(root, "tests/.artifacts"), { recursive: true });
const totals = { passed: 0, failed: 0, skipped: 0 };
function addTotals(file) {
  try {
    const r = JSON.parse(fs.readFileSync(path.join(root, file), "utf8"));
    totals.passed += r.numPassedTests ?? 0;
    totals.failed += r.numFailedTests ?? 0;
    totals.skipped += (r.numPendingTests ?? 0) + (r.numTodoTests ?? 0);
  } catch {
    // no report: the step failed before running tests
  }
}

const started = Date.now();
for (const [name, cmd, args] of steps) {
  console.log(`\n=== ${name} ===`);
  const t = Date.now();
  const result = spawnSync(cmd, args, { cwd: root, stdio: "inherit", env: { ...process.env, E2E_REBUILD: process.env.CI ? "1" : process.env.E2E_REBUILD ?? "" } });
  console.log(`=== ${name}: ${result.status === 0 ? "ok" : "FAILED"} in ${((Date.now() - t) / 1000).toFixed(0)} s ===`);
  const report = args.find((a) => a.startsWith("--outputFile.json="));
  if (report) addTotals(report.split("=")[1]);
  if (result.status !== 0) {
    console.log(`\n${totals.passed} passed, ${Math.max(1, totals.failed)} failed`);
    process.exit(result.status ?? 1);
  }
}
console.log(`\nAll checks passed in ${((Date.now() - started) / 1000).toFixed(0)} s.`);
console.log(`${totals.passed} passed, ${totals.failed} failed, ${totals.skipped} skipped`);
