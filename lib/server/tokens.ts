import { createCipheriv, createDecipheriv, createHash, hkdfSync, randomBytes } from "node:crypto";

export function newSecretToken(): string {
  return randomBytes(32).toString("base64url");
}

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

// A secret the app must show again later (a calendar link) is kept sealed: AES-256-GCM under a key
// derived from AUTH_SECRET (HKDF, its own purpose label), so a copy of the database alone does not
// reveal it. Lookups still go by the SHA-256 above. When AUTH_SECRET changes, old seals no longer
// open (openSecret answers null) but the links keep working: only showing them again needs a new one.
const DEVELOPMENT_SECRET = "hangarline-local-development-secret-change-me";
const SEAL_VERSION = "v1";

function sealKey(purpose: string): Buffer | null {
  const root = process.env.AUTH_SECRET ?? (process.env.NODE_ENV === "production" ? undefined : DEVELOPMENT_SECRET);
  if (!root) return null;
  return Buffer.from(hkdfSync("sha256", root, "hangarline-sealed-secret", purpose, 32));
}

/** `v1.<iv>.<tag>.<ciphertext>` (base64url), bound to its purpose; null without a key. */
export function sealSecret(secret: string, purpose: string): string | null {
  const key = sealKey(purpose);
  if (!key) return null;
  const iv = randomBytes(12);
  const cipher = createCipheriv("aes-256-gcm", key, iv);
  cipher.setAAD(Buffer.from(purpose));
  const body = Buffer.concat([cipher.update(secret, "utf8"), cipher.final()]);
  return [SEAL_VERSION, iv.toString("base64url"), cipher.getAuthTag().toString("base64url"), body.toString("base64url")].join(".");
}

/** The sealed secret, or null when it cannot be opened (no seal, another key, tampered). */
export function openSecret(sealed: string | null | undefined, purpose: string): string | null {
  if (!sealed) return null;
  const [version, iv, tag, body] = sealed.split(".");
  const key = sealKey(purpose);
  if (version !== SEAL_VERSION || !iv || !tag || body === undefined || !key) return null;
  try {
    const decipher = createDecipheriv("aes-256-gcm", key, Buffer.from(iv, "base64url"));
    decipher.setAAD(Buffer.from(purpose));
    decipher.setAuthTag(Buffer.from(tag, "base64url"));
    return Buffer.concat([decipher.update(Buffer.from(body, "base64url")), decipher.final()]).toString("utf8");
  } catch {
    return null;
  }
}
