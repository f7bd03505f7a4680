// Malformed input thrown at every route handler found under app/api (each route.ts, each exported
// method): wrong types, huge strings, impossible and out-of-range dates, invalid ids, pollution
// keys, malformed JSON and empty bodies, as a club admin (who may do most) and as a plain member.
// No answer may be a 500, and no call may change a row of any table. FUZZ_SEED=<n> reproduces a run.
import { NextRequest } from "next/server";
import fs from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { POST as remindersRoute } from "@/app/api/clubs/[club]/documents/reminders/route";
import { signInAs } from "./helpers";
import {
  BAD_DATES, BAD_DATETIMES, BAD_IDS, BAD_MONTHS, BROAD_USER, idsFor, FUZZ_CLUB, GENERIC_BAD, HUGE, PLAIN_MEMBER, POLLUTION_KEYS, ROOT, changedTables, fingerprint, prototypeIsClean, realIds, rng, seedAllOnce, seedFromEnv, walk, widenAdminRoles,
  type Rng,
} from "./fuzz-helpers";

process.env.AUTH_SECRET ??= "fuzz-test-secret-not-used-anywhere-else-0123456789";

const SEED = seedFromEnv(20261202);
const RANDOM_CASES = 8; // per route method and signed-in person, beside the systematic ones
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

/** What each kind of query key or path parameter must survive. */
function badValuesFor(key: string): string[] {
  if (/^(date|from|to)$/.test(key)) return BAD_DATES;
  if (key === "month") return BAD_MONTHS;
  if (key === "club") return ["cottonwood-flyers", "no-such-club", "", HUGE, "../reedwater", "LAKESHORE-AERO", "%2e%2e"];
  if (key === "token") return ["abc.ics", `${"a".repeat(40)}.ics`, HUGE, "", "../../etc/passwd", ...BAD_IDS];
  if (/Id$/.test(key)) return BAD_IDS;
  return GENERIC_BAD;
}

type Case = { route: Route; method: string; handler: Handler; person: string; params: Record<string, string | string[]>; query: [string, string][]; body?: string; type?: string; what: string };

/** Real values for every parameter (the club, an id of the matching table, a month), so a case reaches the parsing it targets. */
function realParams(route: Route, r: Rng, ids: Record<string, string[]>): Record<string, string | string[]> {
  const params: Record<string, string | string[]> = {};
  for (const seg of route.segments) {
    const catchAll = /^\[\.\.\.(\w+)\]$/.exec(seg);
    const single = /^\[(\w+)\]$/.exec(seg);
    if (catchAll) params[catchAll[1]!] = [r.pick(["session", "csrf", "providers", "signin", "callback", "signout", "..", "%00"]), ...(r.chance(0.5) ? [r.pick(["credentials", "email", "x"])] : [])];
    else if (single) {
      const name = single[1]!;
      const real = name === "club" ? [CLUB] : name === "month" ? ["2026-03"] : idsFor(name, ids);
      params[name] = real.length ? r.pick(real) : r.pick(Object.values(ids).flat());
    }
  }
  return params;
}

function urlOf(route: Route, params: Record<string, string | string[]>, query: [string, string][]): string {
  const path = route.segments
    .map((seg) => {
      const name = /^\[(?:\.\.\.)?(\w+)\]$/.exec(seg)?.[1];
      if (!name) return seg;
      const v = params[name]!;
      return Array.isArray(v) ? v.map(encodeURIComponent).join("/") : encodeURIComponent(v);
    })
    .join("/");
  const q = new URLSearchParams(query).toString();
  return `http://app.test/${path.slice(0, 6000)}${q ? `?${q}` : ""}`;
}

const BOOKING_FIELDS = ["aircraftId", "memberId", "instructorId", "purpose", "startsAt", "endsAt", "carryingPassengers", "acceptedGuards"];
const JSON_WRONG: unknown[] = [-1, -1e308, 1e308, 0, 3.5, true, null, [], ["a", "b"], {}, { nested: { deeper: [1] } }, "", HUGE];

const BROKEN_BODIES = [
  "", "{", "{\"a\":", "nul", "[1,2", "\u0000", "{'single':'quotes'}", "NaN", "undefined", "null", "[]", "[1,2,3]", "\"text\"", "42", "true", "{}",
  '{"__proto__":{"polluted":true}}', '{"constructor":{"prototype":{"polluted":true}}}', '{"aircraftId":{"__proto__":{"polluted":true}}}', JSON.stringify({ aircraftId: HUGE, purpose: HUGE }),
];

/**
 * The cases: every path parameter with each value it must survive, every query key of a handler
 * that reads its query with each such value, every field of a JSON body made wrong in turn, then
 * broken bodies and random mixtures for each person.
 */
