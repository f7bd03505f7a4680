// Every absolute link the app hands out (sign-in links, invitations, statements, notices, feeds)
// is built here from the configured address, never from a request's Host or X-Forwarded-Host.

const DEVELOPMENT_BASE = "http://localhost:3000";

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
