import fs from "node:fs";
import path from "node:path";
import Database from "better-sqlite3";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { baseUrl, DEMO_PASSWORD } from "./harness";
import { E2E_DIST, ROOT } from "./stack";
import { get, pool, readable, signInOverHttp, type Fetched, type Jar } from "./leak/http";
import { claimedTree, dynamicParams, expectedRenderStart, fillPath, layoutName, pattern, renderStart, routerStateHeader, routeTree, type Params, type Route } from "./leak/routes";
import { CLUB_SLUG, readSeedFacts, viewerFor, type Marker, type SeedFacts, type Viewer } from "./leak/seed-facts";

// The leak matrix: every demo role (and a signed-in outsider, and nobody signed in) × every page
// and API path of the route tree, filled with real ids from the test server's database × three
// kinds of request (the HTML, an RSC request claiming each parent layout is already on screen,
// the JSON API). No body may carry a private fact the role may not see; who may see what comes
// from the permission table (permissions/abilities.ts), checked on the instance.

const dbFile = path.join(inject("dataDir"), "e2e.db");
const CONCURRENCY = 4;

const ROLES: { key: string; email: string | null }[] = [
  { key: "member", email: "member@hangarline.test" },
  { key: "instructor", email: "instructor@hangarline.test" },
  { key: "safety", email: "safety@hangarline.test" },
  { key: "treasurer", email: "treasurer@hangarline.test" },
  { key: "maintenance", email: "maintenance@hangarline.test" },
  { key: "admin", email: "admin@hangarline.test" },
  { key: "mechanic", email: "mechanic@hangarline.test" },
  { key: "operator", email: "operator@hangarline.test" },
  // Signed in, with roles in another club only.
  { key: "outsider", email: "cottonwood.admin@hangarline.test" },
  { key: "anonymous", email: null },
];

/** Pages the build prerendered: their RSC answer is the stored whole tree, whatever tree the request claims. */
function prerendered(): Set<string> {
  const manifest = JSON.parse(fs.readFileSync(path.join(ROOT, E2E_DIST, "prerender-manifest.json"), "utf8")) as { routes: Record<string, unknown> };
  return new Set(Object.keys(manifest.routes));
}

/** Route handlers the matrix asks with GET (a handler with no GET is listed as not covered). */
function exportsGet(route: Route): boolean {
  const src = fs.readFileSync(path.join(path.resolve(import.meta.dirname, "../../app"), route.file), "utf8");
  return /export\s+(async\s+)?function\s+GET\b|export\s+const\s+GET\b|export\s+const\s+\{[^}]*\bGET\b[^}]*\}/.test(src);
}

/** Every combination of ids for the route's dynamic segments; throws when a segment has no id source. */
function paramSets(route: Route, facts: SeedFacts, missing: string[], empty: string[]): Params[] {
  let sets: Params[] = [{}];
  for (const param of dynamicParams(route)) {
    const source = facts.ids[param];
    if (!source) {
      missing.push(`[${param}] in ${route.file}`);
      return [];
    }
    const values = source();
    if (values.length === 0) {
      // The source exists but the database holds no such row yet: ask with an id that does not exist.
      empty.push(`[${param}] in ${route.file}`);
      values.push("00000000-0000-4000-8000-000000000000");
    }
    sets = sets.flatMap((s) => values.map((v) => ({ ...s, [param]: v })));
  }
  return sets;
}

type Request = { viewer: Viewer; kind: string; path: string; headers: Record<string, string>; route: Route; renderFrom?: string };
type Finding = { viewer: string; kind: string; path: string; status: number; category: string; owner: string; text: string };

const GUARD_KEYS = ["grounded", "inspectionDue", "notCheckedOut", "notCurrent", "flightReview", "medicalExpired", "inArrears", "statusUnknown", "limitations"];

/**
 * Makes sure another member's booking with accepted personal warnings (arrears, currency) exists,
 * booked through the JSON API as that member would: the seed has no such booking.
 */
