// `npm run bench:http`: the app under HTTP load beside the machine's own limit.
//
// Builds the app if its build folder has no build (NEXT_DIST_DIR, default .next-bench; BENCH_REBUILD=1
// forces a build), makes a bench database (the demo seed plus one club filled by seedBench: 30
// aircraft, 150,000 flights, 6,000 squawks, 6,490 completions), starts `next start` on it and a
// bare node:http + better-sqlite3 server that answers with the same flight-line JSON bytes, read
// from SQLite on every request, and drives both with autocannon at 10 and 50 connections.
// Also measured: the framework's floor (a page and a route handler that read no data) and the
// flight-line poll while nothing changed (304; there a 200 counts as an error: the tag was not
// honoured). Prints requests/s, p50 / p97.5 / p99 latency, errors and the ratio to the bare server, then
// next start's resident memory. Numbers on a shared machine are noisy: read the ratios.
//
// Options (environment): BENCH_SECONDS (default 10 per run), BENCH_ROOT (the app folder to build
// and start, default this repository: a checkout of an older commit can be measured the same
// way), BENCH_CPU_PROF=<dir> (next start runs under `node --cpu-prof`; the top self-time
// functions are printed at the end), BENCH_ONLY=<substring> (only the targets whose name has it),
// BENCH_DUMP=<dir> (each target's answer is written there, to read what a request carries).
// Not part of `npm test`; a benchmark reports and never fails on a figure.

import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { randomBytes, randomUUID } from "node:crypto";
import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { register } from "node:module";

type AutocannonResult = {
  requests: { average: number };
  latency: { p50: number; p97_5: number; p99: number };
  errors: number;
  timeouts: number;
  non2xx: number;
  "2xx": number;
};
type Row = { name: string; connections: number; rps: number; p50: number; p975: number; p99: number; errors: number; ratio?: number };

const here = path.dirname(fileURLToPath(import.meta.url));
const repo = path.resolve(here, "../..");
const root = path.resolve(process.env.BENCH_ROOT ?? repo);
const distDir = process.env.NEXT_DIST_DIR ?? ".next-bench";
const seconds = Number(process.env.BENCH_SECONDS ?? 10);
const only = process.env.BENCH_ONLY;
const dumpDir = process.env.BENCH_DUMP ? path.resolve(process.env.BENCH_DUMP) : null;
const cpuProfDir = process.env.BENCH_CPU_PROF ? path.resolve(process.env.BENCH_CPU_PROF) : null;
const DEMO_CLUB = "reedwater";
const DEMO_MEMBER = "member@hangarline.test";
const BENCH_CLUB = "bench-club";

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.listen(0, "127.0.0.1", () => {
      const port = (srv.address() as net.AddressInfo).port;
      srv.close(() => resolve(port));
    });
    srv.on("error", reject);
  });
}

/** fetch, tried again after a dropped connection (a kept-alive socket the server had just closed). */
async function fetchRetry(url: string, init: RequestInit = {}): Promise<Response> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await fetch(url, init);
    } catch (error) {
      if (attempt >= 3) throw error;
      await new Promise((r) => setTimeout(r, 200));
    }
  }
}

async function waitFor(url: string, ms = 120_000): Promise<void> {
  const deadline = Date.now() + ms;
  while (Date.now() < deadline) {
    try {
      const res = await fetch(url, { redirect: "manual" });
      await res.arrayBuffer();
      return;
    } catch {
      await new Promise((r) => setTimeout(r, 250));
    }
  }
  throw new Error(`${url} did not answer within ${ms} ms`);
}

function build(): void {
  const buildId = path.join(root, distDir, "BUILD_ID");
  if (fs.existsSync(buildId) && process.env.BENCH_REBUILD !== "1") return;
  console.log(`building ${root} into ${distDir} …`);
  const r = spawnSync(process.execPath, [path.join(root, "node_modules/next/dist/bin/next"), "build"], {
    cwd: root,
    env: { ...process.env, NEXT_DIST_DIR: distDir, NEXT_TELEMETRY_DISABLED: "1", NODE_ENV: "production" },
    stdio: "inherit",
  });
  if (r.status !== 0) throw new Error("next build failed");
}

