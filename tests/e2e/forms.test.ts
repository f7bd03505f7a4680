import path from "node:path";
import Database from "better-sqlite3";
import { describe, expect, inject, it } from "vitest";
import { formPages, runForms, summarize } from "./form-runs";
import { baseUrl, getBrowser } from "./harness";

// Fifty forms in a row, seven kinds, four roles: each gets its own answer (role="status" text, or
// the page its answer sends the browser to) and each stored exactly one record.
describe("fifty forms in a row", () => {
  it("every submission answers, and each record landed once", async () => {
    const pages = await formPages(await getBrowser(), baseUrl);
    const tag = `Row ${Date.now()}`;
    const samples = await runForms(pages, { total: 50, answerTimeoutMs: 20_000, stopOnMissingAnswer: true, tag });
    const missing = samples.filter((s) => !s.answered).map((s) => `#${s.n} ${s.kind}`);
    expect(missing, "submissions that never showed their answer").toEqual([]);
    expect(samples).toHaveLength(50);
    expect(new Set(samples.map((s) => s.kind)).size).toBe(7);

    const db = new Database(path.join(inject("dataDir"), "e2e.db"), { readonly: true, fileMustExist: true });
    try {
      const landed = samples.flatMap((s) => (s.landed ? [{ n: s.n, kind: s.kind, ...s.landed }] : []));
      expect(landed.length).toBeGreaterThan(35);
      for (const l of landed) {
        const row = db.prepare(`SELECT count(*) AS n FROM ${l.table} WHERE ${l.column} = ?${l.where ? ` AND ${l.where}` : ""}`).get(l.value) as { n: number };
        expect(row.n, `#${l.n} ${l.kind}: rows in ${l.table} for ${l.value}`).toBe(1);
      }
      // Every notice issued by the run was lifted by it.
      const open = db.prepare("SELECT count(*) AS n FROM grounding_notices WHERE reason LIKE ? AND lifted_at IS NULL").get(`${tag} notice %`) as { n: number };
      expect(open.n).toBe(0);
    } finally {
      db.close();
    }
    const s = summarize(samples);
    expect(s.unanswered).toBe(0);
    for (const p of Object.values(pages)) await p.context().close();
  });
});
