// History tables are append-only in the database itself: no UPDATE, DELETE, INSERT OR REPLACE,
// REPLACE INTO or UPSERT changes or removes a row, whatever code (or person) runs the SQL.
import { beforeAll, describe, expect, it } from "vitest";
import { aircraft, clubs, groundingNotices } from "@/db/schema";
import { seedDemo } from "@/db/seed/index";
import { writeAudit } from "@/lib/server/audit";
import { db } from "./helpers";

type Row = Record<string, unknown>;

/** Tables whose rows are never changed at all, and tables whose rows are changed but never removed. */
const FROZEN = ["audit_log", "journal_entries", "journal_lines", "squawk_events", "inspection_completions", "bulletin_acknowledgements", "safety_report_events"];
const KEPT = ["squawks", "grounding_notices", "inspection_items", "flights", "safety_reports"];

function sqlite() {
  return db().$client;
}

function oneRow(table: string): Row {
  const where = table === "bulletins" ? "WHERE status = 'published'" : "";
  const row = sqlite().prepare(`SELECT * FROM ${table} ${where} ORDER BY rowid LIMIT 1`).get() as Row | undefined;
  if (!row) throw new Error(`The demo seed has no row in ${table} to test with`);
  return row;
}

function snapshot(table: string, id: unknown) {
  return { row: sqlite().prepare(`SELECT * FROM ${table} WHERE id = ?`).get(id), count: (sqlite().prepare(`SELECT count(*) AS n FROM ${table}`).get() as { n: number }).n };
}

/** The row written back with a changed created_at: what tampering with history looks like. */
function rewrite(table: string, row: Row, verb: "INSERT OR REPLACE" | "REPLACE" | "UPSERT"): () => void {
  const cols = Object.keys(row);
  const values = cols.map((c) => (c === "created_at" ? Number(row[c]) + 1 : row[c]));
  const list = cols.map((c) => `"${c}"`).join(", ");
  const marks = cols.map(() => "?").join(", ");
  const sql =
    verb === "UPSERT"
      ? `INSERT INTO ${table} (${list}) VALUES (${marks}) ON CONFLICT(id) DO UPDATE SET created_at = excluded.created_at`
      : `${verb} INTO ${table} (${list}) VALUES (${marks})`;
  return () => sqlite().prepare(sql).run(...values);
}

const WAYS = ["UPDATE", "DELETE", "INSERT OR REPLACE", "REPLACE", "UPSERT"] as const;

function attempt(table: string, row: Row, way: (typeof WAYS)[number]): () => void {
  // A published bulletin's words are what must not change (its bookkeeping columns may).
  if (way === "UPDATE" && table === "bulletins") return () => sqlite().prepare("UPDATE bulletins SET title = title || ' (edited)' WHERE id = ?").run(row.id);
  if (way === "UPDATE") return () => sqlite().prepare(`UPDATE ${table} SET created_at = created_at + 1 WHERE id = ?`).run(row.id);
  if (way === "DELETE") return () => sqlite().prepare(`DELETE FROM ${table} WHERE id = ?`).run(row.id);
  return rewrite(table, row, way);
}

beforeAll(async () => {
  await seedDemo(db());
  // The demo seed writes no audit row and no grounding notice; one of each to test with.
  const club = db().select().from(clubs).get()!;
  const plane = db().select().from(aircraft).get()!;
  writeAudit(db(), { clubId: club.id, actorId: null, action: "test.append-only", subjectType: "Club", subjectId: club.id });
  db().insert(groundingNotices).values({ clubId: plane.clubId, aircraftId: plane.id, category: "safety", reason: "Test notice", effectiveAt: new Date() }).run();
}, 120_000);

describe("append-only history refuses every way of changing a row", () => {
  for (const table of [...FROZEN, "bulletins"]) {
    for (const way of WAYS) {
      it(`${table}: ${way} is refused and the row stays as it was`, () => {
        const row = oneRow(table);
        const before = snapshot(table, row.id);
        expect(attempt(table, row, way)).toThrow(/never|published/);
        expect(snapshot(table, row.id)).toEqual(before);
      });
    }
  }

  for (const table of KEPT) {
    for (const way of WAYS.filter((w) => w !== "UPDATE")) {
      it(`${table}: ${way} cannot remove or swap the row`, () => {
        const row = oneRow(table);
        const before = snapshot(table, row.id);
        expect(attempt(table, row, way)).toThrow(/never/);
        expect(snapshot(table, row.id)).toEqual(before);
      });
    }
  }

  it("journal_entries: a REPLACE that collides on the source key (not the id) is refused too", () => {
    const row = sqlite().prepare("SELECT * FROM journal_entries WHERE source_key IS NOT NULL LIMIT 1").get() as Row;
    expect(row).toBeTruthy();
    const copy = { ...row, id: crypto.randomUUID(), reverses_entry_id: null };
    const cols = Object.keys(copy);
    const before = snapshot("journal_entries", row.id);
    expect(() =>
      sqlite()
        .prepare(`REPLACE INTO journal_entries (${cols.map((c) => `"${c}"`).join(", ")}) VALUES (${cols.map(() => "?").join(", ")})`)
        .run(...cols.map((c) => (copy as Row)[c])),
    ).toThrow(/never replaced/);
    expect(snapshot("journal_entries", row.id)).toEqual(before);
  });

  it("bulletin_acknowledgements: acknowledging again under a new id keeps the first acknowledgement (skipped, never replaced)", () => {
    const row = oneRow("bulletin_acknowledgements");
    const before = snapshot("bulletin_acknowledgements", row.id);
    const copy = { ...row, id: crypto.randomUUID(), acknowledged_at: Number(row.acknowledged_at) + 86_400_000 };
    const cols = Object.keys(copy);
    const sql = `INSERT OR REPLACE INTO bulletin_acknowledgements (${cols.map((c) => `"${c}"`).join(", ")}) VALUES (${cols.map(() => "?").join(", ")})`;
    const result = sqlite().prepare(sql).run(...cols.map((c) => (copy as Row)[c]));
    expect(result.changes).toBe(0);
    expect(snapshot("bulletin_acknowledgements", row.id)).toEqual(before);
    expect(sqlite().prepare("SELECT count(*) AS n FROM bulletin_acknowledgements WHERE id = ?").get(copy.id)).toEqual({ n: 0 });
  });

  it("a new row with a fresh key is still an ordinary insert", () => {
    const row = oneRow("audit_log");
    const copy = { ...row, id: crypto.randomUUID() };
    const cols = Object.keys(copy);
    sqlite()
      .prepare(`INSERT INTO audit_log (${cols.map((c) => `"${c}"`).join(", ")}) VALUES (${cols.map(() => "?").join(", ")})`)
      .run(...cols.map((c) => (copy as Row)[c]));
    expect(snapshot("audit_log", copy.id).row).toBeTruthy();
  });
});
