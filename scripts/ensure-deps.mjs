// Installs what is missing, as a newcomer on a fresh machine needs: npm packages from the
// lockfile, and (for browser tests) Debian's chromium. Never downloads a browser of its own.
import { execSync, spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";

const root = path.resolve(import.meta.dirname, "..");

function run(cmd, opts = {}) {
  console.log(`$ ${cmd}`);
  execSync(cmd, { stdio: "inherit", cwd: root, ...opts });
}

export function ensureNodeModules() {
  const lock = path.join(root, "package-lock.json");
  const marker = path.join(root, "node_modules", ".package-lock.json");
  const stale = !fs.existsSync(marker) || fs.statSync(marker).mtimeMs < fs.statSync(lock).mtimeMs;
  let sqliteOk = false;
  if (!stale) {
    sqliteOk = spawnSync(process.execPath, ["-e", "new (require('better-sqlite3'))(':memory:').prepare('select 1').get()"], { cwd: root }).status === 0;
  }
  if (stale || !sqliteOk) run("npm ci --no-audit --no-fund");
}

export function ensureChromium() {
  if (fs.existsSync(process.env.CHROMIUM_PATH ?? "/usr/bin/chromium")) return;
  const sudo = process.getuid && process.getuid() !== 0 ? "sudo " : "";
  run(`${sudo}apt-get update -qq`);
  run(`${sudo}env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium`);
}

if (import.meta.url === `file://${process.argv[1]}`) {
  ensureNodeModules();
  if (process.argv.includes("--browser")) ensureChromium();
}
