import { defineConfig } from "vitest/config";
import path from "node:path";

const alias = { "@": import.meta.dirname, "server-only": path.join(import.meta.dirname, "tests/fixtures/server-only.ts") };

export default defineConfig({
  resolve: { alias },
  // tsconfig keeps JSX for Next; tests compile it with the automatic runtime.
  oxc: { jsx: { runtime: "automatic" } },
  test: {
    projects: [
      {
        resolve: { alias },
        oxc: { jsx: { runtime: "automatic" } },
        test: { name: "unit", include: ["tests/unit/**/*.test.ts"], environment: "node" },
      },
      {
        resolve: { alias },
        oxc: { jsx: { runtime: "automatic" } },
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          environment: "node",
          setupFiles: ["tests/integration/setup.ts"],
          // next-auth imports "next/server" without an extension; inlined, it resolves as in Next.
          server: { deps: { inline: ["next-auth"] } },
          testTimeout: 30000,
          hookTimeout: 30000,
        },
      },
    ],
  },
});
