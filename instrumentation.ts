export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    // A production server without AUTH_URL or a real AUTH_SECRET stops here with a plain message.
    const { assertDeploymentConfig } = await import("./lib/server/deployment-config");
    assertDeploymentConfig();
  }
  if (process.env.NEXT_RUNTIME === "nodejs" && process.env.OUTBOX_WORKER !== "off") {
    const { startOutboxWorker } = await import("./lib/email/runner");
    startOutboxWorker();
  }
}
