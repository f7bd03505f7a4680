import fs from "node:fs";
import path from "node:path";
import ts from "typescript";
import { describe, expect, it } from "vitest";

// Product rule: a role sees only what its permission covers, checked on the instance, in every
// page, handler and action — a layout is never the guard (a layout renders beside its page and
// an RSC request can skip it). This reads the source of every app/**/page.tsx and every
// app/**/route.ts and fails for a file whose own exported function does not call a guard first,
// unless the file is public by design and listed below with its reason and its own check.

const ROOT = path.resolve(import.meta.dirname, "../../..");

/** Page guards (lib/server/authorize.ts): club pages, the operator console, per-person pages outside a club. */
const PAGE_GUARDS = new Set(["authorizePage", "authorizePageAny", "authorizeOperatorPage", "authorizeSignedInPage"]);
/** Route-handler guard (lib/server/api.ts). */
const HANDLER_GUARDS = new Set(["withClub"]);
/** Questions about one record, asked once it is read (for a guard given no type-level permission). */
const RECORD_CHECKS = new Set(["canOn", "authorized", "requirePermission", "canReadReport", "canReadUpload", "medicalViewFor", "mayActOnBooking"]);
const HTTP_METHODS = new Set(["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"]);

type PublicFile = { reason: string; ownCheck?: RegExp; readsNoRecords?: true };