async function ensureWarnedBooking(): Promise<string> {
  const db = new Database(dbFile, { readonly: true, fileMustExist: true });
  const club = db.prepare("select id, time_zone as tz from clubs where slug = ?").get(CLUB_SLUG) as { id: string; tz: string };
  const existing = db.prepare("select id from bookings where club_id = ? and (accepted_warnings like '%inArrears%' or accepted_warnings like '%notCurrent%') limit 1").get(club.id) as { id: string } | undefined;
  const planes = db.prepare("select id from aircraft where club_id = ? order by registration desc").all(club.id) as { id: string }[];
  // pilot2 is in arrears; with an instructor aboard (pilot in command) the lapsed flight review
  // and medical do not refuse the booking, and the arrears warning stays personal.
  const instructor = (db.prepare("select id from users where email = ?").get("instructor@hangarline.test") as { id: string }).id;
  db.close();
  if (existing) return existing.id;
  const day = (offset: number) => new Intl.DateTimeFormat("en-CA", { timeZone: club.tz, year: "numeric", month: "2-digit", day: "2-digit" }).format(new Date(Date.now() + offset * 86_400_000));
  const tried: string[] = [];
  for (const [email, instructorId] of [["pilot2@hangarline.test", instructor], ["student@hangarline.test", null], ["twoclubs@hangarline.test", null]] as const) {
    const jar = await signInOverHttp(baseUrl, email, DEMO_PASSWORD);
    for (const plane of planes) {
      for (const offset of [9, 10, 12]) {
        const res = await fetch(`${baseUrl}/api/clubs/${CLUB_SLUG}/bookings`, {
          method: "POST",
          headers: { "content-type": "application/json", origin: baseUrl, cookie: [...jar].map(([k, v]) => `${k}=${v}`).join("; ") },
          body: JSON.stringify({ aircraftId: plane.id, startsAt: `${day(offset)}T05:00`, endsAt: `${day(offset)}T06:00`, purpose: "Leak matrix fixture", instructorId: instructorId ?? undefined, acceptedGuards: GUARD_KEYS }),
        });
        const body = (await res.json()) as { data?: { id: string; warningsAccepted: { guard: string }[] }; error?: { message: string } };
        if (res.status === 201 && body.data && body.data.warningsAccepted.some((w) => ["inArrears", "notCurrent", "medicalExpired", "notCheckedOut"].includes(w.guard))) return body.data.id;
        tried.push(`${email} ${res.status} ${body.error?.message ?? JSON.stringify(body.data?.warningsAccepted)}`);
        if (res.status !== 409) break; // refused or accepted without personal warnings: try another aircraft
      }
    }
  }
  throw new Error(`Could not book with personal warnings for the matrix:\n${tried.join("\n")}`);
}

function markersFor(viewer: Viewer, facts: SeedFacts): Marker[] {
  const amounts = facts.viewerLegitAmounts(viewer.userId);
  const memos = facts.viewerOwnMemos(viewer.userId);
  const ownName = viewer.name;
  // The viewer's own facts: another's fact that reads the same (or is part of one of them) proves nothing.
  const own = facts.markers.filter((m) => viewer.userId !== null && m.ownerId === viewer.userId).map((m) => m.text);
  return facts.markers.filter((m) => {
    if (m.allowed(viewer)) return false;
    if (ownName && m.text === ownName) return false;
    if (own.some((t) => t.includes(m.text))) return false;
    // A figure that is also one of the viewer's own (their charge, their balance, a dues plan) proves nothing.
    if (/balance|receivables/.test(m.category) && amounts.has(m.text)) return false;
    if (m.category === "journal description" && memos.has(m.text)) return false;
    return true;
  });
}

/** Groups markers by a short prefix so a body is searched for a group only when the prefix occurs. */
function indexMarkers(markers: Marker[]): Map<string, Marker[]> {
  const byPrefix = new Map<string, Marker[]>();
  for (const m of markers) {
    const key = m.text.slice(0, 6);
    (byPrefix.get(key) ?? byPrefix.set(key, []).get(key)!).push(m);
  }
  return byPrefix;
}

