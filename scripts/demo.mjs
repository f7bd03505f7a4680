// `npm run demo`: install if missing, migrate and seed ./data/hangarline.db (or DATABASE_URL),
// build, then serve the app on :3000 with the local e-mail and payment stand-ins.
import { spawn, spawnSync } from "node:child_process";
import path from "node:path";
import { demoAuthSecret } from "./demo-secret.mjs";
import { ensureNodeModules } from "./ensure-deps.mjs";

const root = path.resolve(import.meta.dirname, "..");
ensureNodeModules();

const PORT = process.env.PORT ?? "3000";
const EMAIL_PORT = process.env.EMAIL_PORT ?? "3100";
const PAYMENTS_PORT = process.env.PAYMENTS_PORT ?? "3200";
const appUrl = process.env.APP_URL ?? `http://localhost:${PORT}`;
const databaseUrl = process.env.DATABASE_URL ?? "./data/hangarline.db";

const env = {
  ...process.env,
  DATABASE_URL: databaseUrl,
  UPLOAD_DIR: process.env.UPLOAD_DIR ?? "./data/uploads",
  AUTH_URL: process.env.AUTH_URL ?? appUrl,
  APP_URL: appUrl,
  // Made once into the data folder (data/.auth-secret, owner-only) and reused.
  AUTH_SECRET: process.env.AUTH_SECRET ?? demoAuthSecret(path.dirname(path.resolve(root, databaseUrl.replace(/^file:/, "")))),
  RESEND_BASE_URL: process.env.RESEND_BASE_URL ?? `http://127.0.0.1:${EMAIL_PORT}`,
  RESEND_API_KEY: process.env.RESEND_API_KEY ?? "re_local_demo",
  PAYMENTS_HOST: process.env.PAYMENTS_HOST ?? "127.0.0.1",
  PAYMENTS_PORT,
  PAYMENTS_PROTOCOL: process.env.PAYMENTS_PROTOCOL ?? "http",
  PAYMENTS_WEBHOOK_URL: `${appUrl}/api/webhooks/payments`,
  PAYMENTS_WEBHOOK_SECRET: process.env.PAYMENTS_WEBHOOK_SECRET ?? "whsec_fake_local_secret",
  PAYMENTS_PUBLIC_URL: process.env.PAYMENTS_PUBLIC_URL ?? `http://localhost:${PAYMENTS_PORT}`,
  STRIPE_SECRET_KEY: process.env.STRIPE_SECRET_KEY ?? "sk_test_local_demo",
  NEXT_TELEMETRY_DISABLED: "1",
};
const tsx = path.join(root, "node_modules", ".bin", "tsx");
const next = path.join(root, "node_modules", "next", "dist", "bin", "next");

function step(name, cmd, args) {
  console.log(`\n=== ${name} ===`);
  const r = spawnSync(cmd, args, { cwd: root, env, stdio: "inherit" });
  if (r.status !== 0) process.exit(r.status ?? 1);
}

// The seed writes through db/queries, whose modules import "server-only": load them as the server does.
step("migrate and seed", tsx, ["--conditions=react-server", "db/seed/index.ts"]);
step("build", process.execPath, [next, "build"]);

const children = [
  spawn(tsx, ["fake-services/email/server.ts"], { cwd: root, env: { ...env, PORT: EMAIL_PORT }, stdio: "inherit" }),
  spawn(tsx, ["fake-services/payments/server.ts"], { cwd: root, env: { ...env, PORT: PAYMENTS_PORT }, stdio: "inherit" }),
  spawn(process.execPath, [next, "start", "-p", PORT], { cwd: root, env, stdio: "inherit" }),
];
console.log(`
Hangarline is starting:
  app                   ${appUrl}            (sign in with a demo account from the README)
  e-mail outbox viewer  http://localhost:${EMAIL_PORT}/
  payment provider      http://localhost:${PAYMENTS_PORT}/
Press Ctrl+C to stop.`);
const stop = () => {
  for (const c of children) c.kill("SIGTERM");
  process.exit(0);
};
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
for (const c of children) c.on("exit", (code) => { if (code && code !== 0) { console.error("A service stopped; shutting down."); stop(); } });
