// The settings a production server cannot run safely without. Checked once when the server
// starts (instrumentation.ts) and again when sessions are configured (auth.ts), so that a
// missing one stops the server with a plain message instead of falling back to something unsafe.

type Env = Record<string, string | undefined>;

/** Secrets that are public (in this repository) and so never protect a production session. */
export const PUBLIC_SECRETS: ReadonlySet<string> = new Set([
  "hangarline-local-development-secret-change-me",
  "hangarline-demo-secret-change-me-in-production",
  "e2e-secret-not-for-production-use-only",
]);

export const MIN_SECRET_LENGTH = 32;

function isProduction(env: Env): boolean {
  return env.NODE_ENV === "production";
}

/** Problems that stop a production server; an empty list means it may start. Outside production, none. */
export function deploymentConfigProblems(env: Env = process.env): string[] {
  if (!isProduction(env)) return [];
  const problems: string[] = [];
  const url = env.AUTH_URL?.trim();
  if (!url) {
    problems.push("AUTH_URL is not set. Set it to the address members use, e.g. https://portal.example-club.org; every sign-in link, invitation and statement is built from it, never from a request's Host header.");
  } else {
    let parsed: URL | null = null;
    try {
      parsed = new URL(url);
    } catch {
      parsed = null;
    }
    if (!parsed || (parsed.protocol !== "https:" && parsed.protocol !== "http:")) {
      problems.push(`AUTH_URL must be an absolute http(s) address such as https://portal.example-club.org (it is "${url}").`);
    }
  }
  const secret = env.AUTH_SECRET;
  if (!secret) {
    problems.push(`AUTH_SECRET is not set. Set it to a random value of at least ${MIN_SECRET_LENGTH} characters (for example: openssl rand -base64 33); it signs every session.`);
  } else if (PUBLIC_SECRETS.has(secret)) {
    problems.push("AUTH_SECRET is one of the published development secrets. Generate a random one (openssl rand -base64 33).");
  } else if (secret.length < MIN_SECRET_LENGTH) {
    problems.push(`AUTH_SECRET is shorter than ${MIN_SECRET_LENGTH} characters. Generate a random one (openssl rand -base64 33).`);
  }
  return problems;
}

export class DeploymentConfigError extends Error {
  constructor(readonly problems: string[]) {
    super(`Hangarline will not start in production until its settings are fixed:\n${problems.map((p) => `  - ${p}`).join("\n")}`);
    this.name = "DeploymentConfigError";
  }
}

/** Throws a DeploymentConfigError listing every problem; returns quietly when there is none. */
export function assertDeploymentConfig(env: Env = process.env): void {
  const problems = deploymentConfigProblems(env);
  if (problems.length) throw new DeploymentConfigError(problems);
}

/** `next build` runs with NODE_ENV=production but serves nothing; the check belongs to the server. */
export function isBuildPhase(env: Env = process.env): boolean {
  return env.NEXT_PHASE === "phase-production-build";
}
