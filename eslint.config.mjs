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
);
