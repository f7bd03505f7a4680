"use client";
import { usePathname } from "next/navigation";
import { useEffect, useSyncExternalStore } from "react";
import { isRampPage, type RampMessage } from "@/lib/ramp/pages";
import { refusedMessage, waitingMessage } from "@/lib/ramp/queue";
import { dismiss, flushQueue, getServerSnapshot, getSnapshot, setOnline, startRamp, subscribe } from "./queue-store";

// `next dev` rebuilds pages on every request; a worker serving kept copies would hide changes.
const SERVICE_WORKER_ON = process.env.NODE_ENV === "production";

function tellWorker(message: RampMessage) {
  if (!SERVICE_WORKER_ON || !("serviceWorker" in navigator)) return;
  void navigator.serviceWorker.ready.then((reg) => reg.active?.postMessage(message));
}

/**
 * Ramp mode for one signed-in person on a club's pages: registers the service worker, asks it to
 * keep each ramp page this person opens (client-side navigation fetches no HTML it could keep),
 * sends what waits on the device when there is signal (on load, on `online`, on coming back to the
 * app, and now and then while the browser claims signal it may not have), and shows the
 * queue's state in one status region at the foot of the screen.
 */
export function RampMode({ userId }: { userId: string }) {
  const pathname = usePathname();

  useEffect(() => {
    if (SERVICE_WORKER_ON && "serviceWorker" in navigator) {
      navigator.serviceWorker.register("/sw.js", { scope: "/" }).catch(() => {
        // No worker (private mode, an old browser): the app works as before, without ramp pages.
      });
    }
  }, []);

  useEffect(() => {
    void startRamp(userId);
    const online = () => {
      setOnline(true);
      void flushQueue();
    };
    const offline = () => setOnline(false);
    // Back to the app after the phone slept in a pocket: try what waits.
    const visible = () => {
      if (document.visibilityState === "visible") void flushQueue();
    };
    window.addEventListener("online", online);
    window.addEventListener("offline", offline);
    document.addEventListener("visibilitychange", visible);
    return () => {
      window.removeEventListener("online", online);
      window.removeEventListener("offline", offline);
      document.removeEventListener("visibilitychange", visible);
    };
  }, [userId]);

  useEffect(() => {
    if (isRampPage(pathname) && navigator.onLine) tellWorker({ type: "ramp:keep-page", url: window.location.href });
  }, [pathname]);

  return <RampStatus />;
}

export function RampStatus() {
  const snap = useSyncExternalStore(subscribe, getSnapshot, getServerSnapshot);
  const waiting = snap.userId ? waitingMessage(snap.entries, snap.userId) : null;
  const refused = snap.entries.filter((e) => e.state === "refused");
  const shown = Boolean(waiting || refused.length || snap.notices.length || !snap.online);
  return (
    <div role="status" aria-live="polite" data-ramp-status className={shown ? "sticky bottom-0 z-40 border-t-4 border-sock-500 bg-fin-900 px-4 py-3 text-sand-50 pb-[max(0.75rem,env(safe-area-inset-bottom))]" : "sr-only"}>
      {shown ? (
        <div className="mx-auto max-w-5xl space-y-2 text-sm">
          {!snap.online ? <p className="font-bold">No signal. Pages you opened here are kept on this phone; new squawks and preflight records wait on it.</p> : null}
          {waiting ? (
            <p className="flex items-start gap-2">
              <svg aria-hidden="true" viewBox="0 0 16 16" className="mt-0.5 h-4 w-4 shrink-0" data-shape="clock"><circle cx="8" cy="8" r="6.5" fill="none" stroke="currentColor" strokeWidth="2" /><path d="M8 4v4l3 2" fill="none" stroke="currentColor" strokeWidth="2" /></svg>
              <span>{waiting}{snap.sending ? " Sending now…" : ""}</span>
            </p>
          ) : null}
          {refused.map((e) => (
            <p key={e.id} className="flex flex-wrap items-start gap-2 rounded bg-stop-100 px-2 py-1 text-stop-800">
              <span className="min-w-0 flex-1">{refusedMessage(e, e.refusal ?? "The server refused it.")}</span>
              <button type="button" className="underline" onClick={() => void dismiss(e.id)}>Dismiss</button>
            </p>
          ))}
          {snap.notices.map((n) => (
            <p key={n.id} className="flex flex-wrap items-start gap-2">
              <span aria-hidden="true">✓</span>
              <span className="min-w-0 flex-1">{n.text}</span>
              <button type="button" className="text-sand-50 underline" onClick={() => void dismiss(n.id)}>Dismiss</button>
            </p>
          ))}
        </div>
      ) : null}
    </div>
  );
}
