import tseslint from "typescript-eslint";

export default tseslint.config(
  { ignores: ["node_modules/", ".next/", ".next-*/", "data/", "uploads/", "db/migrations/", "next-env.d.ts", "tests/.artifacts/"] },
  ...tseslint.configs.recommended,
  {
    rules: {
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
      "@typescript-eslint/no-explicit-any": "error",
      "no-console": "off",
    },
  },
  {
    // Permission questions go through permissions/authorize.ts (can / canAll / canOn, and
    // lib/server/authorize.ts for pages): a plain ability.can(action, "Account") is true for
    // every member because of the rule on their own account. The browser's <Allowed> hint is
    // the one exception (components/ability-boundary.tsx); it never guards data.
    files: ["app/**/*.{ts,tsx}", "lib/**/*.{ts,tsx}", "components/**/*.{ts,tsx}", "db/**/*.ts", "auth.ts", "middleware.ts"],
    ignores: ["components/ability-boundary.tsx"],
    rules: {
      "no-restricted-syntax": [
        "error",
        {
          selector: "CallExpression[callee.type='MemberExpression'][callee.property.name=/^(can|cannot|relevantRuleFor|rulesFor|possibleRulesFor)$/]",
          message: "Ask permissions through can / canAll / canOn (permissions/authorize.ts) or authorizePage (lib/server/authorize.ts), never ability.can directly.",
        },
      ],
    },
  },
  {
    // Server logs go through lib/server/log.ts, which withholds SQL parameters and masks
    // personal data; a bare console call would print an error's message as it is.
    files: ["app/**", "lib/**", "db/**", "middleware.ts", "instrumentation.ts"],
    ignores: ["lib/server/log.ts"],
    rules: { "no-console": "error" },
  },
);
