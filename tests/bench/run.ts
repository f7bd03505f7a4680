// `npm run bench`: runs the exported run() of every tests/bench/*.ts module and prints medians.
// Benchmarks report; they never fail the build. A module exports
//   export async function run(tools: BenchTools): Promise<BenchResult[]>
// and collects samples with tools.measure(). Import only types from this file: importing it
// at run time from a bench would wait on this module's own top-level await.

import { register } from "node:module";
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";

export type BenchResult = { name: string; samplesMs: number[]; note?: string };
export type BenchTools = { measure: typeof measure; median: typeof median };

export function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

/** Runs `fn` a few times to warm up, then `samples` times, timing each run. */
export async function measure(name: string, fn: () => unknown, opts: { samples?: number; warmup?: number; note?: string } = {}): Promise<BenchResult> {
  for (let i = 0; i < (opts.warmup ?? 3); i++) await fn();
  const samplesMs: number[] = [];
  for (let i = 0; i < (opts.samples ?? 30); i++) {
    const start = performance.now();
    await fn();
    samplesMs.push(performance.now() - start);
  }
  return { name, samplesMs, note: opts.note };
}

function format(r: BenchResult): string {
  const sorted = [...r.samplesMs].sort((a, b) => a - b);
  const p90 = sorted[Math.min(sorted.length - 1, Math.floor(sorted.length * 0.9))] ?? Number.NaN;
  return `  ${r.name.padEnd(70)} median ${median(r.samplesMs).toFixed(2).padStart(8)} ms   p90 ${p90.toFixed(2).padStart(8)} ms   n=${r.samplesMs.length}${r.note ? `\n      ${r.note}` : ""}`;
}

async function main() {
  // Measure the production builds of libraries such as React, as `next start` runs them.
  (process.env as Record<string, string | undefined>).NODE_ENV ??= "production";
  // Links in the e-mails the benchmarks queue are built from the configured address (required in production).
  (process.env as Record<string, string | undefined>).AUTH_URL ??= "http://bench.test";
  // Query modules import "server-only", which refuses to load outside the framework's server
  // build; here it is an empty module.
  register("data:text/javascript,export async function resolve(s,c,n){ if(s==='server-only') return {url:'data:text/javascript,',shortCircuit:true}; return n(s,c); }");
  const dir = path.dirname(fileURLToPath(import.meta.url));
  const only = process.argv.slice(2);
  const files = fs.readdirSync(dir).filter((f) => f.endsWith(".ts") && f !== "run.ts" && (only.length === 0 || only.some((o) => f.includes(o)))).sort();
  for (const file of files) {
    const mod = (await import(pathToFileURL(path.join(dir, file)).href)) as { run?: (tools: BenchTools) => Promise<BenchResult[]> };
    if (typeof mod.run !== "function") continue;
    console.log(`\n${file}`);
    try {
      for (const result of await mod.run({ measure, median })) console.log(format(result));
    } catch (error) {
      console.log(`  failed: ${error instanceof Error ? error.stack : String(error)}`);
    }
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === path.resolve(process.argv[1])) {
  await main();
}