/** The demo database plus the bench club; returns who to sign in as. */
async function makeDatabase(file: string) {
  // Query modules import "server-only", which refuses to load outside the framework's build.
  register("data:text/javascript,export async function resolve(s,c,n){ if(s==='server-only') return {url:'data:text/javascript,',shortCircuit:true}; return n(s,c); }");
  const { openDatabase } = await import("@/db/client");
  const { migrateDatabase } = await import("@/db/migrate");
  const { seedDemo } = await import("@/db/seed/index");
  const { clubs, memberships, users } = await import("@/db/schema");
  const { defaultClubSettings } = await import("@/lib/validation/club-settings");
  const { seedBench } = await import("./flight-line");
  const { eq } = await import("drizzle-orm");
  const db = openDatabase(file);
  try {
    migrateDatabase(db);
    await seedDemo(db);
    const [club] = db.insert(clubs).values({ slug: BENCH_CLUB, name: "Bench Club", timeZone: "America/Chicago", currency: "USD", unitSystem: "imperial", settings: defaultClubSettings() }).returning().all();
    const [user] = db.insert(users).values({ email: "bench@hangarline.test", name: "Bench Pilot" }).returning().all();
    db.insert(memberships).values({ clubId: club!.id, userId: user!.id, roles: ["member"], joinedOn: "2020-01-01" }).run();
    await seedBench(db, club!.id, user!.id);
    db.$client.pragma("optimize");
    const member = db.select().from(users).where(eq(users.email, DEMO_MEMBER)).get();
    const counts = db.$client.prepare("SELECT (SELECT count(*) FROM flights WHERE club_id = ?) f, (SELECT count(*) FROM squawks WHERE club_id = ?) s, (SELECT count(*) FROM inspection_completions WHERE club_id = ?) c, (SELECT count(*) FROM aircraft WHERE club_id = ?) a").get(club!.id, club!.id, club!.id, club!.id) as Record<string, number>;
    return { benchUser: { id: user!.id, email: user!.email, name: user!.name }, demoUser: { id: member!.id, email: member!.email, name: member!.name }, counts };
  } finally {
    db.$client.close();
  }
}

/** A session cookie exactly as Auth.js makes one at sign-in (an encrypted JWT with our session claims). */
async function mintCookie(secret: string, user: { id: string; email: string; name: string | null }): Promise<string> {
  const { encode } = await import("next-auth/jwt");
  const name = "authjs.session-token"; // the cookie name over http
  const now = Math.floor(Date.now() / 1000);
  const value = await encode({
    salt: name,
    secret,
    maxAge: 30 * 24 * 3600,
    token: { name: user.name, email: user.email, sub: user.id, sid: randomUUID(), authAt: Date.now(), iat: now },
  });
  return `${name}=${value}`;
}

/** node:http + better-sqlite3 and nothing else: the same bytes, read from SQLite per request. */
const BARE_SERVER = `
const http = require("node:http");
const Database = require(process.env.BETTER_SQLITE3);
const db = new Database(process.env.BARE_DB, { readonly: true });
const read = db.prepare("SELECT body FROM bodies WHERE name = ?").pluck();
http.createServer((req, res) => {
  const body = read.get("flight-line");
  res.writeHead(200, { "content-type": "application/json", "content-length": body.length, "cache-control": "no-store" });
  res.end(body);
}).listen(Number(process.env.PORT), "127.0.0.1");
`;

