// The demo's own session secret: random, made once, kept in the data folder (owner-only) and
// reused, so sessions survive a restart and no published secret ever signs one.
import { randomBytes } from "node:crypto";
import fs from "node:fs";
import path from "node:path";

export const SECRET_FILE = ".auth-secret";

/** Returns the secret stored in `dataDir`, making it first when there is none (or it is too short). */
export function demoAuthSecret(dataDir) {
  const file = path.join(dataDir, SECRET_FILE);
  fs.mkdirSync(dataDir, { recursive: true });
  try {
    const existing = fs.readFileSync(file, "utf8").trim();
    if (existing.length >= 32) {
      fs.chmodSync(file, 0o600);
      return existing;
    }
  } catch {
    // not made yet
  }
  const secret = randomBytes(33).toString("base64url");
  fs.writeFileSync(file, `${secret}\n`, { mode: 0o600 });
  fs.chmodSync(file, 0o600);
  return secret;
}
