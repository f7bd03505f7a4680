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
    // Server logs go through lib/server/log.ts, which withholds SQL parameters and masks
    // personal data; a bare console call would print an error's message as it is.
    files: ["app/**", "lib/**", "db/**", "middleware.ts", "instrumentation.ts"],
    ignores: ["lib/server/log.ts"],
    rules: { "no-console": "error" },
  },
);
