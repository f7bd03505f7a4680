import path from "node:path";
import { defineConfig } from "vitest/config";

const alias = { "@": import.meta.dirname, "server-only": path.join(import.meta.dirname, "tests/fixtures/server-only.ts") };

// Browser tests: one production build, one server, run file by file against it.
export default defineConfig({
  resolve: { alias },
  // tsconfig keeps JSX for Next; tests compile it with the automatic runtime.
  oxc: { jsx: { runtime: "automatic" } },
  test: {
    name: "e2e",
    include: ["tests/e2e/**/*.test.ts"],
    globalSetup: ["tests/e2e/global-setup.ts"],
    fileParallelism: false,
    // No retries: a browser test that fails once is a failure to fix. Each test waits for the
    // action's own answer (role="status"), never sleeps; see DEVELOPERS.md "Forms and their answers".
    retry: 0,
    testTimeout: 150_000,
    hookTimeout: 180_000,
  },
});
