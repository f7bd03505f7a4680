export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs" && process.env.OUTBOX_WORKER !== "off") {
    const { startOutboxWorker } = await import("./lib/email/runner");
    startOutboxWorker();
  }
}
