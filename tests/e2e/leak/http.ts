// Plain HTTP against the running app: sign in through the Auth.js credentials callback (with its
// CSRF token) and keep the cookies, then fetch with them. Much faster than a browser per role.

export type Jar = Map<string, string>;

function store(jar: Jar, res: Response) {
  for (const c of res.headers.getSetCookie()) {
    const [pair] = c.split(";");
    const eq = pair!.indexOf("=");
    const name = pair!.slice(0, eq).trim();
    const value = pair!.slice(eq + 1).trim();
    if (/max-age=0|expires=thu, 01 jan 1970/i.test(c) || value === "") jar.delete(name);
    else jar.set(name, value);
  }
}

export function cookieHeader(jar: Jar): string {
  return [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
}

/** Signs in with e-mail and password; returns the cookies of the session. */
export async function signInOverHttp(baseUrl: string, email: string, password: string): Promise<Jar> {
  const jar: Jar = new Map();
  const csrfRes = await fetch(`${baseUrl}/api/auth/csrf`, { redirect: "manual" });
  store(jar, csrfRes);
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const res = await fetch(`${baseUrl}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: cookieHeader(jar), origin: baseUrl },
    body: new URLSearchParams({ csrfToken, email, password, callbackUrl: `${baseUrl}/clubs` }),
  });
  store(jar, res);
  await res.arrayBuffer();
  const session = await fetch(`${baseUrl}/api/auth/session`, { headers: { cookie: cookieHeader(jar) } });
  store(jar, session);
  const body = (await session.json()) as { user?: { email?: string } } | null;
  if (body?.user?.email !== email) throw new Error(`Signing in as ${email} over HTTP failed (callback answered ${res.status} ${res.headers.get("location") ?? ""})`);
  return jar;
}

export type Fetched = { status: number; body: string; location: string | null; contentType: string };

export async function get(baseUrl: string, path: string, jar: Jar | null, headers: Record<string, string> = {}): Promise<Fetched> {
  const res = await fetch(`${baseUrl}${path}`, {
    redirect: "manual",
    headers: { ...(jar ? { cookie: cookieHeader(jar) } : {}), ...headers },
  });
  const body = await res.text();
  return { status: res.status, body, location: res.headers.get("location"), contentType: res.headers.get("content-type") ?? "" };
}

/** Runs the tasks with at most `limit` at a time, in order of start. */
export async function pool<T>(tasks: (() => Promise<T>)[], limit: number): Promise<T[]> {
  const out: T[] = new Array(tasks.length);
  let next = 0;
  const worker = async () => {
    while (next < tasks.length) {
      const i = next++;
      out[i] = await tasks[i]!();
    }
  };
  await Promise.all(Array.from({ length: Math.min(limit, tasks.length) }, worker));
  return out;
}

/**
 * The text a reader (or a script) gets out of a body: HTML entities decoded, React's text
 * separators removed, and the JSON escaping of the RSC payload inside <script> undone.
 */
export function readable(body: string): string {
  return body
    .replace(/<!-- -->/g, "")
    .replace(/\\u0026/g, "&").replace(/\\u003c/g, "<").replace(/\\u003e/g, ">").replace(/\\u0027/g, "'")
    .replace(/\\"/g, '"').replace(/\\\\/g, "\\")
    .replace(/&#x27;|&#39;|&apos;/g, "'").replace(/&quot;/g, '"').replace(/&lt;/g, "<").replace(/&gt;/g, ">").replace(/&nbsp;|&#xa0;/g, "\u00a0").replace(/&amp;/g, "&");
}
