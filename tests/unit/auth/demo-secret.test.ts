import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
// @ts-expect-error plain JavaScript module of the demo script, no type declarations
import { demoAuthSecret, SECRET_FILE } from "../../../scripts/demo-secret.mjs";

describe("npm run demo's session secret", () => {
  it("is random, made once into the data folder with owner-only access, then reused", () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "hangarline-secret-"));
    const other = fs.mkdtempSync(path.join(os.tmpdir(), "hangarline-secret-"));
    try {
      const first = demoAuthSecret(dir) as string;
      expect(first.length).toBeGreaterThanOrEqual(32);
      expect(fs.statSync(path.join(dir, SECRET_FILE)).mode & 0o777).toBe(0o600);
      expect(demoAuthSecret(dir)).toBe(first);
      expect(demoAuthSecret(other)).not.toBe(first);
      expect(first).not.toMatch(/hangarline|demo|change-me/);
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
      fs.rmSync(other, { recursive: true, force: true });
    }
  });
});
