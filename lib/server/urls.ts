// Every absolute link the app hands out (sign-in links, invitations, statements, notices, feeds)
// is built here from the configured address, never from a request's Host or X-Forwarded-Host.

const DEVELOPMENT_BASE = "http://localhost:3000";

/** True when AUTH_URL or APP_URL names the portal's address. */
export function hasConfiguredBaseUrl(env: Record<string, string | undefined> = process.env): boolean {
  return Boolean(env.AUTH_URL?.trim() || env.APP_URL?.trim());
}

/** The configured address (AUTH_URL, or APP_URL where an older setup names only that). */
export function configuredBaseUrl(env: Record<string, string | undefined> = process.env): string {
  const configured = env.AUTH_URL?.trim() || env.APP_URL?.trim();
  if (configured) return new URL(configured).href.replace(/\/$/, "");
  if (env.NODE_ENV === "production") {
    throw new Error("AUTH_URL is not set: Hangarline builds no link from a request's Host header. Set AUTH_URL to the portal's address.");
  }
  return DEVELOPMENT_BASE;
}

export function appUrl(path = "/"): string {
  return `${configuredBaseUrl()}${path.startsWith("/") ? path : `/${path}`}`;
}

/** The same path and query on the configured origin, whatever host a link was first built with. */
export function onConfiguredOrigin(url: string): string {
  const parsed = new URL(url);
  return new URL(`${parsed.pathname}${parsed.search}`, new URL(configuredBaseUrl()).origin).href;
}

/**
 * Where to send someone after signing in: a path on our own address. An absolute address on any
 * other origin (a forged Host may have put one there) keeps only its path.
 */
export function safeRedirectTarget(target: string | null | undefined, fallbackPath = "/clubs", origin?: string): string {
  const base = origin ?? new URL(configuredBaseUrl()).origin;
  if (!target) return `${base}${fallbackPath}`;
  try {
    const parsed = new URL(target, base);
    if (parsed.protocol !== "http:" && parsed.protocol !== "https:") return `${base}${fallbackPath}`;
    return new URL(`${parsed.pathname}${parsed.search}${parsed.hash}`, base).href;
  } catch {
    return `${base}${fallbackPath}`;
  }
}

/** A sign-in link moved onto the configured origin, its callbackUrl too. */
export function signInLinkOnConfiguredOrigin(url: string): string {
  const moved = new URL(onConfiguredOrigin(url));
  const callback = moved.searchParams.get("callbackUrl");
  if (callback !== null) moved.searchParams.set("callbackUrl", safeRedirectTarget(callback));
  return moved.href;
}
