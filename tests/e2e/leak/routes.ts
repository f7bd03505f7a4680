import fs from "node:fs";
import path from "node:path";

// The route tree as the App Router sees it, read from app/: every page.tsx and route.ts, with the
// directory segments (route groups and dynamic segments included) and where the layouts sit.

export const APP_DIR = path.resolve(import.meta.dirname, "../../../app");

export type Segment =
  | { kind: "static"; name: string } // "clubs", "money"
  | { kind: "group"; name: string } // "(auth)": in the router tree, not in the URL
  | { kind: "dynamic"; name: string; param: string } // "[club]"
  | { kind: "catchall"; name: string; param: string; optional: boolean }; // "[...nextauth]"

export type Route = {
  kind: "page" | "api";
  /** The file, relative to app/ (for messages). */
  file: string;
  segments: Segment[];
  /** Indexes into `segments` (-1 = the root layout app/layout.tsx) of the directories that hold a layout.tsx. */
  layoutDepths: number[];
};

function parseSegment(name: string): Segment {
  let m = /^\[\[\.\.\.(.+)\]\]$/.exec(name);
  if (m) return { kind: "catchall", name, param: m[1]!, optional: true };
  m = /^\[\.\.\.(.+)\]$/.exec(name);
  if (m) return { kind: "catchall", name, param: m[1]!, optional: false };
  m = /^\[(.+)\]$/.exec(name);
  if (m) return { kind: "dynamic", name, param: m[1]! };
  if (/^\(.+\)$/.test(name)) return { kind: "group", name };
  return { kind: "static", name };
}

/** Every page.tsx (kind "page") and every route.ts (kind "api") under app/. */
export function routeTree(): Route[] {
  const out: Route[] = [];
  const walk = (dir: string) => {
    for (const e of fs.readdirSync(dir, { withFileTypes: true }).sort((a, b) => a.name.localeCompare(b.name))) {
      const p = path.join(dir, e.name);
      if (e.isDirectory()) {
        if (!e.name.startsWith("_") && !e.name.startsWith("@")) walk(p);
        continue;
      }
      const kind = /^page\.(tsx|ts|jsx|js)$/.test(e.name) ? "page" : /^route\.(ts|js)$/.test(e.name) ? "api" : null;
      if (!kind) continue;
      const rel = path.relative(APP_DIR, dir);
      const names = rel === "" ? [] : rel.split(path.sep);
      const segments = names.map(parseSegment);
      const layoutDepths: number[] = [];
      if (hasLayout(APP_DIR)) layoutDepths.push(-1);
      names.forEach((_, i) => {
        if (hasLayout(path.join(APP_DIR, ...names.slice(0, i + 1)))) layoutDepths.push(i);
      });
      out.push({ kind, file: path.join(rel, e.name), segments, layoutDepths });
    }
  };
  walk(APP_DIR);
  return out;
}

function hasLayout(dir: string): boolean {
  return ["layout.tsx", "layout.ts", "layout.jsx", "layout.js"].some((f) => fs.existsSync(path.join(dir, f)));
}

/** The route's pattern as a URL, e.g. /clubs/[club]/money (route groups left out). */
export function pattern(route: Route): string {
  return "/" + route.segments.filter((s) => s.kind !== "group").map((s) => s.name).join("/");
}

export function dynamicParams(route: Route): string[] {
  return route.segments.flatMap((s) => (s.kind === "dynamic" || s.kind === "catchall" ? [s.param] : []));
}

export type Params = Record<string, string>;

/** The URL path with the params filled in (values are URL-encoded; a catch-all value keeps its slashes). */
export function fillPath(route: Route, params: Params): string {
  const parts = route.segments.flatMap((s) => {
    if (s.kind === "group") return [];
    if (s.kind === "static") return [s.name];
    const v = params[s.param];
    if (v === undefined) throw new Error(`No value for [${s.param}] in ${route.file}`);
    return s.kind === "catchall" ? v.split("/").map(encodeURIComponent) : [encodeURIComponent(v)];
  });
  return "/" + parts.join("/");
}

// ---------------------------------------------------------------------------------------------
// The Next-Router-State-Tree header (Next 15 FlightRouterState), as the client router sends it:
//   [segment, { children: FlightRouterState }, url?, refresh?, isRootLayout?]
// where segment is "" for the root, the directory name for static segments and route groups,
// [param, value, "d"] for a dynamic one ("c" catch-all, "oc" optional catch-all), and
// "__PAGE__" for the page leaf (see next/dist/server/app-render/types.js flightRouterStateSchema,
// create-flight-router-state-from-loader-tree.js and get-dynamic-param.js). The server walks its
// loader tree beside this one (walk-tree-with-flight-router-state.js) and starts rendering at
// the first segment that does not match: every layout above that point is taken to be on
// screen already and is NOT rendered, so whatever check it holds does not run.

type TreeSegment = string | [string, string, string];
type FlightRouterState = [TreeSegment, Record<string, FlightRouterState>, (string | null)?, (string | null)?, boolean?];

function treeSegment(s: Segment, params: Params): TreeSegment {
  if (s.kind === "static" || s.kind === "group") return s.name;
  const v = params[s.param]!;
  return [s.param, v, s.kind === "dynamic" ? "d" : s.optional ? "oc" : "c"];
}

/**
 * The router state of a client that has the layouts down to `depth` (an index into
 * route.segments, -1 = the root layout only) on screen and shows some other page below it:
 * the segments match down to that layout, and the next one ("__PAGE__" of that layout) does not
 * match the page asked for, so rendering starts right under the claimed layout.
 */
export function claimedTree(route: Route, params: Params, depth: number): FlightRouterState {
  let node: FlightRouterState = ["__PAGE__", {}];
  for (let i = depth; i >= 0; i--) node = [treeSegment(route.segments[i]!, params), { children: node }];
  return ["", { children: node }, null, null, true];
}

export function routerStateHeader(tree: FlightRouterState): string {
  return encodeURIComponent(JSON.stringify(tree));
}

/** "root", "clubs/[club]", "clubs/[club]/money": the layout a depth stands for. */
export function layoutName(route: Route, depth: number): string {
  return depth < 0 ? "root" : route.segments.slice(0, depth + 1).map((s) => s.name).join("/");
}

/** The tree segment rendering is expected to start at when `depth` is claimed (the one below that layout). */
export function expectedRenderStart(route: Route, params: Params, depth: number): string {
  const next = route.segments[depth + 1];
  return JSON.stringify(next ? treeSegment(next, params) : "__PAGE__");
}

/**
 * Where the server started rendering, read from an RSC answer: row 0 carries the flight data
 * ("f"), whose first path lists the segments taken as on screen ("children", "clubs", "children",
 * ["club", …], …) and then [segment, routerState, seedData, …] for the segment it rendered from.
 */
export function renderStart(body: string): string | null {
  const row = body.split("\n").find((l) => l.startsWith("0:"));
  if (!row) return null;
  try {
    const f = (JSON.parse(row.slice(2)) as { f?: unknown[][] }).f?.[0];
    if (!Array.isArray(f)) return null;
    const start = f.find((x) => Array.isArray(x) && x.length >= 2 && typeof x[1] === "object" && x[1] !== null && !Array.isArray(x[1])) as unknown[] | undefined;
    return start ? JSON.stringify(start[0]) : null;
  } catch {
    return null;
  }
}
