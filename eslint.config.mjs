import tseslint from "typescript-eslint";

// Permission questions go through permissions/authorize.ts (can / canAll / canOn, and
// lib/server/authorize.ts for pages): a plain ability.can(action, "Account") is true for
// every member because of the rule on their own account. The browser's <Allowed> hint is
// the one exception (components/ability-boundary.tsx); it never guards data.
const NO_DIRECT_ABILITY = {
  selector: "CallExpression[callee.type='MemberExpression'][callee.property.name=/^(can|cannot|relevantRuleFor|rulesFor|possibleRulesFor)$/]",
  message: "Ask permissions through can / canAll / canOn (permissions/authorize.ts) or authorizePage (lib/server/authorize.ts), never ability.can directly.",
};
// A calendar date people read is the club's day, not UTC's: an instant's toISOString() is a
// day ahead every evening west of Greenwich. Use isoDateInTimeZone / formatLocalTime with the
// club's time zone (lib/dates, lib/fleet/time).
const NO_UTC_CALENDAR_DATE = {
  selector: "CallExpression[callee.property.name=/^(slice|substring|substr|split)$/][callee.object.type='CallExpression'][callee.object.callee.property.name='toISOString']",
  message: "Screens show the club's day and time: use isoDateInTimeZone(instant, club.timeZone) or formatLocalTime(instant, club.timeZone), never toISOString().slice(…).",
};
// The same mistake on an ISO string already made: "…T…Z".split("T")[0] or .replace("T", " ").
const NO_UTC_SPLIT = {
  selector: "CallExpression[callee.property.name=/^(split|replace)$/][arguments.0.type='Literal'][arguments.0.value='T']",
  message: "An ISO instant split at \"T\" is a UTC date or time: use isoDateInTimeZone(instant, club.timeZone) or formatLocalTime(instant, club.timeZone).",
};

// Pure rules (lib/<area>) hold no database, framework or request plumbing, so they run the same in
// a page, an action, the browser, a script and a unit test; reads and writes live in db/queries/
// (server-only), request plumbing in lib/server, lib/actions, lib/auth, lib/email, lib/payments,
// lib/storage. A type from the schema (a row's shape) is allowed: it leaves nothing at run time.
const PURE_LIB_FOLDERS = [
  "lib/airworthiness",
  "lib/bookings",
  "lib/cache",
  "lib/csv",
  "lib/currency",
  "lib/dates",
  "lib/fleet",
  "lib/money",
  "lib/pdf",
  "lib/performance",
  "lib/ramp",
  "lib/reconcile",
  "lib/safety",
  "lib/validation",
];
const PURE_LIB_IMPORTS = {
  paths: [
    { name: "drizzle-orm", message: "Pure rules hold no database: query in db/queries/ and pass the rows in." },
    { name: "better-sqlite3", message: "Pure rules hold no database: query in db/queries/ and pass the rows in." },
    { name: "server-only", message: "A pure rule runs anywhere; server-only code belongs in db/queries/ or lib/server/." },
    { name: "next", message: "Pure rules hold no framework code." },
    { name: "react", message: "Pure rules hold no framework code: put components in components/." },
    { name: "react-dom", message: "Pure rules hold no framework code: put components in components/." },
    { name: "next-auth", message: "Pure rules hold no session: take the user as a parameter." },
  ],
  patterns: [
    { group: ["drizzle-orm/*", "better-sqlite3/*"], message: "Pure rules hold no database: query in db/queries/ and pass the rows in." },
    { group: ["next/*", "react/*", "react-dom/*", "next-auth/*", "@auth/*"], message: "Pure rules hold no framework code." },
    { group: ["@/db/*", "!@/db/schema", "!@/db/schema/*"], message: "Pure rules hold no database: query in db/queries/ and pass the rows in." },
    { group: ["@/db/schema", "@/db/schema/*"], allowTypeImports: true, message: "Only a row's type may come from the schema; keep shared constants in lib/<area>." },
    { group: ["@/lib/server/*", "@/lib/actions/*", "@/lib/auth/*", "@/lib/email/*", "@/lib/storage/*"], message: "Pure rules hold no request plumbing or database layer." },
    { group: ["../*", "../../*"], message: "Import another area by its @/ path, so this rule can see what it is." },
  ],
};

export default tseslint.config(
  { ignores: ["node_modules/", ".next/", ".next-*/", "data/", "uploads/", "db/migrations/", "next-env.d.ts", "tests/.artifacts/", "public/sw.js", "public/sw.js.map", "public/swe-worker-*"] },
  ...tseslint.configs.recommended,
  {
    rules: {
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
      "@typescript-eslint/no-explicit-any": "error",
      "no-console": "off",
    },
  },
  {
    files: ["app/**/*.{ts,tsx}", "lib/**/*.{ts,tsx}", "components/**/*.{ts,tsx}", "db/**/*.ts", "auth.ts", "middleware.ts"],
    ignores: ["components/ability-boundary.tsx"],
    rules: { "no-restricted-syntax": ["error", NO_DIRECT_ABILITY] },
  },
  {
    // Screens: both rules (a later block's rule replaces an earlier one's, so both are listed).
    files: ["app/**/*.{ts,tsx}", "components/**/*.{ts,tsx}"],
    ignores: ["components/ability-boundary.tsx"],
    rules: { "no-restricted-syntax": ["error", NO_DIRECT_ABILITY, NO_UTC_CALENDAR_DATE, NO_UTC_SPLIT] },
  },
  {
    files: ["components/ability-boundary.tsx"],
    rules: { "no-restricted-syntax": ["error", NO_UTC_CALENDAR_DATE, NO_UTC_SPLIT] },
  },
  {
    // Action answers and e-mails reach people too: the club's day and time there as well.
    files: ["lib/actions/**/*.ts"],
    rules: { "no-restricted-syntax": ["error", NO_DIRECT_ABILITY, NO_UTC_CALENDAR_DATE, NO_UTC_SPLIT] },
  },
  {
    files: ["emails/**/*.{ts,tsx}"],
    rules: { "no-restricted-syntax": ["error", NO_UTC_CALENDAR_DATE, NO_UTC_SPLIT] },
  },
  {
    // Server logs go through lib/server/log.ts, which withholds SQL parameters and masks
    // personal data; a bare console call would print an error's message as it is.
    files: ["app/**", "lib/**", "db/**", "middleware.ts", "instrumentation.ts"],
    ignores: ["lib/server/log.ts"],
    rules: { "no-console": "error" },
  },
  {
    files: PURE_LIB_FOLDERS.map((folder) => `${folder}/**/*.{ts,tsx}`),
    rules: { "@typescript-eslint/no-restricted-imports": ["error", PURE_LIB_IMPORTS] },
  },
);
