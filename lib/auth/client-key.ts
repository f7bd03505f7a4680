// Which client a sign-in request comes from, for throttling. Next.js gives application code no
// socket address, only headers, and any client can send X-Forwarded-For. So the header is read
// only when TRUST_PROXY says how many proxies of ours stand in front of the app (each appends the
// address it received the request from); otherwise every request shares one bucket.

type Env = Record<string, string | undefined>;

export const UNKNOWN_CLIENT = "client:unknown";

/** Number of trusted proxy hops (TRUST_PROXY=1 for one reverse proxy); 0 when not behind one. */
export function trustedProxyHops(env: Env = process.env): number {
  const raw = env.TRUST_PROXY?.trim().toLowerCase();
  if (!raw || raw === "0" || raw === "false" || raw === "off" || raw === "no") return 0;
  if (raw === "true" || raw === "on" || raw === "yes") return 1;
  const n = Number(raw);
  return Number.isInteger(n) && n > 0 && n <= 10 ? n : 0;
}

function looksLikeAddress(value: string): boolean {
  return /^[0-9a-f:.]{2,45}$/i.test(value);
}

/**
 * The throttling key of the client. Behind N trusted proxies the client is the N-th address from
 * the right of X-Forwarded-For (entries further left were written by the client and prove nothing).
 */
export function clientKeyFrom(headers: Pick<Headers, "get"> | undefined, env: Env = process.env): string {
  const hops = trustedProxyHops(env);
  if (!hops || !headers) return UNKNOWN_CLIENT;
  const chain = (headers.get("x-forwarded-for") ?? "")
    .split(",")
    .map((s) => s.trim())
    .filter(Boolean);
  const candidate = chain[chain.length - hops];
  if (!candidate || !looksLikeAddress(candidate)) return UNKNOWN_CLIENT;
  return `ip:${candidate.toLowerCase()}`;
}
