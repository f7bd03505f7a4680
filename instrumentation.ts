export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    // What the framework logs on its own (a page's or handler's uncaught error) is scrubbed of
    // SQL parameters and e-mail addresses like our own log lines.
    const { installConsoleScrubber } = await import("./lib/server/log");
    installConsoleScrubber();
    // A production server without AUTH_URL or a real AUTH_SECRET stops here with a plain message
    // (Next.js only logs an error thrown from register() and would go on serving).
    const { deploymentConfigProblems, DeploymentConfigError } = await import("./lib/server/deployment-config");
    const problems = deploymentConfigProblems();
    if (problems.length) {
      process.stderr.write(`${new DeploymentConfigError(problems).message}\n`);
      process.exit(1);
    }
  }
  if (process.env.NEXT_RUNTIME === "nodejs" && process.env.OUTBOX_WORKER !== "off") {
    const { startOutboxWorker } = await import("./lib/email/runner");
    startOutboxWorker();
  }
}