function rssMb(pid: number): number {
  // next start may run its server in a child process: count the whole tree.
  let total = 0;
  const visit = (p: number) => {
    try {
      const status = fs.readFileSync(`/proc/${p}/status`, "utf8");
      const m = /VmRSS:\s+(\d+) kB/.exec(status);
      if (m) total += Number(m[1]) / 1024;
      for (const task of fs.readdirSync(`/proc/${p}/task`)) {
        const children = fs.readFileSync(`/proc/${p}/task/${task}/children`, "utf8").trim();
        for (const c of children ? children.split(/\s+/) : []) visit(Number(c));
      }
    } catch {
      // gone
    }
  };
  visit(pid);
  return total;
}

async function load(url: string, connections: number, headers: Record<string, string>, duration: number): Promise<AutocannonResult> {
  // autocannon ships no types: imported by a plain string.
  const autocannon = ((await import("autocannon" as string)) as { default: (opts: object, cb: (err: Error | null, r: AutocannonResult) => void) => void }).default;
  return new Promise((resolve, reject) => {
    autocannon({ url, connections, duration, headers, timeout: 10 }, (err: Error | null, result: AutocannonResult) => (err ? reject(err) : resolve(result)));
  });
}

function summarizeProfile(dir: string): string[] {
  const files = fs.readdirSync(dir).filter((f) => f.endsWith(".cpuprofile"));
  const self = new Map<string, number>();
  let total = 0;
  for (const f of files) {
    const prof = JSON.parse(fs.readFileSync(path.join(dir, f), "utf8")) as {
      nodes: { id: number; callFrame: { functionName: string; url: string; lineNumber: number } }[];
      samples: number[];
      timeDeltas: number[];
    };
    const byId = new Map(prof.nodes.map((n) => [n.id, n]));
    prof.samples.forEach((id, i) => {
      const n = byId.get(id);
      if (!n) return;
      const dt = prof.timeDeltas[i] ?? 0;
      const cf = n.callFrame;
      if (cf.functionName === "(idle)" || cf.functionName === "(program)") return;
      const url = cf.url.replace(/^file:\/\//, "").replace(root, "").replace(/.*node_modules\//, "~/");
      const key = `${cf.functionName || "(anonymous)"} ${url}:${cf.lineNumber + 1}`;
      self.set(key, (self.get(key) ?? 0) + dt);
      total += dt;
    });
  }
  return [...self.entries()].sort((a, b) => b[1] - a[1]).slice(0, 25).map(([k, us]) => `${((100 * us) / total).toFixed(1).padStart(5)}%  ${(us / 1000).toFixed(0).padStart(7)} ms  ${k}`);
}

async function main() {
  build();
  const tmp = fs.mkdtempSync(path.join(os.tmpdir(), "hangarline-bench-http-"));
  const dbFile = path.join(tmp, "bench.db");
  const t0 = performance.now();
  const { benchUser, demoUser, counts } = await makeDatabase(dbFile);
  console.log(`bench database: demo seed + ${BENCH_CLUB}: ${counts.a} aircraft, ${counts.f} flights, ${counts.s} squawks, ${counts.c} completions (${((performance.now() - t0) / 1000).toFixed(1)} s)`);

  const secret = randomBytes(33).toString("base64url");
  const appPort = await freePort();
  const barePort = await freePort();
  const base = `http://127.0.0.1:${appPort}`;
  const nodeArgs = cpuProfDir ? ["--cpu-prof", `--cpu-prof-dir=${cpuProfDir}`] : [];
  if (cpuProfDir) fs.mkdirSync(cpuProfDir, { recursive: true });
  if (dumpDir) fs.mkdirSync(dumpDir, { recursive: true });
  const children: ChildProcess[] = [];
  const app = spawn(process.execPath, [...nodeArgs, path.join(root, "node_modules/next/dist/bin/next"), "start", "-p", String(appPort), "-H", "127.0.0.1"], {
    cwd: root,
    env: {
      ...process.env,
      NODE_ENV: "production",
      NEXT_DIST_DIR: distDir,
      NEXT_TELEMETRY_DISABLED: "1",
      DATABASE_URL: dbFile,
      UPLOAD_DIR: path.join(tmp, "uploads"),
      AUTH_URL: base,
      APP_URL: base,
      AUTH_SECRET: secret,
      OUTBOX_WORKER: "off",
      RESEND_API_KEY: "re_bench",
      RESEND_BASE_URL: "http://127.0.0.1:9",
      STRIPE_SECRET_KEY: "sk_test_bench",
    },
    stdio: ["ignore", "ignore", "inherit"],
  });
  children.push(app);
  const stop = () => {
    for (const c of children) if (c.exitCode === null) c.kill("SIGTERM");
  };
  process.on("exit", stop);
  try {
    await waitFor(`${base}/sign-in`);
    const benchCookie = await mintCookie(secret, benchUser);
    const demoCookie = await mintCookie(secret, demoUser);

    // The bare server's bytes: the app's own answer for the bench club, stored in SQLite.
    const sample = await fetchRetry(`${base}/api/clubs/${BENCH_CLUB}/flight-line`, { headers: { cookie: benchCookie } });
    if (sample.status !== 200) throw new Error(`flight-line JSON answered ${sample.status}: is the minted session accepted?`);
    const bytes = Buffer.from(await sample.arrayBuffer());
    const bareDb = path.join(tmp, "bare.db");
    {
      const Database = (await import("better-sqlite3")).default;
      const b = new Database(bareDb);
      b.exec("CREATE TABLE bodies (name TEXT PRIMARY KEY, body BLOB NOT NULL)");
      b.prepare("INSERT INTO bodies VALUES ('flight-line', ?)").run(bytes);
      b.close();
    }
    const require = (await import("node:module")).createRequire(path.join(root, "package.json"));
    const bare = spawn(process.execPath, ["-e", BARE_SERVER], { env: { ...process.env, PORT: String(barePort), BARE_DB: bareDb, BETTER_SQLITE3: require.resolve("better-sqlite3") }, stdio: ["ignore", "ignore", "inherit"] });
    children.push(bare);
    await waitFor(`http://127.0.0.1:${barePort}/`);
    console.log(`flight-line JSON for ${BENCH_CLUB}: ${(bytes.length / 1024).toFixed(0)} KB; ${seconds} s per run; ${os.cpus().length} CPUs, load average ${os.loadavg().map((l) => l.toFixed(1)).join(" ")}`);

    const targets: { name: string; url: string; cookie: string | null; html?: boolean; floor?: boolean; conditional?: boolean }[] = [
      { name: `bare node:http + better-sqlite3 (same bytes)`, url: `http://127.0.0.1:${barePort}/`, cookie: null },
      // The framework's own floor on this machine: a small page with no data (the sign-in form).
      { name: `sign-in page (no data: the framework's floor)`, url: `${base}/sign-in`, cookie: null, html: true, floor: true },
      { name: `health route (no data: the framework's floor)`, url: `${base}/api/health`, cookie: null, floor: true },
      { name: `flight-line JSON, ${BENCH_CLUB}`, url: `${base}/api/clubs/${BENCH_CLUB}/flight-line`, cookie: benchCookie },
      // What the flight-line page's poll costs while nothing changed: it names the tag it holds.
      { name: `flight-line poll, unchanged (304), ${BENCH_CLUB}`, url: `${base}/api/clubs/${BENCH_CLUB}/flight-line`, cookie: benchCookie, conditional: true },
      { name: `flight-line JSON, ${DEMO_CLUB}`, url: `${base}/api/clubs/${DEMO_CLUB}/flight-line`, cookie: demoCookie },
      { name: `flight-line page, ${DEMO_CLUB}`, url: `${base}/clubs/${DEMO_CLUB}/flight-line`, cookie: demoCookie, html: true },
      { name: `club home, ${DEMO_CLUB}`, url: `${base}/clubs/${DEMO_CLUB}`, cookie: demoCookie, html: true },
      { name: `flight-line page, ${BENCH_CLUB}`, url: `${base}/clubs/${BENCH_CLUB}/flight-line`, cookie: benchCookie, html: true },
      { name: `bookings week page, ${BENCH_CLUB}`, url: `${base}/clubs/${BENCH_CLUB}/bookings`, cookie: benchCookie, html: true },
    ];
    const rows: Row[] = [];
    const bareRps: Record<number, number> = {};
    for (const t of targets) {
      const bare = !t.cookie && !t.floor;
      if (only && !bare && !t.name.includes(only)) continue;
      // Check the answer is the real page (not a redirect to sign-in), then warm up.
      const check = await fetchRetry(t.url, { headers: t.cookie ? { cookie: t.cookie } : {}, redirect: "manual" });
      const body = Buffer.from(await check.arrayBuffer());
      if (check.status !== 200) throw new Error(`${t.name} answered ${check.status}`);
      console.log(`  ${t.name}: ${(body.length / 1024).toFixed(1)} KB per answer`);
      if (dumpDir) fs.writeFileSync(path.join(dumpDir, `${t.name.replace(/[^a-z0-9]+/gi, "-")}.${t.html ? "html" : "json"}`), body);
      const headers: Record<string, string> = t.cookie ? { cookie: t.cookie } : {};
      if (t.html) headers.accept = "text/html";
      if (t.conditional) headers["if-none-match"] = check.headers.get("etag") ?? "";
      await load(t.url, 10, headers, 2);
      for (const connections of [10, 50]) {
        const r = await load(t.url, connections, headers, seconds);
        const row: Row = { name: t.name, connections, rps: r.requests.average, p50: r.latency.p50, p975: r.latency.p97_5, p99: r.latency.p99, errors: r.errors + r.timeouts + (t.conditional ? r["2xx"] : r.non2xx) };
        if (bare) bareRps[connections] = row.rps;
        else if (bareRps[connections]) row.ratio = bareRps[connections]! / Math.max(row.rps, 0.001);
        rows.push(row);
        console.log(`  ${row.name.padEnd(48)} c=${String(connections).padStart(2)}  ${row.rps.toFixed(0).padStart(6)} req/s  p50 ${String(row.p50).padStart(5)} ms  p97.5 ${String(row.p975).padStart(5)} ms  p99 ${String(row.p99).padStart(5)} ms  errors ${row.errors}${row.ratio ? `  bare/app ${row.ratio.toFixed(1)}×` : ""}`);
      }
    }
    const rss = rssMb(app.pid!);
    console.log(`\nnext start resident memory after the runs: ${rss.toFixed(0)} MB (target < 400 MB)`);
    console.log("\n| request | connections | req/s | p50 ms | p97.5 ms | p99 ms | errors | bare ÷ app |");
    console.log("|---|---|---|---|---|---|---|---|");
    for (const r of rows) console.log(`| ${r.name} | ${r.connections} | ${r.rps.toFixed(0)} | ${r.p50} | ${r.p975} | ${r.p99} | ${r.errors} | ${r.ratio ? `${r.ratio.toFixed(1)}×` : "–"} |`);
  } finally {
    const exited = new Promise((r) => (app.exitCode !== null ? r(null) : app.once("exit", r)));
    stop();
    await Promise.race([exited, new Promise((r) => setTimeout(r, 10_000))]);
    if (cpuProfDir) {
      console.log(`\nnext start CPU profile (${cpuProfDir}), top self time:`);
      for (const line of summarizeProfile(cpuProfDir)) console.log(`  ${line}`);
    }
    fs.rmSync(tmp, { recursive: true, force: true });
  }
}

// Run only as a script: `npm run bench` imports every module of this folder looking for run().
if (process.argv[1] && fileURLToPath(import.meta.url) === path.resolve(process.argv[1])) {
  await main();
  process.exit(0);
}
