// Ramp mode: which pages the service worker keeps for a pilot with no signal, and the names the
// worker (app/sw.ts) and the pages (components/ramp/) share. Pure: no framework, no storage.

/**
 * The pages a pilot needs on the ramp: the flight line, an aircraft's page, and a booking's
 * preflight and weight and balance. Nothing else is kept: no money, no member lists, no API answers.
 */
const RAMP_PAGE = /^\/clubs\/[a-z0-9-]+\/(?:flight-line|aircraft\/[A-Za-z0-9_-]+|bookings\/[A-Za-z0-9_-]+\/(?:preflight|weight-balance))\/?$/;

export function isRampPage(pathname: string): boolean {
  return RAMP_PAGE.test(pathname);
}

/** The one cache of pages; emptied on sign-out and whenever the sign-in page is shown. */
export const RAMP_PAGES_CACHE = "hangarline-ramp-pages";

/** Shown when a page was never kept and there is no signal (public/offline.html, precached). */
export const OFFLINE_FALLBACK_URL = "/offline.html";

/** Messages from a page to the worker. */
export type RampMessage = { type: "ramp:keep-page"; url: string } | { type: "ramp:forget-pages" };

/** The cache key of a page: its path alone, so "?reported=…" and the plain page are one entry. */
export function pageCacheKey(url: string, origin: string): string | null {
  let parsed: URL;
  try {
    parsed = new URL(url, origin);
  } catch {
    return null;
  }
  if (parsed.origin !== origin || !isRampPage(parsed.pathname)) return null;
  return `${parsed.origin}${parsed.pathname.replace(/\/$/, "")}`;
}

/** A path where no one is signed in (or someone new is about to be): every kept page goes. */
export function isSignedOutPath(pathname: string): boolean {
  return pathname === "/sign-in" || pathname.startsWith("/sign-in/");
}
