export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    // What the framework logs on its own (a page's or handler's uncaught error) is scrubbed of
    // SQL parameters and e-mail addresses like our own log lines.
    const { installConsoleScrubber } = await import("./lib/server/log");
    installConsoleScrubber();
  }
  if (process.env.NEXT_RUNTIME === "nodejs" && process.env.OUTBOX_WORKER !== "off") {
    const { startOutboxWorker } = await import("./lib/email/runner");
    startOutboxWorker();
  }
}
