"use client";
import { useEffect } from "react";

/**
 * How long a client-side navigation may take to show anything (the new page, its loading state, or
 * any other address) before the page is loaded the plain way. Shared with the forms' follow-ups
 * (components/ui/use-form-action.ts).
 */
export const NAVIGATION_PATIENCE_MS = 6_000;

/** The link a click follows on this site, or null (another origin, a new tab, a download, a jump within the page). */
function followedLink(event: MouseEvent): URL | null {
  if (event.button !== 0 || event.metaKey || event.ctrlKey || event.shiftKey || event.altKey) return null;
  const anchor = event.target instanceof Element ? event.target.closest("a[href]") : null;
  if (!(anchor instanceof HTMLAnchorElement)) return null;
  if ((anchor.target && anchor.target !== "_self") || anchor.hasAttribute("download")) return null;
  const url = new URL(anchor.href, window.location.href);
  if (url.origin !== window.location.origin) return null;
  if (url.pathname === window.location.pathname && url.search === window.location.search) return null;
  return url;
}

/**
 * A link the router took over (the framework's `<Link>` stops the browser's own navigation) must
 * lead somewhere. Under load the router can park a navigation that never commits: the address
 * stays, the old page stays, and the tap seems to do nothing. If nothing has changed after
 * NAVIGATION_PATIENCE_MS, the page the person asked for is loaded the plain way. Any change of
 * address meanwhile (the page, its loading state, a redirect, another tap, the back button) ends
 * the wait.
 */
export function NavigationWatchdog() {
  useEffect(() => {
    let timer: number | undefined;
    // Bubbling to window: the router's own click handler (on the document) has run by now.
    const onClick = (event: MouseEvent) => {
      if (!event.defaultPrevented) return; // the browser navigates itself, or nothing was a link
      const target = followedLink(event);
      if (!target) return;
      const from = window.location.href;
      window.clearTimeout(timer);
      timer = window.setTimeout(() => {
        if (window.location.href === from) window.location.assign(target.href);
      }, NAVIGATION_PATIENCE_MS);
    };
    window.addEventListener("click", onClick);
    return () => {
      window.removeEventListener("click", onClick);
      window.clearTimeout(timer);
    };
  }, []);
  return null;
}