function buildCases(routes: Route[], ids: Record<string, string[]>, r: Rng): Case[] {
  const cases: Case[] = [];
  for (const route of routes) {
    const source = fs.readFileSync(path.join(ROOT, route.file), "utf8");
    const readsQuery = /searchParams/.test(source);
    const readsJson = /\.json\(\)/.test(source);
    for (const { method, handler } of route.methods) {
      const base = (person: string) => ({ route, method, handler, person, params: realParams(route, r, ids), query: [] as [string, string][] });
      for (const name of Object.keys(realParams(route, r, ids))) {
        if (route.segments.some((s) => s === `[...${name}]`)) continue;
        for (const v of badValuesFor(name)) {
          const c = base(BROAD_USER);
          cases.push({ ...c, params: { ...c.params, [name]: v }, what: `${name} = ${JSON.stringify(v.slice(0, 40))}` });
        }
      }
      if (readsQuery && method === "GET") {
        for (const key of QUERY_KEYS) {
          const pool = badValuesFor(key);
          for (const v of pool === GENERIC_BAD ? Array.from({ length: 4 }, () => r.pick(pool)) : pool) cases.push({ ...base(BROAD_USER), query: [[key, v]], what: `?${key}=${JSON.stringify(v.slice(0, 40))}` });
        }
      }
      if (readsJson && method !== "GET") {
        const plausible = { aircraftId: r.pick(idsFor("aircraftId", ids)), startsAt: "2026-12-01T10:00", endsAt: "2026-12-01T11:00" };
        for (const field of BOOKING_FIELDS) {
          const wrong = [...JSON_WRONG, ...(/At$/.test(field) ? BAD_DATETIMES : []), ...(/Id$/.test(field) ? BAD_IDS : [])];
          for (const v of wrong) cases.push({ ...base(BROAD_USER), body: JSON.stringify({ ...plausible, [field]: v }), type: "application/json", what: `body.${field} = ${JSON.stringify(v)?.slice(0, 40)}` });
        }
        for (const body of BROKEN_BODIES) for (const type of ["application/json", "text/plain", ""]) cases.push({ ...base(BROAD_USER), body, type, what: `body ${JSON.stringify(body.slice(0, 30))} as ${type || "no type"}` });
      }
      for (const person of PEOPLE) {
        for (let i = 0; i < RANDOM_CASES; i++) {
          const c = base(person);
          for (const name of Object.keys(c.params)) if (!Array.isArray(c.params[name]) && r.chance(0.3)) c.params[name] = r.pick(badValuesFor(name));
          const query: [string, string][] = [];
          for (let k = r.int(4); k > 0; k--) {
            const key = r.chance(0.8) ? r.pick(QUERY_KEYS) : r.pick(POLLUTION_KEYS);
            query.push([key, r.pick(badValuesFor(key))]);
          }
          const body = method === "GET" ? undefined : r.chance(0.5) ? r.pick(BROKEN_BODIES) : JSON.stringify(Object.fromEntries(BOOKING_FIELDS.filter(() => r.chance(0.6)).map((f) => [f, r.pick([...JSON_WRONG, ...BAD_DATETIMES, ...BAD_IDS])])));
          const type = method === "GET" ? undefined : r.pick(["application/json", "text/plain", "application/x-www-form-urlencoded", "multipart/form-data; boundary=x", ""]);
          cases.push({ ...c, query, body, type, what: `random #${i}` });
        }
      }
    }
  }
  return cases;
}

describe("fuzz: every route handler refuses malformed input without a 500 and without writing", () => {
  let routes: Route[] = [];
  let ids: Record<string, string[]> = {};

  beforeAll(async () => {
    await seedAllOnce();
    widenAdminRoles();
    // With a signing secret configured the webhook reads (and must refuse) the malformed bodies;
    // without one it refuses every request before reading (tests/integration/webhook-secret.test.ts).
    process.env.PAYMENTS_WEBHOOK_SECRET ??= "whsec_fuzz_only_not_a_real_secret";
    routes = await discoverRoutes();
    // The auth library logs every refused request at length; the statuses are what is checked.
    vi.spyOn(console, "error").mockImplementation(() => undefined);
    ids = realIds(3);
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
    const cases = buildCases(routes, ids, r);
    const failures: string[] = [];
    for (const c of cases) {
      signInAs(c.person);
      const url = urlOf(c.route, c.params, c.query);
      const headers: Record<string, string> = {};
      if (c.type) headers["content-type"] = c.type;
      if (c.method !== "GET" && r.chance(0.3)) headers["stripe-signature"] = r.pick(["t=1,v1=deadbeef", "", HUGE.slice(0, 5000), "t=abc"]);
      const label = `${c.method} ${c.route.url} as ${c.person} (seed ${SEED}): ${c.what}`;
      const before = fingerprint();
      try {
        const res = await c.handler(new NextRequest(url, { method: c.method, headers, body: c.method === "GET" ? undefined : (c.body ?? "") }), { params: Promise.resolve(c.params) });
        await res.arrayBuffer();
        if (res.status >= 500) failures.push(`${label} answered ${res.status}`);
      } catch (error) {
        failures.push(`${label} threw ${(error as Error).message?.slice(0, 200)}`);
      }
      const changed = changedTables(before, fingerprint());
      if (changed.length) failures.push(`${label} wrote to ${changed.join(", ")}`);
    }
    const methods = routes.flatMap((x) => x.methods).length;
    console.info(`[fuzz-routes] seed ${SEED}: ${routes.length} route files, ${methods} methods, ${cases.length} calls (${(cases.length / methods).toFixed(0)} per method on average)`);
    expect(failures.slice(0, 25)).toEqual([]);
    expect(prototypeIsClean()).toBe(true);
  }, 120_000);
});
