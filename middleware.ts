import { NextResponse, type NextRequest } from "next/server";

// Three cheap jobs, none of them the guard (every page, handler and action checks the session,
// club and ability again on the server):
// 1. a Content-Security-Policy on every response it sees: a fresh nonce per page request (the
//    framework reads it from the request's CSP header and puts it on its own scripts), a strict
//    one for route handlers;
// 2. state-changing route handlers answer only same-origin JSON (a cross-site form or a
//    `text/plain` fetch is refused before any handler runs);
// 3. no session cookie on a club or operator page → the sign-in page.
// The fixed headers (nosniff, Referrer-Policy, Permissions-Policy, HSTS) come from
// next.config.mjs, which also covers the static files this middleware does not run for.

const SESSION_COOKIES = ["authjs.session-token", "__Secure-authjs.session-token"];
const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * Route handlers that check their own caller: Auth.js has its own CSRF token; the webhook is signed;
 * the scheduled tick is called by a machine with a bearer secret (CRON_SECRET), never by a browser.
 */
export const CALLER_CHECKED_ELSEWHERE = [/^\/api\/auth(\/|$)/, /^\/api\/webhooks\/payments\/?$/, /^\/api\/cron\/tick\/?$/];
/** Route handlers that take a file in a multipart body (none today: uploads go through server actions). */
export const MULTIPART_ROUTES: RegExp[] = [];
/**
 * Route handlers that set their own Content-Security-Policy. Next keeps a header the middleware
 * set and drops the handler's header of the same name, so these get none from here.
 */
export const OWN_CSP_ROUTES = [/^\/api\/clubs\/[^/]+\/uploads\/[^/]+\/?$/];

/** For JSON, files and redirects from /api: nothing may run, load, or frame it. */
export const API_CSP = "default-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'";

/**
 * For the service worker script (/sw.js, built from app/sw.ts): its own policy governs the worker.
 * It runs no inline script and loads none (a nonce means nothing to a worker), and fetches only from us.
 */
export const WORKER_CSP = "default-src 'self'; script-src 'self'; connect-src 'self'; img-src 'self'; object-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'";

export function newNonce(): string {
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  return btoa(String.fromCharCode(...bytes));
}

/** The page policy: scripts only with this request's nonce (and what they load), nothing from elsewhere. */
export function pageCsp(nonce: string, opts: { dev?: boolean; https?: boolean } = {}): string {
  return [
    "default-src 'self'",
    // 'strict-dynamic': chunks loaded by a nonced script run too; 'unsafe-eval' only for dev's fast refresh.
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${opts.dev ? " 'unsafe-eval'" : ""}`,
    // <style>/<link> need the nonce or to be ours; style="…" attributes (charts, layout widths)
    // are allowed on their own: they cannot run code and every load they could start is 'self'.
    `style-src 'self' 'nonce-${nonce}'`,
    // Dev injects <style> elements from script without a nonce ('unsafe-inline' counts only without one).
    opts.dev ? "style-src-elem 'self' 'unsafe-inline'" : `style-src-elem 'self' 'nonce-${nonce}'`,
    "style-src-attr 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self'",
    "connect-src 'self'",
    "media-src 'self'",
    "object-src 'none'",
    "frame-src 'none'",
    "worker-src 'self'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
    ...(opts.https ? ["upgrade-insecure-requests"] : []),
  ].join("; ");
}

/** The origin browsers of this app send: the configured public URL, else the request's own. */
export function expectedOrigin(request: NextRequest): string {
  const configured = process.env.AUTH_URL;
  if (configured) {
    try {
      return new URL(configured).origin;
    } catch {
      // a malformed AUTH_URL is refused at start-up elsewhere; fall back to the request
    }
  }
  return request.nextUrl.origin;
}

function refuse(status: 403 | 415, code: string, message: string): NextResponse {
  const res = NextResponse.json({ error: { code, message } }, { status });
  res.headers.set("Content-Security-Policy", API_CSP);
  res.headers.set("Cache-Control", "no-store");
  return res;
}

function mediaType(request: NextRequest): string {
  return (request.headers.get("content-type") ?? "").split(";")[0]!.trim().toLowerCase();
}

/** null when a state-changing /api request may go on; otherwise the refusal. */
export function checkApiWrite(request: NextRequest): NextResponse | null {
  const path = request.nextUrl.pathname;
  if (SAFE_METHODS.has(request.method) || CALLER_CHECKED_ELSEWHERE.some((re) => re.test(path))) return null;
  const origin = request.headers.get("origin");
  if (!origin) return refuse(403, "forbidden", "This request has no Origin header; changes are accepted only from this site's own pages.");
  if (origin !== expectedOrigin(request)) return refuse(403, "forbidden", "This request comes from another site; changes are accepted only from this site's own pages.");
  const type = mediaType(request);
  const multipartAllowed = MULTIPART_ROUTES.some((re) => re.test(path));
  if (type === "application/json" || (multipartAllowed && type === "multipart/form-data")) return null;
  return refuse(415, "unsupported_media_type", multipartAllowed ? "Send the request as JSON or multipart/form-data." : "Send the request as JSON (Content-Type: application/json).");
}

function isHttps(request: NextRequest): boolean {
  return request.nextUrl.protocol === "https:" || (request.headers.get("x-forwarded-proto") ?? "").split(",")[0]!.trim() === "https";
}

export function middleware(request: NextRequest): NextResponse {
  const path = request.nextUrl.pathname;

  if (path === "/api" || path.startsWith("/api/")) {
    const refused = checkApiWrite(request);
    if (refused) return refused;
    const res = NextResponse.next();
    if (!OWN_CSP_ROUTES.some((re) => re.test(path))) res.headers.set("Content-Security-Policy", API_CSP);
    return res;
  }

  if (path === "/sw.js") {
    const res = NextResponse.next();
    res.headers.set("Content-Security-Policy", WORKER_CSP);
    return res;
  }

  const nonce = newNonce();
  const csp = pageCsp(nonce, { dev: process.env.NODE_ENV === "development", https: isHttps(request) });

  const needsSession = path.startsWith("/clubs/") || path === "/clubs" || path === "/operator" || path.startsWith("/operator/");
  const hasSession = SESSION_COOKIES.some((name) => request.cookies.has(name));
  if (needsSession && !hasSession) {
    const url = request.nextUrl.clone();
    url.pathname = "/sign-in";
    url.search = `?callbackUrl=${encodeURIComponent(request.nextUrl.pathname + request.nextUrl.search)}`;
    const res = NextResponse.redirect(url);
    res.headers.set("Content-Security-Policy", csp);
    return res;
  }

  const requestHeaders = new Headers(request.headers);
  requestHeaders.set("x-nonce", nonce);
  requestHeaders.set("Content-Security-Policy", csp);
  const res = NextResponse.next({ request: { headers: requestHeaders } });
  res.headers.set("Content-Security-Policy", csp);
  return res;
}

// Everything but the build's static files (next.config.mjs gives those their headers). It runs
// in the Node.js runtime, in the server's own process and event loop: the edge runtime would
// rebuild every request and response inside a sandbox first, a cost every page and poll paid.
export const config = { matcher: ["/((?!_next/static/|_next/image).*)"], runtime: "nodejs" };