function scan(body: string, reqPath: string, index: Map<string, Marker[]>): Marker[] {
  const text = readable(body);
  const hits: Marker[] = [];
  for (const [prefix, group] of index) {
    if (!text.includes(prefix)) continue;
    for (const m of group) if ((!m.scope || m.scope(reqPath)) && text.includes(m.text) && (!m.re || m.re.test(text))) hits.push(m);
  }
  return hits;
}

describe("leak matrix: no role sees data it may not, whatever the request", () => {
  const jars = new Map<string, Jar | null>();
  const viewers: Viewer[] = [];
  let facts: SeedFacts;

  beforeAll(async () => {
    await ensureWarnedBooking();
    facts = readSeedFacts(dbFile);
    for (const r of ROLES) {
      jars.set(r.key, r.email ? await signInOverHttp(baseUrl, r.email, DEMO_PASSWORD) : null);
      viewers.push(viewerFor(facts, dbFile, r.key, r.email));
    }
  });

  afterAll(() => facts?.close());

  it("an RSC request with a router-state tree skips exactly the layouts it claims", { retry: 0 }, async () => {
    const routes = routeTree();
    const rsc = async (role: string, file: string, depth: number) => {
      const route = routes.find((r) => r.file === file)!;
      const params = { club: CLUB_SLUG };
      const res = await get(baseUrl, fillPath(route, params), jars.get(role)!, { RSC: "1", "Next-Router-State-Tree": routerStateHeader(claimedTree(route, params, depth)) });
      expect(res.contentType).toContain("text/x-component");
      // The server says where it started rendering: right below the claimed layout.
      expect(renderStart(res.body)).toBe(expectedRenderStart(route, params, depth));
      return readable(res.body);
    };
    // The operator console's layout holds its only guard and renders its header.
    const operatorPage = path.join("operator", "page.tsx");
    expect(await rsc("operator", operatorPage, -1)).toContain("Operator console");
    const skipped = await rsc("operator", operatorPage, 0);
    expect(skipped).not.toContain("Operator console");
    expect(skipped).toContain("Clubs you administer");
    // The club layout renders the club's navigation; the money layout (a guard only) starts the render or is skipped.
    const ratesPage = path.join("clubs", "[club]", "money", "rates", "page.tsx");
    expect(await rsc("treasurer", ratesPage, -1)).toContain("Club sections");
    expect(await rsc("treasurer", ratesPage, 1)).not.toContain("Club sections");
    expect(await rsc("treasurer", ratesPage, 2)).not.toContain("Club sections");
  });

  it("no response body carries another member's money, medical, report or booking data", { retry: 0, timeout: 600_000 }, async () => {
    const started = Date.now();
    const routes = routeTree();
    const missing: string[] = [];
    const empty: string[] = [];
    const notCovered: string[] = [];
    const requests: Request[] = [];
    const patterns = new Set<string>();
    for (const route of routes) {
      if (route.kind === "api" && !exportsGet(route)) {
        notCovered.push(`${pattern(route)} (no GET handler)`);
        continue;
      }
      const sets = paramSets(route, facts, missing, empty);
      if (sets.length) patterns.add(`${route.kind} ${pattern(route)}`);
      for (const params of sets) {
        const p = fillPath(route, params);
        for (const viewer of viewers) {
          if (route.kind === "api") {
            requests.push({ viewer, kind: "api", path: p, headers: {}, route });
            continue;
          }
          requests.push({ viewer, kind: "html", path: p, headers: {}, route });
          for (const depth of route.layoutDepths) {
            requests.push({ viewer, kind: `rsc(${layoutName(route, depth)})`, path: p, headers: { RSC: "1", "Next-Router-State-Tree": routerStateHeader(claimedTree(route, params, depth)) }, route, renderFrom: expectedRenderStart(route, params, depth) });
          }
        }
      }
    }
    // A new dynamic segment must come with a way to find real ids for it.
    expect(missing, "dynamic segments with no id source in tests/e2e/leak/seed-facts.ts").toEqual([]);

    const indexes = new Map(viewers.map((v) => [v.key, indexMarkers(markersFor(v, facts))]));
    // Positive controls: where a role may see a fact, the detector must find it, or a silent
    // matrix could just mean the facts are looked for in the wrong form.
    const [anonReport] = facts.ids.reportId!();
    const [warnedBooking] = facts.ids.bookingId!();
    const controls: { viewer: string; kind: string; path: string; category: RegExp }[] = [
      { viewer: "treasurer", kind: "html", path: `/clubs/${CLUB_SLUG}/money/balances`, category: /^balance \(minor units\)$/ },
      { viewer: "treasurer", kind: "html", path: `/clubs/${CLUB_SLUG}/money/balances`, category: /^name on a money page$/ },
      { viewer: "admin", kind: "html", path: `/clubs/${CLUB_SLUG}/money/journal`, category: /^journal description$/ },
      { viewer: "safety", kind: "html", path: `/clubs/${CLUB_SLUG}/safety/reports/${anonReport}`, category: /^anonymous safety report text$/ },
      { viewer: "admin", kind: "api", path: `/api/clubs/${CLUB_SLUG}/bookings/${warnedBooking}`, category: /^booking warning/ },
      { viewer: "instructor", kind: "html", path: `/clubs/${CLUB_SLUG}/me`, category: /^medical limitations$/ },
    ];
    const controlKeys = new Set(controls.map((c) => `${c.viewer} ${c.kind} ${c.path}`));
    const seen = new Map<string, Set<string>>();
    const findings: Finding[] = [];
    const serverErrors: string[] = [];
    let bytes = 0;
    let scanMs = 0;
    const timeByRoute = new Map<string, number>();
    const statuses = new Map<string, number>();
    const treeMisses: string[] = [];
    const staticPaths = prerendered();
    await pool(
      requests.map((r) => async () => {
        let res: Fetched;
        const t0 = performance.now();
        try {
          res = await get(baseUrl, r.path, jars.get(r.viewer.key)!, r.headers);
          const ms = performance.now() - t0;
          const key = `${r.route.kind} ${pattern(r.route)}`;
          timeByRoute.set(key, (timeByRoute.get(key) ?? 0) + ms);
        } catch (error) {
          serverErrors.push(`${r.viewer.key} ${r.kind} ${r.path}: ${(error as Error).message}`);
          return;
        }
        bytes += res.body.length;
        const sk = `${r.kind.startsWith("rsc") ? "rsc" : r.kind} ${res.status}`;
        statuses.set(sk, (statuses.get(sk) ?? 0) + 1);
        if (res.status >= 500) serverErrors.push(`${r.viewer.key} ${r.kind} ${r.path}: ${res.status}`);
        if (r.renderFrom && res.status === 200 && !staticPaths.has(r.path)) {
          // Every RSC answer must really have started below the claimed layouts, or the request proves nothing.
          const from = renderStart(res.body);
          if (from !== r.renderFrom) treeMisses.push(`${r.viewer.key} ${r.kind} ${r.path}: rendered from ${from}, expected ${r.renderFrom}`);
        }
        const controlKey = `${r.viewer.key} ${r.kind} ${r.path}`;
        if (controlKeys.has(controlKey)) {
          const maySee = indexMarkers(facts.markers.filter((m) => m.allowed(r.viewer)));
          seen.set(controlKey, new Set(scan(res.body, r.path, maySee).map((m) => m.category)));
        }
        const t1 = performance.now();
        const hits = scan(res.body, r.path, indexes.get(r.viewer.key)!);
        scanMs += performance.now() - t1;
        for (const m of hits) {
          findings.push({ viewer: r.viewer.key, kind: r.kind, path: r.path, status: res.status, category: m.category, owner: m.ownerName, text: m.text });
        }
      }),
      CONCURRENCY,
    );

    // Coverage.
    const kinds = new Map<string, number>();
    for (const r of requests) {
      const k = r.kind.startsWith("rsc") ? "rsc" : r.kind;
      kinds.set(k, (kinds.get(k) ?? 0) + 1);
    }
    const seconds = ((Date.now() - started) / 1000).toFixed(1);
    const pagePatterns = [...patterns].filter((p) => p.startsWith("page")).length;
    const apiPatterns = [...patterns].filter((p) => p.startsWith("api")).length;
    const markerCount = viewers.map((v) => `${v.key} ${[...indexes.get(v.key)!.values()].reduce((t, g) => t + g.length, 0)}`).join(", ");
    const coverage = [
      `Leak matrix: ${viewers.length} roles (${viewers.map((v) => v.key).join(", ")})`,
      `  × ${pagePatterns} page routes and ${apiPatterns} API routes (${new Set(requests.map((r) => r.path)).size} concrete paths with real ids)`,
      `  × 3 request kinds: html ${kinds.get("html") ?? 0}, rsc (one per parent layout) ${kinds.get("rsc") ?? 0}, api ${kinds.get("api") ?? 0}`,
      `  = ${requests.length} requests, ${(bytes / 1e6).toFixed(1)} MB of bodies, ${seconds} s`,
      `  forbidden facts checked per role: ${markerCount}`,
      `  answers: ${[...statuses].sort().map(([k, n]) => `${k}×${n}`).join(", ")}`,
      `  time spent scanning bodies: ${(scanMs / 1000).toFixed(1)} s; slowest routes (sum of response times): ${[...timeByRoute].sort((a, b) => b[1] - a[1]).slice(0, 5).map(([k, ms]) => `${k} ${(ms / 1000).toFixed(0)} s`).join(", ")}`,
      ...(empty.length ? [`  no row in the database yet (asked with a made-up id): ${[...new Set(empty)].join("; ")}`] : []),
      ...(notCovered.length ? [`  not asked (no GET): ${notCovered.join("; ")}`] : []),
    ].join("\n");
    console.log(coverage);

    // Leaks, grouped by role, request and what leaked.
    const grouped = new Map<string, Map<string, Finding[]>>();
    for (const f of findings.sort((a, b) => `${a.viewer} ${a.path} ${a.kind}`.localeCompare(`${b.viewer} ${b.path} ${b.kind}`))) {
      const key = `${f.viewer} | ${f.kind} | GET ${f.path} → ${f.status}`;
      const inner = grouped.get(key) ?? grouped.set(key, new Map()).get(key)!;
      const what = `${f.category}`;
      (inner.get(what) ?? inner.set(what, []).get(what)!).push(f);
    }
    const lines: string[] = [];
    for (const [key, inner] of grouped) {
      lines.push(key);
      for (const [what, list] of inner) {
        const examples = list.slice(0, 3).map((f) => `${f.owner}: "${f.text}"`).join("; ");
        lines.push(`    ${what} ×${list.length}: ${examples}${list.length > 3 ? "; …" : ""}`);
      }
    }
    const dir = path.resolve(import.meta.dirname, "../.artifacts");
    fs.mkdirSync(dir, { recursive: true });
    fs.writeFileSync(path.join(dir, "leak-matrix.txt"), `${coverage}\n\nLeaks (${grouped.size} responses):\n${lines.join("\n")}\n\nServer errors:\n${serverErrors.join("\n")}\n`);
    if (lines.length) console.log(`Leaks in ${grouped.size} responses (full list in tests/.artifacts/leak-matrix.txt):\n${lines.join("\n")}`);

    expect(requests.length).toBeGreaterThan(500);
    const blind = controls.filter((c) => ![...(seen.get(`${c.viewer} ${c.kind} ${c.path}`) ?? [])].some((cat) => c.category.test(cat)));
    expect(blind.map((c) => `${c.viewer} ${c.kind} ${c.path}: ${c.category.source} not found where the role may see it`), "positive controls").toEqual([]);
    expect(treeMisses, "RSC answers that did not start rendering below the claimed layouts").toEqual([]);
    expect(serverErrors, "answers of 500 or no answer").toEqual([]);
    expect(lines, `${grouped.size} responses carry data their role may not see`).toEqual([]);
  });
});
