import "server-only";
import { cookies } from "next/headers";
import { decode } from "next-auth/jwt";
import { cache } from "react";
import { eq } from "drizzle-orm";
import { auth } from "@/auth";
import { getDb, type Db } from "@/db/client";
import { users, type User } from "@/db/schema";
import { isSessionCurrent, type SessionClaims } from "@/lib/auth/sessions";
import { LruCache } from "@/lib/cache/lru";

export type SessionUser = Pick<User, "id" | "email" | "name" | "platformRole">;

// Every request reads the session. The cookie is an encrypted JWT (Auth.js, see auth.ts); going
// through auth() for it derives the key, decrypts, re-encrypts a refreshed token that a server
// component cannot even set, and builds and parses a JSON response. Here the cookie is decrypted
// with the same Auth.js function and key, once per distinct cookie value (kept until its expiry
// in a bounded map), and what matters on every request is asked of the database every time:
// is the account active, was the session revoked (isSessionCurrent, as the JWT callback does).
// A cookie this path cannot read goes through auth() itself, so nothing is accepted here that
// Auth.js would refuse, and nothing Auth.js accepts is lost.

const SESSION_COOKIE_NAMES = ["__Secure-authjs.session-token", "authjs.session-token"];
const DEVELOPMENT_SECRET = "hangarline-local-development-secret-change-me";
const decoded = new LruCache<string, SessionClaims & { exp?: unknown }>({ maxEntries: 10_000, maxBytes: 16 * 1024 * 1024 });

function secret(): string | undefined {
  return process.env.AUTH_SECRET ?? (process.env.NODE_ENV === "production" ? undefined : DEVELOPMENT_SECRET);
}

/** The session cookie's value and name (joined from its chunks when Auth.js split it). */
function sessionCookie(jar: Awaited<ReturnType<typeof cookies>>): { name: string; value: string } | null {
  for (const name of SESSION_COOKIE_NAMES) {
    const whole = jar.get(name)?.value;
    if (whole) return { name, value: whole };
    const chunks = jar.getAll().filter((c) => c.name.startsWith(`${name}.`)).sort((a, b) => Number(a.name.slice(name.length + 1)) - Number(b.name.slice(name.length + 1)));
    if (chunks.length) return { name, value: chunks.map((c) => c.value).join("") };
  }
  return null;
}

async function claimsOf(cookie: { name: string; value: string }): Promise<(SessionClaims & { exp?: unknown }) | null> {
  const key = `${cookie.name}=${cookie.value}`;
  const nowSeconds = Date.now() / 1000;
  const kept = decoded.get(key);
  if (kept) return typeof kept.exp === "number" && kept.exp > nowSeconds ? kept : null;
  const s = secret();
  if (!s) return null;
  try {
    const payload = await decode({ token: cookie.value, secret: s, salt: cookie.name });
    if (!payload || typeof payload.exp !== "number") return null;
    decoded.set(key, payload, key.length + 512);
    return payload;
  } catch {
    return null;
  }
}

function activeUser(db: Db, id: string): SessionUser | null {
  const user = db
    .select({ id: users.id, email: users.email, name: users.name, platformRole: users.platformRole, disabledAt: users.disabledAt })
    .from(users)
    .where(eq(users.id, id))
    .get();
  if (!user || user.disabledAt) return null;
  return { id: user.id, email: user.email, name: user.name, platformRole: user.platformRole };
}

/** The signed-in, active account, read fresh from the database (a disabled account has none). Once per request. */
export const getSessionUser = cache(async (): Promise<SessionUser | null> => {
  const jar = await cookies();
  const cookie = sessionCookie(jar);
  if (!cookie) return null;
  const db = getDb();
  const claims = await claimsOf(cookie);
  if (claims) {
    // As the JWT callback: a revoked or deactivated session is no session.
    if (!isSessionCurrent(db, claims) || typeof claims.sub !== "string") return null;
    return activeUser(db, claims.sub);
  }
  // Not readable here (another secret in rotation, an older format): Auth.js decides.
  const session = await auth();
  const id = session?.user?.id;
  return id ? activeUser(db, id) : null;
});
