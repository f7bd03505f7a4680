/// <reference lib="webworker" />
// The service worker (built by @serwist/next into public/sw.js, served from our origin at scope "/").
// - Precaches the build's static files (scripts, styles, fonts, icons) and the offline page.
// - Keeps the ramp pages (lib/ramp/pages.ts) network-first: fresh when there is signal, the kept
//   copy when there is none. Only page HTML of the signed-in person; never an API answer, never a
//   redirect (an ended session's sign-in page), never anything under /api.
// - Forgets every kept page on sign-out (a message from the page) and whenever the sign-in page
//   is asked for, so nothing kept for one person is shown to the next.
// - POSTs (server actions) pass straight through: a write with no signal is kept by the page
//   (components/ramp/queue-store.ts), which knows whose it is and sends it with its idempotency key.
import { NetworkFirst, NetworkOnly, Serwist, type PrecacheEntry, type SerwistGlobalConfig, type SerwistPlugin } from "serwist";
import { OFFLINE_FALLBACK_URL, RAMP_PAGES_CACHE, isRampPage, isSignedOutPath, pageCacheKey, type RampMessage } from "@/lib/ramp/pages";

declare global {
  interface WorkerGlobalScope extends SerwistGlobalConfig {
    __SW_MANIFEST: (PrecacheEntry | string)[] | undefined;
  }
}
declare const self: ServiceWorkerGlobalScope;

/** Kept only: a 200 page of ours, not reached through a redirect (a session that ended → sign-in). */
function keepable(response: Response): boolean {
  return response.status === 200 && !response.redirected && response.type === "basic" && (response.headers.get("content-type") ?? "").startsWith("text/html");
}

/**
 * Bumped on every forget: a page fetched before it (a keep still under way when the person signed
 * out) is not put back afterwards.
 */
let generation = 0;
/** Puts under way: a forget waits for them, then deletes, so none lands after it. */
const putting = new Set<Promise<void>>();

async function forgetPages(): Promise<void> {
  generation += 1;
  await Promise.allSettled([...putting]);
  await caches.delete(RAMP_PAGES_CACHE);
}

const rampPagePlugin: SerwistPlugin = {
  // One entry per page, whatever its query string ("?reported=…" is a confirmation, not a page).
  cacheKeyWillBeUsed: async ({ request }) => pageCacheKey(request.url, self.location.origin) ?? request.url,
  requestWillFetch: async ({ request, state }) => {
    if (state) state.generation = generation;
    return request;
  },
  cacheWillUpdate: async ({ response, state }) => (keepable(response) && (state?.generation ?? generation) === generation ? response : null),
  fetchDidSucceed: async ({ response }) => {
    // The session ended and the server sent the sign-in page instead: what was kept is no longer this person's to see.
    if (response.redirected && isSignedOutPath(new URL(response.url).pathname)) await forgetPages();
    return response;
  },
};

const serwist = new Serwist({
  precacheEntries: self.__SW_MANIFEST,
  // A new worker takes over at once: the pages it keeps and the rules it keeps them by are the build's own.
  skipWaiting: true,
  clientsClaim: true,
  navigationPreload: false,
  runtimeCaching: [
    {
      matcher: ({ request, url, sameOrigin }) => sameOrigin && request.mode === "navigate" && isRampPage(url.pathname),
      handler: new NetworkFirst({
        cacheName: RAMP_PAGES_CACHE,
        // One bar of signal: after this long the kept copy is shown (the network answer still refreshes it).
        networkTimeoutSeconds: 8,
        matchOptions: { ignoreVary: true, ignoreSearch: true },
        plugins: [rampPagePlugin],
      }),
    },
    // Any other page: the network only, the offline page when there is none.
    { matcher: ({ request, sameOrigin }) => sameOrigin && request.mode === "navigate", handler: new NetworkOnly() },
  ],
  fallbacks: { entries: [{ url: OFFLINE_FALLBACK_URL, matcher: ({ request }) => request.mode === "navigate" }] },
});

self.addEventListener("fetch", (event) => {
  const url = new URL(event.request.url);
  if (url.origin === self.location.origin && event.request.method === "GET" && isSignedOutPath(url.pathname)) event.waitUntil(forgetPages());
});

/** A page asks to keep the ramp page it shows (reached by client-side navigation, so no HTML came through here). */
async function keepPage(url: string): Promise<void> {
  const key = pageCacheKey(url, self.location.origin);
  if (!key) return;
  const startedIn = generation;
  const response = await fetch(key, { credentials: "same-origin", redirect: "follow", headers: { Accept: "text/html" } });
  if (!keepable(response)) {
    if (response.redirected && isSignedOutPath(new URL(response.url).pathname)) await forgetPages();
    return;
  }
  if (startedIn !== generation) return;
  const put = caches.open(RAMP_PAGES_CACHE).then((cache) => (startedIn === generation ? cache.put(key, response) : undefined));
  putting.add(put);
  try {
    await put;
  } finally {
    putting.delete(put);
  }
}

self.addEventListener("message", (event) => {
  const message = event.data as RampMessage | undefined;
  // Only our own pages can reach a worker (same origin by construction); the URL is checked again in keepPage.
  if (!message || typeof message !== "object") return;
  if (message.type === "ramp:keep-page" && typeof message.url === "string") event.waitUntil(keepPage(message.url).catch(() => undefined));
  else if (message.type === "ramp:forget-pages") event.waitUntil(forgetPages());
});

serwist.addEventListeners();