/** Public by design: no session guard, because their reader cannot sign in or is not signed in yet. */
const PUBLIC_BY_DESIGN: Record<string, PublicFile> = {
  "app/(marketing)/page.tsx": { reason: "the landing page: fixed words for everyone, reads no records", readsNoRecords: true },
  "app/(auth)/sign-in/page.tsx": { reason: "sign-in: open to whoever is not signed in yet, reads no records", readsNoRecords: true },
  "app/(auth)/sign-in/check-email/page.tsx": { reason: "after asking for a sign-in link: fixed words, reads no records", readsNoRecords: true },
  "app/(auth)/invitations/[token]/page.tsx": { reason: "invitation acceptance: the unguessable token in the link is the key", ownCheck: /findInvitationByToken\(/ },
  "app/api/auth/[...nextauth]/route.ts": { reason: "Auth.js's own sign-in, callback and session endpoints", ownCheck: /export const \{ GET, POST \} = handlers;/ },
  "app/api/calendar/[token]/route.ts": { reason: "calendar feed: calendar programs cannot sign in; the secret in the link is the key, for an active member only", ownCheck: /findFeedBySecret\([\s\S]*getActiveMembership\(/ },
  "app/api/cron/tick/route.ts": { reason: "the scheduler's tick: a bearer CRON_SECRET compared in constant time", ownCheck: /timingSafeEqual\(/ },
  "app/api/health/route.ts": { reason: "the load balancer's probe: ok or unavailable, nothing about any club", readsNoRecords: true },
  "app/api/webhooks/payments/route.ts": { reason: "the payment provider's webhook: its signature is checked on the raw bytes first", ownCheck: /verifyWebhook\(/ },
};

function walk(dir: string, name: RegExp): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    return e.isDirectory() ? walk(p, name) : name.test(e.name) ? [p] : [];
  });
}

type Fn = ts.FunctionDeclaration | ts.FunctionExpression | ts.ArrowFunction;

const calleeName = (call: ts.CallExpression): string | undefined => (ts.isIdentifier(call.expression) ? call.expression.text : undefined);
const unwrap = (e: ts.Expression): ts.Expression => (ts.isParenthesizedExpression(e) || ts.isAsExpression(e) || ts.isNonNullExpression(e) ? unwrap(e.expression) : e);
const hasModifier = (node: ts.Node, kind: ts.SyntaxKind) => (ts.canHaveModifiers(node) ? ts.getModifiers(node)?.some((m) => m.kind === kind) ?? false : false);

function isFunction(node: ts.Node | undefined): node is Fn {
  return !!node && (ts.isFunctionDeclaration(node) || ts.isFunctionExpression(node) || ts.isArrowFunction(node));
}

/** The function a top-level name stands for in this file (a declaration or a const arrow/function). */
function localFunction(source: ts.SourceFile, name: string): Fn | undefined {
  for (const st of source.statements) {
    if (ts.isFunctionDeclaration(st) && st.name?.text === name) return st;
    if (ts.isVariableStatement(st)) {
      for (const d of st.declarationList.declarations) {
        if (ts.isIdentifier(d.name) && d.name.text === name && d.initializer && isFunction(unwrap(d.initializer))) return unwrap(d.initializer) as Fn;
      }
    }
  }
  return undefined;
}

/** Before its guard a function may only read its own URL: `await params`, `await searchParams`, `new URL(req.url)`. */
function onlyReadsTheUrl(st: ts.Statement): boolean {
  if (!ts.isVariableStatement(st)) return false;
  return st.declarationList.declarations.every((d) => {
    if (!d.initializer) return true;
    const init = unwrap(d.initializer);
    if (ts.isNewExpression(init)) return ts.isIdentifier(init.expression) && init.expression.text === "URL";
    if (!ts.isAwaitExpression(init)) return false;
    const awaited = unwrap(init.expression);
    const name = ts.isIdentifier(awaited) ? awaited.text : ts.isPropertyAccessExpression(awaited) ? awaited.name.text : "";
    return name === "params" || name === "searchParams";
  });
}

/** The expression a statement evaluates at its top (a single declaration's value, an expression, a return). */
function topExpression(st: ts.Statement | ts.Expression): ts.Expression | undefined {
  if (ts.isVariableStatement(st)) {
    const decls = st.declarationList.declarations;
    return decls.length === 1 ? decls[0]!.initializer : undefined;
  }
  if (ts.isExpressionStatement(st) || ts.isReturnStatement(st)) return st.expression;
  return ts.isExpression(st as ts.Node) ? (st as ts.Expression) : undefined;
}

/** The guard call a statement makes at its top (not inside a condition, callback or helper), if any. */
function guardCallOf(st: ts.Statement | ts.Expression, guards: Set<string>): { call: ts.CallExpression; awaited: boolean } | undefined {
  let e = topExpression(st);
  if (!e) return undefined;
  e = unwrap(e);
  const awaited = ts.isAwaitExpression(e);
  if (ts.isAwaitExpression(e)) e = unwrap(e.expression);
  return ts.isCallExpression(e) && guards.has(calleeName(e) ?? "") ? { call: e, awaited } : undefined;
}

function callsAny(node: ts.Node, names: Set<string>): boolean {
  let found = false;
  const visit = (n: ts.Node) => {
    if (found) return;
    if (ts.isCallExpression(n) && names.has(calleeName(n) ?? "")) found = true;
    else ts.forEachChild(n, visit);
  };
  visit(node);
  return found;
}

function hasCommentAt(text: string, st: ts.Node): boolean {
  const lineEnd = text.indexOf("\n", st.end);
  const rest = text.slice(st.end, lineEnd === -1 ? undefined : lineEnd);
  return /\/\/|\/\*/.test(rest) || (ts.getLeadingCommentRanges(text, st.pos)?.length ?? 0) > 0;
}

/**
 * What is wrong with one exported function's guard, or null: its guard must be awaited (pages) or
 * returned (handlers) as a statement of its own body, after nothing but reading its own URL. A
 * guard given no type-level permission must check the record once read (or say why beside it).
 */
function checkFunction(fn: Fn, text: string, kind: "page" | "route"): string | null {
  const guards = kind === "page" ? PAGE_GUARDS : HANDLER_GUARDS;
  const names = [...guards].join(" / ");
  if (!fn.body) return "has no body";
  if (!ts.isBlock(fn.body)) {
    const found = guardCallOf(fn.body, guards);
    return found ? checkGuardCall(found.call, fn.body, text, kind) : `never calls ${names} as a statement of its own body`;
  }
  const statements = fn.body.statements;
  const at = statements.findIndex((st) => guardCallOf(st, guards));
  if (at === -1) return `never calls ${names} as a statement of its own body (not inside a condition, callback or helper)`;
  const before = statements.slice(0, at).find((st) => !onlyReadsTheUrl(st));
  if (before) return `does something before its guard: "${before.getText().split("\n")[0]!.slice(0, 80)}"`;
  const st = statements[at]!;
  const { call, awaited } = guardCallOf(st, guards)!;
  if (kind === "page" && !awaited) return `calls ${calleeName(call)} without awaiting it`;
  if (kind === "route" && !ts.isReturnStatement(st)) return `calls ${calleeName(call)} without returning its answer`;
  return checkGuardCall(call, st, text, kind);
}

function checkGuardCall(call: ts.CallExpression, st: ts.Node, text: string, kind: "page" | "route"): string | null {
  const name = calleeName(call)!;
  if (kind === "page" && (name === "authorizePage" || name === "authorizePageAny") && call.arguments.length < 2) {
    // Open to every person with a role in the club: then a record read from the URL is checked once read, or a comment says why.
    if (!hasCommentAt(text, st)) return `${name}(slug) with no permission needs a comment beside it saying who may see the page`;
  }
  if (kind === "route" && name === "withClub") {
    const permission = call.arguments[1];
    const handler = call.arguments[2];
    if (!permission) return "withClub without a permission";
    if (permission.kind === ts.SyntaxKind.NullKeyword && (!handler || !callsAny(handler, RECORD_CHECKS))) {
      return `withClub(slug, null, …) must check the record once read (${[...RECORD_CHECKS].join(", ")})`;
    }
  }
  return null;
}

/** Every problem of one file: a page's default export, a route's exported methods. */
function guardProblems(file: string, text: string): string[] {
  const kind = file.endsWith("route.ts") ? "route" : "page";
  const source = ts.createSourceFile(file, text, ts.ScriptTarget.Latest, true, ts.ScriptKind.TSX);
  const exported: { name: string; fn: Fn | undefined }[] = [];
  for (const st of source.statements) {
    if (kind === "page") {
      if (ts.isFunctionDeclaration(st) && hasModifier(st, ts.SyntaxKind.ExportKeyword) && hasModifier(st, ts.SyntaxKind.DefaultKeyword)) exported.push({ name: "default", fn: st });
      // A page's title is in its HTML too: metadata read from a record needs the same guard first.
      if (ts.isFunctionDeclaration(st) && hasModifier(st, ts.SyntaxKind.ExportKeyword) && st.name?.text === "generateMetadata") exported.push({ name: "generateMetadata", fn: st });
      if (ts.isExportAssignment(st) && !st.isExportEquals) {
        const e = unwrap(st.expression);
        exported.push({ name: "default", fn: isFunction(e) ? e : ts.isIdentifier(e) ? localFunction(source, e.text) : undefined });
      }
    } else {
      if (ts.isFunctionDeclaration(st) && hasModifier(st, ts.SyntaxKind.ExportKeyword) && st.name && HTTP_METHODS.has(st.name.text)) exported.push({ name: st.name.text, fn: st });
      if (ts.isVariableStatement(st) && hasModifier(st, ts.SyntaxKind.ExportKeyword)) {
        for (const d of st.declarationList.declarations) {
          if (ts.isIdentifier(d.name) && HTTP_METHODS.has(d.name.text)) {
            const init = d.initializer && unwrap(d.initializer);
            exported.push({ name: d.name.text, fn: isFunction(init) ? init : init && ts.isIdentifier(init) ? localFunction(source, init.text) : undefined });
          } else if (ts.isObjectBindingPattern(d.name)) {
            for (const el of d.name.elements) if (ts.isIdentifier(el.name) && HTTP_METHODS.has(el.name.text)) exported.push({ name: el.name.text, fn: undefined });
          }
        }
      }
      if (ts.isExportDeclaration(st) && st.exportClause && ts.isNamedExports(st.exportClause)) {
        for (const el of st.exportClause.elements) if (HTTP_METHODS.has(el.name.text)) exported.push({ name: el.name.text, fn: st.moduleSpecifier ? undefined : localFunction(source, (el.propertyName ?? el.name).text) });
      }
    }
  }
  if (exported.length === 0) return [kind === "page" ? "exports no default page function" : "exports no request handler"];
  return exported.flatMap(({ name, fn }) => {
    if (!fn) return [`${name}: not a function of this file, so its guard cannot be seen`];
    const problem = checkFunction(fn, text, kind);
    return problem ? [`${name}: ${problem}`] : [];
  });
}

const rel = (p: string) => path.relative(ROOT, p).split(path.sep).join("/");
const pages = walk(path.join(ROOT, "app"), /^page\.tsx?$/).map(rel).sort();
const routes = walk(path.join(ROOT, "app"), /^route\.tsx?$/).map(rel).sort();
const read = (file: string) => fs.readFileSync(path.join(ROOT, file), "utf8");

describe("every page and handler calls its own guard", () => {
  it("finds the app's pages and handlers", () => {
    expect(pages.length).toBeGreaterThan(50);
    expect(routes.length).toBeGreaterThan(20);
    expect(routes.filter((r) => !r.startsWith("app/api/"))).toEqual([]);
  });

  it("each page.tsx awaits authorizePage / authorizePageAny / authorizeOperatorPage / authorizeSignedInPage first, or is public by design", () => {
    const problems = pages.filter((f) => !(f in PUBLIC_BY_DESIGN)).flatMap((f) => guardProblems(f, read(f)).map((p) => `${f} ${p}`));
    expect(problems).toEqual([]);
  });

  it("each exported handler of a route.ts returns withClub(…) first, or the file is public by design", () => {
    const problems = routes.filter((f) => !(f in PUBLIC_BY_DESIGN)).flatMap((f) => guardProblems(f, read(f)).map((p) => `${f} ${p}`));
    expect(problems).toEqual([]);
  });

  it("club pages use the club guard, operator pages the operator guard", () => {
    const wrong: string[] = [];
    for (const f of pages.filter((p) => !(p in PUBLIC_BY_DESIGN))) {
      const text = read(f);
      if (f.startsWith("app/clubs/[club]/") && !/\bauthorizePage(Any)?\(/.test(text)) wrong.push(`${f}: a club page needs authorizePage or authorizePageAny`);
      if (f.startsWith("app/operator/") && !/\bauthorizeOperatorPage\(/.test(text)) wrong.push(`${f}: an operator page needs authorizeOperatorPage`);
    }
    expect(wrong).toEqual([]);
  });

  it("a page or handler under a record's segment reads it within the club and answers one it may not show like a missing one", () => {
    // [club] is the club itself; every other dynamic segment names a record (or a month of one).
    const recordSegment = /\[(?!club\])[^\]]+\]/;
    const wrong: string[] = [];
    for (const f of [...pages, ...routes].filter((p) => !(p in PUBLIC_BY_DESIGN) && recordSegment.test(p.replace("[club]", "")))) {
      const text = read(f);
      if (!/\bclub\.id\b/.test(text)) wrong.push(`${f}: reads its record without the club's id`);
      if (f.endsWith("page.tsx") ? !/\bnotFound\(\)/.test(text) : !/apiError\("not_found"/.test(text)) wrong.push(`${f}: never answers not-found for a record it may not show`);
    }
    expect(wrong).toEqual([]);
  });

  it("the public list is short, each entry has a one-line reason, names a file that exists and keeps its own check", () => {
    const entries = Object.entries(PUBLIC_BY_DESIGN);
    expect(entries.length).toBeLessThanOrEqual(10);
    for (const [file, entry] of entries) {
      expect(pages.includes(file) || routes.includes(file), `${file} is listed but does not exist`).toBe(true);
      expect(entry.reason.length, file).toBeGreaterThan(20);
      expect(entry.reason, file).not.toContain("\n");
      expect(entry.ownCheck !== undefined || entry.readsNoRecords === true, `${file} names its own check or reads no records`).toBe(true);
      const text = read(file);
      if (entry.ownCheck) expect(text, `${file} lost its own check`).toMatch(entry.ownCheck);
      // Reads no club's records: nothing from the queries, the schema or the session.
      if (entry.readsNoRecords) expect(text, `${file} reads records`).not.toMatch(/from "@\/(db\/(queries|schema)|lib\/server\/(session|club-context))/);
    }
    // Nothing under a club or the operator console is public.
    expect(entries.map(([f]) => f).filter((f) => f.startsWith("app/clubs/") || f.startsWith("app/operator/") || f.startsWith("app/api/clubs/"))).toEqual([]);
  });
});

// Server actions: every export of a "use server" module is built by clubAction (session → club →
// membership → permission) or userAction with a permission, unless it is listed here.
const ACTIONS_OF_THEIR_OWN: Record<string, { reason: string; ownCheck: RegExp }> = {
  "lib/actions/auth/sign-in.ts": { reason: "signing in: for whoever is not signed in yet; Auth.js checks the password or sends the link", ownCheck: /signIn\(/ },
  "lib/actions/auth/sign-out.ts": { reason: "signing out: ends the caller's own session and takes no input", ownCheck: /signOut\(/ },
  "lib/actions/invitations/accept-invitation.ts": { reason: "invitation acceptance: the token is the key, read inside the write", ownCheck: /findInvitationByToken\(/ },
  "lib/actions/safety/ground-from-report.ts": { reason: "resolves the club and asks the officer's rights itself, then calls the clubAction issueGroundingNotice", ownCheck: /resolveClubContext\([\s\S]*canTriageReports\(ctx\.ability\)[\s\S]*can\(ctx\.ability, "create", "GroundingNotice"\)[\s\S]*issueGroundingNotice\(/ },
};

/** Exports of a "use server" module that are not built by clubAction, or by userAction with a permission. */
function unguardedActions(file: string, text: string): string[] {
  const source = ts.createSourceFile(file, text, ts.ScriptTarget.Latest, true, ts.ScriptKind.TS);
  const out: string[] = [];
  for (const st of source.statements) {
    if (!hasModifier(st, ts.SyntaxKind.ExportKeyword) || hasModifier(st, ts.SyntaxKind.DeclareKeyword)) continue;
    if (ts.isFunctionDeclaration(st)) out.push(`${st.name?.text ?? "default"}: a plain function, not clubAction/userAction`);
    if (!ts.isVariableStatement(st)) continue;
    for (const d of st.declarationList.declarations) {
      const name = d.name.getText();
      const init = d.initializer && unwrap(d.initializer);
      const call = init && ts.isCallExpression(init) ? init : undefined;
      const built = call ? calleeName(call) : undefined;
      if (built !== "clubAction" && built !== "userAction") { out.push(`${name}: not built by clubAction/userAction`); continue; }
      const def = call!.arguments[0];
      const props = def && ts.isObjectLiteralExpression(def) ? def.properties.map((p) => p.name?.getText()) : [];
      if (!props.includes("permission")) out.push(`${name}: ${built} without a permission`);
    }
  }
  return out;
}

describe("every server action is built by its guard", () => {
  const files = walk(path.join(ROOT, "lib"), /\.tsx?$/).concat(walk(path.join(ROOT, "app"), /\.tsx?$/), walk(path.join(ROOT, "components"), /\.tsx?$/))
    .filter((f) => /^\s*["']use server["']/.test(fs.readFileSync(f, "utf8")))
    .map(rel)
    .sort();

  it("each export of a \"use server\" module is clubAction(…) or userAction(…) with a permission, or is listed with its own check", () => {
    expect(files.length).toBeGreaterThan(40);
    const problems = files.filter((f) => !(f in ACTIONS_OF_THEIR_OWN)).flatMap((f) => unguardedActions(f, read(f)).map((p) => `${f} ${p}`));
    expect(problems).toEqual([]);
  });

  it("each listed action exists, gives its reason and keeps its own check", () => {
    for (const [file, entry] of Object.entries(ACTIONS_OF_THEIR_OWN)) {
      expect(files, `${file} is listed but is not a "use server" module`).toContain(file);
      expect(entry.reason.length, file).toBeGreaterThan(20);
      expect(read(file), `${file} lost its own check`).toMatch(entry.ownCheck);
    }
  });

  it("refuses a plain exported function and a userAction with no permission", () => {
    expect(unguardedActions("x.ts", `"use server";\nexport async function doIt(_p: unknown, f: FormData) { return write(f); }`)).toEqual([expect.stringMatching(/plain function/)]);
    expect(unguardedActions("x.ts", `"use server";\nexport const doIt = userAction({ schema, requireUser: true, run() {}, success: "Done." });`)).toEqual([expect.stringMatching(/without a permission/)]);
    expect(unguardedActions("x.ts", `"use server";\nexport const doIt = clubAction({ schema, permission: ["create", "Squawk"], run() {}, success: "Done." });`)).toEqual([]);
    expect(unguardedActions("x.ts", `"use server";\nexport const doIt = async () => write();`)).toEqual([expect.stringMatching(/not built by/)]);
  });
});

describe("the scan itself refuses what it should", () => {
  const page = (body: string) => `import { authorizePage } from "@/lib/server/authorize";\nexport default async function P({ params, searchParams }: any) {\n${body}\n}\n`;
  const route = (body: string) => `import { withClub } from "@/lib/server/api";\nexport async function GET(req: Request, { params }: any) {\n${body}\n}\n`;

  it("passes a page that awaits its guard after reading only its URL", () => {
    expect(guardProblems("x/page.tsx", page(`const { club: slug } = await params;\nconst sp = await searchParams;\nconst { db } = await authorizePage(slug, ["read", "Ledger"]);\nreturn db;`))).toEqual([]);
    expect(guardProblems("x/page.tsx", `import { authorizeOperatorPage } from "x";\nasync function P() { await authorizeOperatorPage(); return null; }\nexport default P;`)).toEqual([]);
  });

  it("refuses a page with no guard, a guard only in a comment or an import, or a guard not awaited", () => {
    expect(guardProblems("x/page.tsx", page(`const { club } = await params;\nreturn listThings(getDb(), club);`))).toEqual([expect.stringMatching(/never calls/)]);
    expect(guardProblems("x/page.tsx", page(`// await authorizePage(slug, ["read", "Ledger"])\nreturn null;`))).toEqual([expect.stringMatching(/never calls/)]);
    expect(guardProblems("x/page.tsx", page(``))).toEqual([expect.stringMatching(/never calls/)]);
    expect(guardProblems("x/page.tsx", page(`const { club: slug } = await params;\nconst p = authorizePage(slug, ["read", "Ledger"]);\nreturn p;`))).toEqual([expect.stringMatching(/without awaiting/)]);
    expect(guardProblems("x/page.tsx", `export default function P() { return null; }\nexport async function Other() { await authorizePage("x", ["read", "Ledger"]); }`)).toEqual([expect.stringMatching(/never calls/)]);
  });

  it("refuses a guard inside a condition, in a helper, or after a read", () => {
    expect(guardProblems("x/page.tsx", page(`const { club: slug } = await params;\nif (slug) { await authorizePage(slug, ["read", "Ledger"]); }\nreturn null;`))).toEqual([expect.stringMatching(/never calls/)]);
    expect(guardProblems("x/page.tsx", page(`const { club: slug } = await params;\nconst rows = listJournal(getDb(), slug);\nawait authorizePage(slug, ["read", "Ledger"]);\nreturn rows;`))).toEqual([expect.stringMatching(/before its guard/)]);
    expect(guardProblems("x/page.tsx", page(`const { club: slug } = await params;\nawait check(slug);\nreturn null;`))).toEqual([expect.stringMatching(/never calls/)]);
  });

  it("checks a page's generateMetadata as well as the page", () => {
    const meta = (body: string) => `${page(`const { club: slug } = await params;\nawait authorizePage(slug, ["read", "Ledger"]);\nreturn null;`)}export async function generateMetadata({ params }: any) {\n${body}\n}\n`;
    expect(guardProblems("x/page.tsx", meta(`const { id } = await params;\nreturn { title: getReport(getDb(), id).title };`))).toEqual([expect.stringMatching(/^generateMetadata: never calls/)]);
    expect(guardProblems("x/page.tsx", meta(`const { club: slug, id } = await params;\nconst { db } = await authorizePage(slug, ["read", "Ledger"]);\nreturn { title: id };`))).toEqual([]);
  });

  it("asks for a reason beside authorizePage(slug) with no permission", () => {
    expect(guardProblems("x/page.tsx", page(`const { club: slug } = await params;\nconst { db } = await authorizePage(slug);\nreturn db;`))).toEqual([expect.stringMatching(/needs a comment/)]);
    expect(guardProblems("x/page.tsx", page(`const { club: slug } = await params;\nconst { db } = await authorizePage(slug); // every person with a role in the club\nreturn db;`))).toEqual([]);
  });

  it("refuses a handler that does not return withClub, and withClub(null) with no record check", () => {
    expect(guardProblems("x/route.ts", route(`const { club } = await params;\nreturn withClub(club, ["read", "Aircraft"], (ctx) => Response.json(ctx.club));`))).toEqual([]);
    expect(guardProblems("x/route.ts", route(`const { club } = await params;\nreturn Response.json(listAircraft(getDb(), club));`))).toEqual([expect.stringMatching(/never calls/)]);
    expect(guardProblems("x/route.ts", route(`const { club } = await params;\nwithClub(club, ["read", "Aircraft"], () => new Response());\nreturn new Response("x");`))).toEqual([expect.stringMatching(/without returning/)]);
    expect(guardProblems("x/route.ts", route(`const { club, id } = await params;\nreturn withClub(club, null, (ctx) => Response.json(getDocument(ctx.db, id)));`))).toEqual([expect.stringMatching(/must check the record/)]);
    expect(guardProblems("x/route.ts", route(`const { club, id } = await params;\nreturn withClub(club, null, (ctx) => { const d = getDocument(ctx.db, id); return canOn(ctx.ability, "read", "MemberDocument", d) ? Response.json(d) : new Response(null, { status: 404 }); });`))).toEqual([]);
  });

  it("checks every exported method of a route, and refuses methods it cannot see", () => {
    const two = `${route(`const { club } = await params;\nreturn withClub(club, ["read", "Booking"], () => new Response());`)}export async function POST() {\nreturn new Response(writeSomething());\n}\n`;
    expect(guardProblems("x/route.ts", two)).toEqual([expect.stringMatching(/^POST: /)]);
    expect(guardProblems("x/route.ts", `import { handlers } from "x";\nexport const { GET, POST } = handlers;`)).toEqual([expect.stringMatching(/^GET: not a function/), expect.stringMatching(/^POST: not a function/)]);
    expect(guardProblems("x/route.ts", `export { GET } from "./elsewhere";`)).toEqual([expect.stringMatching(/^GET: not a function/)]);
  });
});
