import { randomBytes } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import type { TestProject } from "vitest/node";
import { ensureBuild, freePort, startNext, tempDir } from "./stack";

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    emailUrl: string;
    paymentsUrl: string;
    dataDir: string;
  }
}

export default async function setup(project: TestProject) {
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

  project.provide("baseUrl", baseUrl);
  project.provide("emailUrl", email.url);
  project.provide("paymentsUrl", payments.url);
  project.provide("dataDir", dir);

  return async () => {
    server.kill("SIGTERM");
    await Promise.all([email.close(), payments.close()]);
    fs.rmSync(dir, { recursive: true, force: true });
  };
}
