import path from "node:path";
import { defineConfig } from "vitest/config";
const alias = { "@": import.meta.dirname, "server-only": path.join(import.meta.dirname, "tests/fixtures/server-only.ts") };
export default defineConfig({ resolve: { alias }, test: { include: ["tests/e2e/bookings.test.ts"], globalSetup: ["/tmp/e2e-local-setup.ts"], testTimeout: 120_000 } });
