// Malformed input thrown at every route handler found under app/api (each route.ts, each exported
// method): wrong types, huge strings, impossible and out-of-range dates, invalid ids, pollution
// keys, malformed JSON and empty bodies, as a club admin (who may do most) and as a plain member.
// No answer may be a 500, and no call may change a row of any table. FUZZ_SEED=<n> reproduces a run.
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { POST as remindersRoute } from "@/app/api/clubs/[club]/documents/reminders/route";
import { signInAs } from "./helpers";
import {
  BAD_DATES, BAD_IDS, BAD_MONTHS, BROAD_USER, FUZZ_CLUB, GENERIC_BAD, HUGE, PLAIN_MEMBER, POLLUTION_KEYS, ROOT, changedTables, fingerprint, prototypeIsClean, realIds, rng, seedAllOnce, seedFromEnv, walk, widenAdminRoles,
  type Rng,
} from "./fuzz-helpers";

process.env.AUTH_SECRET ??= "fuzz-test-secret-not-used-anywhere-else-0123456789";

const SEED = seedFromEnv(20261202);
const CASES = 14; // per route method and signed-in person
const CLUB = FUZZ_CLUB;
const PEOPLE = [BROAD_USER, PLAIN_MEMBER];
const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;

type Handler = (req: Request, ctx: { params: Promise<Record<string, string | string[]>> }) => Promise<Response>;
type Route = { file: string; url: string; segments: string[]; methods: { method: string; handler: Handler }[] };

/** The route tree as Next sees it: app/api/…/route.ts, with [param] and [...catchAll] segments. */
async function discoverRoutes(): Promise<Route[]> {
  const files = walk(path.join(ROOT, "app/api"), (f) => path.basename(f) === "route.ts");
  const routes: Route[] = [];
  for (const file of files) {
    const mod = (await import(file)) as Record<string, unknown>;
    const segments = path.relative(path.join(ROOT, "app"), path.dirname(file)).split(path.sep);
    const methods = METHODS.filter((m) => typeof mod[m] === "function").map((method) => ({ method, handler: mod[method] as Handler }));
    routes.push({ file: path.relative(ROOT, file), url: `/${segments.join("/")}`, segments, methods });
  }
  return routes;
}

const QUERY_KEYS = ["view", "date", "from", "to", "format", "userId", "aircraftId", "status", "flagged", "month", "limit", "page", "q"];

function paramValue(r: Rng, name: string, ids: string[]): string {
  if (name === "club") return r.chance(0.85) ? CLUB : r.pick(["cottonwood-flyers", "no-such-club", "", HUGE, "../lakeshore-aero", "LAKESHORE-AERO", "%2e%2e"]);
  if (name === "month") return r.chance(0.3) ? r.pick(["2026-03", "2026-01", "1900-01", "2200-12"]) : r.pick([...BAD_MONTHS, ...GENERIC_BAD]);
  if (name === "token") return r.pick(["abc.ics", `${"a".repeat(40)}.ics`, HUGE, "", "../../etc/passwd", ...BAD_IDS]);
  return r.chance(0.35) ? r.pick(ids) : r.pick([...BAD_IDS, ...GENERIC_BAD]);
}

function queryString(r: Rng): string {
  const q = new URLSearchParams();
  const n = r.int(5);
  for (let i = 0; i < n; i++) {
    const key = r.chance(0.8) ? r.pick(QUERY_KEYS) : r.pick(POLLUTION_KEYS);
    const value = r.chance(0.2) ? r.pick(["day", "week", "csv", "json", "open", "1", "2026-05-01"]) : r.pick([...BAD_DATES, ...BAD_IDS, ...GENERIC_BAD]);
    q.append(key, value);
    if (r.chance(0.15)) q.append(key, r.pick(GENERIC_BAD)); // the same key twice
  }
  const s = q.toString();
  return s ? `?${s}` : "";
}

const BOOKING_FIELDS = ["aircraftId", "memberId", "instructorId", "purpose", "startsAt", "endsAt", "carryingPassengers", "acceptedGuards"];

function jsonBody(r: Rng, ids: string[]): string {
  const kind = r.int(9);
  if (kind === 0) return "";
  if (kind === 1) return r.pick(["{", "{\"a\":", "nul", "[1,2", "\u0000", "{'single':'quotes'}", "NaN", "undefined"]);
  if (kind === 2) return r.pick(["null", "[]", "[1,2,3]", "\"text\"", "42", "true", "{}"]);
  if (kind === 3) return r.pick(['{"__proto__":{"polluted":true}}', '{"constructor":{"prototype":{"polluted":true}}}', '{"aircraftId":{"__proto__":{"polluted":true}}}']);
  if (kind === 4) return JSON.stringify({ aircraftId: HUGE, purpose: HUGE });
  const values: unknown[] = [
    -1, -1e308, 1e308, 0, 3.5, true, false, null, [], [1, 2], {}, { nested: { deeper: [1] } }, "", HUGE,
    ...BAD_DATES, ...BAD_IDS.slice(0, 5), "0000-01-01T10:00", "9999-12-31T23:59", "2026-02-30T10:00", ...ids.slice(0, 2),
  ];
  const body: Record<string, unknown> = {};
  for (const f of BOOKING_FIELDS) if (r.chance(0.7)) body[f] = r.pick(values);
  // A plausible booking with one field made wrong: the refusal must come from that field.
  if (kind >= 7) {
    Object.assign(body, { aircraftId: r.pick(ids), startsAt: "2026-12-01T10:00", endsAt: "2026-12-01T11:00" });
    body[r.pick(["startsAt", "endsAt", "aircraftId"])] = r.pick(["0000-01-01T10:00", "9999-12-31T23:59", "2026-02-30T10:00", ...BAD_IDS, -1, null, [], {}]);
  }
  return JSON.stringify(body);
}

