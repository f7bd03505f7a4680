export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    // A production server without AUTH_URL or a real AUTH_SECRET stops here with a plain message
    // (Next.js only logs an error thrown from register() and would go on serving).
    const { deploymentConfigProblems, DeploymentConfigError } = await import("./lib/server/deployment-config");
    const problems = deploymentConfigProblems();
    if (problems.length) {
      console.error(new DeploymentConfigError(problems).message);
      process.exit(1);
    }
  }
  if (process.env.NEXT_RUNTIME === "nodejs" && process.env.OUTBOX_WORKER !== "off") {
    const { startOutboxWorker } = await import("./lib/email/runner");
    startOutboxWorker();
  }
}
