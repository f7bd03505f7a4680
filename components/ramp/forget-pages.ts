"use client";
import { RAMP_PAGES_CACHE, type RampMessage } from "@/lib/ramp/pages";

/**
 * Signing out forgets the pages kept on this device for the ramp (the service worker also forgets
 * them whenever the sign-in page is asked for). Writes still waiting stay, kept under their
 * author's id: they are sent only when that person signs in again, never under someone else.
 */
export async function forgetRampPages(): Promise<void> {
  if (typeof caches !== "undefined") await caches.delete(RAMP_PAGES_CACHE).catch(() => false);
  if ("serviceWorker" in navigator) navigator.serviceWorker.controller?.postMessage({ type: "ramp:forget-pages" } satisfies RampMessage);
}
