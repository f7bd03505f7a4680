import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { randomBytes } from "node:crypto";
import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";

export const ROOT = path.resolve(import.meta.dirname, "../..");
// E2E_DIST_DIR lets a parallel worker keep its own build (default .next-e2e).
export const E2E_DIST = process.env.E2E_DIST_DIR ?? ".next-e2e";

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.once("error", reject);
    srv.listen(0, "127.0.0.1", () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
  });
}

function newestMtime(dir: string): number {
  let newest = 0;
  const stack = [dir];
  while (stack.length) {
    const d = stack.pop()!;
    for (const entry of fs.readdirSync(d, { withFileTypes: true })) {
      const p = path.join(d, entry.name);
      if (entry.isDirectory()) stack.push(p);
      else newest = Math.max(newest, fs.statSync(p).mtimeMs);
    }
  }
  return newest;
}

const SOURCE_DIRS = ["app", "components", "lib", "db", "emails", "permissions"];

/** Builds into .next-e2e unless a build newer than every source file is there already. */
export function ensureBuild(): void {
  const buildId = path.join(ROOT, E2E_DIST, "BUILD_ID");
  if (fs.existsSync(buildId) && process.env.E2E_REBUILD !== "1") {
    const built = fs.statSync(buildId).mtimeMs;
    const sources = Math.max(...SOURCE_DIRS.map((d) => newestMtime(path.join(ROOT, d))), fs.statSync(path.join(ROOT, "middleware.ts")).mtimeMs);
    if (built > sources) return;
  }
  const result = spawnSync(process.execPath, [path.join(ROOT, "node_modules/next/dist/bin/next"), "build"], {
    cwd: ROOT,
    env: { ...process.env, NEXT_DIST_DIR: E2E_DIST, NEXT_TELEMETRY_DISABLED: "1" },
    stdio: "inherit",
  });
  if (result.status !== 0) throw new Error("next build failed");
}

export function tempDir(): string {
  return fs.mkdtempSync(path.join(os.tmpdir(), "hangarline-e2e-"));
}

export async function startNext(port: number, env: Record<string, string>): Promise<ChildProcess> {
  const child = spawn(process.execPath, [path.join(ROOT, "node_modules/next/dist/bin/next"), "start", "-p", String(port), "-H", "127.0.0.1"], {
    cwd: ROOT,
    env: { ...process.env, ...env, NEXT_DIST_DIR: E2E_DIST, NEXT_TELEMETRY_DISABLED: "1", NODE_ENV: "production" },
    stdio: ["ignore", "pipe", "pipe"],
  });
  const log: string[] = [];
  child.stdout?.on("data", (d) => log.push(String(d)));
  child.stderr?.on("data", (d) => {
    log.push(String(d));
    if (process.env.E2E_VERBOSE) process.stderr.write(d);
  });
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`next start exited early:\n${log.join("")}`);
    try {
      const res = await fetch(`http://localhost:${port}/sign-in`);
      if (res.ok) return child;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  child.kill();
  throw new Error(`next start did not answer in time:\n${log.join("")}`);
}

export type Stack = { baseUrl: string; emailUrl: string; paymentsUrl: string; dataDir: string; close: () => Promise<void> };

/**
 * The whole test stack: a production build (kept when fresh), a fresh migrated database with the
 * demo seed, the fake e-mail and payments providers and `next start` on free ports. Used by the
 * browser tests' global setup and by `npm run bench:forms`.
 */
export async function startStack(): Promise<Stack> {
  ensureBuild();
  const dir = tempDir();
  const dbFile = path.join(dir, "e2e.db");
  process.env.DATABASE_URL = dbFile;
  const { openDatabase } = await import("@/db/client");
  const { migrateDatabase } = await import("@/db/migrate");
  const { seedDemo } = await import("@/db/seed/index");
  const db = openDatabase(dbFile);
  migrateDatabase(db);
  await seedDemo(db);
  db.$client.close();

  const appPort = await freePort();
  const baseUrl = `http://localhost:${appPort}`;
  const { startFakeEmailServer } = await import("@/fake-services/email/server");
  const { startFakePaymentsServer, DEFAULT_WEBHOOK_SECRET } = await import("@/fake-services/payments/server");
  const email = await startFakeEmailServer({ port: 0 });
  const payments = await startFakePaymentsServer({ port: 0, webhookUrl: `${baseUrl}/api/webhooks/payments`, webhookSecret: DEFAULT_WEBHOOK_SECRET });
  const paymentsPort = new URL(payments.url).port;

  const server = await startNext(appPort, {
    DATABASE_URL: dbFile,
    UPLOAD_DIR: path.join(dir, "uploads"),
    AUTH_URL: baseUrl,
    APP_URL: baseUrl,
    // A fresh random secret per run: the production server refuses published ones.
    AUTH_SECRET: randomBytes(33).toString("base64url"),
    RESEND_BASE_URL: email.url,
    RESEND_API_KEY: "re_e2e_local",
    PAYMENTS_HOST: "127.0.0.1",
    PAYMENTS_PORT: paymentsPort,
    PAYMENTS_PROTOCOL: "http",
    PAYMENTS_WEBHOOK_SECRET: DEFAULT_WEBHOOK_SECRET,
    STRIPE_SECRET_KEY: "sk_test_e2e",
    OUTBOX_INTERVAL_MS: "500",
  });

  return {
    baseUrl,
    emailUrl: email.url,
    paymentsUrl: payments.url,
    dataDir: dir,
    close: async () => {
      server.kill("SIGTERM");
      await Promise.all([email.close(), payments.close()]);
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}