describe("fuzz: every route handler refuses malformed input without a 500 and without writing", () => {
  let routes: Route[] = [];
  let ids: string[] = [];

  beforeAll(async () => {
    await seedAllOnce();
    widenAdminRoles();
    routes = await discoverRoutes();
    // The auth library logs every refused request at length; the statuses are what is checked.
    vi.spyOn(console, "error").mockImplementation(() => undefined);
    ids = Object.values(realIds(2)).flat();
    // Queuing the reminders that are due is the one write a request without input makes (it is
    // idempotent): done once here, so every fuzzed call after it must leave the tables as they are.
    signInAs(BROAD_USER);
    await remindersRoute(new Request(`http://app.test/api/clubs/${CLUB}/documents/reminders`, { method: "POST" }), { params: Promise.resolve({ club: CLUB }) });
  }, 60_000);

  afterAll(() => {
    vi.restoreAllMocks();
  });

  it("finds the route tree", () => {
    expect(routes.length).toBeGreaterThanOrEqual(26);
    expect(routes.flatMap((r) => r.methods).length).toBeGreaterThanOrEqual(28);
  });

  it("answers no malformed request with a 500 and writes nothing", async () => {
    const r = rng(SEED);
    const failures: string[] = [];
    let calls = 0;
    for (const route of routes) {
      for (const { method, handler } of route.methods) {
        for (const person of PEOPLE) {
          signInAs(person);
          for (let i = 0; i < CASES; i++) {
            const params: Record<string, string | string[]> = {};
            let url = "";
            for (const seg of route.segments) {
              const catchAll = /^\[\.\.\.(\w+)\]$/.exec(seg);
              const single = /^\[(\w+)\]$/.exec(seg);
              if (catchAll) {
                const parts = [r.pick(["session", "csrf", "providers", "signin", "callback", "signout", HUGE.slice(0, 300), "..", "%00"]), ...(r.chance(0.5) ? [r.pick(["credentials", "email", "nodemailer", "x"])] : [])];
                params[catchAll[1]!] = parts;
                url += `/${parts.map(encodeURIComponent).join("/")}`;
              } else if (single) {
                const v = paramValue(r, single[1]!, ids);
                params[single[1]!] = v;
                url += `/${encodeURIComponent(v)}`;
              } else url += `/${seg}`;
            }
            const full = `http://app.test${url.slice(0, 4000)}${queryString(r)}`;
            const init: RequestInit = { method, headers: {} as Record<string, string> };
            if (method !== "GET") {
              const body = jsonBody(r, ids);
              const type = r.pick(["application/json", "application/json", "text/plain", "application/x-www-form-urlencoded", "multipart/form-data; boundary=x", ""]);
              if (type) (init.headers as Record<string, string>)["content-type"] = type;
              if (r.chance(0.3)) (init.headers as Record<string, string>)["stripe-signature"] = r.pick(["t=1,v1=deadbeef", "", HUGE.slice(0, 5000), "t=abc"]);
              init.body = body;
            }
            const label = `${method} ${route.url} #${i} as ${person} (seed ${SEED}): ${full.slice(0, 160)}`;
            const before = fingerprint();
            let status = 0;
            try {
              const res = await handler(new Request(full, init), { params: Promise.resolve(params) });
              status = res.status;
              await res.arrayBuffer();
            } catch (error) {
              failures.push(`${label} threw ${(error as Error).message?.slice(0, 200)}`);
              continue;
            } finally {
              calls++;
            }
            if (status >= 500) failures.push(`${label} answered ${status}`);
            const changed = changedTables(before, fingerprint());
            if (changed.length) failures.push(`${label} wrote to ${changed.join(", ")}`);
          }
        }
      }
    }
    console.info(`[fuzz-routes] seed ${SEED}: ${routes.length} route files, ${routes.flatMap((x) => x.methods).length} methods × ${PEOPLE.length} people × ${CASES} cases = ${calls} calls`);
    expect(failures.slice(0, 25)).toEqual([]);
    expect(prototypeIsClean()).toBe(true);
  }, 120_000);
});
